using System.Globalization;

namespace CoefGen.Core.Study;

/// <summary>One varied key and its values, in sweep order.</summary>
public sealed record SweepAxis(string Key, IReadOnlyList<double> Values)
{
    /// <summary>Most values one axis may have (a guard against a typo such as 1:1e9:1).</summary>
    public const int MaxValues = 10_000;

    /// <summary>
    /// Parses KEY=LIST, KEY=START:STOP:STEP or KEY=START:STOP:xFACTOR. Numbers may carry an SI prefix
    /// (20M, 2.5k, 50n). Ranges include STOP (to 1e-9 relative); values are start + i*step or start*factor^i,
    /// rounded to 12 significant digits so that 0.1 steps give 0.3, not 0.30000000000000004.
    /// </summary>
    public static SweepAxis? TryParse(string spec, out string? error)
    {
        ArgumentNullException.ThrowIfNull(spec);
        var eq = spec.IndexOf('=', StringComparison.Ordinal);
        if (eq <= 0 || eq == spec.Length - 1)
        {
            error = $"'{spec}': expected KEY=LIST, KEY=START:STOP:STEP or KEY=START:STOP:xFACTOR (e.g. adc.rate_hz=10M:40M:x2)";
            return null;
        }

        var key = spec[..eq].Trim();
        var body = spec[(eq + 1)..].Trim();
        var values = body.Contains(':', StringComparison.Ordinal) ? Range(body, out error) : List(body, out error);
        if (values is null)
        {
            error = $"{key}: {error}";
            return null;
        }

        if (values.Count > MaxValues)
        {
            error = $"{key}: {values.Count.ToString(CultureInfo.InvariantCulture)} values; at most {MaxValues.ToString(CultureInfo.InvariantCulture)} per --vary";
            return null;
        }

        return new SweepAxis(key, values);
    }

    private static List<double>? List(string body, out string? error)
    {
        var values = new List<double>();
        foreach (var part in body.Split(','))
        {
            if (!TryNumber(part, out var v))
            {
                error = $"'{part.Trim()}' is not a number";
                return null;
            }

            values.Add(v);
        }

        error = null;
        return values;
    }

    private static List<double>? Range(string body, out string? error)
    {
        var parts = body.Split(':');
        if (parts.Length != 3)
        {
            error = $"'{body}': a range is START:STOP:STEP or START:STOP:xFACTOR";
            return null;
        }

        var geometric = parts[2].TrimStart().StartsWith('x');
        var stepText = geometric ? parts[2].Trim()[1..] : parts[2];
        if (!TryNumber(parts[0], out var start) || !TryNumber(parts[1], out var stop) || !TryNumber(stepText, out var step))
        {
            error = $"'{body}': START, STOP and STEP must be numbers";
            return null;
        }

        var values = new List<double>();
        if (geometric)
        {
            if (!(step > 1) || !(start > 0) || !(stop >= start))
            {
                error = $"'{body}': a geometric range needs 0 < START <= STOP and FACTOR > 1";
                return null;
            }

            for (var i = 0; values.Count <= MaxValues; i++)
            {
                var v = Round12(start * Math.Pow(step, i));
                if (v > stop * (1 + 1e-9))
                {
                    break;
                }

                values.Add(v);
            }
        }
        else
        {
            if (!(step > 0) || !(stop >= start))
            {
                error = $"'{body}': a linear range needs START <= STOP and STEP > 0";
                return null;
            }

            if (stop > start && step > stop - start)
            {
                // 4:10:30 read as START:STOP:STEP is the single value 4; most likely START:STEP:STOP was meant.
                error = $"'{body}': a range is START:STOP:STEP, and STEP {parts[2].Trim()} is larger than STOP - START, which gives the single value {parts[0].Trim()}; " +
                        $"for START:STEP:STOP write {parts[0].Trim()}:{parts[2].Trim()}:{parts[1].Trim()}, for one value write {parts[0].Trim()}";
                return null;
            }

            for (var i = 0; values.Count <= MaxValues; i++)
            {
                var v = start + (i * step);
                if (v > stop + (Math.Abs(step) * 1e-9))
                {
                    break;
                }

                values.Add(Round12(v));
            }
        }

        error = null;
        return values;
    }

    private static double Round12(double v) =>
        v == 0 ? 0 : double.Parse(v.ToString("G12", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>A plain number, optionally followed by one SI prefix letter.</summary>
    public static bool TryNumber(string text, out double value)
    {
        ArgumentNullException.ThrowIfNull(text);
        var t = text.Trim();
        var scale = 1.0;
        if (t.Length > 1 && Prefix(t[^1]) is double p)
        {
            scale = p;
            t = t[..^1];
        }

        if (double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out var v) && double.IsFinite(v))
        {
            value = v * scale;
            return true;
        }

        value = 0;
        return false;
    }

    private static double? Prefix(char c) => c switch
    {
        'G' => 1e9,
        'M' => 1e6,
        'k' => 1e3,
        'm' => 1e-3,
        'u' => 1e-6,
        'n' => 1e-9,
        'p' => 1e-12,
        _ => null,
    };
}
