using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>The [timing] section as written, before nanoseconds become samples. Null members were missing or invalid.</summary>
internal sealed record TimingInput(
    TimeQuantity? Pixel,
    TimeQuantity? Transfer,
    TimeQuantity? ResetStart,
    TimeQuantity? ResetCount,
    TimeQuantity? SignalStart,
    TimeQuantity? SignalCount,
    StepModel? Step,
    SourceLocation StepLocation);
