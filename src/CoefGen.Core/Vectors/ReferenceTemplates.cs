namespace CoefGen.Core.Vectors;

/// <summary>
/// The reference datapath and testbench templates in templates/, rendered next to the vectors. The VHDL
/// datapath uses the emitted vhdl-package, the Verilog one the verilog-include, the C bench the c-header; the SV
/// package is written beside them for SystemVerilog users.
/// </summary>
public static class ReferenceTemplates
{
    /// <summary>Built-in coefficient templates the reference files include.</summary>
    public static IReadOnlyList<string> Packages { get; } = ["vhdl-package", "verilog-include", "c-header", "sv-package"];

    /// <summary>(template file in templates/, output suffix after the prefix).</summary>
    public static IReadOnlyList<(string FileName, string OutputSuffix)> Files { get; } =
    [
        ("ref-datapath.vhd.scriban", "_datapath.vhd"),
        ("ref-tb.vhd.scriban", "_tb.vhd"),
        ("ref-datapath.v.scriban", "_datapath.v"),
        ("ref-tb.v.scriban", "_tb.v"),
        ("ref-tb.c.scriban", "_tb.c"),
        ("ref-pipeline.v.scriban", "_pipeline.v"),
        ("ref-pipeline-tb.v.scriban", "_pipeline_tb.v"),
        ("ref-pipeline.vhd.scriban", "_pipeline.vhd"),
        ("ref-pipeline-tb.vhd.scriban", "_pipeline_tb.vhd"),
        ("ref-coefs.hex.scriban", "_coefs.hex"),
    ];

    /// <summary>With form = "two-stage": the two-stage packages (the Verilog datapath includes the Verilog one).</summary>
    public static IReadOnlyList<string> TwoStagePackages { get; } = ["two-stage-verilog-include", "two-stage-c-header", "two-stage-vhdl-package", "two-stage-sv-package"];

    /// <summary>With form = "two-stage": the two-stage Verilog and VHDL datapaths and the (shared) self-checking testbenches.</summary>
    public static IReadOnlyList<(string FileName, string OutputSuffix)> TwoStageFiles { get; } =
    [
        ("ref-two-stage-datapath.v.scriban", "_datapath.v"),
        ("ref-tb.v.scriban", "_tb.v"),
        ("ref-two-stage-datapath.vhd.scriban", "_datapath.vhd"),
        ("ref-tb.vhd.scriban", "_tb.vhd"),
    ];
}
