namespace CoefGen.Core.FixedPoint;

/// <summary>The words people read for the width proof's stable check identifiers (JSON keeps the identifiers).</summary>
public static class CheckLabel
{
    public static string Of(string name) => name switch
    {
        // The two-stage proof prefixes each stage's checks (stage1_product, stage2_accumulator_final, ...).
        _ when name.StartsWith("stage1_", StringComparison.Ordinal) => "read sum: " + Of(name["stage1_".Length..]),
        "stage2_product" => "read weights: product w x rounded read sum",
        _ when name.StartsWith("stage2_", StringComparison.Ordinal) => "read weights: " + Of(name["stage2_".Length..]),
        "coefficient" => "coefficient",
        "product" => "product c x sample",
        "accumulator_final" => "final accumulator sum",
        "accumulator_partial" => "partial accumulator sums",
        "post_multiply" => "accumulator x post-multiplier",
        "output" => "output",
        _ => name.Replace('_', ' '),
    };
}
