using CoefGen.Core.Readout;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Readout;

public class ScenarioValidationTests
{
    private static string WithScenarios(string scenarios) => Minimal + "\n" + scenarios + "\n";

    [Fact]
    public void Cases_and_a_range_load_with_the_nominal_first_and_the_box_corners_and_edge_midpoints()
    {
        var toml = WithScenarios("""
            [scenarios]
            objective = "regret"

            [[scenarios.case]]
            name = "hot"
            "noise.source[0].flicker_corner_hz" = "200 kHz"
            "noise.front_end_pole_hz" = 1.6e6

            [scenarios.range]
            "noise.source[0].white_nv_per_rthz" = [3, 12]
            "noise.front_end_pole_hz" = ["1.5 MHz", "2.5 MHz"]
            """);
        var s = Load(toml).Description!.Scenarios!;
        Assert.Equal(RobustObjective.Regret, s.Objective);
        // nominal + 1 case + 4 corners + 4 edge midpoints (geometric, since both ends are positive)
        Assert.Equal(10, s.Cases.Count);
        Assert.Equal("nominal", s.Cases[0].Name);
        Assert.Empty(s.Cases[0].Overrides);
        Assert.Equal([new NoiseOverride("noise.source[0].flicker_corner_hz", 200e3), new NoiseOverride("noise.front_end_pole_hz", 1.6e6)], s.Cases[1].Overrides);
        var range = s.Cases.Skip(2).Select(c => c.Overrides.Select(o => o.Value).ToArray()).ToArray();
        Assert.Equal([3.0, 1.5e6], range[0]);
        Assert.Equal([3.0, Math.Sqrt(1.5e6 * 2.5e6)], range[1]);
        Assert.Equal([12.0, 2.5e6], range[^1]);
        Assert.DoesNotContain(range, v => v[0] == 6.0 && v[1] == Math.Sqrt(1.5e6 * 2.5e6)); // the centre is neither corner nor edge
    }

    [Fact]
    public void An_unknown_override_key_is_located_with_a_suggestion()
    {
        var toml = WithScenarios("[[scenarios.case]]\nname = \"x\"\n\"noise.source[0].flicker_corner\" = 5000");
        var d = AssertOnly(Load(toml), "CG1601", "scenarios.case[0].noise.source[0].flicker_corner", LineOf(toml, "\"noise.source[0].flicker_corner\""));
        Assert.Contains("did you mean 'noise.source[0].flicker_corner_hz'", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_source_index_beyond_the_sources_is_not_overridable()
    {
        var toml = WithScenarios("[[scenarios.case]]\nname = \"x\"\n\"noise.source[7].flicker_corner_hz\" = 5000");
        AssertOnly(Load(toml), "CG1601", "scenarios.case[0].noise.source[7].flicker_corner_hz", LineOf(toml, "source[7]"));
    }

    [Fact]
    public void An_override_value_obeys_the_rule_of_its_key()
    {
        var toml = WithScenarios("[[scenarios.case]]\nname = \"x\"\n\"noise.front_end_pole_hz\" = 0");
        AssertOnly(Load(toml), "CG1004", "scenarios.case[0].noise.front_end_pole_hz", LineOf(toml, "\"noise.front_end_pole_hz\" = 0"));
    }

    [Fact]
    public void A_range_must_be_low_then_high()
    {
        var toml = WithScenarios("[scenarios.range]\n\"noise.front_end_pole_hz\" = [\"3 MHz\", \"1 MHz\"]");
        AssertOnly(Load(toml), "CG1604", "scenarios.range.noise.front_end_pole_hz", LineOf(toml, "[\"3 MHz\""));
        var one = WithScenarios("[scenarios.range]\n\"noise.front_end_pole_hz\" = [1e6]");
        AssertOnly(Load(one), "CG1604", "scenarios.range.noise.front_end_pole_hz", LineOf(one, "[1e6]"));
        var kind = WithScenarios("[scenarios.range]\n\"noise.front_end_pole_hz\" = [true, \"2 MV\"]");
        AssertOnly(Load(kind), "CG1003", "scenarios.range.noise.front_end_pole_hz[0]", LineOf(kind, "[true"));
        var unit = WithScenarios("[scenarios.range]\n\"noise.front_end_pole_hz\" = [1e6, \"2 MV\"]");
        AssertOnly(Load(unit), "CG1003", "scenarios.range.noise.front_end_pole_hz[1]", LineOf(unit, "\"2 MV\""));
    }

    [Fact]
    public void Duplicate_scenario_names_and_an_empty_set_are_reported()
    {
        var dup = WithScenarios("[[scenarios.case]]\nname = \"nominal\"");
        AssertOnly(Load(dup), "CG1602", "scenarios.case[0].name", LineOf(dup, "name = \"nominal\""));
        var empty = WithScenarios("[scenarios]\ninclude_nominal = false");
        AssertOnly(Load(empty), "CG1603", "scenarios", LineOf(empty, "[scenarios]"));
    }

    [Fact]
    public void A_scenario_that_makes_the_noise_unbounded_is_reported_at_its_name()
    {
        // A file whose only source is silent needs no bandwidth limit; a scenario that gives it noise does.
        var silent = Minimal.Replace("front_end_pole_hz = \"2 MHz\"\n", "", StringComparison.Ordinal);
        var start = silent.IndexOf("white_nv_per_rthz", StringComparison.Ordinal);
        var end = silent.IndexOf('\n', start);
        silent = (silent[..start] + "white_nv_per_rthz = 0" + silent[end..]).Replace("flicker_corner_hz = \"30 kHz\"", "flicker_corner_hz = 0", StringComparison.Ordinal);
        Assert.True(Load(silent).Description is not null, string.Join("\n", Load(silent).Diagnostics));
        var toml = silent + "\n[[scenarios.case]]\nname = \"loud\"\n\"noise.source[0].white_nv_per_rthz\" = 5\n";
        AssertOnly(Load(toml), "CG1307", "scenarios.case[0].name", LineOf(toml, "name = \"loud\""));
    }

    [Fact]
    public void The_robust_scheme_needs_scenarios()
    {
        var toml = Minimal + "\n[weights]\nscheme = \"robust\"\n";
        AssertOnly(Load(toml), "CG1605", "weights.scheme", LineOf(toml, "scheme = \"robust\""));
    }

    [Fact]
    public void The_writer_spells_every_scenario_out_and_the_loader_reads_it_back()
    {
        var toml = WithScenarios("[scenarios]\nobjective = \"mean\"\n\n[scenarios.range]\n\"noise.source[0].flicker_corner_hz\" = [\"20 kHz\", \"200 kHz\"]");
        var d = Load(toml).Description!;
        var back = Load(ReadoutWriter.ToToml(d)).Description!;
        Assert.Equal(d.Scenarios!.Objective, back.Scenarios!.Objective);
        Assert.Equal(d.Scenarios.Cases.Select(c => c.Name), back.Scenarios.Cases.Select(c => c.Name));
        Assert.Equal(d.Scenarios.Cases.SelectMany(c => c.Overrides), back.Scenarios.Cases.SelectMany(c => c.Overrides));
    }
}
