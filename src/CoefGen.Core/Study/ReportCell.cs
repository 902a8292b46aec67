using CoefGen.Core.Formatting;

namespace CoefGen.Core.Study;

/// <summary>
/// One table cell of the design report: text, or a number with the JSON path (in the `design --json` document) it
/// was taken from, so a test can check every number against that document. Numbers are shown by <see cref="Human"/>;
/// <see cref="Value"/> keeps full precision. <see cref="Raw"/> marks machine text (hashes, big integers).
/// </summary>
public sealed record ReportCell(string Text, string? JsonPath = null, double? Value = null, bool Raw = false)
{
    public static ReportCell Of(string text) => new(text);

    public static ReportCell Verbatim(string text, string? jsonPath = null) => new(text, jsonPath, null, true);

    /// <summary>A plain number, 4 significant figures.</summary>
    public static ReportCell Number(string jsonPath, double value) => new(Human.NumShort(value), jsonPath, value);

    /// <summary>A quantity with an SI prefix: "20 MHz".</summary>
    public static ReportCell Si(string jsonPath, double value, string unit) => new(Human.SiShort(value, unit), jsonPath, value);

    /// <summary>A quantity in a unit that takes no prefix: "0.9194 e-".</summary>
    public static ReportCell With(string jsonPath, double value, string unit) => new(Human.With(value, unit), jsonPath, value);

    /// <summary>A fraction shown as a percentage: 0.1234 -> "12.34 %".</summary>
    public static ReportCell Percent(string jsonPath, double fraction) => new(Human.Percent(fraction), jsonPath, fraction);
}
