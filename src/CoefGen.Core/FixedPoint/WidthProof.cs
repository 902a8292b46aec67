namespace CoefGen.Core.FixedPoint;

/// <summary>
/// What the integer datapath needs against what the target has, for every input in the ADC range.
/// Each check carries the required bits, the available bits and the extreme value with the input that reaches it.
/// </summary>
public sealed record WidthProof
{
    /// <summary>All checks, in datapath order (coefficient, product, accumulator final, partial sums, post-multiply, output).</summary>
    public required IReadOnlyList<WidthCheck> Checks { get; init; }

    /// <summary>True when every check that matters for the chosen accumulator mode holds.</summary>
    public bool Safe => Checks.All(c => c.Fits || !c.Required);

    /// <summary>What to change, one sentence each, when something does not fit.</summary>
    public required IReadOnlyList<string> Advice { get; init; }
}
