using System.Globalization;
using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using FsCheck;
using FsCheck.Fluent;

namespace CoefGen.Core.Tests.Weights;

/// <summary>
/// A random valid readout for property tests. The generator is written to reach the edges: windows of
/// one sample, N_R != N_S, adjacent windows, partially settled steps (s in (0, 1)), drift on and off,
/// every window shape, strongly correlated noise with a tiny white floor, and a constant added to the
/// lags (as a removed or kept 1/f constant would be).
/// </summary>
public sealed record RandomCase(
    int ResetStart, int ResetCount, int Gap, int SignalCount, double? PoleKappa, double TransferFraction,
    bool RejectDrift, WindowShape Shape, int Ramp, int Bits, double NoiseLsb, int NoiseSeed, int ConstantKind)
{
    private const double RateHz = 1e6;

    public static Arbitrary<RandomCase> Arbitrary()
    {
        var gen =
            from resetStart in Gen.Choose(0, 4)
            from drift in Gen.Elements(false, true)
            from resetCount in Gen.Frequency((3, Gen.Choose(drift ? 2 : 1, 4)), (2, Gen.Choose(2, 24)))
            from signalCount in Gen.Frequency((3, Gen.Choose(drift ? 2 : 1, 4)), (2, Gen.Choose(2, 24)))
            from gap in Gen.Frequency((2, Gen.Constant(0)), (3, Gen.Choose(1, 12)))
            from settled in Gen.Elements(true, false)
            from kappa in Gen.Choose(5, 300)
            from fraction in Gen.Choose(1, 999)
            from shape in Gen.Elements(WindowShape.Triangle, WindowShape.Hann, WindowShape.Trapezoid, WindowShape.Explicit)
            from ramp in Gen.Choose(0, 6)
            from bits in Gen.Elements(12, 16, 20)
            from noiseLsb in Gen.Elements(0.0, 0.5, 2.0)
            from seed in Gen.Choose(0, 1_000_000)
            from constantKind in Gen.Choose(0, 2)
            select new RandomCase(
                resetStart, resetCount, gap, signalCount, settled ? null : kappa / 100.0, fraction / 1000.0,
                drift, shape, ramp, bits, noiseLsb, seed, constantKind);
        return gen.ToArbitrary();
    }

    public SampleGrid Grid
    {
        get
        {
            var reset = new SampleWindow(ResetStart, ResetCount);
            var signal = new SampleWindow(reset.End + Gap, SignalCount);
            // The transfer happens between the last reset sample and the first signal sample.
            var transfer = (reset.End - 1 + (TransferFraction * (Gap + 1))) / RateHz;
            double? pole = PoleKappa is double k ? k * RateHz / (2 * Math.PI) : null;
            return SampleGrid.Create(RateHz, reset, signal, transfer, pole);
        }
    }

    /// <summary>16 to 24-bit style scales: analog noise around 100 uV rms, 4 V full scale.</summary>
    public AdcSpec Adc => new(RateHz, Bits, 4.0, AdcCoding.TwosComplement, NoiseLsb);

    public SensorSpec Sensor => new(5.0, -2.0);

    public WeightsSpec Spec
    {
        get
        {
            var rng = new Random(NoiseSeed + 1);
            return new WeightsSpec(
                WeightScheme.Optimal, Shape, Ramp,
                Shape == WindowShape.Explicit ? ExplicitShape(rng, ResetCount, RejectDrift) : null,
                Shape == WindowShape.Explicit ? ExplicitShape(rng, SignalCount, RejectDrift) : null,
                RejectDrift);
        }
    }

    public SampledCovariance Covariance
    {
        get
        {
            var grid = Grid;
            var rng = new Random(NoiseSeed);
            var lags = TestCovariances.LagCount(grid);
            var components = new List<CovarianceComponent>();
            var c00 = 0.0;
            for (var j = 0; j < 1 + rng.Next(3); j++)
            {
                var amplitude = 1e-8 * (0.05 + rng.NextDouble());
                // Half the terms strongly correlated (rho up to 0.9999), half anywhere in [0, 1).
                var rho = rng.Next(2) == 0 ? 1 - Math.Pow(10, -1 - (3 * rng.NextDouble())) : rng.NextDouble();
                components.Add(TestCovariances.Ar1("ar1-" + j.ToString(CultureInfo.InvariantCulture), lags, amplitude, rho));
                c00 += amplitude;
            }

            var constant = ConstantKind switch { 1 => -0.5 * c00, 2 => c00, _ => 0.0 };
            var first = components[0];
            components[0] = first with { Lag = [.. first.Lag.Select(x => x + constant)] };
            return new SampledCovariance(grid.SampleIndex, components, Adc.DigitalVarianceV2);
        }
    }

    private static double[] ExplicitShape(Random rng, int count, bool drift)
    {
        var w = new double[count];
        for (var k = 0; k < count; k++)
        {
            // Some zero weights, never all zero; none with drift rejection, where a window reduced to one
            // effective sample could make the step and the drift inseparable.
            w[k] = drift || k == count / 2 || rng.Next(4) != 0 ? 0.1 + rng.NextDouble() : 0.0;
        }

        return w;
    }
}
