using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests;

public class SmokeTests
{
    [Fact]
    public void Sample_grid_puts_reset_before_signal_with_ideal_step()
    {
        var g = SampleGrid.Create(1e6, new SampleWindow(2, 3), new SampleWindow(8, 4), 6e-6, null);
        Assert.Equal(7, g.Count);
        Assert.Equal(3, g.Windows[0].Count);
        Assert.True(g.IsSettled);
        Assert.Equal(8, g.SampleIndex[3]);
    }
}
