using CoefGen.Core.Instrument;
using CoefGen.Core.Study;
using CoefGen.Core.Tests.Pipeline;

namespace CoefGen.Core.Tests.Instrument;

/// <summary>Sweeps over every table of an instrument: parallel equals one-at-a-time, table order kept, a point equals the table's own design.</summary>
public class InstrumentSweepTests
{
    private static readonly Lazy<InstrumentDesign> TwoTables = new(() => ExampleInstrument.Design(
        ExampleInstrument.InstrumentText.Replace("base = \"cam4_base.toml\"", "base = \"cam4_base.toml\"\ntables = [\"slow/a\", \"fast/d\"]", StringComparison.Ordinal),
        ExampleInstrument.BaseText));

    private static DesignPoint Point => new("cam4_base.toml", _ => null, ShippedExamples.Catalog);

    private static SweepAxis Gain => SweepAxis.TryParse("sensor.gain=1.8,2", out _)!;

    [Fact]
    public void Tables_in_parallel_give_the_same_sweeps_in_table_order_as_each_table_swept_alone()
    {
        var design = TwoTables.Value;
        var parallel = InstrumentSweep.Run(design, Point, [Gain], maxParallelism: 2);
        Assert.Equal(2, parallel.Count);
        for (var i = 0; i < design.Tables.Count; i++)
        {
            var alone = Sweep.Run(design.Tables[i].Text, Point, [Gain], maxParallelism: 1);
            Assert.Equal(Noise(alone), Noise(parallel[i]));
        }

        // The two tables differ (slow and fast modes), so a swapped order would show.
        Assert.NotEqual(Noise(parallel[0]), Noise(parallel[1]));
    }

    [Fact]
    public void A_point_at_the_tables_own_value_equals_the_standalone_design_of_the_tables_readout_text()
    {
        // Independent reference: the table's text designed as a user file (slow/a has the base gain 2.0, channel d sets 1.8).
        var design = TwoTables.Value;
        var sweeps = InstrumentSweep.Run(design, Point, [Gain]);
        var slowA = ExampleInstrument.Standalone(design.Tables[0].Text);
        var fastD = ExampleInstrument.Standalone(design.Tables[1].Text);
        Assert.Equal(slowA.Predictions.Select(p => p.SigmaElectrons), sweeps[0].Points[1].Outcome.Schemes.Select(s => s.NoiseElectrons));
        Assert.Equal(fastD.Predictions.Select(p => p.SigmaElectrons), sweeps[1].Points[0].Outcome.Schemes.Select(s => s.NoiseElectrons));
    }

    private static double[] Noise(SweepResult r) => [.. r.Points.SelectMany(p => p.Outcome.Schemes.Select(s => s.NoiseElectrons))];
}
