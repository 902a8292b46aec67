using System.Globalization;
using System.Net;

namespace CoefGen.Core.Study;

/// <summary>Invariant, fixed-precision numbers and escaping for hand-written SVG (same bytes on every machine).</summary>
internal static class SvgFormat
{
    public static readonly string[] Palette = ["#1f77b4", "#d62728", "#2ca02c", "#9467bd", "#ff7f0e", "#8c564b", "#e377c2", "#7f7f7f"];

    public static string C(double v) => Math.Round(v, 2).ToString("0.##", CultureInfo.InvariantCulture);

    public static string Esc(string text) => WebUtility.HtmlEncode(text);

    /// <summary>Tick label: 3 significant digits, exponent form outside 1e-3 .. 1e5.</summary>
    public static string Tick(double v)
    {
        if (v == 0)
        {
            return "0";
        }

        var a = Math.Abs(v);
        return a >= 1e-3 && a < 1e5
            ? v.ToString("G3", CultureInfo.InvariantCulture)
            : v.ToString("0.##E+0", CultureInfo.InvariantCulture);
    }
}
