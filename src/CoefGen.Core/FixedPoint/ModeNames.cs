namespace CoefGen.Core.FixedPoint;

/// <summary>The spellings of the mode enums in TOML files (words joined by hyphens, as in the readout file).</summary>
public static class ModeNames
{
    public static IReadOnlyList<string> NormalizeNames { get; } = ["shift", "exact"];

    public static IReadOnlyList<string> RoundingNames { get; } = ["half-up", "half-even", "truncate"];

    public static IReadOnlyList<string> AccumulatorNames { get; } = ["wrap", "saturate"];

    public static NormalizeMode? ParseNormalize(string text) => text switch
    {
        "shift" => NormalizeMode.Shift,
        "exact" => NormalizeMode.Exact,
        _ => null,
    };

    public static RoundingMode? ParseRounding(string text) => text switch
    {
        "half-up" => RoundingMode.HalfUp,
        "half-even" => RoundingMode.HalfEven,
        "truncate" => RoundingMode.Truncate,
        _ => null,
    };

    public static AccumulatorMode? ParseAccumulator(string text) => text switch
    {
        "wrap" => AccumulatorMode.Wrap,
        "saturate" => AccumulatorMode.Saturate,
        _ => null,
    };

    public static string Name(NormalizeMode m) => m == NormalizeMode.Shift ? "shift" : "exact";

    public static string Name(RoundingMode m) => m switch
    {
        RoundingMode.HalfUp => "half-up",
        RoundingMode.HalfEven => "half-even",
        _ => "truncate",
    };

    public static string Name(AccumulatorMode m) => m == AccumulatorMode.Wrap ? "wrap" : "saturate";
}
