using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// The pipeline stage of the two-stage form. With form = "full" it is computed whenever the cycle has one (shown
/// beside the full table, as before) and left out when it cannot be formed; with form = "two-stage" it is the datapath,
/// so a cycle without it is a located error.
/// </summary>
internal static class TwoStageStage
{
    /// <summary>Errors of form = "two-stage" that need the grid and the covariance (the loader checked the rest).</summary>
    public static IReadOnlyList<Diagnostic> Check(ReadoutDescription d, SampleGrid grid, SampledCovariance r)
    {
        if (d.Weights.Form != WeightsForm.TwoStage)
        {
            return [];
        }

        var at = d.LocationOf("weights.form");
        if (ReadLayout.Of(grid) is null)
        {
            return [Diagnostic.Error(TwoStageCodes.NotIdenticalReads, at,
                "form = \"two-stage\" needs every weighted sample in one of N >= 2 identical reads (same window offsets, equally spaced, at least 2 samples each); this cycle has windows outside its repetition; use form = \"full\"", "weights.form")];
        }

        if (r.Shot is not null)
        {
            return [Diagnostic.Error(TwoStageCodes.WithShotNoise, at,
                "form = \"two-stage\" needs noise that is the same in every read; the shot noise of the integrating charge ([integration]) grows from read to read; remove the shot-noise rates or use form = \"full\"", "weights.form")];
        }

        return [];
    }

    /// <summary>The two-stage datapath, or null when the cycle has none (form = "full" only: Check has refused the rest).</summary>
    public static TwoStageDatapath? Run(ReadoutDescription d, SampleGrid grid, SampledCovariance r, FixedPointSettings settings)
    {
        var layout = ReadLayout.Of(grid);
        var real = layout is null ? null : TwoStageWeights.Design(grid, r, d.Weights.RejectDrift);
        if (layout is null || real is null)
        {
            return null;
        }

        if (d.Weights.Form == WeightsForm.TwoStage)
        {
            var integer = IntegerStage.Run(d, () => TwoStageIntegerDesigner.Design(grid, r, real, d.Adc, settings));
            return new TwoStageDatapath(real, integer, layout);
        }

        try
        {
            return new TwoStageDatapath(real, TwoStageIntegerDesigner.Design(grid, r, real, d.Adc, settings), layout);
        }
        catch (CoefficientWidthException)
        {
            return null; // beside a full table only: a two-stage form that does not fit is not shown
        }
    }
}
