namespace CoefGen.Core.Readout;

/// <summary>The sensor's output stage and the analog chain up to the ADC.</summary>
/// <param name="ConversionGainUvPerE">Sense-node conversion gain in microvolts per electron, at the sensor output.</param>
/// <param name="Gain">Voltage gain from the sensor output to the ADC input (V/V, positive: the loader refuses a negative gain, see README).</param>
public sealed record SensorSpec(double ConversionGainUvPerE, double Gain)
{
    /// <summary>Volts at the ADC input per electron at the sense node.</summary>
    public double VoltsAtAdcPerElectron => Math.Abs(Gain) * ConversionGainUvPerE * 1e-6;
}
