namespace CoefGen.Core.Capture;

/// <summary>A narrow line standing above the fitted model (left out of the fit).</summary>
/// <param name="FrequencyHz">Bin with the largest excess.</param>
/// <param name="RmsV">sqrt of the excess power integrated over the masked bins, V rms at the ADC.</param>
/// <param name="Bins">Masked bins (including the guard bins either side).</param>
public sealed record InterferenceLine(double FrequencyHz, double RmsV, int Bins);
