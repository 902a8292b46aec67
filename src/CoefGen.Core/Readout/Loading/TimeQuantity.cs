using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>A timing value as written: in samples, or in nanoseconds (then converted at the ADC clock).</summary>
/// <param name="Path">Dotted key as written, e.g. "timing.reset.start_ns".</param>
/// <param name="Location">Where the value was written.</param>
/// <param name="Value">Samples, or nanoseconds when <paramref name="IsNs"/>.</param>
/// <param name="IsNs">True for the _ns spelling of the key.</param>
internal sealed record TimeQuantity(string Path, SourceLocation Location, double Value, bool IsNs);
