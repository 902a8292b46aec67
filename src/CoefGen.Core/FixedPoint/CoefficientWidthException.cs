namespace CoefGen.Core.FixedPoint;

/// <summary>
/// No coefficient scale 2^P (P >= 0) keeps every quantised weight within the coefficient width: an input
/// problem (too few coefficient bits for these weights), which the pipeline reports as CG2032.
/// </summary>
public sealed class CoefficientWidthException(string message) : Exception(message);
