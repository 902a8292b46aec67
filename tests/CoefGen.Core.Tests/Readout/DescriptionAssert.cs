using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Readout;

/// <summary>Field-by-field comparison: records with IReadOnlyList members do not compare lists by value.</summary>
internal static class DescriptionAssert
{
    /// <summary>Everything except provenance (path, hash, key locations) must match; table densities to a relative 1e-12.</summary>
    public static void Equivalent(ReadoutDescription expected, ReadoutDescription actual)
    {
        Assert.Equal(expected.Name, actual.Name);
        Assert.Equal(expected.Adc, actual.Adc);
        Assert.Equal(expected.Sensor, actual.Sensor);
        Timing(expected.Timing, actual.Timing);
        Noise(expected.Noise, actual.Noise);
        Weights(expected.Weights, actual.Weights);
        Assert.Equal(expected.FixedPoint, actual.FixedPoint);
        Assert.Equal(expected.Emit, actual.Emit);
    }

    private static void Timing(TimingSpec e, TimingSpec a)
    {
        Assert.Equal(e.PixelSamples, a.PixelSamples);
        Assert.Equal(e.TransferTimeS, a.TransferTimeS);
        Assert.Equal(e.Cycle.AsTwoWindow()?.Reset, a.Cycle.AsTwoWindow()?.Reset);
        Assert.Equal(e.Cycle.AsTwoWindow()?.Signal, a.Cycle.AsTwoWindow()?.Signal);
        Assert.Equal(e.Step, a.Step);
        Assert.Equal(e.Rounding, a.Rounding);
    }

    private static void Noise(NoiseSpec e, NoiseSpec a)
    {
        Assert.Equal(e.Sources, a.Sources);
        Assert.Equal(e.FrontEndPoleHz, a.FrontEndPoleHz);
        Assert.Equal(e.BandwidthHz, a.BandwidthHz);
        Assert.Equal(e.CapturePath, a.CapturePath);
        Assert.Equal(e.Table is null, a.Table is null);
        if (e.Table is not null && a.Table is not null)
        {
            Assert.Equal(e.Table.Name, a.Table.Name);
            Assert.Equal(e.Table.FrequencyHz, a.Table.FrequencyHz);
            Assert.Equal(e.Table.DensityV2PerHz.Count, a.Table.DensityV2PerHz.Count);
            for (var i = 0; i < e.Table.DensityV2PerHz.Count; i++)
            {
                // The CSV holds sqrt(S) in nV/rtHz; squaring back costs a few ulps.
                var want = e.Table.DensityV2PerHz[i];
                Assert.True(Math.Abs(a.Table.DensityV2PerHz[i] - want) <= 1e-12 * want, $"density {i}: {a.Table.DensityV2PerHz[i]:R} vs {want:R}");
            }
        }
    }

    private static void Weights(WeightsSpec e, WeightsSpec a)
    {
        Assert.Equal((e.Scheme, e.Window, e.RampSamples, e.RejectDrift), (a.Scheme, a.Window, a.RampSamples, a.RejectDrift));
        Assert.Equal(e.ExplicitReset, a.ExplicitReset);
        Assert.Equal(e.ExplicitSignal, a.ExplicitSignal);
    }
}
