using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Readout;

public class WeightsValidationTests
{
    /// <summary>The fixture with 4-sample windows so explicit shapes stay short.</summary>
    private static string Small(string weights) =>
        With("start = 220\ncount = 160", "start = 220\ncount = 4")
            .Replace("start = 20\ncount = 160", "start = 20\ncount = 4", StringComparison.Ordinal)
        + "\n[weights]\n" + weights + "\n";

    [Fact]
    public void Explicit_shapes_of_the_right_length_load()
    {
        var d = Load(Small("window = \"explicit\"\nreset = [1, 1, 1, 1]\nsignal = [0, 1, 1, 0]")).Description!;
        Assert.Equal([0.0, 1, 1, 0], d.Weights.ExplicitSignal!);
    }

    [Fact]
    public void Explicit_window_without_a_shape_is_reported_at_the_window()
    {
        var toml = Small("window = \"explicit\"\nreset = [1, 1, 1, 1]");
        AssertOnly(Load(toml), "CG1401", "weights.signal", LineOf(toml, "window = \"explicit\""));
    }

    [Fact]
    public void Explicit_shape_of_the_wrong_length_is_reported()
    {
        var toml = Small("window = \"explicit\"\nreset = [1, 1, 1]\nsignal = [1, 1, 1, 1]");
        var d = AssertOnly(Load(toml), "CG1401", "weights.reset", LineOf(toml, "reset = [1, 1, 1]"));
        Assert.Contains("3 values", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void All_zero_explicit_shape_is_reported()
    {
        var toml = Small("window = \"explicit\"\nreset = [1, 1, 1, 1]\nsignal = [0, 0.0, 0, 0]");
        AssertOnly(Load(toml), "CG1401", "weights.signal", LineOf(toml, "signal = [0, 0.0"));
    }

    [Fact]
    public void Negative_or_non_numeric_shape_element_is_reported_at_the_element()
    {
        var toml = Small("window = \"explicit\"\nreset = [1, -1, 1, 1]\nsignal = [1, \"a\", 1, 1]");
        var result = Load(toml);
        var negative = AssertError(result, "CG1004", "weights.reset[1]", LineOf(toml, "reset ="));
        Assert.Equal(13, negative.Location.Column);
        AssertError(result, "CG1003", "weights.signal[1]", LineOf(toml, "signal ="));
    }

    [Fact]
    public void Shape_without_explicit_window_is_reported_at_the_key()
    {
        var toml = Small("window = \"hann\"\nsignal = [1, 1, 1, 1]");
        AssertOnly(Load(toml), "CG1402", "weights.signal", LineOf(toml, "signal ="));
    }

    [Fact]
    public void Shape_with_the_default_window_is_reported_too()
    {
        var toml = Small("reset = [1, 1, 1, 1]");
        AssertOnly(Load(toml), "CG1402", "weights.reset", LineOf(toml, "reset ="));
    }

    [Fact]
    public void Ramp_below_one_sample_is_out_of_range()
    {
        var toml = Small("ramp_samples = 0");
        AssertOnly(Load(toml), "CG1004", "weights.ramp_samples", LineOf(toml, "ramp_samples"));
    }

    [Fact]
    public void Reject_drift_must_be_a_boolean()
    {
        var toml = Small("reject_drift = \"yes\"");
        AssertOnly(Load(toml), "CG1003", "weights.reject_drift", LineOf(toml, "reject_drift"));
    }
}
