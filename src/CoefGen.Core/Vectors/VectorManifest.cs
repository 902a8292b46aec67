using System.Text.Json;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Vectors;

/// <summary>What `verify` needs from manifest.json: which readout the vectors belong to, and the output word.</summary>
public sealed record VectorManifest(string Design, string ReadoutSha256, int Pixels, int OutputBits, int OutputFracBits, ulong Seed)
{
    /// <summary>Parses the manifest; problems come back as CG4002 diagnostics naming the key.</summary>
    public static (VectorManifest? Manifest, IReadOnlyList<Diagnostic> Diagnostics) Parse(string json, string path)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(path);
        var at = SourceLocation.FileOnly(path);
        try
        {
            using var doc = JsonDocument.Parse(json);
            var root = doc.RootElement;
            string Text(string key) => root.TryGetProperty(key, out var v) && v.ValueKind == JsonValueKind.String
                ? v.GetString()!
                : throw new KeyNotFoundException(key);
            int Int(string key) => root.TryGetProperty(key, out var v) && v.TryGetInt32(out var i) ? i : throw new KeyNotFoundException(key);
            if (Text("schema") != VectorFiles.ManifestSchema)
            {
                return (null, [Diagnostic.Error(VectorCodes.ManifestMalformed, at, $"schema is not {VectorFiles.ManifestSchema}", "schema")]);
            }

            var seed = root.TryGetProperty("seed", out var s) && s.TryGetUInt64(out var u) ? u : throw new KeyNotFoundException("seed");
            var m = new VectorManifest(Text("design"), Text("readout_sha256"), Int("pixels"), Int("output_bits"), Int("output_frac_bits"), seed);
            if (m.Pixels < 1 || m.OutputBits is < 1 or > 64)
            {
                return (null, [Diagnostic.Error(VectorCodes.ManifestMalformed, at, "pixels must be at least 1 and output_bits 1..64")]);
            }

            return (m, []);
        }
        catch (JsonException e)
        {
            return (null, [Diagnostic.Error(VectorCodes.ManifestMalformed, new SourceLocation(path, (int)(e.LineNumber ?? -1) + 1, 0), "not valid JSON: " + e.Message)]);
        }
        catch (KeyNotFoundException e)
        {
            return (null, [Diagnostic.Error(VectorCodes.ManifestMalformed, at, "missing or mistyped key", e.Message)]);
        }
    }
}
