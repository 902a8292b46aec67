namespace CoefGen.Core.Readout.Loading;

/// <summary>Reads [fixed_point] as written; the FixedPoint stage resolves it against the target profile.</summary>
internal static class FixedPointSectionReader
{
    private static readonly (string, int)[] Normalize = [("shift", 0), ("exact", 1)];
    private static readonly (string, int)[] Rounding = [("half-up", 0), ("half-even", 1), ("truncate", 2)];
    private static readonly (string, int)[] Accumulator = [("wrap", 0), ("saturate", 1)];

    public static readonly FixedPointSpec Empty = new(null, null, null, null, null, null, null, null, null);

    public static FixedPointSpec? Read(TableReader root)
    {
        var section = root.Section("fixed_point", required: false);
        if (section is null)
        {
            return root.Has("fixed_point") ? null : Empty;
        }

        var errorsBefore = root.Context.ErrorCount;
        section.RejectUnknown("target", "coef_bits", "sample_bits", "acc_bits", "output_bits", "output_frac_bits", "normalize", "rounding", "accumulator");
        var spec = new FixedPointSpec(
            section.Text("target", required: false),
            Bits(section, "coef_bits", 2, 63),
            Bits(section, "sample_bits", 2, 63),
            Bits(section, "acc_bits", 2, 64),
            Bits(section, "output_bits", 2, 64),
            Bits(section, "output_frac_bits", 0, 32),
            Word(section, "normalize", Normalize),
            Word(section, "rounding", Rounding),
            Word(section, "accumulator", Accumulator));
        return root.Context.ErrorCount > errorsBefore ? null : spec;
    }

    private static int? Bits(TableReader section, string key, int min, int max) =>
        section.Integer(key, required: false, min, max) is { } v ? (int)v : null;

    /// <summary>The word as written, after checking it is one of the allowed ones.</summary>
    private static string? Word(TableReader section, string key, (string Word, int Value)[] words) =>
        section.Choice(key, words) is { } index ? words[index].Word : null;
}
