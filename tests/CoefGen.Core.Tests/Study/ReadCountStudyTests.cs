using System.Text;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Study;
using CoefGen.Core.Tests.Cycle;

namespace CoefGen.Core.Tests.Study;

/// <summary>The report's read noise against read count: every point a design of the edited cycle, checked against closed forms.</summary>
public class ReadCountStudyTests
{
    private static (ReadCountCurve Curve, DesignResult File) Study(string text)
    {
        var load = ReadoutLoader.Load(Encoding.UTF8.GetBytes(text), "cyc.toml", _ => null);
        Assert.True(load.Description is not null, string.Join("\n", load.Diagnostics));
        var file = DesignPipeline.Run(load.Description!, Pipeline.ShippedExamples.Catalog, frequencyCheck: false);
        var curve = ReadCountStudy.Run(text, file, new DesignPoint("cyc.toml", _ => null, Pipeline.ShippedExamples.Catalog));
        Assert.NotNull(curve);
        return (curve!, file);
    }

    private static double Noise(ReadCountPoint p, WeightScheme s) => p.Schemes.First(x => x.Scheme == s).NoiseElectrons;

    /// <summary>Rows other than the file's would come from the parametric model; a capture design gets no mixed table.</summary>
    [Fact]
    public void A_design_on_a_capture_has_no_read_count_curve()
    {
        var (_, file) = Study(CycleFiles.RepeatedReads);
        var onCapture = file with { CaptureSource = "idle.i16" };
        Assert.Null(ReadCountStudy.Run(CycleFiles.RepeatedReads, onCapture, new DesignPoint("cyc.toml", _ => null, Pipeline.ShippedExamples.Catalog)));
    }

    [Fact]
    public void Independent_reads_under_white_noise_follow_sigma_one_over_root_n_at_every_point()
    {
        // Tiffenberg et al. 2017 (PRL 119, 131802): N independent reads averaged, sigma_N = sigma_1 / sqrt(N). The file's
        // noise is white up to Nyquist (brick-wall at fs/2: zero covariance at every non-zero lag) with an ideal step, so
        // each pedestal/signal pair of m samples has variance 2 sigma^2 / m (PHYSICS.md §4b) and the optimum is the average.
        // The transfer moved to sample 28 so that every signal sample sees the whole (ideal) step.
        var (curve, file) = Study(CycleFiles.RepeatedReads.Replace("transfer_sample = 30", "transfer_sample = 28", StringComparison.Ordinal));
        Assert.Equal(ReadCountKind.Repeat, curve.Axis.Kind);
        Assert.Equal(ReadCountLaw.InverseSqrt, curve.Law);
        Assert.Equal([1, 2, 4, 8], curve.Points.Select(p => p.Reads));
        var perSample = file.Covariance.TotalLag[0] + file.Covariance.DigitalVarianceV2;
        var vpe = file.Description.Sensor.VoltsAtAdcPerElectron;
        foreach (var p in curve.Points)
        {
            Assert.True(p.Valid, p.Problem?.ToString());
            var closed = Math.Sqrt(2 * perSample / (16.0 * p.Reads)) / vpe;
            Assert.Equal(1, Noise(p, WeightScheme.Boxcar) / closed, 1e-9);
            Assert.Equal(1, Noise(p, WeightScheme.Optimal) / closed, 1e-9);
            Assert.Equal(1, curve.Reference(p.Reads)!.Value / closed, 1e-9);
            if (p.Reads > 1)
            {
                Assert.Equal(1, p.TwoStageElectrons!.Value / closed, 1e-9); // the average is itself a two-stage form
            }

            // One read period (50 samples) less per read removed; the tail after the last read stays.
            Assert.Equal(400 - ((8 - p.Reads) * 50), p.PixelSamples);
        }

        // The file's own read count is the design passed in, number for number.
        Assert.Equal(file.Predictions.Select(x => x.SigmaElectrons), curve.Points[^1].Schemes.Select(s => s.NoiseElectrons));
    }

    [Fact]
    public void Fowler_n_under_white_noise_follows_two_sigma_squared_over_n()
    {
        // Fowler & Gatley 1990 (ApJ 353, L33): N reads at each end, independent samples, var = 2 sigma^2 / N for the
        // difference of group means; both groups keep their start, so the separation (the reference time here) stays.
        var (curve, _) = Study(CycleFiles.Fowler);
        Assert.Equal(ReadCountKind.GroupSize, curve.Axis.Kind);
        Assert.Equal([1, 2, 4], curve.Points.Select(p => p.Reads));
        var one = Noise(curve.Points[0], WeightScheme.Boxcar);
        foreach (var p in curve.Points)
        {
            Assert.Equal(1, Noise(p, WeightScheme.Boxcar) / (one / Math.Sqrt(p.Reads)), 1e-9);
            Assert.Equal(1, Noise(p, WeightScheme.Boxcar) / curve.Reference(p.Reads)!.Value, 1e-9);
        }
    }

    [Fact]
    public void Up_the_ramp_read_noise_limited_follows_the_unweighted_slope_variance()
    {
        // PHYSICS.md §4b: n equally spaced reads, unweighted least-squares slope, var = 12 sigma^2 / (n (n^2 - 1) dt^2);
        // the boxcar of a ramp is that fit. No shot noise here (flux and dark current 0), white samples.
        var text = CycleFiles.Ramp.Replace("photon_flux_e_per_s = \"2 M\"", "photon_flux_e_per_s = 0", StringComparison.Ordinal)
            .Replace("dark_current_e_per_s = 1000", "dark_current_e_per_s = 0", StringComparison.Ordinal);
        var (curve, file) = Study(text);
        Assert.Equal(ReadCountLaw.RampFit, curve.Law);
        Assert.Equal([1, 2, 4, 8, 16, 32, 40], curve.Points.Select(p => p.Reads));
        Assert.False(curve.Points[0].Valid); // one read of a ramp has no slope
        var sigma = Math.Sqrt(file.Covariance.TotalLag[0] + file.Covariance.DigitalVarianceV2) / file.Description.Sensor.VoltsAtAdcPerElectron;
        foreach (var p in curve.Points.Skip(1))
        {
            var n = (double)p.Reads;
            var closed = sigma * Math.Sqrt(12 / (n * ((n * n) - 1))); // reference time = read period: dt / T_ref = 1
            Assert.Equal(1, Noise(p, WeightScheme.Boxcar) / closed, 1e-9);
            Assert.Equal(1, curve.Reference(p.Reads)!.Value / closed, 1e-9);
        }
    }

    [Fact]
    public void A_classic_file_and_a_cycle_without_repetition_have_no_read_count()
    {
        var d = Pipeline.ShippedExamples.Load("fast_imaging.toml");
        Assert.Null(ReadCountAxis.Of(File.ReadAllText(Path.Combine(Pipeline.ShippedExamples.Folder, "fast_imaging.toml")), d, out var why));
        Assert.Contains("two-window", why, StringComparison.Ordinal);
    }
}
