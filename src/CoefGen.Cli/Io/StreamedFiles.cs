namespace CoefGen.Cli.Io;

/// <summary>
/// Files written by a streaming producer into a folder: each goes to a hidden temporary file beside its
/// destination and is renamed into place only after the producer finished without an exception (then all
/// of them); on failure the temporary files are removed and nothing is replaced.
/// </summary>
internal static class StreamedFiles
{
    /// <summary>Runs <paramref name="produce"/> with a stream opener for file names in <paramref name="dir"/>; returns the files written.</summary>
    public static int Write(string dir, Action<Func<string, Stream>> produce)
    {
        Directory.CreateDirectory(dir);
        var temps = new List<(string Temp, string Final)>();
        try
        {
            produce(name =>
            {
                var final = Path.Combine(dir, name);
                var temp = Path.Combine(dir, $".{name}.{Environment.ProcessId}.tmp");
                temps.Add((temp, final));
                return new FileStream(temp, FileMode.Create, FileAccess.Write, FileShare.None, 1 << 16);
            });
            foreach (var (temp, final) in temps)
            {
                File.Move(temp, final, overwrite: true);
            }

            return temps.Count;
        }
        finally
        {
            foreach (var (temp, _) in temps)
            {
                if (File.Exists(temp))
                {
                    File.Delete(temp);
                }
            }
        }
    }
}
