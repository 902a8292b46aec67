namespace CoefGen.Core.Emit;

/// <summary>The built-in templates shipped in templates/.</summary>
public static class BuiltinTemplates
{
    /// <summary>All built-in templates, in a fixed order.</summary>
    public static IReadOnlyList<BuiltinTemplate> All { get; } =
    [
        new("c-header", "c-header.h.scriban", "_coefs.h"),
        new("vhdl-package", "vhdl-package.vhd.scriban", "_coefs_pkg.vhd"),
        new("sv-package", "sv-package.sv.scriban", "_coefs_pkg.sv"),
        new("verilog-include", "verilog-include.vh.scriban", "_coefs.vh"),
    ];

    /// <summary>The built-in templates of the two-stage datapath (form = "two-stage"; model: <see cref="TwoStageTemplateModel"/>).</summary>
    public static IReadOnlyList<BuiltinTemplate> TwoStage { get; } =
    [
        new("two-stage-c-header", "two-stage-c-header.h.scriban", "_two_stage.h"),
        new("two-stage-vhdl-package", "two-stage-vhdl-package.vhd.scriban", "_two_stage_pkg.vhd"),
        new("two-stage-sv-package", "two-stage-sv-package.sv.scriban", "_two_stage_pkg.sv"),
        new("two-stage-verilog-include", "two-stage-verilog-include.vh.scriban", "_two_stage.vh"),
    ];

    /// <summary>Finds a built-in template (full-table or two-stage) by name (ordinal, case-sensitive); false when the name is not built in.</summary>
    public static bool TryGet(string name, out BuiltinTemplate template)
    {
        ArgumentNullException.ThrowIfNull(name);
        template = All.Concat(TwoStage).FirstOrDefault(t => t.Name == name)!;
        return template is not null;
    }

    /// <summary>True for a built-in two-stage template name.</summary>
    public static bool IsTwoStage(string name) => TwoStage.Any(t => t.Name == name);
}
