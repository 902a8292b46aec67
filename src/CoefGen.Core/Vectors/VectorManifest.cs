using System.Text.Json;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Vectors;

/// <summary>What `verify` needs from manifest.json: which readout the vectors belong to, and the output word.</summary>
public sealed record VectorManifest(string Design, string ReadoutSha256, int Pixels, int OutputBits, int OutputFracBits, ulong Seed)
{
    /// <summary>Accumulator width (0 in a manifest written before it was listed).</summary>
    public int AccBits { get; init; }

    /// <summary>Every data file with its SHA-256 (lower-case hex), as written.</summary>
    public IReadOnlyList<(string Name, string Sha256)> Files { get; init; } = [];

    /// <summary>Pixels per datapath branch (<see cref="DatapathBranch"/>), and the targets no input reaches with the reason.</summary>
    public IReadOnlyList<(string Branch, int Count)> Branches { get; init; } = [];

    public IReadOnlyList<(string Target, string Reason)> UnreachedBranches { get; init; } = [];

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
            var files = root.TryGetProperty("files", out var f) && f.ValueKind == JsonValueKind.Array
                ? f.EnumerateArray().Select(e => (FileText(e, "name"), FileText(e, "sha256"))).ToList()
                : throw new KeyNotFoundException("files");
            if (files.Any(x => x.Item1.Length == 0 || x.Item1 != Path.GetFileName(x.Item1) || x.Item1 == VectorFileNames.Manifest))
            {
                return (null, [Diagnostic.Error(VectorCodes.ManifestMalformed, at, "a file name is empty, names a folder or the manifest itself", "files")]);
            }

            var m = new VectorManifest(Text("design"), Text("readout_sha256"), Int("pixels"), Int("output_bits"), Int("output_frac_bits"), seed)
            {
                AccBits = root.TryGetProperty("acc_bits", out var ab) && ab.TryGetInt32(out var abi) ? abi : 0,
                Files = files,
                Branches = Object(root, "branches").Select(p => (p.Name, p.Value.TryGetInt32(out var n) ? n : 0)).ToList(),
                UnreachedBranches = Object(root, "unreached_branches").Select(p => (p.Name, p.Value.ValueKind == JsonValueKind.String ? p.Value.GetString()! : "")).ToList(),
            };
            if (m.Pixels < 1 || m.OutputBits is < 1 or > 64 || m.AccBits is < 0 or > 64)
            {
                return (null, [Diagnostic.Error(VectorCodes.ManifestMalformed, at, "pixels must be at least 1 and output_bits 1..64")]);
            }

            return (m, []);
        }
        catch (InvalidOperationException)
        {
            return (null, [Diagnostic.Error(VectorCodes.ManifestMalformed, at, "a value has the wrong JSON type")]);
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

    private static string FileText(JsonElement e, string key) =>
        e.ValueKind == JsonValueKind.Object && e.TryGetProperty(key, out var v) && v.ValueKind == JsonValueKind.String ? v.GetString()! : throw new KeyNotFoundException("files." + key);

    private static IEnumerable<JsonProperty> Object(JsonElement root, string key) =>
        root.TryGetProperty(key, out var v) && v.ValueKind == JsonValueKind.Object ? [.. v.EnumerateObject()] : [];
}
