using System.Runtime.InteropServices;
using System.Security.Cryptography;
using System.Text;
using CoefGen.Cli.Io;

namespace CoefGen.Cli.Tests.BadInput;

/// <summary>A fresh folder holding a copy of examples/, with helpers to plant bad inputs and to fingerprint the tree.</summary>
internal sealed class Sandbox : IDisposable
{
    public Sandbox()
    {
        Root = RepoPaths.TempDir();
        foreach (var f in Directory.GetFiles(System.IO.Path.Combine(RepoPaths.Root, "examples")))
        {
            File.Copy(f, System.IO.Path.Combine(Root, System.IO.Path.GetFileName(f)));
        }
    }

    public string Root { get; }

    public string Fast => Path("fast_imaging.toml");

    public string Path(string relative) => System.IO.Path.Combine(Root, relative);

    public string Write(string relative, string text)
    {
        var path = Path(relative);
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text);
        return path;
    }

    public string Dir(string relative) => Directory.CreateDirectory(Path(relative)).FullName;

    /// <summary>A copy of an example with one textual replacement (which must apply).</summary>
    public string Edit(string example, string find, string replace, string? asName = null)
    {
        var text = File.ReadAllText(Path(example));
        Assert.Contains(find, text, StringComparison.Ordinal);
        return Write(asName ?? "edited_" + example, text.Replace(find, replace, StringComparison.Ordinal));
    }

    /// <summary>A sparse file of <paramref name="bytes"/> zero bytes (no disk used).</summary>
    public string Sparse(string relative, long bytes)
    {
        var path = Path(relative);
        using var fs = new FileStream(path, FileMode.Create);
        fs.SetLength(bytes);
        return path;
    }

    public string Fifo(string relative)
    {
        var path = Path(relative);
        Assert.Equal(0, MkFifo(path, 0x1A4));
        return path;
    }

    public string Link(string relative, string target)
    {
        File.CreateSymbolicLink(Path(relative), target);
        return Path(relative);
    }

    /// <summary>1-based line of the first line containing <paramref name="text"/> in a sandbox file.</summary>
    public int LineOf(string path, string text)
    {
        var lines = File.ReadAllLines(path);
        var i = Array.FindIndex(lines, l => l.Contains(text, StringComparison.Ordinal));
        Assert.True(i >= 0, $"'{text}' not in {path}");
        return i + 1;
    }

    /// <summary>Every entry below the root: path, kind, and for files the SHA-256 and modification time; for links the target.</summary>
    public string Fingerprint()
    {
        var sb = new StringBuilder();
        foreach (var entry in new DirectoryInfo(Root).EnumerateFileSystemInfos("*", new EnumerationOptions { RecurseSubdirectories = true, AttributesToSkip = 0 })
                     .OrderBy(e => e.FullName, StringComparer.Ordinal))
        {
            var rel = System.IO.Path.GetRelativePath(Root, entry.FullName);
            if (entry.LinkTarget is string target)
            {
                sb.Append(rel).Append(" -> ").Append(target).Append('\n');
            }
            else if (entry is FileInfo special && FileKind.Of(special.FullName) != FileKindValue.Regular)
            {
                sb.Append(rel).Append(" (special)\n");
            }
            else if (entry is FileInfo file)
            {
                var hash = file.Length > 64 << 20 ? "large" : Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(file.FullName)));
                sb.Append(rel).Append(' ').Append(file.Length).Append(' ').Append(hash).Append(' ').Append(file.LastWriteTimeUtc.Ticks).Append('\n');
            }
            else
            {
                sb.Append(rel).Append("/\n");
            }
        }

        return sb.ToString();
    }

    /// <summary>Removes the sandbox (links are removed, not followed).</summary>
    public void Dispose()
    {
        try
        {
            Directory.Delete(Root, recursive: true);
        }
        catch (IOException)
        {
            // A leftover temporary folder is harmless.
        }
    }

    [DllImport("libc", EntryPoint = "mkfifo")]
    private static extern int MkFifo([MarshalAs(UnmanagedType.LPUTF8Str)] string path, uint mode);
}
