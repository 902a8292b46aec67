namespace CoefGen.Core.Study;

/// <summary>A file the readout's [[emit]] entries produce, rendered in memory, with the SHA-256 of its bytes.</summary>
public sealed record EmittedFile(string Template, string RelativePath, int Bytes, string Sha256);
