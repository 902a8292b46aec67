using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using CoefGen.Core.Capture;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>
/// Hostile numbers: the numeric values of the shipped examples (plain numbers and the number inside SI strings)
/// scaled by powers of ten up to 10^±300, through the loader, the pipeline and (for noise.capture) the capture
/// design. Nothing may throw except the pipeline's own <see cref="InputException"/>; every outcome is either
/// located errors or a design whose every number is finite.
/// </summary>
public partial class ScaledNumberPropertyTests
{
    [GeneratedRegex("^(\\s*[a-z_]+\\s*=\\s*\"?)([-+]?[0-9]+(?:\\.[0-9]+)?(?:[eE][-+]?[0-9]+)?)(.*)$", RegexOptions.CultureInvariant)]
    private static partial Regex NumericLine();

    private static readonly int[] Exponents = [1, -1, 2, -2, 3, -3, 10, -10, 30, -30, 100, -100, 300, -300];

    private sealed record Mutation(string Example, int[] Exponent)
    {
        public override string ToString() => $"{Example}: exponents [{string.Join(", ", Exponent)}]";
    }

    private static Gen<Mutation> Mutations()
    {
        var names = ShippedExamples.Names.ToArray();
        return from name in Gen.Elements(names)
               let count = NumericLines(File.ReadAllText(Path.Combine(ShippedExamples.Folder, name))).Count
               from single in Gen.Elements(true, false)
               from which in Gen.Choose(0, count - 1)
               from e in Gen.Elements(Exponents)
               from each in Gen.ArrayOf(Gen.Frequency((3, Gen.Constant(0)), (1, Gen.Elements(1, -1, 300, -300))), count)
               select new Mutation(name, single ? [.. Enumerable.Range(0, count).Select(i => i == which ? e : 0)] : each);
    }

    [Property(MaxTest = 100)]
    public Property Numbers_scaled_by_powers_of_ten_give_located_errors_or_a_finite_design() =>
        Prop.ForAll(Mutations().ToArbitrary(), m =>
        {
            var text = Scale(File.ReadAllText(Path.Combine(ShippedExamples.Folder, m.Example)), m.Exponent);
            var load = ReadoutLoader.Load(Encoding.UTF8.GetBytes(text), m.Example, ReadRelative);
            if (load.Description is null)
            {
                Assert.Contains(load.Diagnostics, d => d.Severity == Severity.Error && d.Location.Line > 0);
                return;
            }

            DesignResult result;
            try
            {
                result = DesignPipeline.Run(load.Description, ShippedExamples.Catalog);
                if (load.Description.Noise.CapturePath is { } path)
                {
                    var format = new CaptureFormat(CaptureFormat.EncodingFromFileName(path), CaptureLayout.PixelSynchronous, load.Description.Timing.PixelSamples);
                    var parsed = CaptureParser.Parse(ReadRelative(path), path, format, load.Description.Adc);
                    if (parsed.Capture is null)
                    {
                        Assert.Contains(parsed.Diagnostics, d => d.Severity == Severity.Error);
                        return;
                    }

                    result = CaptureDesign.Apply(result, parsed.Capture);
                }
            }
            catch (InputException ex)
            {
                Assert.Contains(ex.Diagnostics, d => d.Severity == Severity.Error);
                return;
            }

            AssertFinite(result, m);
        });

    /// <summary>Every number a design prints or writes (checked here independently of <see cref="DesignFiniteness"/>).</summary>
    private static void AssertFinite(DesignResult r, Mutation m)
    {
        var numbers = r.Weights.SelectMany(w => w.H)
            .Concat(r.Predictions.SelectMany(p => new[] { p.VarianceV2, p.SigmaV, p.SigmaAdu, p.SigmaElectrons, p.FrequencyDomainVarianceV2 ?? 0 }))
            .Concat(r.Predictions.SelectMany(p => p.Budget.SelectMany(b => new[] { b.VarianceV2, b.Share })))
            .Concat([r.Datapath.GainErrorPpm, r.Datapath.NoisePenaltyPercent, r.Datapath.PredictedNoiseOutputLsb]);
        Assert.True(numbers.All(double.IsFinite), $"{m}: a design with a non-finite number");
    }

    private static List<int> NumericLines(string text)
    {
        var lines = text.Split('\n');
        return [.. Enumerable.Range(0, lines.Length).Where(i => !lines[i].TrimStart().StartsWith('#') && NumericLine().IsMatch(lines[i]))];
    }

    /// <summary>Multiplies the k-th numeric value by 10^exponent[k]; integers stay integers while they fit a long.</summary>
    private static string Scale(string text, int[] exponent)
    {
        var lines = text.Split('\n');
        var numeric = NumericLines(text);
        for (var k = 0; k < numeric.Count; k++)
        {
            if (exponent[k] == 0)
            {
                continue;
            }

            var match = NumericLine().Match(lines[numeric[k]]);
            var written = match.Groups[2].Value;
            var scaled = double.Parse(written, CultureInfo.InvariantCulture) * Math.Pow(10, exponent[k]);
            var isInteger = !written.Contains('.', StringComparison.Ordinal) && !written.Contains('e', StringComparison.OrdinalIgnoreCase);
            var value = isInteger && exponent[k] > 0 && Math.Abs(scaled) < 9e18
                ? ((long)scaled).ToString(CultureInfo.InvariantCulture)
                : scaled.ToString("0.0###############E+0", CultureInfo.InvariantCulture);
            lines[numeric[k]] = match.Groups[1].Value + value + match.Groups[3].Value;
        }

        return string.Join('\n', lines);
    }

    private static byte[] ReadRelative(string relative) => File.ReadAllBytes(Path.Combine(ShippedExamples.Folder, relative));
}
