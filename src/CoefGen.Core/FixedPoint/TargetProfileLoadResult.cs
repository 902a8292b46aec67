using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.FixedPoint;

/// <summary>A loaded target profile, or the problems that kept it from loading (Profile is null then).</summary>
public sealed record TargetProfileLoadResult(TargetProfile? Profile, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool Succeeded => Profile is not null;
}
