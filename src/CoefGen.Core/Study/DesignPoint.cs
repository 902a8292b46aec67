using System.Text;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>Loads a readout text through <see cref="ReadoutLoader"/> and runs the pipeline, as `design` does.</summary>
public sealed class DesignPoint
{
    private readonly string _sourcePath;
    private readonly Func<string, byte[]?> _readRelative;
    private readonly TargetCatalog _catalog;

    /// <param name="sourcePath">The readout file's path (messages, relative psd_table paths).</param>
    /// <param name="readRelative">Reads files the readout names, relative to it.</param>
    /// <param name="catalog">Target profiles.</param>
    public DesignPoint(string sourcePath, Func<string, byte[]?> readRelative, TargetCatalog catalog)
    {
        ArgumentNullException.ThrowIfNull(sourcePath);
        ArgumentNullException.ThrowIfNull(readRelative);
        ArgumentNullException.ThrowIfNull(catalog);
        _sourcePath = sourcePath;
        _readRelative = readRelative;
        _catalog = catalog;
    }

    /// <summary>The full design of a readout text, or null with the diagnostics that stopped it.</summary>
    public DesignResult? Run(string text, out IReadOnlyList<Diagnostic> diagnostics)
    {
        ArgumentNullException.ThrowIfNull(text);
        var load = ReadoutLoader.Load(Encoding.UTF8.GetBytes(text), _sourcePath, _readRelative);
        if (load.Description is null || load.Diagnostics.Any(d => d.Severity == Severity.Error))
        {
            diagnostics = [.. load.Diagnostics.Where(d => d.Severity == Severity.Error)];
            return null;
        }

        try
        {
            var result = DesignPipeline.Run(load.Description, _catalog, frequencyCheck: false);
            diagnostics = [.. load.Diagnostics, .. result.Warnings];
            return result;
        }
        catch (InputException ex)
        {
            diagnostics = [.. ex.Diagnostics.Where(d => d.Severity == Severity.Error)];
            return null;
        }
        catch (ArgumentException ex)
        {
            // A valid file the stages still cannot design (e.g. a one-sample Hann window has no weight): a row, not a crash.
            diagnostics = [Diagnostic.Error("CG6002", SourceLocation.FileOnly(_sourcePath), $"the design stages reject this point: {ex.Message}")];
            return null;
        }
    }

    /// <summary>The summary of one point (invalid points carry their diagnostics).</summary>
    public PointOutcome Evaluate(string text)
    {
        var result = Run(text, out var diagnostics);
        return result is null ? PointOutcome.Invalid(diagnostics) : Summarise(result, diagnostics);
    }

    public static PointOutcome Summarise(DesignResult result, IReadOnlyList<Diagnostic> diagnostics)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(diagnostics);
        // With form = "two-stage" the datapath is the two-stage one (the full table is not quantised).
        var (safe, gain, penalty) = result.IsTwoStage
            ? (result.Proof.Safe, result.TwoStage!.Quantised.GainErrorPpm, result.TwoStage.Quantised.NoisePenaltyPercent)
            : (result.Datapath.Proof.Safe, result.Datapath.GainErrorPpm, result.Datapath.NoisePenaltyPercent);
        return new PointOutcome
        {
            Schemes = [.. result.Predictions.Select(p => new SchemeNoise(p.Scheme, p.Label, p.SigmaElectrons, p.SigmaAdu, result.Regret?.Rows.First(row => row.Scheme == p.Scheme).WorstRatio))],
            Chosen = result.Description.Weights.Scheme,
            Safe = safe,
            GainErrorPpm = gain,
            NoisePenaltyPercent = penalty,
            PixelSamples = result.Description.Timing.PixelSamples,
            PixelTimeS = result.Description.Timing.PixelSamples / result.Description.Adc.RateHz,
            Diagnostics = diagnostics,
        };
    }
}
