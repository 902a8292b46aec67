using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>One [[timing.window]] as written. Null members were missing or invalid.</summary>
internal sealed record CycleWindowInput(
    string Name,
    string Path,
    SourceLocation Location,
    TimeQuantity? Start,
    TimeQuantity? Count,
    ChargeSight? Sees,
    SourceLocation SeesLocation,
    TimeQuantity? Transfer,
    int? Group,
    SourceLocation GroupLocation);

/// <summary>[timing.repeat] as written: the windows of one reset group, Times copies, Every samples apart.</summary>
internal sealed record RepeatInput(
    SourceLocation Location,
    int? Group,
    SourceLocation GroupLocation,
    int? Times,
    SourceLocation TimesLocation,
    TimeQuantity? Every,
    bool NewGroup);

/// <summary>[integration] as written (ramp windows only).</summary>
internal sealed record IntegrationInput(
    SourceLocation Location,
    TimeQuantity? Start,
    TimeQuantity? Reference,
    double? PhotonFlux,
    double? DarkCurrent,
    IReadOnlyList<double>? Levels,
    bool Valid);

/// <summary>A general cycle as written, before nanoseconds become samples.</summary>
internal sealed record CycleInput(
    TimeQuantity? Pixel,
    StepModel? Step,
    SourceLocation StepLocation,
    IReadOnlyList<CycleWindowInput> Windows,
    RepeatInput? Repeat,
    IntegrationInput? Integration,
    SourceLocation TimingLocation,
    bool Valid);
