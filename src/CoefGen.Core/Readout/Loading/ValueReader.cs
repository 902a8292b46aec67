using System.Globalization;
using Tomlyn.Syntax;

namespace CoefGen.Core.Readout.Loading;

/// <summary>Typed values from a table's keys. Each returns null (after a diagnostic, if required) when the value cannot be used.</summary>
internal static class ValueReader
{
    /// <summary>
    /// A real number in the unit named by the key's suffix: a TOML integer or float, or an SI string ("20 MHz").
    /// </summary>
    public static double? Quantity(this TableReader table, string key, bool required, NumberRule rule)
    {
        var entry = Required(table, key, required);
        if (entry is null)
        {
            return null;
        }

        var unit = KeyUnit.ForKey(key);
        switch (QuantitySyntax.TryRead(entry.Value, unit, out var value, out var reason))
        {
            case false:
                table.Context.Error(ReadoutCodes.WrongType, entry.ValueLocation, entry.Path, reason);
                return null;
            case null:
                var example = unit.Canonical.Length == 0 ? "\"2.5\"" : $"\"2.5 k{unit.Canonical}\"";
                table.WrongType(entry, $"a number or a string with an SI prefix such as {example}");
                return null;
        }

        if (!double.IsFinite(value) || !rule.Accepts(value))
        {
            table.Context.Error(ReadoutCodes.OutOfRange, entry.ValueLocation, entry.Path,
                $"'{key}' = {Format(value)} is not allowed; expected {rule.Allowed}");
            return null;
        }

        return value;
    }

    /// <summary>A TOML integer (a float such as 16.0 is refused) within [min, max].</summary>
    public static long? Integer(this TableReader table, string key, bool required, long min, long max)
    {
        var entry = Required(table, key, required);
        if (entry is null)
        {
            return null;
        }

        if (entry.Value is not IntegerValueSyntax integer)
        {
            var hint = entry.Value is FloatValueSyntax f ? $" (write {Format(Math.Truncate(f.Value))}, not {f.Token?.Text ?? Format(f.Value)})" : "";
            table.WrongType(entry, $"an integer{hint}");
            return null;
        }

        if (integer.Value < min || integer.Value > max)
        {
            table.Context.Error(ReadoutCodes.OutOfRange, entry.ValueLocation, entry.Path,
                $"'{key}' = {integer.Value.ToString(CultureInfo.InvariantCulture)} is out of range; expected an integer from {min.ToString(CultureInfo.InvariantCulture)} to {max.ToString(CultureInfo.InvariantCulture)}");
            return null;
        }

        return integer.Value;
    }

    public static string? Text(this TableReader table, string key, bool required, bool allowEmpty = false)
    {
        var entry = Required(table, key, required);
        if (entry is null)
        {
            return null;
        }

        if (entry.Value is not StringValueSyntax text)
        {
            table.WrongType(entry, "a string");
            return null;
        }

        var value = text.Value ?? "";
        if (!allowEmpty && value.Trim().Length == 0)
        {
            table.Context.Error(ReadoutCodes.OutOfRange, entry.ValueLocation, entry.Path, $"'{key}' must not be empty");
            return null;
        }

        return value;
    }

    /// <summary>One of a fixed set of words; lists them when the value is another word.</summary>
    public static T? Choice<T>(this TableReader table, string key, IReadOnlyList<(string Word, T Value)> words)
        where T : struct
    {
        var entry = Required(table, key, required: false);
        if (entry is null)
        {
            return null;
        }

        var allowed = string.Join(", ", words.Select(w => $"\"{w.Word}\""));
        if (entry.Value is not StringValueSyntax text)
        {
            table.WrongType(entry, $"one of {allowed}");
            return null;
        }

        foreach (var (word, value) in words)
        {
            if (word == text.Value)
            {
                return value;
            }
        }

        var suggestion = DidYouMean.Suggest(text.Value ?? "", words.Select(w => w.Word));
        var hint = suggestion is null ? "" : $" (did you mean \"{suggestion}\"?)";
        table.Context.Error(ReadoutCodes.NotAllowedWord, entry.ValueLocation, entry.Path,
            $"'{key}' = \"{text.Value}\" is not allowed{hint}; allowed: {allowed}");
        return null;
    }

    public static bool? Flag(this TableReader table, string key)
    {
        var entry = Required(table, key, required: false);
        if (entry is null)
        {
            return null;
        }

        if (entry.Value is not BooleanValueSyntax flag)
        {
            table.WrongType(entry, "true or false");
            return null;
        }

        return flag.Value;
    }

    /// <summary>An array of finite numbers (integers or floats).</summary>
    public static IReadOnlyList<double>? NumberArray(this TableReader table, string key, NumberRule rule)
    {
        var entry = Required(table, key, required: false);
        if (entry is null)
        {
            return null;
        }

        if (entry.Value is not ArraySyntax array)
        {
            table.WrongType(entry, "an array of numbers");
            return null;
        }

        var values = new List<double>();
        var ok = true;
        var index = 0;
        foreach (var item in array.Items)
        {
            var location = TomlTreeBuilder.Locate(item.Value ?? (SyntaxNode)item, table.Context.File);
            var path = $"{entry.Path}[{index.ToString(CultureInfo.InvariantCulture)}]";
            double? value = item.Value switch
            {
                IntegerValueSyntax i => i.Value,
                FloatValueSyntax f => f.Value,
                _ => null,
            };
            if (value is null)
            {
                table.Context.Error(ReadoutCodes.WrongType, location, path, $"element {index.ToString(CultureInfo.InvariantCulture)} of '{key}' is not a number");
                ok = false;
            }
            else if (!double.IsFinite(value.Value) || !rule.Accepts(value.Value))
            {
                table.Context.Error(ReadoutCodes.OutOfRange, location, path,
                    $"element {index.ToString(CultureInfo.InvariantCulture)} of '{key}' = {Format(value.Value)} is not allowed; expected {rule.Allowed}");
                ok = false;
            }
            else
            {
                values.Add(value.Value);
            }

            index++;
        }

        return ok ? values : null;
    }

    public static string Format(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static TomlEntry? Required(TableReader table, string key, bool required)
    {
        var entry = table.Entry(key);
        if (entry is null)
        {
            if (required)
            {
                table.MissingKey(key);
            }

            return null;
        }

        if (entry.Kind != TomlEntryKind.Value)
        {
            table.WrongType(entry, "a value");
            return null;
        }

        return entry;
    }
}
