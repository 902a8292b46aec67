using CoefGen.Core.Diagnostics;

namespace CoefGen.Cli.Io;

/// <summary>
/// Every file one command writes, possibly into several folders (sweep's --csv and --plot): each folder gets an
/// <see cref="OutputStage"/>; <see cref="Commit"/> checks all of them before moving anything, so a run writes
/// everything or nothing. Disposing removes what was staged and not committed.
/// </summary>
internal sealed class OutputBatch : IDisposable
{
    private readonly Dictionary<string, OutputStage> _stages = new(StringComparer.Ordinal);
    private readonly List<Diagnostic> _problems = [];
    private readonly HashSet<string> _refused = new(StringComparer.Ordinal);

    /// <summary>Problems so far (a stage that could not open, a file that could not be staged).</summary>
    public IReadOnlyList<Diagnostic> Problems => _problems;

    /// <summary>The stage of <paramref name="destination"/> (opened on first use), or null after a problem.</summary>
    public OutputStage? Stage(string destination, string option)
    {
        var full = Path.GetFullPath(destination);
        if (_stages.TryGetValue(full, out var stage))
        {
            return stage;
        }

        if (_refused.Contains(full))
        {
            return null;
        }

        stage = OutputStage.Open(full, option, out var problem);
        if (stage is null)
        {
            _refused.Add(full);
            _problems.Add(problem!);
            return null;
        }

        _stages.Add(full, stage);
        return stage;
    }

    /// <summary>Stages one file of <paramref name="destination"/>; <paramref name="origin"/> locates a bad name (an option or a key).</summary>
    public void Add(string destination, string option, string relativePath, byte[] bytes, string origin)
    {
        if (Stage(destination, option) is { } stage && stage.Add(relativePath, bytes, origin) is { } problem)
        {
            _problems.Add(problem);
        }
    }

    /// <summary>Records a failure of a writer that streams into a stage's folder (an I/O exception).</summary>
    public void Fail(OutputStage stage, Exception ex) =>
        _problems.Add(Diagnostic.Error(Diagnostics.CliCodes.OutputNotWritable, SourceLocation.FileOnly(stage.Option),
            $"cannot write into '{OutputStage.Show(stage.Destination)}': {ex.Message}"));

    /// <summary>
    /// Moves everything into place, or nothing: prints the diagnostics and returns null when any file or destination
    /// has a problem. On success, every file with whether it was left unchanged (path shown relative to the working folder).
    /// </summary>
    public IReadOnlyList<(string Path, bool Unchanged)>? Commit(TextWriter error)
    {
        var problems = new List<Diagnostic>(_problems);
        var plans = problems.Count == 0 ? _stages.Values.Select(s => (Stage: s, Moves: s.Plan(problems))).ToList() : [];
        if (problems.Count > 0)
        {
            DiagnosticPrinter.PrintFailure(error, problems);
            return null;
        }

        var written = new List<(string, bool)>();
        foreach (var (stage, moves) in plans)
        {
            stage.Apply(moves);
            written.AddRange(moves.Select(m => (Path.GetRelativePath(Directory.GetCurrentDirectory(), Path.Combine(stage.Destination, m.RelativePath)), m.Unchanged)));
        }

        return written;
    }

    public void Dispose()
    {
        foreach (var stage in _stages.Values)
        {
            stage.Dispose();
        }
    }
}
