using System.Text.RegularExpressions;

namespace CoefGen.Core.Readout.Loading;

/// <summary>Reads every section of a parsed readout file and assembles the description when nothing is wrong.</summary>
internal static partial class DescriptionReader
{
    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_]*$", RegexOptions.CultureInvariant)]
    private static partial Regex Identifier();

    public static ReadoutDescription? Read(TomlTable document, LoadContext context, string contentSha256)
    {
        var root = new TableReader(context, document);
        root.RejectUnknown("name", "adc", "sensor", "timing", "integration", "noise", "weights", "fixed_point", "emit", "scenarios");
        var name = ReadName(root);
        var adc = AdcSectionReader.Read(root, out var rate);
        var sensor = SensorSectionReader.Read(root, out var gain);
        var isCycle = CycleSectionReader.IsCycle(root);
        var cycleInput = isCycle ? CycleSectionReader.Read(root) : null;
        var timingInput = isCycle ? null : TimingSectionReader.Read(root);
        var noise = NoiseSectionReader.Read(root, gain, out var poleGiven);
        var timing = cycleInput is not null ? CycleResolver.Resolve(cycleInput, rate, poleGiven, context)
            : timingInput is null ? null : TimingResolver.Resolve(timingInput, rate, poleGiven, context);
        if (!isCycle && root.Has("integration"))
        {
            context.Error(CycleCodes.IntegrationMismatch, root.Entry("integration")!.KeyLocation, "integration",
                "[integration] applies to ramp windows of a cycle listed with [[timing.window]]; this file has a classic reset/signal timing");
        }

        var weights = WeightsSectionReader.Read(root, timing);
        var scenarios = ScenariosSectionReader.Read(root, noise);
        RequireScenariosForRobust(root, weights, scenarios);
        var fixedPoint = FixedPointSectionReader.Read(root);
        var emit = EmitSectionReader.Read(root);
        if (context.Bag.HasErrors || name is null || adc is null || sensor is null || timing is null
            || noise is null || weights is null || fixedPoint is null || emit is null)
        {
            return null;
        }

        return new ReadoutDescription
        {
            Name = name,
            SourcePath = context.File,
            ContentSha256 = contentSha256,
            Adc = adc,
            Sensor = sensor,
            Timing = timing,
            Noise = noise,
            Weights = weights,
            FixedPoint = fixedPoint,
            Emit = emit,
            KeyLocations = context.Locations,
            Scenarios = scenarios,
        };
    }

    private static void RequireScenariosForRobust(TableReader root, WeightsSpec? weights, ScenarioSpec? scenarios)
    {
        if (weights?.Scheme == WeightScheme.Robust && scenarios is null && !root.Has("scenarios"))
        {
            var location = root.Context.Locations.GetValueOrDefault("weights.scheme", root.Context.FileOnly);
            root.Context.Error(ReadoutCodes.RobustWithoutScenarios, location, "weights.scheme",
                "scheme = \"robust\" needs noise scenarios to be robust over; add a [scenarios] section with [[scenarios.case]] entries or a [scenarios.range]");
        }
    }

    private static string? ReadName(TableReader root)
    {
        var name = root.Text("name", required: true, allowEmpty: true);
        if (name is null)
        {
            return null;
        }

        if (!Identifier().IsMatch(name))
        {
            root.Context.Error(ReadoutCodes.BadIdentifier, root.Entry("name")!.ValueLocation, "name",
                $"name = \"{name}\" is not an identifier; it prefixes emitted code, so use a letter followed by letters, digits or '_'");
            return null;
        }

        return name;
    }
}
