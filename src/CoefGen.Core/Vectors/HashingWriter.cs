using System.Security.Cryptography;
using System.Text;

namespace CoefGen.Core.Vectors;

/// <summary>A buffered UTF-8 text sink that hashes and counts lines as it goes.</summary>
internal sealed class HashingWriter(string name, Stream stream) : IDisposable
{
    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    private readonly IncrementalHash _hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
    private readonly StringBuilder _buffer = new();

    public string Name => name;

    public long Lines { get; private set; }

    public string Sha256 { get; private set; } = "";

    public void Line(string text)
    {
        _buffer.Append(text).Append('\n');
        Lines++;
        if (_buffer.Length >= 1 << 16)
        {
            Flush();
        }
    }

    public void Raw(string text)
    {
        _buffer.Append(text);
        Lines += text.Count(ch => ch == '\n');
    }

    public void Finish()
    {
        Flush();
        stream.Flush();
        Sha256 = Convert.ToHexStringLower(_hash.GetHashAndReset());
    }

    public void Dispose()
    {
        stream.Dispose();
        _hash.Dispose();
    }

    private void Flush()
    {
        var bytes = Utf8.GetBytes(_buffer.ToString());
        _hash.AppendData(bytes);
        stream.Write(bytes);
        _buffer.Clear();
    }
}
