using CoefGen.Core.Tests.Toolchain;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Vectors;

/// <summary>Vectors above the dense sampler's limit: circulant embedding (Dietrich and Newsam 1997, PHYSICS.md §4b).</summary>
public class CirculantSamplerTests
{
    /// <summary>The slowscan example with 2 x 2200 weighted samples (above the dense limit of 4096), on a target that stores them.</summary>
    private static Core.Pipeline.DesignResult Large() => ExampleDesigns.FromText(
        File.ReadAllText(ExampleDesigns.ExamplePath("slowscan_spectro.toml"))
            .Replace("pixel_ns = 10000", "pixel_ns = 250000", StringComparison.Ordinal)
            .Replace("transfer_ns = 5000", "transfer_ns = 120000", StringComparison.Ordinal)
            .Replace("start_ns = 700\ncount_ns = 3800", "start_ns = 700\ncount_ns = 110000", StringComparison.Ordinal)
            .Replace("start_ns = 5800\ncount_ns = 3800", "start_ns = 125000\ncount_ns = 110000", StringComparison.Ordinal)
            .Replace("target = \"dsp18x27-acc48\"", "target = \"mcu32-acc64\"", StringComparison.Ordinal),
        "slowscan_large.toml");

    [Fact]
    public void Embedding_reproduces_the_model_covariance_exactly_and_draws_have_its_variance()
    {
        var r = Large();
        Assert.True(r.Covariance.Count > CorrelatedNoiseSampler.MaxSamples);
        var sampler = CirculantNoiseSampler.Create(r.Covariance, r.Noise, r.Grid.RateHz);
        Assert.Null(sampler.Note);

        // Exactness: the circulant's top-left block is the model's covariance (true lags, constant added back).
        var span = r.Grid.SampleIndex[^1] - r.Grid.SampleIndex[0] + 1;
        var model = new double[span];
        foreach (var c in r.Noise.Components)
        {
            var t = c.LagTable(r.Grid.RateHz, span);
            for (var k = 0; k < span; k++)
            {
                model[k] += t[k] + (double.IsFinite(c.RemovedConstantV2) ? c.RemovedConstantV2 : 0);
            }
        }

        var worst = Enumerable.Range(0, span).Max(k => Math.Abs(sampler.DrawnLags[k] - model[k]));
        Assert.True(worst < 1e-10 * model[0], $"worst {worst:E3} of {model[0]:E3}");

        // Statistics: the chosen weights' analog variance from 400 draws (chi-square, 400 dof: 7 % rms) within 25 %.
        var rng = new Xoshiro256StarStar(3);
        var x = new double[sampler.Count];
        var h = r.Chosen.H;
        var sum = 0.0;
        const int draws = 400;
        for (var d = 0; d < draws; d++)
        {
            sampler.Sample(rng, x);
            var y = 0.0;
            for (var i = 0; i < h.Length; i++)
            {
                y += h[i] * x[i];
            }

            sum += y * y;
        }

        var expected = r.Covariance.QuadraticForm(h) - r.Covariance.DigitalPart(h);
        Assert.InRange(sum / draws / expected, 0.75, 1.25);
    }

    [Fact]
    public void Vectors_of_a_large_design_match_the_Verilog_reference_datapath()
    {
        // The 64-bit accumulator of this target keeps the C reference from being emitted; Icarus runs the RTL.
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, Large(), 20);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), 20);
    }
}
