using System.Security.Cryptography;
using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Vectors;

namespace CoefGen.Cli.Commands;

/// <summary>`verify` checks every vector file against the manifest's SHA-256 before it reads any of them.</summary>
internal static class VectorHashes
{
    /// <summary>Null when every listed file is present and unchanged; otherwise the exit code after printing which files differ.</summary>
    public static int? Check(string dir, VectorManifest manifest, TextWriter error)
    {
        var problems = new List<Diagnostic>();
        if (!manifest.Files.Any(f => f.Name == VectorFileNames.ExpectedDecimal))
        {
            problems.Add(Diagnostic.Error(VectorCodes.ManifestMalformed, SourceLocation.FileOnly(Path.Combine(dir, VectorFileNames.Manifest)),
                $"the manifest lists no {VectorFileNames.ExpectedDecimal}", "files"));
        }

        foreach (var (name, sha) in manifest.Files)
        {
            var path = Path.Combine(dir, name);
            try
            {
                using var stream = File.OpenRead(path);
                var actual = Convert.ToHexStringLower(SHA256.HashData(stream));
                if (!string.Equals(actual, sha, StringComparison.OrdinalIgnoreCase))
                {
                    problems.Add(Diagnostic.Error(VectorCodes.FileTampered, SourceLocation.FileOnly(path),
                        $"SHA-256 {actual} differs from the manifest's {sha}: the file changed after `coefgen vectors` wrote it; regenerate the vectors"));
                }
            }
            catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
            {
                var reason = ex is FileNotFoundException or DirectoryNotFoundException ? "file not found" : ex.Message;
                problems.Add(Diagnostic.Error(VectorCodes.FileUnreadable, SourceLocation.FileOnly(path), "cannot read a file the manifest lists: " + reason));
            }
        }

        return problems.Count == 0 ? null : DiagnosticPrinter.PrintFailure(error, problems);
    }
}
