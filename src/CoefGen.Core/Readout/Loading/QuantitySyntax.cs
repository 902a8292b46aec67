using Tomlyn.Syntax;

namespace CoefGen.Core.Readout.Loading;

/// <summary>A TOML value as a quantity in a key's unit: an integer, a float or an SI string ("20 kHz").</summary>
internal static class QuantitySyntax
{
    /// <summary>True with the value; false with the SI parser's reason; null when the value is neither a number nor a string.</summary>
    public static bool? TryRead(ValueSyntax? syntax, KeyUnit unit, out double value, out string reason)
    {
        reason = "";
        switch (syntax)
        {
            case IntegerValueSyntax integer:
                value = integer.Value;
                return true;
            case FloatValueSyntax real:
                value = real.Value;
                return true;
            case StringValueSyntax text:
                return SiQuantity.TryParse(text.Value ?? "", unit, out value, out reason);
            default:
                value = double.NaN;
                return null;
        }
    }
}
