using CoefGen.Cli.Io;

namespace CoefGen.Cli.Tests.BadInput;

public class BadInputCorpusTests
{
    public static TheoryData<string> Names { get; } = new(BadInputCorpus.All.Select(c => c.Name));

    [Theory]
    [MemberData(nameof(Names))]
    public void A_bad_input_is_a_located_diagnostic_with_its_exit_code_and_the_folder_stays_byte_identical(string name)
    {
        var c = BadInputCorpus.All.Single(x => x.Name == name);
        using var sandbox = new Sandbox();
        var args = c.Arrange(sandbox);
        var location = c.Location(sandbox);
        var before = sandbox.Fingerprint();

        var r = CliRunner.Run(args);

        var all = r.Output + r.Error;
        Assert.True(r.ExitCode == c.Exit, $"exit {r.ExitCode}, expected {c.Exit}\n{r.Error}");
        var lines = r.Error.Split('\n');
        Assert.True(lines.Any(l => l.StartsWith(location + (location.EndsWith(':') ? "" : ":"), StringComparison.Ordinal) && l.Contains($"error {c.Code}:", StringComparison.Ordinal)),
            $"no line at '{location}' with error {c.Code}:\n{r.Error}");
        Assert.DoesNotContain("   at ", all, StringComparison.Ordinal);
        Assert.DoesNotContain("Exception", all, StringComparison.Ordinal);
        Assert.DoesNotContain("System.", r.Error, StringComparison.Ordinal);
        Assert.True(lines.Length <= DiagnosticPrinter.MaxShown + 5, $"{lines.Length} lines of diagnostics: the list must be capped");
        if (c.Absent is not null)
        {
            Assert.DoesNotContain(c.Absent, all, StringComparison.Ordinal);
        }

        Assert.Equal(before, sandbox.Fingerprint());
    }

    [Fact]
    public void The_corpus_has_at_least_60_distinct_cases()
    {
        Assert.True(BadInputCorpus.All.Count >= 60, $"{BadInputCorpus.All.Count} cases");
        Assert.Equal(BadInputCorpus.All.Count, BadInputCorpus.All.Select(c => c.Name).Distinct(StringComparer.Ordinal).Count());
    }
}
