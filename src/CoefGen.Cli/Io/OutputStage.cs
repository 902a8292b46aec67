using System.Text;
using CoefGen.Cli.Diagnostics;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Cli.Io;

/// <summary>
/// All-or-nothing output into one destination folder. Files are written into a hidden staging folder on the
/// same file system (inside the destination when it exists, else next to where it will be created) and only
/// moved into place by <see cref="OutputBatch.Commit"/> after every file was written and every destination
/// checked. A writer that streams (vectors) writes straight into <see cref="Folder"/>. A destination file whose
/// bytes would not change is left alone (its modification time too).
/// </summary>
internal sealed class OutputStage : IDisposable
{
    /// <summary>Longest file or folder name (bytes of UTF-8) on the usual file systems.</summary>
    public const int MaxNameBytes = 255;

    private const string StagePrefix = ".coefgen-stage-";

    private readonly bool _destinationExisted;
    private readonly Dictionary<string, string> _origins = new(StringComparer.Ordinal);

    private OutputStage(string destination, string option, string folder, bool destinationExisted)
    {
        Destination = destination;
        Option = option;
        Folder = folder;
        _destinationExisted = destinationExisted;
    }

    /// <summary>The destination folder (full path, as given).</summary>
    public string Destination { get; }

    /// <summary>The command-line option that named the destination, for messages.</summary>
    public string Option { get; }

    /// <summary>The staging folder: write here; relative paths inside it are the paths inside <see cref="Destination"/>.</summary>
    public string Folder { get; }

    /// <summary>Opens the stage, or returns null with the diagnostic (destination is a file, folder not writable).</summary>
    public static OutputStage? Open(string destination, string option, out Diagnostic? problem)
    {
        var full = Path.GetFullPath(destination);
        problem = null;
        var existing = full;
        while (!Directory.Exists(existing))
        {
            if (File.Exists(existing) || FileKind.Of(existing) != FileKindValue.Missing)
            {
                problem = Error(CliCodes.OutputFolderIsFile, option,
                    existing == full ? $"'{Show(full)}' is a file, not a folder" : $"'{Show(existing)}' (a parent of '{Show(full)}') is a file, not a folder");
                return null;
            }

            existing = Path.GetDirectoryName(existing) ?? throw new InvalidOperationException("no existing ancestor of " + full);
        }

        if (NameProblem(Path.GetRelativePath(existing, full)) is string tooLong)
        {
            problem = Error(CliCodes.OutputNameTooLong, option, tooLong);
            return null;
        }

        var folder = Path.Combine(existing, StagePrefix + Guid.NewGuid().ToString("N")[..12]);
        try
        {
            Directory.CreateDirectory(folder);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            problem = Error(CliCodes.OutputNotWritable, option, $"cannot write to '{Show(existing)}': {ex.Message}");
            return null;
        }

        return new OutputStage(full, option, folder, existing == full);
    }

    /// <summary>Writes one file into the stage; a diagnostic (located at <paramref name="origin"/>) when its name cannot be written.</summary>
    public Diagnostic? Add(string relativePath, byte[] bytes, string origin)
    {
        if (NameProblem(relativePath) is string tooLong)
        {
            return Error(CliCodes.OutputNameTooLong, origin, tooLong);
        }

        var path = Path.Combine(Folder, relativePath);
        _origins[Path.GetRelativePath(Folder, path)] = origin;
        try
        {
            Directory.CreateDirectory(Path.GetDirectoryName(path)!);
            File.WriteAllBytes(path, bytes);
            return null;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            return Error(CliCodes.OutputNotWritable, origin, $"cannot write '{Show(relativePath)}': {ex.Message}");
        }
    }

