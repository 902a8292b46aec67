using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>Pixels per kind (in order of first appearance) and per datapath branch, gathered while streaming.</summary>
public sealed class VectorCounts
{
    private readonly List<string> _kindOrder = [];
    private readonly Dictionary<string, int> _kinds = [];
    private readonly Dictionary<string, int> _branches = DatapathBranch.All.ToDictionary(b => b, _ => 0);

    /// <summary>(kind, pixels) in order of first appearance.</summary>
    public IEnumerable<(string Kind, int Count)> Kinds => _kindOrder.Select(k => (k, _kinds[k]));

    /// <summary>(branch, pixels) for every branch of <see cref="DatapathBranch.All"/>, zeros included.</summary>
    public IEnumerable<(string Branch, int Count)> Branches => DatapathBranch.All.Select(b => (b, _branches[b]));

    public void Add(IntegerDesign design, GoldenPixel pixel)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(pixel);
        if (!_kinds.TryAdd(pixel.Kind, 1))
        {
            _kinds[pixel.Kind]++;
        }
        else
        {
            _kindOrder.Add(pixel.Kind);
        }

        foreach (var b in DatapathBranch.Of(design, [.. design.SampleIndex.Select(k => pixel.Codes[k])], pixel.Expected))
        {
            _branches[b]++;
        }
    }
}
