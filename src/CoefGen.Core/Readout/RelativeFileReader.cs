namespace CoefGen.Core.Readout;

/// <summary>
/// Reads a file the readout file names (psd_table), relative to the readout file: the bytes, or null with the
/// reason in <paramref name="problem"/> (not found, not a regular file, too large), quoted in the diagnostic.
/// </summary>
public delegate byte[]? RelativeFileReader(string relativePath, out string? problem);
