using System.Globalization;
using CoefGen.Cli.Diagnostics;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Cli.Io;

/// <summary>
/// Reads one input file the user named (readout, psd_table, capture, template): only a regular file (no folder,
/// device, FIFO or socket), and never more than its kind's limit, so /dev/zero or a huge file is a clear
/// diagnostic instead of an out-of-memory crash.
/// </summary>
internal static class InputFile
{
    /// <summary>Readout files are short TOML; even thousands of explicit weights fit easily.</summary>
    public const long ReadoutLimit = 4L << 20;

    /// <summary>A measured spectrum table: about a million rows.</summary>
    public const long PsdTableLimit = 32L << 20;

    /// <summary>A capture of idle samples (raw int16: 128 Mi samples).</summary>
    public const long CaptureLimit = 256L << 20;

    /// <summary>A Scriban template.</summary>
    public const long TemplateLimit = 4L << 20;

    /// <summary>The bytes, or null with <paramref name="problem"/> set (located at <paramref name="location"/>).</summary>
    /// <param name="path">The path to read.</param>
    /// <param name="what">The kind of file, for messages ("readout file", "capture").</param>
    /// <param name="limit">Largest accepted size in bytes.</param>
    /// <param name="location">Where the path came from (the file itself, or the key that names it).</param>
    /// <param name="notFoundCode">The code of a missing or unreadable file (each kind keeps its own).</param>
    /// <param name="key">The key that names the file, if any.</param>
    /// <param name="problem">Why nothing was read.</param>
    public static byte[]? TryRead(string path, string what, long limit, SourceLocation location, string notFoundCode, string? key, out Diagnostic? problem)
    {
        var bytes = TryRead(path, what, limit, out var missing, out var reason);
        problem = bytes is null
            ? Diagnostic.Error(missing ? notFoundCode : Code(reason!), location, $"cannot read the {what} '{SafeText.Excerpt(path, 200)}': {reason}", key)
            : null;
        return bytes;
    }

    /// <summary>The bytes, or null with the reason (<paramref name="unreadable"/>: missing or refused by the system, else not a regular file or too large).</summary>
    public static byte[]? TryRead(string path, string what, long limit, out bool unreadable, out string? reason)
    {
        unreadable = false;
        reason = null;
        try
        {
            switch (FileKind.Of(path))
            {
                case FileKindValue.Missing:
                    (unreadable, reason) = (true, "file not found");
                    return null;
                case FileKindValue.Directory:
                    reason = NotRegularFolder;
                    return null;
                case FileKindValue.Other:
                    reason = NotRegularDevice;
                    return null;
                default:
                    var bytes = ReadBounded(path, limit);
                    reason = bytes is null ? $"it is larger than the limit of {Size(limit)} for a {what}" : null;
                    return bytes;
            }
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            (unreadable, reason) = (true, ex is FileNotFoundException or DirectoryNotFoundException ? "file not found" : ex.Message);
            return null;
        }
    }

    private const string NotRegularFolder = "it is a folder, not a file";

    private const string NotRegularDevice = "it is a device, FIFO or socket, not a regular file";

    private static string Code(string reason) =>
        reason is NotRegularFolder or NotRegularDevice ? CliCodes.InputNotRegular : CliCodes.InputTooLarge;

    /// <summary>Reads at most <paramref name="limit"/> bytes; null when the file holds more.</summary>
    private static byte[]? ReadBounded(string path, long limit)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        if (stream.CanSeek && stream.Length > limit)
        {
            return null;
        }

        using var memory = new MemoryStream(stream.CanSeek ? (int)stream.Length : 0);
        var buffer = new byte[81920];
        int n;
        while ((n = stream.Read(buffer, 0, buffer.Length)) > 0)
        {
            if (memory.Length + n > limit)
            {
                return null;
            }

            memory.Write(buffer, 0, n);
        }

        return memory.ToArray();
    }

    private static string Size(long bytes) => (bytes >> 20).ToString(CultureInfo.InvariantCulture) + " MiB";
}
