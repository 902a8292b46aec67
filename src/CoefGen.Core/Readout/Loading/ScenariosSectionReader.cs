using CoefGen.Core.Diagnostics;
using System.Globalization;
using Tomlyn.Syntax;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// Reads [scenarios]: named noise variants ([[scenarios.case]], every key but name is a dotted noise key and
/// its value) and ranges ([scenarios.range], a dotted noise key = [low, high]) sampled at the corners and the
/// edge midpoints of their box. Values are checked with the same rule as the key itself in [noise].
/// </summary>
internal static class ScenariosSectionReader
{
    /// <summary>Most scenarios one file may name (each costs one optimal solve per robust iteration).</summary>
    public const int MaxCases = 64;

    /// <summary>Most keys one range box may vary (4 keys: 16 corners and 32 edge midpoints).</summary>
    public const int MaxRangeKeys = 4;

    /// <summary>The name of the scenario that is the file's own noise.</summary>
    public const string NominalName = "nominal";

    private static readonly (string, RobustObjective)[] Objectives = [("worst-case", RobustObjective.WorstCase), ("regret", RobustObjective.Regret), ("mean", RobustObjective.Mean)];

    public static ScenarioSpec? Read(TableReader root, NoiseSpec? noise)
    {
        var section = root.Section("scenarios", required: false);
        if (section is null)
        {
            return null;
        }

        var context = root.Context;
        var errorsBefore = context.ErrorCount;
        section.RejectUnknown("objective", "include_nominal", "case", "range");
        var objective = section.Choice("objective", Objectives);
        var includeNominal = section.Flag("include_nominal");
        var sourceCount = noise?.Sources.Count ?? 0;
        var cases = new List<(NoiseScenario Scenario, SourceLocation Location, string Path)>();
        if (includeNominal ?? true)
        {
            cases.Add((new NoiseScenario(NominalName, []), section.Location, section.Path));
        }

        foreach (var table in section.SectionArray("case"))
        {
            var name = table.Text("name", required: true);
            var overrides = new List<NoiseOverride>();
            foreach (var key in table.Keys.Where(k => k != "name"))
            {
                var rule = RuleFor(table, key, sourceCount, noise is null);
                if (rule is not null && table.Quantity(key, required: true, rule) is double v)
                {
                    overrides.Add(new NoiseOverride(key, v));
                }
            }

            if (name is not null)
            {
                cases.Add((new NoiseScenario(name, overrides), table.Entry("name")!.ValueLocation, table.KeyPath("name")));
            }
        }

        var range = section.Section("range", required: false);
        if (range is not null)
        {
            cases.AddRange(RangeCases(range, sourceCount, noise is null));
        }

        CheckNames(context, cases);
        if (noise is not null)
        {
            CheckBounded(context, noise, cases);
        }

        if (context.ErrorCount == errorsBefore && (cases.Count == 0 || cases.Count > MaxCases))
        {
            context.Error(ReadoutCodes.ScenarioCount, section.Location, section.Path,
                $"[scenarios] gives {cases.Count.ToString(CultureInfo.InvariantCulture)} scenarios; give between 1 and {MaxCases.ToString(CultureInfo.InvariantCulture)} (the nominal noise counts unless include_nominal = false)");
        }

        return context.ErrorCount > errorsBefore || noise is null
            ? null
            : new ScenarioSpec(objective ?? RobustObjective.WorstCase, [.. cases.Select(c => c.Scenario)]);
    }

    /// <summary>The rule of an overridable key (as in [noise]), or null after a located error.</summary>
    private static NumberRule? RuleFor(TableReader table, string key, int sourceCount, bool noiseInvalid)
    {
        var zeroAllowed = NoiseOverrides.ZeroAllowed(key, sourceCount);
        if (zeroAllowed is null)
        {
            if (!noiseInvalid)
            {
                var allowed = NoiseOverrides.AllowedKeys(sourceCount);
                var suggestion = DidYouMean.Suggest(key, allowed);
                var hint = suggestion is null ? "" : $" (did you mean '{suggestion}'?)";
                table.Context.Error(ReadoutCodes.ScenarioKey, table.Entry(key)!.KeyLocation, table.KeyPath(key),
                    $"'{key}' is not a noise key a scenario can override{hint}; allowed: {string.Join(", ", allowed)}");
            }

            return null;
        }

        return zeroAllowed.Value ? NumberRule.NonNegative : NumberRule.Positive;
    }

