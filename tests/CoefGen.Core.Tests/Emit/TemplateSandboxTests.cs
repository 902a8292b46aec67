using CoefGen.Core.Emit;

namespace CoefGen.Core.Tests.Emit;

/// <summary>Hostile user templates fail with a located CG3xxx diagnostic and produce no output.</summary>
public class TemplateSandboxTests
{
    private static RenderResult RenderUser(string text, string? folder = null)
    {
        var model = TemplateModel.Create(TestDesigns.Fixed(), TestDesigns.Provenance);
        folder ??= Directory.CreateTempSubdirectory("coefgen-tpl-").FullName;
        var path = Path.Combine(folder, "user.scriban");
        File.WriteAllText(path, text);
        return TemplateRenderer.RenderFile(model, path, TestContext.Current.CancellationToken);
    }

    [Theory]
    [InlineData("ok\n{{ coefs.GetType }}", "CG3003", 2, 10)]
    [InlineData("{{ proof.GetType }}", "CG3003", 1, 10)]
    [InlineData("{{ object.x }}", "CG3003", 1, 11)]
    [InlineData("{{ date.now }}", "CG3003", 1, 4)]
    [InlineData("a\nb\n  {{ while true; end }}", "CG3004", 3, 6)]
    [InlineData("{{ for i in 0..100000000 }}{{ end }}", "CG3004", 1, 14)]
    [InlineData("{{ func f; ret f; end; f }}", "CG3007", 1, 16)]
    [InlineData("{{ include '/etc/hostname' }}", "CG3005", 1, 4)]
    [InlineData("{{ include '../outside.scriban' }}", "CG3005", 1, 4)]
    [InlineData("{{ proof.safe = false }}", "CG3003", 1, 10)]
    [InlineData("{{ 1 + }}", "CG3002", 1, 8)]
    public void Hostile_template_fails_with_a_located_diagnostic_and_no_output(string text, string code, int line, int column)
    {
        var r = RenderUser(text);
        Assert.Null(r.Text);
        var d = Assert.Single(r.Diagnostics);
        Assert.Equal(code, d.Code);
        Assert.EndsWith("user.scriban", d.Location.File, StringComparison.Ordinal);
        Assert.Equal(line, d.Location.Line);
        Assert.Equal(column, d.Location.Column);
    }

    [Fact]
    public void Include_inside_the_template_folder_works_and_output_is_normalised()
    {
        var folder = Directory.CreateTempSubdirectory("coefgen-tpl-").FullName;
        File.WriteAllText(Path.Combine(folder, "part.scriban"), "count {{ coef_count }}   \r\n");
        var r = RenderUser("{{ include 'part.scriban' }}\n\n\n", folder);
        Assert.Equal("count 8\n", r.Text);
    }

    [Fact]
    public void Output_over_the_limit_is_an_error_not_a_silent_truncation()
    {
        var r = RenderUser("{{ s = 'xxxxxxxxxxxxxxxx'; for i in 0..22; s = s + s; end; s }}");
        Assert.Null(r.Text);
        Assert.Equal("CG3006", Assert.Single(r.Diagnostics).Code);
    }

    [Fact]
    public void A_cancelled_token_stops_the_render()
    {
        var model = TemplateModel.Create(TestDesigns.Fixed(), TestDesigns.Provenance);
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => TemplateRenderer.Render(model, "{{ for c in coefs }}{{ c }}{{ end }}", "t", ".", cts.Token));
    }
}
