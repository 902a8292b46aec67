namespace CoefGen.Core.Readout;

/// <summary>
/// The classic two-window view of a cycle: one reset window that sees no charge and one signal window after the
/// transfer, both after one reset. Only a cycle written in the classic form ([timing.reset] and [timing.signal])
/// has it (<see cref="CycleSpec.AsTwoWindow"/>); consumers whose output or search is two-window by nature (the
/// classic text, JSON and template constants, the sweep's window searches, explicit reset/signal shapes) ask for
/// it, so the assumption is in the type and a general cycle is never read as "first and last window".
/// </summary>
/// <param name="Reset">Reset (reference) window.</param>
/// <param name="Signal">Signal window.</param>
/// <param name="TransferTimeS">Charge-transfer instant from the start of the cycle, in seconds.</param>
public sealed record TwoWindowCycle(SampleWindow Reset, SampleWindow Signal, double TransferTimeS)
{
    /// <summary>
    /// The cycle of a classic file: the reset window sees no charge, the signal window the charge after the
    /// transfer, both in reset group 0.
    /// </summary>
    public CycleSpec ToCycle() => ToCycle(ChargeSight.None);

    /// <summary>
    /// As <see cref="ToCycle()"/>, with what the reset window sees given: a grid built directly (tests) may place the
    /// transfer before the end of the reset window, and then the reset window sees the charge step as well.
    /// </summary>
    internal CycleSpec ToCycle(ChargeSight resetSees) => new(
        [
            new CycleWindow("reset", Reset, resetSees, resetSees == ChargeSight.None ? 0 : TransferTimeS, 0, 0),
            new CycleWindow("signal", Signal, ChargeSight.Transfer, TransferTimeS, 0, 0),
        ],
        1, null, null, 1)
    {
        TwoWindow = this,
    };
}
