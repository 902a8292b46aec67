namespace CoefGen.Core.Emit;

/// <summary>
/// Where an emitted file came from, written into its opening comment instead of a timestamp so that the
/// same input gives the same bytes. All values are supplied by the caller as plain values.
/// </summary>
/// <param name="ToolName">Name of the generating tool, e.g. "coefgen".</param>
/// <param name="ToolVersion">Version of the generating tool, e.g. "0.1.0".</param>
/// <param name="ReadoutFileName">File name (no directory) of the readout description.</param>
/// <param name="ReadoutSha256">Lower-case hex SHA-256 of the readout file's bytes.</param>
/// <param name="SchemeLabel">Weight scheme label, e.g. "optimal".</param>
/// <param name="PredictedReadNoiseElectrons">Predicted read noise in electrons rms.</param>
/// <param name="PredictedReadNoiseAdu">Predicted read noise in ADU rms.</param>
public sealed record Provenance(
    string ToolName,
    string ToolVersion,
    string ReadoutFileName,
    string ReadoutSha256,
    string SchemeLabel,
    double PredictedReadNoiseElectrons,
    double PredictedReadNoiseAdu);
