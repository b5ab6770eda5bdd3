namespace Decide.Core.Robustness;

/// <summary>
/// A small, fast, seedable pseudo-random generator (xoshiro256** seeded through SplitMix64, Blackman &amp; Vigna
/// 2018). A value type with no allocations, so every block of Monte Carlo draws can own one, derived from the run's
/// seed and the block's index: results are then identical on any number of threads.
/// </summary>
public struct SeededRandom
{
    private ulong _s0, _s1, _s2, _s3;

    /// <summary>Creates the generator for stream <paramref name="stream"/> of a run seeded with <paramref name="seed"/>.</summary>
    public SeededRandom(ulong seed, ulong stream = 0)
    {
        var x = seed ^ (0x9E3779B97F4A7C15UL * (stream + 1));
        _s0 = Next(ref x);
        _s1 = Next(ref x);
        _s2 = Next(ref x);
        _s3 = Next(ref x);
    }

    /// <summary>Next 64 random bits.</summary>
    public ulong NextUInt64()
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

    /// <summary>Uniform double in [0, 1) with 53 random bits.</summary>
    public double NextDouble() => (NextUInt64() >> 11) * (1.0 / (1UL << 53));

    /// <summary>
    /// A draw from the triangular distribution with minimum l, mode m and maximum u (inverse transform); l when the
    /// TFN is crisp.
    /// </summary>
    public double NextTriangular(double l, double m, double u)
    {
        var width = u - l;
        if (!(width > 0))
        {
            return m;
        }

        var p = NextDouble();
        var split = (m - l) / width;
        return p < split
            ? l + Math.Sqrt(p * width * (m - l))
            : u - Math.Sqrt((1 - p) * width * (u - m));
    }

    private static ulong Next(ref ulong x)
    {
        var z = x += 0x9E3779B97F4A7C15UL;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));
}
