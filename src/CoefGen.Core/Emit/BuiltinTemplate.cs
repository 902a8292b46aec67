namespace CoefGen.Core.Emit;

/// <summary>One built-in template: its name in [[emit]], its file in templates/ and its default output name.</summary>
/// <param name="Name">Name used in readout files, e.g. "c-header".</param>
/// <param name="FileName">File name inside the built-in template folder.</param>
/// <param name="DefaultOutputSuffix">Appended to the identifier prefix to give the default output file name.</param>
public sealed record BuiltinTemplate(string Name, string FileName, string DefaultOutputSuffix)
{
    /// <summary>The default output file name for a model's prefix, e.g. "red_ch0_coefs.h".</summary>
    public string DefaultOutputName(string prefix) => prefix + DefaultOutputSuffix;
}
