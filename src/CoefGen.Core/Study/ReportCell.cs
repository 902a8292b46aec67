namespace CoefGen.Core.Study;

/// <summary>
/// One table cell of the design report: text, or a number with the JSON path (in the `design --json` document)
/// it was taken from, so a test can check every number against that document.
/// </summary>
public sealed record ReportCell(string Text, string? JsonPath = null, double? Value = null)
{
    public static ReportCell Of(string text) => new(text);

    public static ReportCell Number(string jsonPath, double value) =>
        new(value.ToString("G6", System.Globalization.CultureInfo.InvariantCulture), jsonPath, value);
}
