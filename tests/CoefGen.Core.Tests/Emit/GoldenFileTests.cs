using CoefGen.Core.Emit;

namespace CoefGen.Core.Tests.Emit;

/// <summary>
/// The four built-in templates for one fixed design against committed outputs, so every change to the
/// generated C or HDL shows as a diff in review. UPDATE_GOLDEN=1 rewrites the golden files.
/// </summary>
public class GoldenFileTests
{
    public static TheoryData<string> Names => new(BuiltinTemplates.All.Select(t => t.Name));

    [Theory]
    [MemberData(nameof(Names))]
    public void Builtin_template_output_matches_the_committed_golden_file(string name)
    {
        var model = TemplateModel.Create(TestDesigns.Fixed(), TestDesigns.Provenance);
        Assert.True(BuiltinTemplates.TryGet(name, out var t));
        var text = BuiltinRender.Render(model, name);
        var golden = Path.Combine(RepoPaths.Golden, t.DefaultOutputName(model.Prefix));
        if (Environment.GetEnvironmentVariable("UPDATE_GOLDEN") == "1")
        {
            File.WriteAllText(golden, text);
        }

        Assert.True(File.Exists(golden), $"missing golden file {golden}; run with UPDATE_GOLDEN=1");
        Assert.Equal(File.ReadAllText(golden), text);
    }
}
