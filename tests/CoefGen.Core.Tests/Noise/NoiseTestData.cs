using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Noise;

/// <summary>Shared inputs for the noise tests: grids, boxcar weights and a valid readout description.</summary>
internal static class NoiseTestData
{
    public const double Rate = 40e6;

    public static SampleGrid Grid(int resetStart, int resetCount, int signalStart, int signalCount, double rate = Rate) =>
        SampleGrid.Create(rate, new SampleWindow(resetStart, resetCount), new SampleWindow(signalStart, signalCount), 0, null);

    /// <summary>Boxcar CDS weights: -1/N_R on the reset window, +1/N_S on the signal window (Σh = 0).</summary>
    public static double[] Boxcar(SampleGrid grid) =>
        [.. Enumerable.Range(0, grid.Count).Select(i => (grid.WindowOf(i) == 1) ? 1.0 / grid.Windows[1].Count : -1.0 / grid.Windows[0].Count)];

    /// <summary>Boxcar-like weights with a smooth taper so |H| has no special zeros (Σh = 0 kept exactly).</summary>
    public static double[] Tapered(SampleGrid grid)
    {
        var h = new double[grid.Count];
        for (var i = 0; i < grid.Count; i++)
        {
            var local = (grid.WindowOf(i) == 1) ? i - grid.Windows[0].Count : i;
            var n = (grid.WindowOf(i) == 1) ? grid.Windows[1].Count : grid.Windows[0].Count;
            var taper = 1 + 0.3 * Math.Sin(Math.PI * (local + 0.5) / n);
            h[i] = ((grid.WindowOf(i) == 1) ? 1 : -1) * taper;
        }

        var reset = h.Take(grid.Windows[0].Count).Sum();
        var signal = h.Skip(grid.Windows[0].Count).Sum();
        for (var i = 0; i < grid.Count; i++)
        {
            h[i] /= (grid.WindowOf(i) == 1) ? signal : -reset;
        }

        return h;
    }

    public static ReadoutDescription Description(IReadOnlyList<NoiseSourceSpec> sources, double? poleHz, double? bandwidthHz, PsdTable? table, double gain = -2.0) =>
        new()
        {
            Name = "ch0",
            SourcePath = "ch0.toml",
            ContentSha256 = new string('0', 64),
            Adc = new AdcSpec(Rate, 16, 2.0, AdcCoding.TwosComplement, 0.5),
            Sensor = new SensorSpec(4.0, gain),
            Timing = new TimingSpec(400, 5e-6, new SampleWindow(10, 64), new SampleWindow(250, 64), StepModel.Ideal, []),
            Noise = new NoiseSpec(sources, poleHz, bandwidthHz, table, null),
            Weights = new WeightsSpec(WeightScheme.Boxcar, WindowShape.Triangle, 0, null, null, false),
            FixedPoint = new FixedPointSpec(null, 16, null, null, null, null, null, null, null),
            Emit = [],
        };

    public static NoiseModel Model(double digitalV2, params NoiseComponent[] components) => new(components, digitalV2);
}
