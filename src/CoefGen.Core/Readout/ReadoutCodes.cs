namespace CoefGen.Core.Readout;

/// <summary>Stable diagnostic codes of the readout stage (CG0xxx syntax, CG1xxx readout rules).</summary>
public static class ReadoutCodes
{
    /// <summary>Not UTF-8 text, or a TOML syntax error.</summary>
    public const string TomlSyntax = "CG0001";

    public const string UnknownKey = "CG1001";
    public const string MissingKey = "CG1002";
    public const string WrongType = "CG1003";
    public const string OutOfRange = "CG1004";
    public const string NotAllowedWord = "CG1005";
    public const string ExactlyOneOf = "CG1006";
    public const string DuplicateSourceName = "CG1007";
    public const string BadIdentifier = "CG1008";

    public const string WindowOutsideCycle = "CG1201";
    public const string WindowsOverlap = "CG1202";
    public const string WindowEmptyAfterRounding = "CG1203";
    public const string TransferOutOfOrder = "CG1204";
    public const string SignalBeforeReset = "CG1205";

    public const string PsdTableUnreadable = "CG1301";
    public const string PsdTableBadLine = "CG1302";
    public const string PsdTableNotIncreasing = "CG1303";
    public const string PsdTableNegativeDensity = "CG1304";
    public const string PsdTableTooShort = "CG1305";
    public const string NoNoise = "CG1306";
    public const string UnboundedNoise = "CG1307";
    public const string LowCutoffAboveCorner = "CG1308";

    /// <summary>noise.bandwidth_hz at or below a source's 1/f low cutoff.</summary>
    public const string BandwidthBelowLowCutoff = "CG1310";

    /// <summary>Warning: the analog bandwidth (pole or limit) is far below the ADC rate, e.g. a forgotten unit.</summary>
    public const string BandwidthFarBelowRate = "CG1311";

    /// <summary>Warning: the noise at one sample is so large that it alone spans the ADC's full scale.</summary>
    public const string NoiseAboveFullScale = "CG1312";

    /// <summary>Warning: a trapezoid's ramps do not fit in the window (ramp_samples more than half the window).</summary>
    public const string RampLongerThanWindow = "CG1405";

    public const string ExplicitShape = "CG1401";
    public const string ShapeWithoutExplicit = "CG1402";
    public const string PoleStepWithoutPole = "CG1403";

    /// <summary>A scenario override names a key that is not an overridable noise key.</summary>
    public const string ScenarioKey = "CG1601";

    /// <summary>Two scenarios with the same name.</summary>
    public const string DuplicateScenarioName = "CG1602";

    /// <summary>No scenario, or more than <c>ScenariosSectionReader.MaxCases</c>.</summary>
    public const string ScenarioCount = "CG1603";

    /// <summary>A scenario range is not [low, high] with low &lt;= high.</summary>
    public const string ScenarioRange = "CG1604";

    /// <summary>weights.scheme = "robust" without a [scenarios] section.</summary>
    public const string RobustWithoutScenarios = "CG1605";
}
