namespace CoefGen.Core.Readout;

/// <summary>One [[emit]] entry: a built-in template name or a template path, and the output path (relative to the output folder).</summary>
public sealed record EmitSpec(string Template, string Path);
