using System.Globalization;
using System.Text;
using CoefGen.Cli.Diagnostics;
using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Commands;

/// <summary>Sweeps that cannot mean what was asked are errors (exit 2), not a table of invalid rows.</summary>
internal static class SweepChecks
{
    /// <summary>Point diagnostics shown when every point is invalid.</summary>
    private const int ShownPointDiagnostics = 5;

    /// <summary>
    /// A varied key that is not a readout key (the editor would add it and every point would fail on it),
    /// located at --vary with the loader's did-you-mean; null when every key is known.
    /// </summary>
    public static Diagnostic? UnknownKey(string baseText, string readoutPath, IReadOnlyList<SweepAxis> axes)
    {
        var baseDir = Path.GetDirectoryName(Path.GetFullPath(readoutPath)) ?? ".";
        RelativeFileReader read = (string relative, out string? why) => InputFiles.ReadRelative(baseDir, relative, out why);
        var before = ReadoutLoader.Load(Encoding.UTF8.GetBytes(baseText), readoutPath, read).Diagnostics
            .Where(d => d.Code == ReadoutCodes.UnknownKey).Select(d => d.ToString()).ToHashSet(StringComparer.Ordinal);
        foreach (var axis in axes)
        {
            var edited = ReadoutTextEditor.SetNumber(baseText, axis.Key, axis.Values[0], out var problem);
            if (edited is null)
            {
                return Diagnostic.Error(CliCodes.SweepUnknownKey, SourceLocation.FileOnly("--vary"), problem ?? $"cannot set '{SafeText.Excerpt(axis.Key)}'");
            }

            var added = ReadoutLoader.Load(Encoding.UTF8.GetBytes(edited), readoutPath, read).Diagnostics
                .FirstOrDefault(d => d.Code == ReadoutCodes.UnknownKey && !before.Contains(d.ToString()));
            if (added is not null)
            {
                return Diagnostic.Error(CliCodes.SweepUnknownKey, SourceLocation.FileOnly("--vary"),
                    $"'{SafeText.Excerpt(axis.Key)}' is not a key of the readout file ({added.Message})");
            }
        }

        return null;
    }

    /// <summary>The first point's diagnostics and one error saying no point is valid.</summary>
    public static IReadOnlyList<Diagnostic> AllInvalid(SweepResult sweep)
    {
        var first = sweep.Points[0].Outcome.Diagnostics.Where(d => d.Severity == Severity.Error).Take(ShownPointDiagnostics);
        var values = string.Join(", ", sweep.Axes.Select((a, i) => $"{a.Key} = {sweep.Points[0].Values[i].ToString("G6", CultureInfo.InvariantCulture)}"));
        return
        [
            .. first,
            Diagnostic.Error(CliCodes.SweepAllInvalid, SourceLocation.FileOnly("--vary"),
                $"none of the {sweep.Points.Count.ToString(CultureInfo.InvariantCulture)} points is a valid design (above: the first point, {values}); nothing was written"),
        ];
    }
}
