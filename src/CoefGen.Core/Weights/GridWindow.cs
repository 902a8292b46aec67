using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>One window of the cycle as a run of grid entries: entries First .. First+Count-1 of the sample grid.</summary>
/// <param name="First">Grid index of the window's first sample.</param>
/// <param name="Count">Samples in the window.</param>
/// <param name="Sees">What the window sees of the charge.</param>
/// <param name="Group">Reset group.</param>
/// <param name="Read">Copy of the repetition the window belongs to (0 when not repeated).</param>
public sealed record GridWindow(int First, int Count, ChargeSight Sees, int Group, int Read);
