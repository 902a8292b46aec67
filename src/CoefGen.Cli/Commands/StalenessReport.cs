using CoefGen.Cli.Io;
using CoefGen.Core.Emit;

namespace CoefGen.Cli.Commands;

/// <summary>What `check` prints: each rendered file against the bytes in the output folder.</summary>
internal static class StalenessReport
{
    /// <summary>Prints one line per file and returns the entries; <paramref name="source"/> names what the files come from ("the readout file").</summary>
    public static IReadOnlyList<StalenessEntry> Print(IReadOnlyList<RenderedArtefact> artefacts, string dir, string source, TextWriter output)
    {
        var entries = StalenessCheck.Compare(artefacts, rel =>
        {
            var p = Path.Combine(dir, rel);
            // Only a regular file can be up to date (a FIFO would block the read, a folder cannot match).
            return FileKind.Of(p) == FileKindValue.Regular ? File.ReadAllBytes(p) : null;
        });
        foreach (var e in entries)
        {
            var word = e.Status switch
            {
                StalenessStatus.UpToDate => "up to date",
                StalenessStatus.Stale => $"STALE (differs from what {source} gives; run coefgen emit)",
                _ => "MISSING (run coefgen emit)",
            };
            output.WriteLine($"{e.RelativePath}: {word}");
        }

        return entries;
    }
}
