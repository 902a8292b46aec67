namespace CoefGen.Core.Capture;

/// <summary>Turns capture codes into noise samples in volts at the ADC input.</summary>
public static class CaptureSamples
{
    /// <summary>
    /// The capture as one noise record in volts: for pixel cycles, the mean waveform of each sample
    /// position removed and the result scaled by sqrt(P / (P - 1)) (removing a mean estimated from P
    /// cycles takes 1/P of the variance away); for a stream, the overall mean removed. Pixel cycles are
    /// taken to be consecutive in time, so the record is continuous.
    /// </summary>
    public static double[] ResidualStream(SampleCapture capture, double lsbV)
    {
        ArgumentNullException.ThrowIfNull(capture);
        var rows = capture.Rows;
        var cycle = capture.CycleLength;
        var mean = MeanWaveform(capture, Enumerable.Range(0, rows).ToArray());
        if (capture.Layout == CaptureLayout.Stream)
        {
            mean = [mean.Average()];
        }

        var scale = capture.Layout == CaptureLayout.PixelSynchronous ? Math.Sqrt(rows / (rows - 1.0)) : 1.0;
        var x = new double[capture.SampleCount];
        for (var r = 0; r < rows; r++)
        {
            for (var c = 0; c < cycle; c++)
            {
                x[(r * cycle) + c] = (capture.At(r, c) - mean[c]) * lsbV * scale;
            }
        }

        return x;
    }

    /// <summary>Mean code of each sample position over the given cycles.</summary>
    public static double[] MeanWaveform(SampleCapture capture, IReadOnlyList<int> rows)
    {
        ArgumentNullException.ThrowIfNull(capture);
        ArgumentNullException.ThrowIfNull(rows);
        var mean = new double[capture.CycleLength];
        foreach (var r in rows)
        {
            for (var c = 0; c < capture.CycleLength; c++)
            {
                mean[c] += capture.At(r, c);
            }
        }

        for (var c = 0; c < mean.Length; c++)
        {
            mean[c] /= rows.Count;
        }

        return mean;
    }
}
