namespace CoefGen.Core.Capture;

/// <summary>How the samples of a capture are arranged in time.</summary>
public enum CaptureLayout
{
    /// <summary>Consecutive pixel cycles; each row holds the codes of one cycle, sample 0 first.</summary>
    PixelSynchronous,

    /// <summary>One continuous run of idle samples at the ADC rate.</summary>
    Stream,
}
