using CoefGen.Core.Emit;

namespace CoefGen.Core.Instrument;

/// <summary>The built-in combined templates: one file holding every table of an instrument (packages, and reference datapaths that switch tables at run time).</summary>
public static class InstrumentTemplates
{
    public static IReadOnlyList<BuiltinTemplate> All { get; } =
    [
        new("instrument-c-header", "instrument-c-header.h.scriban", "_tables.h"),
        new("instrument-vhdl-package", "instrument-vhdl-package.vhd.scriban", "_tables_pkg.vhd"),
        new("instrument-sv-package", "instrument-sv-package.sv.scriban", "_tables_pkg.sv"),
        new("instrument-sv-datapath", "instrument-sv-datapath.sv.scriban", "_tables_datapath.sv"),
        new("instrument-vhdl-datapath", "instrument-vhdl-datapath.vhd.scriban", "_tables_datapath.vhd"),
    ];

    public static bool TryGet(string name, out BuiltinTemplate template)
    {
        ArgumentNullException.ThrowIfNull(name);
        template = All.FirstOrDefault(t => t.Name == name)!;
        return template is not null;
    }
}
