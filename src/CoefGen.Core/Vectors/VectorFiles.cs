using System.Globalization;
using System.Numerics;
using System.Security.Cryptography;
using System.Text;

namespace CoefGen.Core.Vectors;

/// <summary>
/// The text of every vector file for a <see cref="GoldenVectorSet"/>: '\n' line ends, invariant culture,
/// no clock, so the same set gives the same bytes. Writing them (atomically) is the caller's job.
/// </summary>
public static class VectorFiles
{
    public const string ManifestSchema = "coefgen.vectors/1";

    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>
    /// All files in memory, the manifest last (it carries the SHA-256 of the others and of <paramref name="alongside"/>,
    /// the files written into the same folder with the vectors); see <see cref="VectorFileWriter"/>.
    /// </summary>
    public static IReadOnlyList<(string Name, string Text)> Render(GoldenVectorSet set, string toolName, string toolVersion, IReadOnlyList<(string Name, string Text)>? alongside = null)
    {
        ArgumentNullException.ThrowIfNull(set);
        var streams = new List<(string Name, MemoryStream Stream)>();
        VectorFileWriter.Write(set.AsStream(), name =>
        {
            var m = new MemoryStream();
            streams.Add((name, m));
            return m;
        }, toolName, toolVersion, alongside: alongside?.Select(a => (a.Name, Utf8.GetBytes(a.Text))).ToList());
        return [.. streams.Select(s => (s.Name, Utf8.GetString(s.Stream.ToArray())))];
    }

    /// <summary>Lower-case hex of a non-negative code (offset binary) or a two's-complement code, masked to <paramref name="bits"/>.</summary>
    public static string UnsignedHex(long code, int bits)
    {
        var mask = (BigInteger.One << bits) - 1;
        var digits = (bits + 3) / 4;
        var v = new BigInteger(code) & mask;
        var s = v.ToString("x", CultureInfo.InvariantCulture).TrimStart('0');
        return s.PadLeft(digits, '0');
    }

    /// <summary>Lower-case hex SHA-256 of the UTF-8 bytes of <paramref name="text"/>.</summary>
    public static string Sha256(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Convert.ToHexStringLower(SHA256.HashData(Utf8.GetBytes(text)));
    }
}
