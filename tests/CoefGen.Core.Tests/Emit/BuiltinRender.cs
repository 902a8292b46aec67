using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Tests.Emit;

/// <summary>Renders a built-in template from the repository's templates/ folder, failing the test on any diagnostic.</summary>
public static class BuiltinRender
{
    public static string Render(IntegerDesign design, string builtinName) => Render(TemplateModel.Create(design, TestDesigns.Provenance), builtinName);

    public static string Render(TemplateModel model, string builtinName)
    {
        Assert.True(BuiltinTemplates.TryGet(builtinName, out var t));
        var r = TemplateRenderer.RenderFile(model, Path.Combine(RepoPaths.Templates, t.FileName), TestContext.Current.CancellationToken);
        Assert.True(r.Succeeded, string.Join("\n", r.Diagnostics));
        return r.Text!;
    }
}
