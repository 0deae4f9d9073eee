using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// The random stream of one Monte Carlo trial: xoshiro256** seeded through SplitMix64 from (seed, trial index), so
/// that every trial's draws are a pure function of the seed and its index, whatever thread runs it and in whatever
/// order.
/// </summary>
/// <remarks>
/// <para>Generator: D. Blackman and S. Vigna, "Scrambled linear pseudorandom number generators", ACM Trans. Math.
/// Softw. 47(4), art. 36, 2021 (xoshiro256**, from memory). Seeding: G. L. Steele, D. Lea and C. H. Flood, "Fast
/// splittable pseudorandom number generators", OOPSLA 2014 (SplitMix64 finaliser, constants from memory), applied to
/// the seed and to the trial index in turn, the usual way to fill xoshiro's state.</para>
/// <para>Normal deviates by the Box–Muller transform (G. E. P. Box and M. E. Muller, "A note on the generation of
/// random normal deviates", Ann. Math. Statist. 29, 610–611, 1958), one deviate per pair of uniforms (the second
/// is discarded, which keeps the number of draws per error fixed).</para>
/// </remarks>
internal struct TrialRandom
{
    private ulong s0, s1, s2, s3;

    /// <summary>The stream of trial <paramref name="trial"/> (0-based) of a run with seed <paramref name="seed"/>.</summary>
    public TrialRandom(int seed, long trial)
    {
        ulong x = unchecked((ulong)(long)seed * 0x9E3779B97F4A7C15UL ^ (ulong)trial);
        ulong sm = SplitMix(ref x) ^ unchecked((ulong)trial * 0xD1B54A32D192ED03UL);
        s0 = SplitMix(ref sm); s1 = SplitMix(ref sm); s2 = SplitMix(ref sm); s3 = SplitMix(ref sm);
    }

    private static ulong SplitMix(ref ulong x)
    {
        ulong z = unchecked(x += 0x9E3779B97F4A7C15UL);
        z = unchecked((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL);
        z = unchecked((z ^ (z >> 27)) * 0x94D049BB133111EBUL);
        return z ^ (z >> 31);
    }

    /// <summary>The next 64 random bits.</summary>
    public ulong NextBits()
    {
        ulong result = unchecked(RotateLeft(s1 * 5, 7) * 9);
        ulong t = s1 << 17;
        s2 ^= s0; s3 ^= s1; s1 ^= s2; s0 ^= s3; s2 ^= t; s3 = RotateLeft(s3, 45);
        return result;
    }

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));

    /// <summary>A uniform deviate in [0, 1) with 53 random bits.</summary>
    public double NextUniform() => (NextBits() >> 11) * (1.0 / (1UL << 53));

    /// <summary>A standard normal deviate (Box–Muller, see remarks).</summary>
    public double NextNormal()
    {
        double u1 = 1.0 - NextUniform();   // (0, 1]
        double u2 = NextUniform();
        return Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
    }

    /// <summary>
    /// One machining error, m: uniform in ±value or normal with σ = value. Always consumes two uniforms, so the stream
    /// stays aligned whatever the laws and whether a tolerance is zero (a zero tolerance gives exactly 0).
    /// </summary>
    public double Draw(MachiningTolerance tolerance)
    {
        ArgumentNullException.ThrowIfNull(tolerance);
        return Draw(tolerance.Value.Meters, tolerance.Distribution);
    }

    /// <summary>One tilt error, rad, by the same rule as <see cref="Draw(MachiningTolerance)"/>.</summary>
    public double Draw(AngleTolerance tolerance)
    {
        ArgumentNullException.ThrowIfNull(tolerance);
        return Draw(tolerance.Value.Radians, tolerance.Distribution);
    }

    private double Draw(double v, ErrorDistribution law)
    {
        if (law == ErrorDistribution.Normal) return v == 0 ? Discard(0.0) : v * NextNormal();
        double u = NextUniform();
        NextUniform();
        return v == 0 ? 0.0 : v * (2 * u - 1);
    }

    private double Discard(double value)
    {
        NextUniform();
        NextUniform();
        return value;
    }
}
