using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using Scriban.Runtime;
using static CoefGen.Core.Emit.ModelBuilder;

namespace CoefGen.Core.Emit;

/// <summary>
/// The template fields of the general cycle (templates/README.md): whether the design is a classic two-window one
/// (templates then keep their reset/signal constants), the window table and the read and group counts.
/// </summary>
internal static class CycleModel
{
    public static void Add(ScriptObject g, IntegerDesign d)
    {
        Set(g, "two_window", d.Windows is null);
        Set(g, "read_count", d.ReadCount);
        Set(g, "group_count", d.GroupCount);
        Set(g, "first_sample", d.SampleIndex[0]);
        Set(g, "last_sample", d.SampleIndex[^1]);
        var windows = d.Windows ??
        [
            new Weights.GridWindow(0, d.Reset!.Count, ChargeSight.None, 0, 0),
            new Weights.GridWindow(d.Reset.Count, d.Signal!.Count, ChargeSight.Transfer, 0, 0),
        ];
        Set(g, "window_count", windows.Count);
        Set(g, "windows", windows.Select(w => Window(d, w)).ToArray());
        Set(g, "window_start", Array(windows.Select(w => d.SampleIndex[w.First]).ToArray()));
        Set(g, "window_length", Array(windows.Select(w => w.Count).ToArray()));
        Set(g, "window_first_coef", Array(windows.Select(w => w.First).ToArray()));
        Set(g, "window_group", Array(windows.Select(w => w.Group).ToArray()));
    }

    private static ScriptObject Window(IntegerDesign d, Weights.GridWindow w)
    {
        var o = new ScriptObject();
        Set(o, "start", d.SampleIndex[w.First]);
        Set(o, "count", w.Count);
        Set(o, "first_coef", w.First);
        Set(o, "group", w.Group);
        Set(o, "read", w.Read);
        Set(o, "sees", ChargeSightWords.Word(w.Sees));
        o.IsReadOnly = true;
        return o;
    }
}
