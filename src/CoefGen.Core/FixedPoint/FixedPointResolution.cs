using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.FixedPoint;

/// <summary>Resolved settings, or the located problems that prevent them (Settings is null then).</summary>
public sealed record FixedPointResolution(FixedPointSettings? Settings, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool Succeeded => Settings is not null;
}
