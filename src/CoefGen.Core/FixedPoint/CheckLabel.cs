namespace CoefGen.Core.FixedPoint;

/// <summary>The words people read for the width proof's stable check identifiers (JSON keeps the identifiers).</summary>
public static class CheckLabel
{
    public static string Of(string name) => name switch
    {
        "coefficient" => "coefficient",
        "product" => "product c x sample",
        "accumulator_final" => "final accumulator sum",
        "accumulator_partial" => "partial accumulator sums",
        "post_multiply" => "accumulator x post-multiplier",
        "output" => "output",
        _ => name.Replace('_', ' '),
    };
}
