namespace CoefGen.Core.Weights.Structured;

/// <summary>Preconditioners the structured solver can use (kept selectable so they can be measured).</summary>
public enum PreconditionerKind
{
    /// <summary>Plain projected CG (no preconditioning).</summary>
    None,

    /// <summary>T. Chan's optimal circulant of each run's Toeplitz block (Chan 1988).</summary>
    TChanCirculant,

    /// <summary>Strang's circulant (central lags copied, wrapped) of each run's Toeplitz block (Strang 1986).</summary>
    StrangCirculant,
}
