using System.Globalization;
using System.Text;
using CoefGen.Core.Pipeline;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>
/// The read-noise cost of integer coefficients on the shipped examples, at 18, 12 and 8 coefficient bits.
/// The figures go to the test output (ITestOutputHelper, lines and a markdown table) and the table also to the console.
/// Under dotnet test (Microsoft.Testing.Platform) the test output of a passing test shows only with --output Detailed,
/// which is a dotnet test option and goes before the "--" (add --show-stdout All where an AI-agent environment is
/// detected, which defaults it to Failed); the console is not captured there (no [assembly: CaptureConsole]):
///   dotnet test --project tests/CoefGen.Core.Tests --output Detailed -- --filter-class CoefGen.Core.Tests.Pipeline.IntegerNoisePenaltyTests
/// Running the test executable directly (xunit's own runner) prints the console table, and test output with -showLiveOutput:
///   tests/CoefGen.Core.Tests/bin/Debug/net10.0/CoefGen.Core.Tests -class CoefGen.Core.Tests.Pipeline.IntegerNoisePenaltyTests -showLiveOutput
/// </summary>
public class IntegerNoisePenaltyTests(ITestOutputHelper output)
{
    private static readonly int[] CoefBits = [18, 12, 8];

    [Fact]
    public void Integer_noise_penalty_of_every_shipped_example_is_under_a_tenth_of_a_percent_at_18_bit_coefficients()
    {
        var table = new StringBuilder();
        table.Append("| example | scheme | target |");
        foreach (var bits in CoefBits)
        {
            table.Append(CultureInfo.InvariantCulture, $" penalty @ {bits} bit |");
        }

        table.Append("\n|---|---|---|").Append(string.Concat(CoefBits.Select(_ => "---:|"))).Append('\n');
        var at18 = new List<(string Name, double Penalty, bool Safe)>();
        foreach (var name in ShippedExamples.Names)
        {
            var description = ShippedExamples.Load(name);
            table.Append(CultureInfo.InvariantCulture, $"| {name} | {description.Weights.Scheme} | {description.FixedPoint.Target} |");
            foreach (var bits in CoefBits)
            {
                var run = DesignPipeline.Run(description with { FixedPoint = description.FixedPoint with { CoefBits = bits } }, ShippedExamples.Catalog);
                var d = run.Datapath;
                Assert.Equal(bits, d.CoefBits);
                output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"{name}: {bits}-bit coefficients, P = {d.P}, noise penalty {d.NoisePenaltyPercent:G4} %, gain error {d.GainErrorPpm:G4} ppm, safe = {d.Proof.Safe}"));
                table.Append(CultureInfo.InvariantCulture, $" {d.NoisePenaltyPercent:G3} % |");
                if (bits == 18)
                {
                    at18.Add((name, d.NoisePenaltyPercent, d.Proof.Safe));
                }
            }

            table.Append('\n');
        }

        output.WriteLine(table.ToString());
        Console.WriteLine(table.ToString());
        Assert.NotEmpty(at18);
        foreach (var (name, penalty, safe) in at18)
        {
            // The bound is on the magnitude: the penalty can be negative. Integer weights can beat real-valued weights that
            // are not the optimum (boxcar, windowed), and under drift rejection rounding may break sum h t = 0 slightly,
            // so the integer weights minimise over a looser constraint set than the real ones. Bound from the issue text
            // ("under 0.1 % at 18-bit coefficients"), common practice, no source.
            Assert.True(Math.Abs(penalty) < 0.1, $"{name}: integer noise penalty {penalty} % at 18 bits");
            Assert.True(safe, $"{name}: width proof not safe at 18 bits");
        }
    }
}
