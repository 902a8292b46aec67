namespace CoefGen.Core.Readout;

/// <summary>Stable diagnostic codes of the general cycle ([[timing.window]], [timing.repeat], [integration]).</summary>
public static class CycleCodes
{
    /// <summary>A window that sees the charge starts before its transfer, or a ramp window before the integration starts.</summary>
    public const string WindowBeforeCharge = "CG1250";

    /// <summary>Reset groups are numbered 0 .. G-1 and one of them has no window.</summary>
    public const string ResetGroupWithoutWindow = "CG1251";

    /// <summary>The repetition's last copy ends after the pixel cycle.</summary>
    public const string RepeatPastCycle = "CG1252";

    /// <summary>The repetition names a reset group that has no window.</summary>
    public const string RepeatUnknownGroup = "CG1253";

    /// <summary>Ramp windows without [integration], or [integration] without ramp windows.</summary>
    public const string IntegrationMismatch = "CG1254";

    /// <summary>A setting or a stage that takes only the classic two-window cycle.</summary>
    public const string TwoWindowOnly = "CG1255";

    /// <summary>No window of the cycle sees the charge (nothing to estimate).</summary>
    public const string NoChargeWindow = "CG1256";
}
