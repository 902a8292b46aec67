using System.Numerics;
using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Cycle;

/// <summary>Two representative two-stage designs (form = "two-stage"), their cycle codes and an independent BigInteger reference.</summary>
internal static class TwoStageCases
{
    /// <summary>The shipped skipper example (64 reads of 48 samples, own reset per read, wrap, half-up, two's complement).</summary>
    public static DesignResult Skipper() => ExampleDesigns.FromText(
        File.ReadAllText(ExampleDesigns.ExamplePath(Path.Combine("cycles", "skipper_reads.toml")))
            .Replace("scheme = \"optimal\"\n", "scheme = \"optimal\"\nform = \"two-stage\"\n", StringComparison.Ordinal),
        "skipper_two_stage.toml");

    /// <summary>
    /// The other arithmetic branches: 8 reads sharing one reset, offset-binary codes, a saturating accumulator of the least
    /// allowed width and half-even rounding (ties in both stages' shifts).
    /// </summary>
    public static DesignResult SharedReset() => ExampleDesigns.FromText(
        CycleFiles.RepeatedReads
            .Replace("new_group = true", "new_group = false", StringComparison.Ordinal)
            .Replace("bits = 16\n", "bits = 14\ncoding = \"offset-binary\"\n", StringComparison.Ordinal)
        + "\n[weights]\nform = \"two-stage\"\n\n[fixed_point]\nacc_bits = 40\nrounding = \"half-even\"\naccumulator = \"saturate\"\ncoef_bits = 16\n",
        "shared_reset_two_stage.toml");

    public static TheoryData<string> Names => new("skipper", "shared reset");

    public static DesignResult Named(string name) => name == "skipper" ? Skipper() : SharedReset();

    public static TemplateModel Model(DesignResult r)
    {
        var two = r.TwoStage!;
        return TwoStageTemplateModel.Create(r.Description.Name, two.Quantised, two.Layout, r.FixedPointSettings, r.Description.Timing.PixelSamples,
            r.Grid.SampleIndex[0], new Provenance("coefgen", "test", "t.toml", "0", "optimal two-stage", 1, 1));
    }

    /// <summary>The codes of the weighted samples (grid order) out of a whole cycle's codes.</summary>
    public static long[] GridCodes(DesignResult r, long[] cycle) => [.. r.Grid.SampleIndex.Select(i => cycle[i])];

    /// <summary>A whole cycle holding <paramref name="gridCodes"/> at the weighted samples and the zero-volt code elsewhere.</summary>
    public static long[] Cycle(DesignResult r, IReadOnlyList<long> gridCodes)
    {
        var d = r.TwoStage!.Quantised;
        var zero = d.Coding == AdcCoding.OffsetBinary ? 1L << (d.AdcBits - 1) : 0L;
        var cycle = Enumerable.Repeat(zero, r.Description.Timing.PixelSamples).ToArray();
        for (var k = 0; k < gridCodes.Count; k++)
        {
            cycle[r.Grid.SampleIndex[k]] = gridCodes[k];
        }

        return cycle;
    }

    /// <summary>
    /// Random cycles over the whole ADC range, cycles near the rails, every proof check's worst case and the all-minimum and
    /// all-maximum cycles.
    /// </summary>
    public static List<long[]> Cycles(DesignResult r, int random, int seed)
    {
        var d = r.TwoStage!.Quantised;
        var rng = new Random(seed);
        var (lo, hi) = d.Coding == AdcCoding.OffsetBinary ? (0L, (1L << d.AdcBits) - 1) : (-(1L << (d.AdcBits - 1)), (1L << (d.AdcBits - 1)) - 1);
        var n = r.Description.Timing.PixelSamples;
        var cycles = new List<long[]>();
        for (var t = 0; t < random; t++)
        {
            cycles.Add([.. Enumerable.Range(0, n).Select(_ => t % 2 == 0 ? rng.NextInt64(lo, hi + 1) : (rng.Next(2) == 0 ? lo + rng.NextInt64(0, 4) : hi - rng.NextInt64(0, 4)))]);
        }

        cycles.AddRange(d.Proof.Checks.Where(c => c.WorstCaseCodes is not null).Select(c => Cycle(r, c.WorstCaseCodes!)));
        cycles.Add(Enumerable.Repeat(lo, n).ToArray());
        cycles.Add(Enumerable.Repeat(hi, n).ToArray());
        return cycles;
    }

    /// <summary>
    /// The datapath written out with BigInteger and floor division (no Int128, no shared helpers), exact when the proof is
    /// safe (no wrap or saturation inside; the output saturates).
    /// </summary>
    public static BigInteger Reference(TwoStageIntegerDesign d, IReadOnlyList<long> codes) => Reference(d, codes, out _);

    /// <summary>As <see cref="Reference(TwoStageIntegerDesign, IReadOnlyList{long})"/>, with the rounded read sums.</summary>
    public static BigInteger Reference(TwoStageIntegerDesign d, IReadOnlyList<long> codes, out BigInteger[] readSums)
    {
        var m = d.Table.Count;
        BigInteger acc2 = 0;
        readSums = new BigInteger[d.ReadWeights.Count];
        for (var j = 0; j < d.ReadWeights.Count; j++)
        {
            BigInteger acc1 = 0;
            for (var p = 0; p < m; p++)
            {
                var x = (BigInteger)codes[(j * m) + p] - (d.Coding == AdcCoding.OffsetBinary ? BigInteger.One << (d.AdcBits - 1) : 0);
                acc1 += d.Table[p] * x;
            }

            readSums[j] = Round(acc1, d.Stage1Shift, d.Rounding);
            acc2 += d.ReadWeights[j] * readSums[j];
        }

        var outMax = (BigInteger.One << (d.OutputBits - 1)) - 1;
        return BigInteger.Clamp(Round(acc2, d.Shift, d.Rounding), -outMax - 1, outMax);
    }

    private static BigInteger Round(BigInteger v, int shift, RoundingMode mode)
    {
        if (shift == 0)
        {
            return v;
        }

        var den = BigInteger.One << shift;
        var floor = BigInteger.DivRem(v, den, out var rem);
        if (rem < 0)
        {
            floor -= 1;
            rem += den;
        }

        return mode switch
        {
            RoundingMode.Truncate => floor,
            RoundingMode.HalfUp => 2 * rem >= den ? floor + 1 : floor,
            _ => 2 * rem > den || (2 * rem == den && !floor.IsEven) ? floor + 1 : floor,
        };
    }
}
