namespace CoefGen.Core.FixedPoint;

/// <summary>How the accumulator is rounded when it is shifted right by S bits.</summary>
public enum RoundingMode
{
    /// <summary>floor((acc + 2^(S-1)) / 2^S): ties go towards +infinity (-2.5 gives -2).</summary>
    HalfUp,

    /// <summary>Round to nearest, ties to the even result.</summary>
    HalfEven,

    /// <summary>floor(acc / 2^S): an arithmetic right shift, bias -1/2 LSB.</summary>
    Truncate,
}
