using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// The target profiles available to a run, built from (name, content) pairs the caller read
/// (Core lists no directories). A profile that fails to load is left out and its diagnostics kept.
/// </summary>
public sealed class TargetCatalog
{
    /// <summary>Target used when the readout names none.</summary>
    public const string DefaultTargetName = "dsp18x27-acc48";

    private readonly SortedDictionary<string, TargetProfile> _profiles;

    private TargetCatalog(SortedDictionary<string, TargetProfile> profiles, IReadOnlyList<Diagnostic> diagnostics)
    {
        _profiles = profiles;
        Diagnostics = diagnostics;
    }

    /// <summary>Profile names in ordinal order.</summary>
    public IReadOnlyList<string> Names => [.. _profiles.Keys];

    /// <summary>Problems found while loading the profiles.</summary>
    public IReadOnlyList<Diagnostic> Diagnostics { get; }

    /// <summary>Loads each file. <paramref name="files"/>: (name without ".toml", bytes, path for messages).</summary>
    public static TargetCatalog Create(IEnumerable<(string Name, byte[] Content, string SourcePath)> files)
    {
        ArgumentNullException.ThrowIfNull(files);
        var profiles = new SortedDictionary<string, TargetProfile>(StringComparer.Ordinal);
        var bag = new DiagnosticBag();
        foreach (var (name, content, path) in files.OrderBy(f => f.Name, StringComparer.Ordinal))
        {
            var result = TargetProfileLoader.Load(content, path);
            bag.AddRange(result.Diagnostics);
            if (result.Profile is not { } p)
            {
                continue;
            }

            if (!string.Equals(p.Name, name, StringComparison.Ordinal))
            {
                bag.Error(FixedPointCodes.ProfileNameMismatch, SourceLocation.FileOnly(path), $"profile name '{p.Name}' differs from its file name '{name}'", "name");
            }
            else if (!profiles.TryAdd(name, p))
            {
                bag.Error(FixedPointCodes.ProfileNameMismatch, SourceLocation.FileOnly(path), $"a profile named '{name}' is already loaded", "name");
            }
        }

        return new TargetCatalog(profiles, bag.Items);
    }

    /// <summary>Convenience for (name, content) pairs; the path in messages is "targets/NAME.toml".</summary>
    public static TargetCatalog Create(IEnumerable<(string Name, byte[] Content)> files)
    {
        ArgumentNullException.ThrowIfNull(files);
        return Create(files.Select(f => (f.Name, f.Content, $"targets/{f.Name}.toml")));
    }

    public bool TryGet(string name, out TargetProfile profile)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (_profiles.TryGetValue(name, out var p))
        {
            profile = p;
            return true;
        }

        profile = null!;
        return false;
    }

    /// <summary>Known names closest to <paramref name="name"/> (edit distance), best first, at most three.</summary>
    public IReadOnlyList<string> Suggest(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        return [.. _profiles.Keys
            .Select(k => (k, d: EditDistance(name, k)))
            .Where(p => p.d <= Math.Max(3, name.Length / 3))
            .OrderBy(p => p.d).ThenBy(p => p.k, StringComparer.Ordinal)
            .Take(3).Select(p => p.k)];
    }

    private static int EditDistance(string a, string b)
    {
        var prev = new int[b.Length + 1];
        var cur = new int[b.Length + 1];
        for (var j = 0; j <= b.Length; j++)
        {
            prev[j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            cur[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = a[i - 1] == b[j - 1] ? 0 : 1;
                cur[j] = Math.Min(Math.Min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }

            (prev, cur) = (cur, prev);
        }

        return prev[b.Length];
    }
}
