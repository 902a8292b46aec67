using System.Diagnostics;

namespace CoefGen.Cli.Io;

/// <summary>Reads a file as it was in a git revision (`git show REV:./NAME` in the file's folder).</summary>
internal static class GitRevision
{
    /// <summary>The file's bytes at <paramref name="revision"/>, or null with <paramref name="problem"/> set (not a repository, unknown revision, file absent then).</summary>
    public static byte[]? Read(string revision, string path, out string? problem)
    {
        var full = Path.GetFullPath(path);
        var start = new ProcessStartInfo("git")
        {
            WorkingDirectory = Path.GetDirectoryName(full) ?? ".",
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add("show");
        start.ArgumentList.Add($"{revision}:./{Path.GetFileName(full)}");
        try
        {
            using var process = Process.Start(start) ?? throw new InvalidOperationException("git did not start");
            using var bytes = new MemoryStream();
            var stderr = process.StandardError.ReadToEndAsync();
            process.StandardOutput.BaseStream.CopyTo(bytes);
            process.WaitForExit();
            if (process.ExitCode != 0)
            {
                problem = stderr.Result.Trim();
                return null;
            }

            problem = null;
            return bytes.ToArray();
        }
        catch (Exception ex) when (ex is System.ComponentModel.Win32Exception or InvalidOperationException or IOException)
        {
            problem = $"cannot run git: {ex.Message}";
            return null;
        }
    }
}
