using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Instrument;

/// <summary>Every table of an instrument designed for one datapath: shared settings, the tables in index order, the shared proof.</summary>
public sealed record InstrumentDesign
{
    public required InstrumentSpec Spec { get; init; }

    /// <summary>The base readout file's path (as read) and the SHA-256 of its bytes.</summary>
    public required string BasePath { get; init; }

    public required string BaseSha256 { get; init; }

    /// <summary>The one set of fixed-point settings every table is designed for.</summary>
    public required FixedPointSettings Settings { get; init; }

    /// <summary>Output fraction bits shared by every table.</summary>
    public required int OutputFracBits { get; init; }

    public required IReadOnlyList<InstrumentTable> Tables { get; init; }

    /// <summary>Per proof check: the widest need over the tables.</summary>
    public required IReadOnlyList<SharedWidth> Widths { get; init; }

    public required IReadOnlyList<Diagnostic> Warnings { get; init; }

    /// <summary>True when every table's width proof holds on the shared datapath.</summary>
    public bool Safe => Tables.All(t => t.Result.Datapath.Proof.Safe);

    /// <summary>The longest table (coefficients); combined templates pad to it.</summary>
    public int MaxCoefficientCount => Tables.Max(t => t.Result.Datapath.Coefficients.Count);
}
