namespace CoefGen.Core.Readout;

/// <summary>Where a noise density is referred: at the sensor output (scaled by the chain gain) or at the ADC input.</summary>
public enum NoiseReference
{
    Sensor,
    Adc,
}