    /// <summary>The corners (2^k) and edge midpoints (k 2^(k-1)) of the box, in lexicographic order low, middle, high per key.</summary>
    private static List<(NoiseScenario, SourceLocation, string)> RangeCases(TableReader range, int sourceCount, bool noiseInvalid)
    {
        var context = range.Context;
        var axes = new List<(string Key, double[] Levels)>();
        foreach (var key in range.Keys)
        {
            var rule = RuleFor(range, key, sourceCount, noiseInvalid);
            if (rule is not null && Bounds(range, key, rule) is { } b)
            {
                var middle = b.Low > 0 ? Math.Sqrt(b.Low * b.High) : 0.5 * (b.Low + b.High);
                axes.Add((key, [b.Low, middle, b.High]));
            }
        }

        if (range.Keys.Count > MaxRangeKeys)
        {
            context.Error(ReadoutCodes.ScenarioCount, range.Location, range.Path,
                $"[scenarios.range] varies {range.Keys.Count.ToString(CultureInfo.InvariantCulture)} keys; at most {MaxRangeKeys.ToString(CultureInfo.InvariantCulture)} (the box has 2^k corners and k 2^(k-1) edge midpoints)");
            return [];
        }

        if (range.Keys.Count == 0)
        {
            context.Error(ReadoutCodes.ScenarioCount, range.Location, range.Path,
                "[scenarios.range] is empty; give a noise key = [low, high], e.g. \"noise.source[0].flicker_corner_hz\" = [\"20 kHz\", \"200 kHz\"]");
            return [];
        }

        var result = new List<(NoiseScenario, SourceLocation, string)>();
        if (axes.Count != range.Keys.Count)
        {
            return result;
        }

        var total = (int)Math.Pow(3, axes.Count);
        for (var code = 0; code < total; code++)
        {
            var levels = new int[axes.Count];
            var rest = code;
            for (var a = axes.Count - 1; a >= 0; a--)
            {
                levels[a] = rest % 3;
                rest /= 3;
            }

            if (levels.Count(l => l == 1) > 1 || (axes.Count > 1 && levels.All(l => l == 1)))
            {
                continue; // neither a corner nor an edge midpoint
            }

            var overrides = axes.Select((a, i) => new NoiseOverride(a.Key, a.Levels[levels[i]])).ToArray();
            var name = string.Join(", ", overrides.Select(o => $"{ShortKey(o.Key)}={Round6(o.Value).ToString("R", CultureInfo.InvariantCulture)}"));
            result.Add((new NoiseScenario(name, overrides), range.Location, range.Path));
        }

        return result;
    }

    private static (double Low, double High)? Bounds(TableReader range, string key, NumberRule rule)
    {
        var context = range.Context;
        var entry = range.Entry(key)!;
        var unit = KeyUnit.ForKey(key);
        if (entry.Value is not ArraySyntax array || array.Items.ChildrenCount != 2)
        {
            context.Error(ReadoutCodes.ScenarioRange, entry.ValueLocation, entry.Path,
                $"'{key}' in [scenarios.range] must be [low, high]: two numbers or SI strings such as [\"20 k{unit.Canonical}\", \"200 k{unit.Canonical}\"]");
            return null;
        }

        var values = new double[2];
        var index = 0;
        foreach (var item in array.Items)
        {
            var location = TomlTreeBuilder.Locate(item.Value ?? (SyntaxNode)item, context.File);
            string? reason = QuantitySyntax.TryRead(item.Value, unit, out var value, out var why) switch
            {
                true => null,
                false => why,
                null => $"element {index.ToString(CultureInfo.InvariantCulture)} of '{key}' is not a number or an SI string",
            };
            var code = ReadoutCodes.WrongType;
            if (reason is null && (!double.IsFinite(value) || !rule.Accepts(value)))
            {
                code = ReadoutCodes.OutOfRange;
                reason = $"element {index.ToString(CultureInfo.InvariantCulture)} of '{key}' = {ValueReader.Format(value)} is not allowed; expected {rule.Allowed}";
            }

            if (reason is not null)
            {
                context.Error(code, location, $"{entry.Path}[{index.ToString(CultureInfo.InvariantCulture)}]", reason);
                return null;
            }

            values[index++] = value;
        }

        if (!(values[0] <= values[1]))
        {
            context.Error(ReadoutCodes.ScenarioRange, entry.ValueLocation, entry.Path,
                $"'{key}' in [scenarios.range] is [{ValueReader.Format(values[0])}, {ValueReader.Format(values[1])}]; the low end must not be above the high end");
            return null;
        }

        return (values[0], values[1]);
    }

    /// <summary>Six significant digits, written in full ("2449490", not "2.44949E+06") for scenario names.</summary>
    private static double Round6(double v) =>
        v == 0 ? 0 : double.Parse(v.ToString("G6", CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture);

    private static string ShortKey(string key) => key.StartsWith("noise.", StringComparison.Ordinal) ? key["noise.".Length..] : key;

    /// <summary>A scenario may not give a source white or 1/f noise when nothing limits the bandwidth (as in [noise]).</summary>
    private static void CheckBounded(LoadContext context, NoiseSpec noise, List<(NoiseScenario Scenario, SourceLocation Location, string Path)> cases)
    {
        foreach (var (scenario, location, path) in cases)
        {
            var n = NoiseOverrides.Apply(noise, scenario.Overrides);
            if (n.FrontEndPoleHz is null && n.BandwidthHz is null && n.Sources.Any(s => s.WhiteNvPerRtHz > 0 || s.FlickerCornerHz > 0))
            {
                context.Error(ReadoutCodes.UnboundedNoise, location, path,
                    $"scenario \"{scenario.Name}\" gives a source white or 1/f noise but nothing limits its bandwidth, so its variance is infinite; override noise.front_end_pole_hz or noise.bandwidth_hz too");
            }
        }
    }

    private static void CheckNames(LoadContext context, List<(NoiseScenario Scenario, SourceLocation Location, string Path)> cases)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (scenario, location, path) in cases)
        {
            if (!seen.Add(scenario.Name))
            {
                context.Error(ReadoutCodes.DuplicateScenarioName, location, path,
                    $"a scenario named \"{scenario.Name}\" is already defined; scenario names must be unique (\"{NominalName}\" is the file's own noise unless include_nominal = false)");
            }
        }
    }
}
