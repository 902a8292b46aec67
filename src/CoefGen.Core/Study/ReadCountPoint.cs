using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Study;

/// <summary>One read count of <see cref="ReadCountStudy"/>: the design of the cycle with <paramref name="Reads"/> reads.</summary>
/// <param name="Reads">N.</param>
/// <param name="PixelSamples">The pixel cycle of that design, in samples.</param>
/// <param name="Schemes">Read noise of every scheme (empty when the point is not a valid design).</param>
/// <param name="TwoStageElectrons">Read noise of the two-stage form (per-read table x read weights), or null where it does not apply.</param>
/// <param name="Problem">Why the point is not a valid design; null when it is.</param>
public sealed record ReadCountPoint(int Reads, int PixelSamples, IReadOnlyList<SchemeNoise> Schemes, double? TwoStageElectrons, Diagnostic? Problem)
{
    public bool Valid => Problem is null;
}
