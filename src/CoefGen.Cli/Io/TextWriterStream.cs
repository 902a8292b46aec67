using System.Text;

namespace CoefGen.Cli.Io;

/// <summary>
/// A write-only stream that decodes the UTF-8 bytes written to it onto a <see cref="TextWriter"/>, so a
/// <see cref="System.Text.Json.Utf8JsonWriter"/> can stream a large document (a 128 000-sample design's JSON is
/// about 20 MB) to the console without holding it as bytes and as a string. The decoder keeps a multi-byte
/// character that is split across two writes.
/// </summary>
internal sealed class TextWriterStream(TextWriter output) : Stream
{
    private readonly Decoder _decoder = Encoding.UTF8.GetDecoder();
    private char[] _chars = new char[4096];

    public override bool CanRead => false;

    public override bool CanSeek => false;

    public override bool CanWrite => true;

    public override long Length => throw new NotSupportedException();

    public override long Position { get => throw new NotSupportedException(); set => throw new NotSupportedException(); }

    public override void Write(byte[] buffer, int offset, int count) => Write(buffer.AsSpan(offset, count));

    public override void Write(ReadOnlySpan<byte> buffer)
    {
        var needed = _decoder.GetCharCount(buffer, flush: false);
        if (needed > _chars.Length)
        {
            _chars = new char[needed];
        }

        var written = _decoder.GetChars(buffer, _chars, flush: false);
        output.Write(_chars, 0, written);
    }

    public override void Flush() => output.Flush();

    public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();

    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();

    public override void SetLength(long value) => throw new NotSupportedException();
}
