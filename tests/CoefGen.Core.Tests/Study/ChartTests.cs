using CoefGen.Core.Study;

namespace CoefGen.Core.Tests.Study;

public class ChartTests
{
    [Fact]
    public void Log_ticks_are_1_2_5_over_few_decades_and_decades_over_many()
    {
        Assert.Equal([1, 2, 5, 10, 20, 50, 100, 200, 500], ChartTicks.Log(1, 500));
        Assert.Equal([1e3, 1e4, 1e5, 1e6, 1e7], ChartTicks.Log(1e3, 4e7));
        Assert.Equal([-18, -15, -12, -9, -6, -3, 0], ChartTicks.Log(1e-20, 1).Select(t => (int)Math.Round(Math.Log10(t))));
        Assert.Equal(["1 kHz", "10 kHz", "100 kHz", "1 MHz", "10 MHz"], ChartTicks.Log(1e3, 4e7).Select(t => ChartTicks.Label(t, "Hz")));
        Assert.Equal("1 x 10^-5", ChartTicks.Label(1e-5, null));
        Assert.Equal([0, 0.2, 0.4, 0.6, 0.8, 1], ChartTicks.Linear(0, 1).Select(t => Math.Round(t, 12)));
    }

    [Fact]
    public void A_chart_ends_its_axis_at_the_given_maximum_and_draws_every_series_with_its_own_style()
    {
        var svg = new SvgLineChart
        {
            Title = "t",
            XLabel = "frequency",
            XUnit = "Hz",
            YLabel = "y",
            XLog = true,
            YLog = true,
            XMax = 4e7,
            Series = [new ChartSeries("a", [1e3, 4e7, 1e8], [1, 2, 3], Style: ChartPalette.Schemes[0]), new ChartSeries("b", [1e3, 4e7], [1, 2], Style: ChartPalette.Schemes[2])],
        }.Render();
        Assert.Contains("<title>t</title>", svg, StringComparison.Ordinal);
        Assert.Contains("<desc>", svg, StringComparison.Ordinal);
        Assert.Contains($"stroke-dasharray=\"{ChartPalette.Schemes[0].Dash}\"", svg, StringComparison.Ordinal);
        Assert.DoesNotContain("100 MHz", svg, StringComparison.Ordinal); // the point past the maximum is left out, no tick there
        Assert.DoesNotContain("E+", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_palette_entry_has_its_own_dash_pattern()
    {
        var all = ChartPalette.Schemes.Concat(ChartPalette.Sources).Append(ChartPalette.Total).Append(ChartPalette.Digital).Append(ChartPalette.Model).Append(ChartPalette.AdcNoise).Append(ChartPalette.Reference).Append(ChartPalette.TwoStage).ToList();
        Assert.Equal(all.Count, all.Select(s => s.Dash).Distinct().Count() + 1); // the optimal scheme and the total are both solid, never in one chart
        Assert.Equal(all.Count, all.Select(s => s.Colour).Distinct().Count());
    }

    /// <summary>
    /// The palette stays apart under colour vision deficiency: smallest CIELAB (1976) distance between any two colours
    /// drawn together, under normal vision and the severity-1 protanopia, deuteranopia and tritanopia matrices of
    /// Machado, Oliveira and Fernandes (2009), applied in linear sRGB.
    /// </summary>
    [Fact]
    public void The_palette_is_distinguishable_under_simulated_colour_vision_deficiency()
    {
        var schemes = ChartPalette.Schemes.Select(s => s.Colour).ToList();
        var sources = ChartPalette.Sources.Select(s => s.Colour).Append(ChartPalette.Total.Colour).Append(ChartPalette.Digital.Colour).ToList();
        Assert.True(ColourVision.MinDistance(schemes) >= 20, $"schemes {ColourVision.MinDistance(schemes)}");
        Assert.True(ColourVision.MinDistance(sources) >= 25, $"sources {ColourVision.MinDistance(sources)}");
        Assert.True(ColourVision.MinDistance([ChartPalette.Total.Colour, ChartPalette.Model.Colour]) >= 20);
        // The two-stage form is drawn with the schemes and the reference law (read noise against read count).
        Assert.True(ColourVision.MinDistance([.. schemes, ChartPalette.TwoStage.Colour]) >= 20);
        Assert.True(ColourVision.MinDistance([ChartPalette.TwoStage.Colour, ChartPalette.Reference.Colour]) >= 20);
        foreach (var c in schemes.Concat(sources).Append(ChartPalette.TwoStage.Colour))
        {
            Assert.True(ColourVision.MinDistance([c, "#ffffff"]) >= 30, $"{c} too close to the white background");
        }

        // Negative control: a red and a green of equal lightness collapse for deuteranopia.
        Assert.True(ColourVision.MinDistance(["#d03030", "#5a8a00"]) < 20);
    }
}
