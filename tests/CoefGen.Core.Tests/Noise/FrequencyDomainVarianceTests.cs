using System.Diagnostics;
using CoefGen.Core.Noise;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Noise;

/// <summary>
/// Time domain (lag tables, SampledCovariance.QuadraticForm) against the frequency domain
/// (∫ S_fold |H|² df + σ_d² Σh²): the identity derived in PHYSICS §4; tolerance 1e-6 relative for Σh = 0.
/// </summary>
public class FrequencyDomainVarianceTests(ITestOutputHelper output)
{
    private const double E2 = 1e-16;
    private const double Tolerance = 1e-6;

    public static TheoryData<string> Configurations =>
        ["white+pole", "white+pole above the sample rate", "1/f+pole", "white brick-wall", "1/f brick-wall", "white brick-wall above Nyquist", "pole+brick-wall", "table", "everything"];

    private static NoiseModel ModelFor(string name) => name switch
    {
        "white+pole" => NoiseTestData.Model(0, ParametricNoiseComponent.White("w", E2, 1e6, null)),
        "white+pole above the sample rate" => NoiseTestData.Model(0, ParametricNoiseComponent.White("w", E2, 130e6, null)),
        "1/f+pole" => NoiseTestData.Model(0, ParametricNoiseComponent.Flicker("f", E2 * 5e4, 1, 2e6, null)),
        "white brick-wall" => NoiseTestData.Model(0, ParametricNoiseComponent.White("w", E2, null, 15e6)),
        "1/f brick-wall" => NoiseTestData.Model(0, ParametricNoiseComponent.Flicker("f", E2 * 5e4, 0.1, null, 15e6)),
        "white brick-wall above Nyquist" => NoiseTestData.Model(0, ParametricNoiseComponent.White("w", E2, null, 55e6)),
        "pole+brick-wall" => NoiseTestData.Model(
            0, ParametricNoiseComponent.White("w", E2, 1e6, 17e6), ParametricNoiseComponent.Flicker("f", E2 * 5e4, 1, 1e6, 17e6)),
        "table" => NoiseTestData.Model(0, Table()),
        _ => NoiseTestData.Model(
            3e-10,
            ParametricNoiseComponent.White("w", E2, 3e5, null),
            ParametricNoiseComponent.Flicker("f", E2 * 1e5, 1e-3, 3e5, null),
            Table()),
    };

    private static MeasuredPsdComponent Table() =>
        new("t", [0, 2e3, 3e4, 4e5, 1.1e6, 2.5e6, 8e6, 30e6], [5e-15, 3e-15, 4e-16, 2.2e-16, 1.5e-16, 6e-17, 1e-17, 2e-18]);

    [Theory]
    [MemberData(nameof(Configurations))]
    public void Frequency_domain_variance_equals_time_domain_quadratic_form(string configuration)
    {
        var model = ModelFor(configuration);
        foreach (var grid in new[] { NoiseTestData.Grid(5, 64, 140, 64), NoiseTestData.Grid(0, 16, 19, 9) })
        {
            foreach (var h in new[] { NoiseTestData.Boxcar(grid), NoiseTestData.Tapered(grid) })
            {
                var time = model.Sample(grid).QuadraticForm(h);
                var frequency = FrequencyDomainVariance.Compute(model, grid, h);
                output.WriteLine($"{configuration}, {grid.Count} samples: relative difference {(frequency - time) / time:e2}");
                Assert.True(Math.Abs(time - frequency) < Tolerance * time, $"{configuration}: {time} vs {frequency} ({(frequency - time) / time:e2})");
            }
        }
    }

    [Fact]
    public void Per_component_frequency_domain_parts_match_the_sampled_budget()
    {
        var model = ModelFor("everything");
        var grid = NoiseTestData.Grid(2, 40, 90, 40);
        var h = NoiseTestData.Tapered(grid);
        var sampled = model.Sample(grid);
        var parts = FrequencyDomainVariance.ComputeByComponent(model, grid, h);
        for (var c = 0; c < parts.Length; c++)
        {
            var time = sampled.ComponentQuadraticForm(h, c);
            Assert.True(Math.Abs(time - parts[c]) < Tolerance * time, $"{model.Components[c].Name}: {time} vs {parts[c]}");
        }
    }

    [Fact]
    public void Two_thousand_weighted_samples_agree_and_their_cost_is_reported()
    {
        var model = ModelFor("everything");
        var grid = NoiseTestData.Grid(0, 1000, 1100, 1000);
        var h = NoiseTestData.Tapered(grid);
        var clock = Stopwatch.StartNew();
        var sampled = model.Sample(grid);
        var time = sampled.QuadraticForm(h);
        var sampleMs = clock.Elapsed.TotalMilliseconds;
        clock.Restart();
        var frequency = FrequencyDomainVariance.Compute(model, grid, h);
        var frequencyMs = clock.Elapsed.TotalMilliseconds;
        output.WriteLine($"2x1000 samples: lag tables + quadratic form {sampleMs:f0} ms, frequency domain {frequencyMs:f0} ms, rel diff {(frequency - time) / time:e2}");
        Assert.True(Math.Abs(time - frequency) < Tolerance * time, $"{time} vs {frequency}");
    }
}
