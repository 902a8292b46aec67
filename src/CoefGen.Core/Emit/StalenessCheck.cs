namespace CoefGen.Core.Emit;

/// <summary>The comparison behind <c>check</c>: fresh renderings against the bytes on disk.</summary>
public static class StalenessCheck
{
    /// <summary>
    /// Compares each artefact's bytes with <paramref name="readExisting"/>(relative path), which returns
    /// null when the file does not exist. Byte comparison, so a changed line ending or BOM counts as stale.
    /// </summary>
    public static IReadOnlyList<StalenessEntry> Compare(IReadOnlyList<RenderedArtefact> rendered, Func<string, byte[]?> readExisting)
    {
        ArgumentNullException.ThrowIfNull(rendered);
        ArgumentNullException.ThrowIfNull(readExisting);
        var result = new List<StalenessEntry>(rendered.Count);
        foreach (var artefact in rendered)
        {
            var existing = readExisting(artefact.RelativePath);
            var status = existing is null ? StalenessStatus.Missing
                : existing.AsSpan().SequenceEqual(artefact.ToBytes()) ? StalenessStatus.UpToDate
                : StalenessStatus.Stale;
            result.Add(new StalenessEntry(artefact.RelativePath, status));
        }

        return result;
    }

    /// <summary>True when every entry is up to date.</summary>
    public static bool AllUpToDate(IReadOnlyList<StalenessEntry> entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        return entries.All(e => e.Status == StalenessStatus.UpToDate);
    }
}
