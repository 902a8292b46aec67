using System.Globalization;
using CoefGen.Core.Vectors;

namespace CoefGen.Cli.Commands;

/// <summary>After a match: which datapath branches the passing run exercised (from the manifest), and which not, with the reason.</summary>
internal static class BranchCoverage
{
    public static void Print(VectorManifest manifest, TextWriter output)
    {
        if (manifest.Branches.Count == 0)
        {
            return;
        }

        var hit = manifest.Branches.Where(b => b.Count > 0).Select(b => string.Create(CultureInfo.InvariantCulture, $"{b.Branch} {b.Count}"));
        output.WriteLine("branches exercised (pixels): " + string.Join(", ", hit));
        var missed = manifest.Branches.Where(b => b.Count == 0).Select(b => b.Branch).ToList();
        if (missed.Count > 0)
        {
            output.WriteLine("not exercised: " + string.Join(", ", missed));
        }

        foreach (var (target, reason) in manifest.UnreachedBranches)
        {
            output.WriteLine($"  unreachable {target}: {reason}");
        }
    }
}
