using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Core.FixedPoint.TwoStage;

/// <summary>
/// Real two-stage weights (a, g) to integers. g is normalised to unit gain against the read-weighted step
/// s_eff,p = sum_j a_j s_(j,p), rounded at the largest scale 2^P1 that fits coef_bits and repaired by the quantiser's
/// largest-remainder rule to sum g = 0 exactly over each reset class of the read (ReadLayout.ResetClasses: every reset level cancels in stage 1 alone). The read weights are
/// then renormalised against the integer table's per-read gain and rounded at the largest 2^P2 that fits coef_bits.
/// The first sums are rounded by the smallest shift s1 that lets the second stage fit the accumulator (its noise is
/// counted in the penalty). The output is a pure shift by P1 + P2 - s1 - F; the residual rounding of the gain is reported as a gain error. Pure.
/// </summary>
public static class TwoStageIntegerDesigner
{
    public static TwoStageIntegerDesign Design(SampleGrid grid, SampledCovariance r, TwoStageResult two, AdcSpec adc, FixedPointSettings settings)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(two);
        ArgumentNullException.ThrowIfNull(adc);
        ArgumentNullException.ThrowIfNull(settings);
        var m = two.PerReadTable.Length;
        var n = two.ReadWeights.Length;
        var limit = (1L << (settings.CoefBits - 1)) - 1;

        var effective = new double[m];
        for (var j = 0; j < n; j++)
        {
            for (var p = 0; p < m; p++)
            {
                effective[p] += two.ReadWeights[j] * grid.Step[(j * m) + p];
            }
        }

        var gain1 = two.PerReadTable.Select((v, p) => v * effective[p]).Sum();
        var gn = two.PerReadTable.Select(v => v / gain1).ToArray();
        var classes = ReadLayout.Of(grid)?.ResetClasses ?? throw new ArgumentException("the grid is not N identical reads", nameof(grid));
        var (g, p1) = Round(gn, limit, classes);

        var readGain = new double[n];
        for (var j = 0; j < n; j++)
        {
            for (var p = 0; p < m; p++)
            {
                readGain[j] += Math.ScaleB(g[p], -p1) * grid.Step[(j * m) + p];
            }
        }

        var gain2 = two.ReadWeights.Select((v, j) => v * readGain[j]).Sum();
        var (w, p2) = Round([.. two.ReadWeights.Select(v => v / gain2)], limit, []);

        // The smallest stage-1 shift with which the second multiply and accumulator fit (the output shift is not yet known: 0).
        var s1 = 0;
        while (s1 < 62 && !Stage2Fits(TwoStageWidthProver.Prove(g, w, adc.Bits, adc.Coding, settings, s1, 0)))
        {
            s1++;
        }

        var h = TwoStageWeights.Expand([.. w.Select(v => Math.ScaleB(v, -p2))], [.. g.Select(v => Math.ScaleB(v, -p1))]);
        var gainInt = h.Select((v, k) => v * grid.Step[k]).Sum();

        // Rounding r_j adds 2^(2 s1) / 12 per read in acc1 counts (uniform rounding error, common practice, no source):
        // sum_j w_j^2 2^(2 s1) / 12 in acc2 counts, i.e. over 2^(2 (P1 + P2)) in ADU^2.
        var rounding = s1 == 0 ? 0.0 : w.Sum(v => (double)v * v) * Math.ScaleB(1.0, (2 * s1) - (2 * (p1 + p2))) / 12 * adc.LsbV * adc.LsbV;
        var sigmaInt = Math.Sqrt(r.QuadraticForm(h) + rounding) / gainInt;
        var realGain = two.H.Select((v, k) => v * grid.Step[k]).Sum();
        var sigmaReal = Math.Sqrt(two.VarianceV2) / realGain;
        var f = Math.Min(settings.OutputFracBits ?? Math.Min(FixedPointDesigner.RecommendedFracBits(sigmaInt / adc.LsbV), settings.OutputBits - 1), p1 + p2 - s1);
        var shift = p1 + p2 - s1 - f;
        var proof = TwoStageWidthProver.Prove(g, w, adc.Bits, adc.Coding, settings, s1, shift);
        var stage1Bits = proof.Checks.Single(c => c.Name == "stage1_accumulator_final").RequiredBits;
        return new TwoStageIntegerDesign(g, w, p1, p2, s1, shift, f, adc.Bits, adc.Coding, stage1Bits, settings.AccBits, settings.OutputBits,
            settings.Rounding, proof, (gainInt - 1) * 1e6, 100 * ((sigmaInt / sigmaReal) - 1));
    }

    private static bool Stage2Fits(WidthProof proof) =>
        proof.Checks.Where(c => c.Name.StartsWith("stage2_", StringComparison.Ordinal) && c.Required && c.Name != "stage2_coefficient").All(c => c.Fits);

    /// <summary>c = round(x 2^P) at the largest P with every |c| within limit, after repairing the sum of each class in <paramref name="zeroSum"/> to 0.</summary>
    private static (long[] C, int P) Round(double[] x, long limit, IReadOnlyList<int[]> zeroSum)
    {
        var maxAbs = x.Max(Math.Abs);
        if (!(maxAbs > 0) || x.Any(v => !double.IsFinite(v)))
        {
            throw new ArgumentException("two-stage weights must be finite and not all zero");
        }

        for (var p = Math.Min(61, (int)Math.Floor(Math.Log2(limit / maxAbs)) + 1); p >= 0; p--)
        {
            var xs = x.Select(v => Math.ScaleB(v, p)).ToArray();
            var c = xs.Select(v => (long)Math.Round(v, MidpointRounding.ToEven)).ToArray();
            foreach (var members in zeroSum)
            {
                Quantiser.FixSum(c, xs, members, 0);
            }

            if (c.Max(v => Math.Abs(v)) <= limit)
            {
                return (c, p);
            }
        }

        throw new CoefficientWidthException("no scale 2^P with P >= 0 keeps the two-stage weights within the coefficient width");
    }
}
