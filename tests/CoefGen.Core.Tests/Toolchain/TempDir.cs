namespace CoefGen.Core.Tests.Toolchain;

/// <summary>One fresh directory per test, removed afterwards.</summary>
public sealed class TempDir : IDisposable
{
    public TempDir() => Path = Directory.CreateTempSubdirectory("coefgen-tc-").FullName;

    public string Path { get; }

    public string Write(string name, string content)
    {
        var full = System.IO.Path.Combine(Path, name);
        File.WriteAllText(full, content.Replace("\r\n", "\n", StringComparison.Ordinal));
        return full;
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
            // Best effort: a tool may still hold a file on some systems.
        }
    }
}
