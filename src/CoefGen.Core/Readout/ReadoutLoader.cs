namespace CoefGen.Core.Readout;

/// <summary>Placeholder so the contract compiles; the readout stage replaces it.</summary>
public static class ReadoutLoader
{
}
