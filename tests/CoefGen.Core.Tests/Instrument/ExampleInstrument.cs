using System.Text;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Instrument;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Emit;
using CoefGen.Core.Tests.Pipeline;

namespace CoefGen.Core.Tests.Instrument;

/// <summary>The shipped example instrument examples/camera4 (4 modes x 4 channels), designed once per test run.</summary>
public static class ExampleInstrument
{
    public static string Folder => Path.Combine(RepoPaths.Root, "examples", "camera4");

    public static string BaseText => File.ReadAllText(Path.Combine(Folder, "cam4_base.toml"));

    /// <summary>Table fast/b written out by hand as a standalone readout file.</summary>
    public static string FastB => Path.Combine(RepoPaths.Root, "tests", "CoefGen.Core.Tests", "Instrument", "cam4_fast_b.toml");

    public static string InstrumentText => File.ReadAllText(Path.Combine(Folder, "cam4.toml"));

    private static readonly Lazy<InstrumentDesign> LazyDesign = new(() => Design(InstrumentText, BaseText));

    public static InstrumentDesign Shipped => LazyDesign.Value;

    /// <summary>Loads and designs an instrument from texts; fails the test on any diagnostic error.</summary>
    public static InstrumentDesign Design(string instrumentText, string baseText)
    {
        var (design, diagnostics) = TryDesign(instrumentText, baseText);
        Assert.True(design is not null, string.Join("\n", diagnostics));
        return design!;
    }

    /// <summary>The design, or null with the diagnostics (as the CLI would print them).</summary>
    public static (InstrumentDesign? Design, IReadOnlyList<Diagnostic> Diagnostics) TryDesign(string instrumentText, string baseText)
    {
        var load = InstrumentLoader.Load(Encoding.UTF8.GetBytes(instrumentText), "cam4.toml");
        if (load.Spec is null)
        {
            return (null, load.Diagnostics);
        }

        try
        {
            return (InstrumentDesigner.Design(load.Spec, Encoding.UTF8.GetBytes(baseText), "cam4_base.toml", _ => null, ShippedExamples.Catalog, frequencyCheck: false), load.Diagnostics);
        }
        catch (InputException ex)
        {
            return (null, ex.Diagnostics);
        }
    }

    /// <summary>A standalone readout text designed exactly as `coefgen design` would.</summary>
    public static DesignResult Standalone(string readoutText)
    {
        var load = ReadoutLoader.Load(Encoding.UTF8.GetBytes(readoutText), "standalone.toml", _ => null);
        Assert.True(load.Description is not null, string.Join("\n", load.Diagnostics));
        return DesignPipeline.Run(load.Description!, ShippedExamples.Catalog, frequencyCheck: false);
    }
}
