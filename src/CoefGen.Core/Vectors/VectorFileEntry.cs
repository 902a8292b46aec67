namespace CoefGen.Core.Vectors;

/// <summary>One data file as the manifest lists it: name, line count, SHA-256 of its bytes.</summary>
public sealed record VectorFileEntry(string Name, long Lines, string Sha256);
