namespace CoefGen.Core.Emit;

/// <summary>One rendered file: its path relative to the output folder ('/' separators) and its full text.</summary>
public sealed record RenderedArtefact(string RelativePath, string Content)
{
    /// <summary>The bytes to write: UTF-8 without a byte-order mark.</summary>
    public byte[] ToBytes() => new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(Content);
}
