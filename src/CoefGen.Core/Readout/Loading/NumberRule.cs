namespace CoefGen.Core.Readout.Loading;

/// <summary>An allowed range for a number, with the words that tell the user what is allowed.</summary>
internal sealed record NumberRule(Func<double, bool> Accepts, string Allowed)
{
    public static readonly NumberRule Positive = new(v => v > 0, "a finite number > 0");

    public static readonly NumberRule NonNegative = new(v => v >= 0, "a finite number >= 0");

    public static readonly NumberRule Any = new(_ => true, "a finite number");
}