    /// <summary>Checks every staged file against its destination; the moves to make, or diagnostics.</summary>
    internal IReadOnlyList<StagedMove> Plan(List<Diagnostic> problems)
    {
        var moves = new List<StagedMove>();
        var realDestination = RealPath.Of(Destination);
        foreach (var staged in Directory.EnumerateFiles(Folder, "*", SearchOption.AllDirectories).Order(StringComparer.Ordinal))
        {
            var relative = Path.GetRelativePath(Folder, staged);
            var target = Path.Combine(Destination, relative);
            var at = _origins.GetValueOrDefault(relative, Option);
            if (!_destinationExisted)
            {
                moves.Add(new StagedMove(staged, target, relative, Unchanged: false));
                continue;
            }

            var real = RealPath.Of(target);
            if (!RealPath.IsInside(real, realDestination))
            {
                problems.Add(Error(CliCodes.OutputEscapes, at,
                    $"refused: '{Show(target)}' resolves through a symbolic link to '{Show(real)}', outside the output folder '{Show(Destination)}'"));
                continue;
            }

            if (ParentFile(real, realDestination) is string file)
            {
                problems.Add(Error(CliCodes.OutputFolderIsFile, at, $"cannot write '{Show(target)}': '{Show(file)}' is a file, not a folder"));
                continue;
            }

            switch (FileKind.Of(real))
            {
                case FileKindValue.Directory:
                    problems.Add(Error(CliCodes.OutputIsDirectory, at, $"cannot write '{Show(target)}': it is a folder"));
                    continue;
                case FileKindValue.Other:
                    problems.Add(Error(CliCodes.OutputIsDirectory, at, $"cannot write '{Show(target)}': it is a device, FIFO or socket"));
                    continue;
                case FileKindValue.Regular:
                    moves.Add(new StagedMove(staged, real, relative, SameBytes(staged, real)));
                    continue;
                default:
                    moves.Add(new StagedMove(staged, real, relative, Unchanged: false));
                    continue;
            }
        }

        return moves;
    }

    /// <summary>Moves the planned files into place (one rename of the whole stage when the destination is new).</summary>
    internal void Apply(IReadOnlyList<StagedMove> moves)
    {
        if (!_destinationExisted)
        {
            Directory.CreateDirectory(Path.GetDirectoryName(Destination)!);
            Directory.Move(Folder, Destination);
            return;
        }

        foreach (var m in moves.Where(m => !m.Unchanged))
        {
            Directory.CreateDirectory(Path.GetDirectoryName(m.Target)!);
            File.Move(m.Staged, m.Target, overwrite: true);
        }
    }

    public void Dispose()
    {
        try
        {
            if (Directory.Exists(Folder))
            {
                Directory.Delete(Folder, recursive: true);
            }
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            // A staging folder that cannot be removed is harmless (hidden, never read); the result stands.
        }
    }

    /// <summary>Why a relative output path cannot be created (a name longer than <see cref="MaxNameBytes"/>), or null.</summary>
    public static string? NameProblem(string relativePath)
    {
        foreach (var segment in relativePath.Split(['/', Path.DirectorySeparatorChar], StringSplitOptions.RemoveEmptyEntries))
        {
            var bytes = Encoding.UTF8.GetByteCount(segment);
            if (bytes > MaxNameBytes)
            {
                return $"the name '{SafeText.Excerpt(segment, 40)}' is {bytes} bytes long; file systems allow at most {MaxNameBytes} (shorten the name or the path)";
            }
        }

        return null;
    }

    private static string? ParentFile(string real, string realDestination)
    {
        for (var dir = Path.GetDirectoryName(real); dir is not null && RealPath.IsInside(dir, realDestination) && dir.Length > realDestination.Length; dir = Path.GetDirectoryName(dir))
        {
            if (File.Exists(dir))
            {
                return dir;
            }
        }

        return null;
    }

    private static bool SameBytes(string a, string b)
    {
        var fa = new FileInfo(a);
        var fb = new FileInfo(b);
        if (fa.Length != fb.Length)
        {
            return false;
        }

        using var sa = fa.OpenRead();
        using var sb = fb.OpenRead();
        var ba = new byte[65536];
        var bb = new byte[65536];
        int n;
        while ((n = sa.ReadAtLeast(ba, ba.Length, throwOnEndOfStream: false)) > 0)
        {
            if (sb.ReadAtLeast(bb, n, throwOnEndOfStream: false) != n || !ba.AsSpan(0, n).SequenceEqual(bb.AsSpan(0, n)))
            {
                return false;
            }
        }

        return true;
    }

    internal static string Show(string path) => SafeText.Excerpt(path, 200);

    private static Diagnostic Error(string code, string location, string message) => Diagnostic.Error(code, SourceLocation.FileOnly(location), message);
}

/// <summary>One staged file and where it goes; <paramref name="Unchanged"/>: the destination already holds these bytes.</summary>
internal sealed record StagedMove(string Staged, string Target, string RelativePath, bool Unchanged);
