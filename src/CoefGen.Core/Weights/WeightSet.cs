using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>Real-valued weights of one scheme: the estimate is sum_k H[k] x_k over the grid samples.</summary>
/// <param name="Scheme">The scheme that produced the weights.</param>
/// <param name="Label">Human label, e.g. "weighted (trapezoid, ramp 8)".</param>
/// <param name="H">One weight per grid sample, in grid order (reset samples first).</param>
public sealed record WeightSet(WeightScheme Scheme, string Label, double[] H);
