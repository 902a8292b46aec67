using CoefGen.Core.Readout;

namespace CoefGen.Core.Noise;

/// <summary>
/// A measured spectrum (<see cref="PsdTable"/>): S piecewise-linear in f between the points, held flat
/// from 0 Hz to the first point, S_N (f_N/f)² above the last point. Its cosine transform is exact
/// piece by piece (Filon-type: ∫(a + bf) cos(ωf) df is elementary), the f⁻² tail uses Si/Ci auxiliaries.
/// By Bochner's theorem a non-negative S gives a positive-semidefinite C (PHYSICS §2).
/// </summary>
public sealed class MeasuredPsdComponent : NoiseComponent
{
    private readonly double[] _f;
    private readonly double[] _s;

    public MeasuredPsdComponent(string name, IReadOnlyList<double> frequencyHz, IReadOnlyList<double> densityV2PerHz)
        : base(name)
    {
        ArgumentNullException.ThrowIfNull(frequencyHz);
        ArgumentNullException.ThrowIfNull(densityV2PerHz);
        if (frequencyHz.Count < 2 || frequencyHz.Count != densityV2PerHz.Count)
        {
            throw new ArgumentException("a PSD table needs at least two points and one density per frequency");
        }

        _f = [.. frequencyHz];
        _s = [.. densityV2PerHz];
        for (var i = 0; i < _f.Length; i++)
        {
            if (!double.IsFinite(_f[i]) || !(_s[i] >= 0) || !double.IsFinite(_s[i]) || (i == 0 ? _f[0] < 0 : _f[i] <= _f[i - 1]))
            {
                throw new ArgumentException("table frequencies must increase from >= 0 and densities be finite and >= 0");
            }
        }
    }

    /// <summary>The component for a loaded table, named "&lt;table&gt; (measured)".</summary>
    public static MeasuredPsdComponent FromTable(PsdTable table)
    {
        ArgumentNullException.ThrowIfNull(table);
        return new MeasuredPsdComponent(table.Name + " (measured)", table.FrequencyHz, table.DensityV2PerHz);
    }

    public override IReadOnlyList<double> Breakpoints => _f;

    public override double Psd(double fHz)
    {
        if (fHz < 0)
        {
            return 0;
        }

        if (fHz <= _f[0])
        {
            return _s[0];
        }

        var last = _f.Length - 1;
        if (fHz >= _f[last])
        {
            var r = _f[last] / fHz;
            return _s[last] * r * r;
        }

        var i = Array.BinarySearch(_f, fHz);
        if (i >= 0)
        {
            return _s[i];
        }

        var hi = ~i;
        var t = (fHz - _f[hi - 1]) / (_f[hi] - _f[hi - 1]);
        return _s[hi - 1] + t * (_s[hi] - _s[hi - 1]);
    }

    public override double PsdIntegralAbove(double fHz)
    {
        var last = _f.Length - 1;
        if (fHz >= _f[last])
        {
            return _s[last] * _f[last] * _f[last] / fHz;
        }

        var total = _s[last] * _f[last];
        var start = Math.Max(fHz, 0);
        if (start < _f[0])
        {
            total += _s[0] * (_f[0] - start);
            start = _f[0];
        }

        for (var i = 0; i < last; i++)
        {
            if (_f[i + 1] <= start)
            {
                continue;
            }

            var a = Math.Max(_f[i], start);
            total += 0.5 * (Psd(a) + _s[i + 1]) * (_f[i + 1] - a);
        }

        return total;
    }

    public override double Covariance(double tauS)
    {
        var w = 2 * Math.PI * Math.Abs(tauS);

        // Flat part [0, f_0].
        var sum = _s[0] * _f[0] * Sinc(w * _f[0]);

        // Linear pieces, written about the midpoint m with half-width h (no cancellation at small ω):
        // ∫ S cos = h [(p + q) cos(ωm) sinc(ωh) - (q - p) sin(ωm) j1(ωh)].
        for (var i = 0; i + 1 < _f.Length; i++)
        {
            var m = 0.5 * (_f[i] + _f[i + 1]);
            var h = 0.5 * (_f[i + 1] - _f[i]);
            var (sm, cm) = Math.SinCos(w * m);
            sum += h * ((_s[i] + _s[i + 1]) * cm * Sinc(w * h) - (_s[i + 1] - _s[i]) * sm * SphericalJ1(w * h));
        }

        // Tail S_N F²/f² on [F, ∞): S_N F [cos y - y (π/2 - Si(y))], y = ωF, via the auxiliaries f, g.
        var fLast = _f[^1];
        var sLast = _s[^1];
        var y = w * fLast;
        double tail;
        if (y <= 2)
        {
            tail = Math.Cos(y) - y * (Math.PI / 2 - SpecialFunctions.Si(y));
        }
        else
        {
            var (fa, ga) = SpecialFunctions.AuxiliaryFG(y);
            var (sy, cy) = Math.SinCos(y);
            tail = cy * (1 - y * fa) - y * ga * sy;
        }

        return sum + sLast * fLast * tail;
    }

    private static double Sinc(double x) => Math.Abs(x) < 1e-4 ? 1 - x * x / 6 : Math.Sin(x) / x;

    /// <summary>j1(x) = (sin x - x cos x)/x², series below 0.1 where the difference cancels.</summary>
    private static double SphericalJ1(double x)
    {
        if (Math.Abs(x) < 0.1)
        {
            var x2 = x * x;
            return x / 3 * (1 - x2 / 10 * (1 - x2 / 28 * (1 - x2 / 54)));
        }

        var (s, c) = Math.SinCos(x);
        return (s - x * c) / (x * x);
    }
}
