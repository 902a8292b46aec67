namespace CoefGen.Core.Readout;

/// <summary>A run of consecutive samples inside the pixel cycle: indices Start .. Start+Count-1.</summary>
public sealed record SampleWindow(int Start, int Count)
{
    /// <summary>One past the last sample index.</summary>
    public int End => Start + Count;

    public bool Contains(int sample) => sample >= Start && sample < End;

    public bool Overlaps(SampleWindow other) => Start < other.End && other.Start < End;
}
