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

    /// <summary>Finds a built-in template by name (ordinal, case-sensitive); false when the name is not built in.</summary>
    public static bool TryGet(string name, out BuiltinTemplate template)
    {
        ArgumentNullException.ThrowIfNull(name);
        template = All.FirstOrDefault(t => t.Name == name)!;
        return template is not null;
    }
}
