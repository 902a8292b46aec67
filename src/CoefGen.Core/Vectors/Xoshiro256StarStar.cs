namespace CoefGen.Core.Vectors;

/// <summary>
/// xoshiro256** (Blackman and Vigna, 2018), seeded through SplitMix64: a PRNG implemented here so that the
/// stream of bits is the same on every .NET version and machine (System.Random's algorithm is not a contract).
/// Gaussian deviates come from the Box–Muller transform on two uniforms in (0, 1).
/// </summary>
public sealed class Xoshiro256StarStar
{
    private ulong _s0;
    private ulong _s1;
    private ulong _s2;
    private ulong _s3;
    private double? _spareGaussian;

    public Xoshiro256StarStar(ulong seed)
    {
        var x = seed;
        _s0 = SplitMix64(ref x);
        _s1 = SplitMix64(ref x);
        _s2 = SplitMix64(ref x);
        _s3 = SplitMix64(ref x);
    }

    /// <summary>The next 64 random bits.</summary>
    public ulong NextUInt64()
    {
        unchecked
        {
            var result = RotateLeft(_s1 * 5, 7) * 9;
            var t = _s1 << 17;
            _s2 ^= _s0;
            _s3 ^= _s1;
            _s1 ^= _s2;
            _s0 ^= _s3;
            _s2 ^= t;
            _s3 = RotateLeft(_s3, 45);
            return result;
        }
    }

    /// <summary>Uniform in the open interval (0, 1): 53 random bits, offset by half a step so 0 never occurs.</summary>
    public double NextOpenUnit() => ((NextUInt64() >> 11) + 0.5) * (1.0 / (1UL << 53));

    /// <summary>A standard normal deviate (Box–Muller; the second value of each pair is kept for the next call).</summary>
    public double NextGaussian()
    {
        if (_spareGaussian is double spare)
        {
            _spareGaussian = null;
            return spare;
        }

        var r = Math.Sqrt(-2.0 * Math.Log(NextOpenUnit()));
        var theta = 2.0 * Math.PI * NextOpenUnit();
        _spareGaussian = r * Math.Sin(theta);
        return r * Math.Cos(theta);
    }

    /// <summary>SplitMix64 step (Steele, Lea and Flood, 2014): the seeding generator recommended for xoshiro.</summary>
    public static ulong SplitMix64(ref ulong state)
    {
        unchecked
        {
            state += 0x9E3779B97F4A7C15UL;
            var z = state;
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
            return z ^ (z >> 31);
        }
    }

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));
}
