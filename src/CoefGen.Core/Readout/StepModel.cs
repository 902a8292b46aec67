namespace CoefGen.Core.Readout;

/// <summary>How the video level moves after the charge transfer (the step response s_k).</summary>
public enum StepModel
{
    /// <summary>s = 0 before the transfer instant, 1 after (no settling).</summary>
    Ideal,

    /// <summary>s(t) = 1 - exp(-2 pi f_p (t - t_transfer)) after the transfer, from the front-end pole.</summary>
    Pole,
}
