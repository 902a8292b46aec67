using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Weights;

public class WindowShapeTests
{
    public static TheoryData<int> Counts => new() { 1, 2, 3, 4, 5, 7, 8, 16, 33, 100, 1001 };

    private static void AssertSymmetricAndPositive(double[] w)
    {
        for (var k = 0; k < w.Length; k++)
        {
            Assert.True(w[k] > 0, $"w[{k}] = {w[k]}");
            Assert.True(w[k].Equals(w[w.Length - 1 - k]), $"w[{k}] = {w[k]:R} but w[{w.Length - 1 - k}] = {w[w.Length - 1 - k]:R}");
        }
    }

    [Theory]
    [MemberData(nameof(Counts))]
    public void Triangle_is_bit_exactly_symmetric_and_positive(int n) => AssertSymmetricAndPositive(WindowShapes.Triangle(n));

    [Theory]
    [MemberData(nameof(Counts))]
    public void Hann_is_bit_exactly_symmetric_and_positive(int n) => AssertSymmetricAndPositive(WindowShapes.Hann(n));

    [Theory]
    [MemberData(nameof(Counts))]
    public void Trapezoid_is_bit_exactly_symmetric_and_positive_for_automatic_and_long_ramps(int n)
    {
        AssertSymmetricAndPositive(WindowShapes.Trapezoid(n, 0));
        AssertSymmetricAndPositive(WindowShapes.Trapezoid(n, 3));
        AssertSymmetricAndPositive(WindowShapes.Trapezoid(n, n + 5));
    }

    [Fact]
    public void Shapes_follow_their_documented_definitions()
    {
        // Definitions in WindowShapes' doc comments (our own choice, no source).
        Assert.Equal([1.0 / 3, 2.0 / 3, 1, 2.0 / 3, 1.0 / 3], WindowShapes.Triangle(5));
        Assert.Equal([0.5, 1, 1, 0.5], WindowShapes.Triangle(4));
        var hann = WindowShapes.Hann(5);
        double[] expectedHann = [0.25, 0.75, 1, 0.75, 0.25];
        for (var k = 0; k < 5; k++)
        {
            Assert.Equal(expectedHann[k], hann[k], 1e-15);
        }

        Assert.Equal([0.25, 0.5, 0.75, 1, 1, 0.75, 0.5, 0.25], WindowShapes.Trapezoid(8, 3));
        Assert.Equal(2, WindowShapes.EffectiveRamp(16, 0));
        Assert.Equal(1, WindowShapes.EffectiveRamp(7, 0));
        Assert.Equal([0.5, 1, 1, 1, 1, 1, 1, 1, 1, 0.5], WindowShapes.Trapezoid(10, 0));
    }

    [Fact]
    public void A_negative_ramp_is_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => WindowShapes.Trapezoid(8, -1));
    }
}
