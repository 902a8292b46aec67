using System.Text;
using CoefGen.Core.Emit;

namespace CoefGen.Core.Tests.Emit;

public class ArtefactRendererTests
{
    private static TemplateModel Model() => TemplateModel.Create(TestDesigns.Fixed(), TestDesigns.Provenance);

    [Theory]
    [InlineData("/abs/x.h")]
    [InlineData("../x.h")]
    [InlineData("a/../../x.h")]
    [InlineData("C:/x.h")]
    [InlineData("a\\x.h")]
    [InlineData("")]
    [InlineData("a//x.h")]
    public void Output_paths_that_leave_the_output_folder_are_refused(string path)
    {
        var r = ArtefactRenderer.RenderAll(Model(), [("c-header", path)], RepoPaths.Templates, RepoPaths.Templates, TestContext.Current.CancellationToken);
        Assert.Empty(r.Artefacts);
        Assert.Equal("CG3010", Assert.Single(r.Diagnostics).Code);
    }

    [Fact]
    public void One_failing_entry_means_no_artefacts_at_all()
    {
        var r = ArtefactRenderer.RenderAll(Model(), [("c-header", "inc/a.h"), ("no-such.scriban", "b.h"), ("vhdl-package", "inc/a.h")],
            RepoPaths.Templates, RepoPaths.Templates, TestContext.Current.CancellationToken);
        Assert.Empty(r.Artefacts);
        Assert.Equal(["CG3001", "CG3011"], r.Diagnostics.Select(d => d.Code).ToArray());
    }

    [Fact]
    public void Staleness_check_reports_up_to_date_stale_and_missing()
    {
        var r = ArtefactRenderer.RenderAll(Model(), [("c-header", "a.h"), ("sv-package", "b.sv"), ("verilog-include", "c.vh")],
            RepoPaths.Templates, RepoPaths.Templates, TestContext.Current.CancellationToken);
        Assert.True(r.Succeeded);
        var disk = new Dictionary<string, byte[]>
        {
            ["a.h"] = r.Artefacts[0].ToBytes(),
            ["b.sv"] = Encoding.UTF8.GetBytes(r.Artefacts[1].Content.Replace("\n", "\r\n", StringComparison.Ordinal)),
        };
        var s = StalenessCheck.Compare(r.Artefacts, p => disk.GetValueOrDefault(p));
        Assert.Equal([StalenessStatus.UpToDate, StalenessStatus.Stale, StalenessStatus.Missing], s.Select(e => e.Status).ToArray());
        Assert.False(StalenessCheck.AllUpToDate(s));
    }
}
