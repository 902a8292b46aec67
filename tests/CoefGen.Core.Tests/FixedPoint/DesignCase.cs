using CoefGen.Core.Noise;
using CoefGen.Core.Weights;
using FsCheck;
using FsCheck.Fluent;

namespace CoefGen.Core.Tests.FixedPoint;

/// <summary>A random but valid quantiser input, with a generator that reaches the edges.</summary>
internal sealed record DesignCase(int ResetCount, int SignalCount, double[] Shape, int CoefBits, double Rho, bool Settled)
{
    public SampleGrid Grid => Settled
        ? FixedPointFixtures.Grid(ResetCount, SignalCount)
        : SampleGrid.Create(1e6, new(0, ResetCount), new(ResetCount + 2, SignalCount), (ResetCount + 1) / 1e6, 2e5);

    /// <summary>Window-shaped weights: -shape/sum over reset, +shape/sum over signal, then gain-normalised by the quantiser.</summary>
    public double[] Weights
    {
        get
        {
            var reset = Shape[..ResetCount];
            var signal = Shape[ResetCount..];
            return [.. reset.Select(v => -v / reset.Sum()), .. signal.Select(v => v / signal.Sum())];
        }
    }

    public SampledCovariance Covariance(SampleGrid g) => FixedPointFixtures.Ar1(g, Rho, 4e-9, 1e-9);

    /// <summary>
    /// Whether some scale 2^P (P >= 0) can hold these weights: an unsettled grid needs signal weights above 1 per
    /// unit gain, and when even P = 0 leaves less than one count of headroom for the sum repair the quantiser
    /// refuses (CoefficientWidthException, reported as CG2032), which is not a valid input.
    /// </summary>
    public bool Representable
    {
        get
        {
            if (Settled)
            {
                return true;
            }

            var g = Grid;
            var w = Weights;
            var gain = w.Select((v, k) => v * g.Step[k]).Sum();
            var maxAbs = w.Max(v => Math.Abs(v / gain));
            return Math.Round(maxAbs, MidpointRounding.ToEven) + 1 <= (1L << (CoefBits - 1)) - 1;
        }
    }

    public override string ToString() => $"reset {ResetCount}, signal {SignalCount}, coef {CoefBits} bits, rho {Rho}, settled {Settled}";

    public static Arbitrary<DesignCase> Arbitrary()
    {
        // Counts: 1 (the smallest window), powers of two and their neighbours, anything up to 64.
        var count = Gen.Frequency((2, Gen.Elements(1, 2, 3, 63, 64, 65, 100)), (3, Gen.Choose(1, 64)));
        var bits = Gen.Elements(2, 3, 4, 6, 8, 11, 12, 16, 18, 25, 32);
        var rho = Gen.Elements(0.0, 0.5, 0.9, 0.999);
        var settled = Gen.Frequency((3, Gen.Constant(true)), (1, Gen.Constant(false)));
        var gen =
            from r in count
            from s in count
            from shape in Gen.ArrayOf(Gen.Choose(1, 1000).Select(v => v / 1000.0), r + s)
            from b in bits
            from p in rho
            from st in settled
            select new DesignCase(r, s, shape, b, p, st);
        return gen.Where(dc => dc.Representable).ToArbitrary();
    }
}
