namespace CoefGen.Core.Readout;

/// <summary>Which datapath the chosen weights take ([weights] form).</summary>
public enum WeightsForm
{
    /// <summary>One coefficient per weighted sample of the cycle (every classic file).</summary>
    Full,

    /// <summary>Repeated identical reads: one per-read table and one weight per read, h = a (x) g.</summary>
    TwoStage,
}
