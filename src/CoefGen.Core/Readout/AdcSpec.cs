namespace CoefGen.Core.Readout;

/// <summary>The digitiser of one channel.</summary>
/// <param name="RateHz">Sample rate; sample k is taken at t_k = k / RateHz from the start of the pixel cycle.</param>
/// <param name="Bits">Resolution in bits (2..32).</param>
/// <param name="FullScaleV">Peak-to-peak input span in volts; one LSB is FullScaleV / 2^Bits.</param>
/// <param name="Coding">Code format at the ADC output.</param>
/// <param name="NoiseLsb">The ADC's own input-referred noise in LSB rms, on top of quantisation.</param>
public sealed record AdcSpec(double RateHz, int Bits, double FullScaleV, AdcCoding Coding, double NoiseLsb)
{
    /// <summary>One code step in volts.</summary>
    public double LsbV => FullScaleV / Math.Pow(2, Bits);

    /// <summary>Sample period in seconds.</summary>
    public double PeriodS => 1.0 / RateHz;

    /// <summary>Smallest code as a signed value seen by the MAC.</summary>
    public long MinCode => -(1L << (Bits - 1));

    /// <summary>Largest code as a signed value seen by the MAC.</summary>
    public long MaxCode => (1L << (Bits - 1)) - 1;

    /// <summary>White per-sample digital variance in V^2: quantisation LSB^2/12 plus the ADC's own noise.</summary>
    public double DigitalVarianceV2 => LsbV * LsbV * (1.0 / 12.0 + NoiseLsb * NoiseLsb);
}
