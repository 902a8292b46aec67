using System.Globalization;
using System.Text.RegularExpressions;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Cli.Tests.BadInput;

/// <summary>
/// Random damage to the shipped example readout files (keys dropped, value types swapped, lines duplicated,
/// numbers scaled by 10^±300) run through the real command line in-process: the tool may accept the file or
/// refuse it with diagnostics, but never reports a "difference" (1) or an internal error (3), never prints a
/// stack trace, and writes nothing when it refuses. Each case is drawn from one FsCheck seed (reproducible).
/// </summary>
public partial class MutatedReadoutPropertyTests
{
    private static readonly string[] Examples = ["fast_imaging.toml", "slowscan_spectro.toml", "ir_measured.toml", "capture_bench.toml"];

    [Property(MaxTest = 40)]
    public Property Mutated_example_readouts_exit_0_or_2_and_a_refusal_writes_nothing() =>
        Prop.ForAll(Gen.Choose(0, int.MaxValue).ToArbitrary(), seed =>
        {
            var random = new Random(seed);
            using var sandbox = new Sandbox();
            var example = Examples[random.Next(Examples.Length)];
            var lines = File.ReadAllLines(sandbox.Path(example)).ToList();
            var applied = new List<string>();
            for (var m = random.Next(1, 4); m > 0; m--)
            {
                applied.Add(Mutate(lines, random));
            }

            var path = sandbox.Write("mutated.toml", string.Join("\n", lines) + "\n");
            var outDir = sandbox.Dir("out");
            sandbox.Write("out/keep.txt", "an existing file\n");
            var what = $"seed {seed}, {example}: {string.Join("; ", applied)}";

            var before = sandbox.Fingerprint();
            var design = CliRunner.Run("design", path, "--json");
            Check(design, what);
            Assert.Equal(before, sandbox.Fingerprint());

            var emit = CliRunner.Run("emit", path, "--out", outDir);
            Check(emit, what);
            if (emit.ExitCode != 0)
            {
                Assert.Equal(before, sandbox.Fingerprint());
            }
        });

    private static void Check(CliRunner.Result r, string what)
    {
        Assert.True(r.ExitCode is 0 or 2, $"{what}: exit {r.ExitCode}\n{r.Error}");
        Assert.DoesNotContain("   at ", r.Output + r.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("Exception", r.Error, StringComparison.Ordinal);
        if (r.ExitCode == 2)
        {
            Assert.Matches(ErrorLine(), r.Error);
        }
    }

    /// <summary>Applies one random mutation in place and says what it did.</summary>
    private static string Mutate(List<string> lines, Random random)
    {
        var keys = lines.Select((l, i) => (l, i)).Where(x => KeyLine().IsMatch(x.l)).Select(x => x.i).ToArray();
        var i = keys[random.Next(keys.Length)];
        var match = KeyLine().Match(lines[i]);
        var key = match.Groups[1].Value;
        var value = match.Groups[2].Value.Trim();
        switch (random.Next(4))
        {
            case 0:
                lines.RemoveAt(i);
                return $"dropped {key}";
            case 1:
                var swapped = value.StartsWith('"') ? "12345" : value is "true" or "false" ? "\"yes\"" : "\"text\"";
                lines[i] = $"{key} = {swapped}";
                return $"{key} = {swapped}";
            case 2:
                lines.Insert(i, lines[i]);
                return $"duplicated {key}";
            default:
                var exponent = random.Next(2) == 0 ? 300 : -300;
                var scaled = Number().Replace(value, n => double.TryParse(n.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out var x)
                    ? (x * Math.Pow(10, exponent)).ToString("R", CultureInfo.InvariantCulture).Replace("E", "e", StringComparison.Ordinal)
                    : n.Value, 1);
                if (scaled.Contains("Infinity", StringComparison.Ordinal) || scaled.Contains("NaN", StringComparison.Ordinal))
                {
                    scaled = value;
                }

                lines[i] = $"{key} = {scaled}";
                return $"{key} = {scaled}";
        }
    }

    [GeneratedRegex(@"^\s*([A-Za-z_][A-Za-z0-9_]*)\s*=\s*(.*)$")]
    private static partial Regex KeyLine();

    [GeneratedRegex(@"(?<![A-Za-z_])[0-9]+(\.[0-9]+)?([eE][-+]?[0-9]+)?")]
    private static partial Regex Number();

    [GeneratedRegex(@"error CG\d{4}:")]
    private static partial Regex ErrorLine();
}
