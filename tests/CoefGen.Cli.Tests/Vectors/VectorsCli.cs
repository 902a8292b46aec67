using System.Globalization;

namespace CoefGen.Cli.Tests.Vectors;

/// <summary>Runs `vectors` into a fresh folder and writes a DUT dump next to it (shared by the vector command tests).</summary>
internal static class VectorsCli
{
    public static string Generate(string example, int pixels, params string[] extra)
    {
        var dir = RepoPaths.TempDir();
        var r = CliRunner.Run(["vectors", RepoPaths.Example(example), "--out", dir, "--pixels", pixels.ToString(CultureInfo.InvariantCulture), .. extra]);
        Assert.True(r.ExitCode == 0, r.Error);
        return dir;
    }

    public static string Dump(string dir, IEnumerable<string> lines)
    {
        var path = Path.Combine(dir, "dut.txt");
        File.WriteAllText(path, string.Join("\n", lines) + "\n");
        return path;
    }
}
