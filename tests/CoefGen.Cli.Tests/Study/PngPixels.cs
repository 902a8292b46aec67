using System.Buffers.Binary;
using System.IO.Compression;

namespace CoefGen.Cli.Tests.Study;

/// <summary>Counts non-white pixels of an 8-bit RGB/RGBA PNG (zlib IDAT, PNG filters undone); enough to tell a blank page.</summary>
internal static class PngPixels
{
    public static (int Width, int Height, long NonWhite) Count(byte[] png)
    {
        var pos = 8;
        int width = 0, height = 0, colourType = 0;
        using var idat = new MemoryStream();
        while (pos < png.Length)
        {
            var len = (int)BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(pos));
            var type = System.Text.Encoding.ASCII.GetString(png, pos + 4, 4);
            var data = png.AsSpan(pos + 8, len);
            if (type == "IHDR")
            {
                width = (int)BinaryPrimitives.ReadUInt32BigEndian(data);
                height = (int)BinaryPrimitives.ReadUInt32BigEndian(data[4..]);
                Assert.Equal(8, data[8]);
                colourType = data[9];
            }
            else if (type == "IDAT")
            {
                idat.Write(data);
            }

            pos += 12 + len;
        }

        var bpp = colourType switch { 2 => 3, 6 => 4, _ => throw new InvalidDataException($"colour type {colourType}") };
        idat.Position = 0;
        using var z = new ZLibStream(idat, CompressionMode.Decompress);
        using var raw = new MemoryStream();
        z.CopyTo(raw);
        var bytes = raw.ToArray();
        var stride = width * bpp;
        var prev = new byte[stride];
        var cur = new byte[stride];
        long nonWhite = 0;
        for (var y = 0; y < height; y++)
        {
            var filter = bytes[y * (stride + 1)];
            Array.Copy(bytes, (y * (stride + 1)) + 1, cur, 0, stride);
            for (var i = 0; i < stride; i++)
            {
                int a = i >= bpp ? cur[i - bpp] : 0, b = prev[i], c = i >= bpp ? prev[i - bpp] : 0;
                cur[i] = unchecked((byte)(cur[i] + filter switch { 0 => 0, 1 => a, 2 => b, 3 => (a + b) / 2, 4 => Paeth(a, b, c), _ => throw new InvalidDataException("filter") }));
            }

            for (var x = 0; x < width; x++)
            {
                if (cur[x * bpp] < 250 || cur[(x * bpp) + 1] < 250 || cur[(x * bpp) + 2] < 250)
                {
                    nonWhite++;
                }
            }

            (prev, cur) = (cur, prev);
        }

        return (width, height, nonWhite);
    }

    private static int Paeth(int a, int b, int c)
    {
        int p = a + b - c, pa = Math.Abs(p - a), pb = Math.Abs(p - b), pc = Math.Abs(p - c);
        return pa <= pb && pa <= pc ? a : pb <= pc ? b : c;
    }
}
