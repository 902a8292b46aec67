using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>Renders a built-in template for a design into a temp dir under its default output name.</summary>
public static class Emitted
{
    public static string Write(TempDir dir, IntegerDesign design, string builtin)
    {
        var model = TemplateModel.Create(design, TestDesigns.Provenance);
        Assert.True(BuiltinTemplates.TryGet(builtin, out var t));
        var name = t.DefaultOutputName(model.Prefix);
        dir.Write(name, BuiltinRender.Render(model, builtin));
        return name;
    }

    public static int IndexBits(int count)
    {
        var b = 1;
        while ((1 << b) < count)
        {
            b++;
        }

        return b;
    }

    public static readonly TimeSpan Timeout = TimeSpan.FromSeconds(120);
}
