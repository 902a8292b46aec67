using CoefGen.Core.Noise;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>
/// Weights that minimise the worst-case variance max_i hᵀC_i h over noise scenarios under the usual
/// constraints. The problem is convex; by minimax duality (Sion 1958) its value is max over λ on the simplex
/// of g(λ) = min_h hᵀ(Σλ_i C_i)h, and every evaluation of g is the existing optimal solve on the mixed
/// covariance (dense or structured alike). g is concave with gradient (hᵀC_i h)_i at the solve's h
/// (Danskin), so the search climbs along pairs: weight moves from the scenario with the smallest variance
/// among the active ones to the one with the largest, to the point where their variances meet (a root of
/// the directional derivative, found by the Illinois rule). Every solve's h is a feasible primal point and
/// every λ a dual bound; the search stops when the best of each are within the gap tolerance.
/// </summary>
public static class RobustWeights
{
    /// <summary>Relative duality gap the search stops at.</summary>
    public const double DefaultGapTolerance = 1e-9;

    /// <summary>Cap on optimal solves (vertices included).</summary>
    public const int DefaultMaxSolves = 400;

    private const int MaxLineSteps = 40;

    /// <summary>Computes the robust weights for the scenario covariances (all on <paramref name="grid"/>).</summary>
    public static RobustSolution Compute(
        SampleGrid grid,
        IReadOnlyList<SampledCovariance> scenarios,
        bool rejectDrift,
        IOptimalSolver solver,
        RobustObjective objective,
        double gapTolerance = DefaultGapTolerance,
        int maxSolves = DefaultMaxSolves)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(scenarios);
        ArgumentNullException.ThrowIfNull(solver);
        if (scenarios.Count == 0)
        {
            throw new ArgumentException("at least one scenario is needed", nameof(scenarios));
        }

        var m = scenarios.Count;
        var search = new Search(grid, scenarios, rejectDrift, solver, [.. Enumerable.Repeat(1.0, m)]);
        var vertices = Enumerable.Range(0, m).Select(i => search.Evaluate(Unit(m, i))).ToArray();
        var optima = vertices.Select((p, i) => p.V[i]).ToArray();
        if (objective == RobustObjective.Mean)
        {
            var mean = search.Evaluate([.. Enumerable.Repeat(1.0 / m, m)]);
            return new RobustSolution(mean.H, objective, mean.Lambda, mean.V, optima, mean.G, null, search.Solves);
        }

        if (objective == RobustObjective.Regret)
        {
            // Minimax of h^T (C_i / optimum_i) h: the same problem on scaled scenarios; the vertices are already solved.
            var scaled = new Search(grid, scenarios, rejectDrift, solver, [.. optima.Select(o => 1 / o)], search.Solves);
            vertices = [.. vertices.Select(p => scaled.Record(p.Lambda, p.H))];
            search = scaled;
        }

        var current = vertices.MaxBy(p => p.G)!;
        while (search.Solves < maxSolves && search.RelativeGap > gapTolerance)
        {
            var next = PairStep(search, current, gapTolerance, maxSolves);
            if (next is null || next.G <= current.G)
            {
                break; // no ascent left that round-off can resolve
            }

            current = next;
        }

        var best = search.BestPrimal;
        var variances = scenarios.Select(c => c.QuadraticForm(best.H)).ToArray();
        return new RobustSolution(best.H, objective, best.Lambda, variances, optima, search.BestDual.G, Math.Max(0, search.RelativeGap), search.Solves);
    }

    /// <summary>One pairwise ascent step from <paramref name="from"/>; null when the pair is already balanced.</summary>
    private static Point? PairStep(Search search, Point from, double tolerance, int maxSolves)
    {
        var v = from.V;
        var up = Array.IndexOf(v, v.Max());
        var down = -1;
        for (var i = 0; i < v.Length; i++)
        {
            if (i != up && from.Lambda[i] > 0 && (down < 0 || v[i] < v[down]))
            {
                down = i;
            }
        }

        if (down < 0 || v[up] - v[down] <= tolerance * from.G * 0.1)
        {
            return null;
        }

        var tMax = from.Lambda[down];
        double Slope(Point p) => p.V[up] - p.V[down];
        Point At(double t)
        {
            var lambda = (double[])from.Lambda.Clone();
            lambda[up] += t;
            lambda[down] = t >= tMax ? 0 : lambda[down] - t;
            return search.Evaluate(lambda);
        }

        var end = At(tMax);
        var fb = Slope(end);
        if (fb >= 0)
        {
            return end; // the whole weight of `down` moves over: it leaves the active set
        }

        // Illinois rule on the decreasing slope over [0, tMax]: slope(0) > 0 > slope(tMax).
        double a = 0, fa = v[up] - v[down], b = tMax;
        var best = end.G > from.G ? end : from;
        for (var step = 0; step < MaxLineSteps && search.Solves < maxSolves; step++)
        {
            var t = ((a * fb) - (b * fa)) / (fb - fa);
            if (!(t > a && t < b))
            {
                t = 0.5 * (a + b);
            }

            var p = At(t);
            var f = Slope(p);
            if (p.G > best.G)
            {
                best = p;
            }

            if (Math.Abs(f) <= 0.1 * tolerance * p.G || b - a <= 1e-15 * tMax)
            {
                break;
            }

            if (f * fb < 0)
            {
                a = b;
                fa = fb;
            }
            else
            {
                fa /= 2;
            }

            b = t;
            fb = f;
        }

        return ReferenceEquals(best, from) ? null : best;
    }

    private static double[] Unit(int m, int i)
    {
        var e = new double[m];
        e[i] = 1;
        return e;
    }

    /// <summary>A visited dual point: λ, the optimal h of the mix, each (scaled) scenario's variance, g(λ) and the worst case.</summary>
    private sealed record Point(double[] Lambda, double[] H, double[] V, double G, double Worst);

    /// <summary>The dual search on the scenarios scaled by <paramref name="scale"/> (all 1 for the plain worst case).</summary>
    private sealed class Search(SampleGrid grid, IReadOnlyList<SampledCovariance> scenarios, bool rejectDrift, IOptimalSolver solver, double[] scale, int solves = 0)
    {
        public int Solves { get; private set; } = solves;

        public Point BestPrimal { get; private set; } = null!;

        public Point BestDual { get; private set; } = null!;

        public double RelativeGap => (BestPrimal.Worst - BestDual.G) / BestDual.G;

        public Point Evaluate(double[] lambda)
        {
            var mix = scenarios.Count == 1 ? scenarios[0] : CovarianceMixture.Mix(scenarios, [.. lambda.Select((l, i) => l * scale[i])]);
            var h = solver.Solve(grid, mix, rejectDrift).H;
            Solves++;
            return Record(lambda, h);
        }

        /// <summary>Records a solved point (h optimal for the scaled mix at λ).</summary>
        public Point Record(double[] lambda, double[] h)
        {
            var v = scenarios.Select((c, i) => scale[i] * c.QuadraticForm(h)).ToArray();
            var g = 0.0;
            for (var i = 0; i < v.Length; i++)
            {
                g += lambda[i] * v[i];
            }

            var p = new Point(lambda, h, v, g, v.Max());
            if (BestPrimal is null || p.Worst < BestPrimal.Worst)
            {
                BestPrimal = p;
            }

            if (BestDual is null || p.G > BestDual.G)
            {
                BestDual = p;
            }

            return p;
        }
    }
}
