namespace CoefGen.Core.Readout;

/// <summary>
/// A measured one-sided noise spectrum, referred to the ADC input, as read from a CSV table.
/// S is interpolated piecewise-linearly in f between points; below the first point it is held flat
/// down to 0 Hz; above the last point it falls as f^-2 (a single-pole roll-off).
/// </summary>
/// <param name="Name">Label in the noise budget (the file name).</param>
/// <param name="FrequencyHz">Strictly increasing, at least two points, first &gt;= 0.</param>
/// <param name="DensityV2PerHz">One-sided power density S(f) in V^2/Hz at the ADC input, non-negative.</param>
public sealed record PsdTable(string Name, IReadOnlyList<double> FrequencyHz, IReadOnlyList<double> DensityV2PerHz);
