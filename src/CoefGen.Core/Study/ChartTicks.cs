using CoefGen.Core.Formatting;

namespace CoefGen.Core.Study;

/// <summary>Tick positions and labels: 1-2-5 steps on linear axes; 1-2-5 or decades on log axes; labels in SI units.</summary>
public static class ChartTicks
{
    /// <summary>Log-axis ticks in [lo, hi]: 1, 2, 5 per decade over up to three decades, else decades (every k-th beyond eight).</summary>
    public static IReadOnlyList<double> Log(double lo, double hi)
    {
        var a = (int)Math.Floor(Math.Log10(lo) + 1e-9);
        var b = (int)Math.Ceiling(Math.Log10(hi) - 1e-9);
        var decades = b - a;
        var ticks = new List<double>();
        if (decades <= 3)
        {
            for (var k = a; k <= b; k++)
            {
                foreach (var m in new[] { 1.0, 2, 5 })
                {
                    Add(ticks, m * Math.Pow(10, k), lo, hi);
                }
            }
        }
        else
        {
            var every = Math.Max(1, (decades + 7) / 8);
            for (var k = a; k <= b; k++)
            {
                if (k % every == 0)
                {
                    Add(ticks, Math.Pow(10, k), lo, hi);
                }
            }
        }

        return ticks;
    }

    /// <summary>Linear-axis ticks in [lo, hi] with a 1, 2 or 5 x 10^n step, about six of them.</summary>
    public static IReadOnlyList<double> Linear(double lo, double hi)
    {
        var raw = (hi - lo) / 6;
        var mag = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        var step = new[] { 1.0, 2, 5, 10 }.Select(m => m * mag).First(s => s >= raw * (1 - 1e-9));
        var ticks = new List<double>();
        for (var i = Math.Ceiling((lo / step) - 1e-9); i * step <= hi + (step * 1e-9); i++)
        {
            var t = i * step;
            ticks.Add(Math.Abs(t) < step * 1e-9 ? 0 : t);
        }

        return ticks;
    }

    /// <summary>"20 MHz" with a unit, else "0.002" / "2 x 10^-9"; never E-notation.</summary>
    public static string Label(double v, string? unit) => unit is null ? Human.NumShort(v, 3) : Human.SiShort(v, unit, 3);

    private static void Add(List<double> ticks, double t, double lo, double hi)
    {
        if (t >= lo * (1 - 1e-9) && t <= hi * (1 + 1e-9))
        {
            ticks.Add(t);
        }
    }
}
