using System.Reflection;

namespace CoefGen.Cli;

/// <summary>Tool name and version as written into provenance and JSON (no commit hash, no date: deterministic).</summary>
internal static class ToolInfo
{
    public const string Name = "coefgen";

    public static string Version { get; } =
        typeof(ToolInfo).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "0.0.0";
}
