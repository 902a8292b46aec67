namespace CoefGen.Core.Readout;

/// <summary>One window of a general pixel cycle.</summary>
/// <param name="Name">Label from the readout file; repeated copies get "name#k" (k = 1, 2, ...; the first copy keeps the name).</param>
/// <param name="Samples">Sample indices inside the cycle.</param>
/// <param name="Sees">What the window sees of the charge.</param>
/// <param name="ChargeTimeS">Transfer instant (<see cref="ChargeSight.Transfer"/>) or integration start (<see cref="ChargeSight.Ramp"/>), seconds from the cycle start; 0 for <see cref="ChargeSight.None"/>.</param>
/// <param name="ResetGroup">Reset group (0 .. groups-1): windows after the same reset share one unknown offset.</param>
/// <param name="Read">Which copy of a repetition the window belongs to (0 for windows that are not repeated).</param>
public sealed record CycleWindow(string Name, SampleWindow Samples, ChargeSight Sees, double ChargeTimeS, int ResetGroup, int Read);
