using System.Diagnostics;
using System.Globalization;
using CoefGen.Core.Noise;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.Structured;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Benchmarks;

/// <summary>Stopwatch around each public stage of the design of one readout file (profiling aid).</summary>
public static class StageProfile
{
    public static void Run(string path)
    {
        var d = RepoFiles.Load(File.ReadAllBytes(path), path, _ => null);
        var clock = new StageClock();
        void Lap(string what) => clock.Lap(what);

        var grid = SampleGrid.FromDescription(d);
        Lap("grid");
        var noise = NoiseModel.FromDescription(d);
        var cov = CycleNoise.WithShot(noise.Sample(grid), grid, d);
        Lap("covariance");
        var box = BoxcarWeights.Compute(grid, d.Weights.RejectDrift);
        Lap("boxcar");
        var shaped = ShapedWeights.Compute(grid, d.Weights);
        Lap("weighted");
        var sol = StructuredOptimalSolver.Solve(cov, ConstraintSystem.FromGrid(grid, d.Weights.RejectDrift));
        Lap($"structured optimal ({sol.Iterations} it)");
        foreach (var w in new[] { box, shaped, new WeightSet(WeightScheme.Optimal, "optimal", [.. sol.Weights]) })
        {
            NoisePredictor.Predict(w, cov, d.Adc, d.Sensor, null);
        }

        Lap("3 predictions");
        var two = TwoStageWeights.Design(grid, cov, d.Weights.RejectDrift);
        Lap($"two-stage ({two?.Iterations})");
        var settings = CoefGen.Core.FixedPoint.FixedPointSettingsResolver.Resolve(d, RepoFiles.Targets()).Settings!;
        Lap("settings");
        if (two is not null)
        {
            CoefGen.Core.FixedPoint.TwoStage.TwoStageIntegerDesigner.Design(grid, cov, two, d.Adc, settings);
            Lap("two-stage integer design");
        }

        DesignPipeline.Run(d, RepoFiles.Targets());
        Lap("whole DesignPipeline.Run");
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"var optimal {sol.VarianceV2:E6} two-stage {two?.VarianceV2:E6} boxcar {cov.QuadraticForm(box.H):E6}"));
    }
}
