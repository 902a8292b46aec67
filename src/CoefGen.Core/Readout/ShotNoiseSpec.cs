namespace CoefGen.Core.Readout;

/// <summary>
/// Shot noise of the integrating charge (ramp windows): photon flux and dark current in electrons per second at the
/// sense node. The covariance in e-^2 between ramp samples i and j of one reset group is
/// (flux + dark) * min(t_i - t0, t_j - t0), t0 the integration start (PHYSICS.md §4b).
/// </summary>
/// <param name="PhotonFluxEPerS">Photon flux the weights are designed at (the stated signal level).</param>
/// <param name="DarkCurrentEPerS">Dark current.</param>
/// <param name="LevelsEPerS">Further photon-flux levels at which the designed weights' noise is reported (may be empty).</param>
public sealed record ShotNoiseSpec(double PhotonFluxEPerS, double DarkCurrentEPerS, IReadOnlyList<double> LevelsEPerS)
{
    /// <summary>Total rate of the integrating charge, e-/s.</summary>
    public double TotalEPerS => PhotonFluxEPerS + DarkCurrentEPerS;
}
