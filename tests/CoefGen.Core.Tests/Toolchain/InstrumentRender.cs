using CoefGen.Core.Emit;
using CoefGen.Core.Instrument;
using CoefGen.Core.Tests.Emit;
using CoefGen.Core.Tests.Instrument;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>Renders a combined template of the example instrument into a temp dir under its default output name.</summary>
public static class InstrumentRender
{
    public static string Write(TempDir dir, string template)
    {
        Assert.True(InstrumentTemplates.TryGet(template, out var t));
        var result = TemplateRenderer.RenderFile(InstrumentTemplateModel.Create(ExampleInstrument.Shipped, "coefgen", "test"), Path.Combine(RepoPaths.Templates, t.FileName));
        Assert.True(result.Text is not null, string.Join("\n", result.Diagnostics));
        var name = "cam4" + t.DefaultOutputSuffix;
        dir.Write(name, result.Text!);
        return name;
    }
}
