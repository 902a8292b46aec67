using System.Text;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Emit;

/// <summary>The words and safe comment text the template model uses.</summary>
internal static class ModelText
{
    public static string Word(RoundingMode mode) => mode switch
    {
        RoundingMode.HalfUp => "half-up",
        RoundingMode.HalfEven => "half-even",
        RoundingMode.Truncate => "truncate",
        _ => throw new ArgumentOutOfRangeException(nameof(mode), mode, null),
    };

    public static string Word(AccumulatorMode mode) => mode switch
    {
        AccumulatorMode.Wrap => "wrap",
        AccumulatorMode.Saturate => "saturate",
        _ => throw new ArgumentOutOfRangeException(nameof(mode), mode, null),
    };

    public static string Word(NormalizeMode mode) => mode switch
    {
        NormalizeMode.Shift => "shift",
        NormalizeMode.Exact => "exact",
        _ => throw new ArgumentOutOfRangeException(nameof(mode), mode, null),
    };

    public static string Word(AdcCoding coding) => coding switch
    {
        AdcCoding.TwosComplement => "twos-complement",
        AdcCoding.OffsetBinary => "offset-binary",
        _ => throw new ArgumentOutOfRangeException(nameof(coding), coding, null),
    };

    /// <summary>
    /// Text that is safe inside a C block comment, a // or -- line comment: printable ASCII only (others
    /// become '?'), and "*/" broken up, so a file name can never end a comment or start a new line.
    /// </summary>
    public static string CommentSafe(string text)
    {
        var sb = new StringBuilder(text.Length);
        foreach (var ch in text)
        {
            sb.Append(ch is >= ' ' and <= '~' ? ch : '?');
        }

        return sb.ToString().Replace("*/", "* /", StringComparison.Ordinal);
    }
}
