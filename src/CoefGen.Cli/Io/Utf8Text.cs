using System.Text;

namespace CoefGen.Cli.Io;

/// <summary>The bytes every text file the CLI writes is made of: UTF-8 without a byte-order mark (same text, same bytes).</summary>
internal static class Utf8Text
{
    private static readonly UTF8Encoding Utf8NoBom = new(encoderShouldEmitUTF8Identifier: false);

    public static byte[] Encode(string content) => Utf8NoBom.GetBytes(content);
}
