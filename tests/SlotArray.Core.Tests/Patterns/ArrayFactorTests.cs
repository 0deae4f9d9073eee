using SlotArray.Core.Patterns;
using SlotArray.Tests.Shared;
using Complex = System.Numerics.Complex;

namespace SlotArray.Core.Tests.Patterns;

/// <summary>
/// The array factor against an independent naive sum written here with Complex.Exp (the definition
/// AF = Σ a_n exp(j k z_n sin θ), Balanis, Antenna Theory, 2005, Ch. 6), and the fast uniform path against the
/// direct vectorised sum.
/// </summary>
public class ArrayFactorTests
{
    private const double Lambda = 0.03;
    private static readonly double K = 2 * Math.PI / Lambda;

    private static Complex[] RandomExcitations(int n, int seed)
    {
        var rng = new Random(seed);
        return Enumerable.Range(0, n).Select(_ => Complex.FromPolarCoordinates(0.2 + rng.NextDouble(), 2 * Math.PI * rng.NextDouble())).ToArray();
    }

    private static Complex Naive(IReadOnlyList<double> z, IReadOnlyList<Complex> a, double u)
    {
        Complex s = 0;
        for (int n = 0; n < z.Count; n++) s += a[n] * Complex.Exp(new Complex(0, K * z[n] * u));
        return s;
    }

    [Theory]
    [InlineData(1, true)]
    [InlineData(7, true)]
    [InlineData(37, true)]
    [InlineData(1000, true)]
    [InlineData(37, false)]
    [InlineData(1000, false)]
    public void Direct_sum_with_arbitrary_positions_matches_the_naive_definition(int n, bool symmetricGrid)
    {
        var rng = new Random(n);
        var z = Enumerable.Range(0, n).Select(i => i * 0.6 * Lambda + rng.NextDouble() * 0.1 * Lambda).ToArray();
        var a = RandomExcitations(n, n + 1);
        var grid = symmetricGrid ? AngleGrid.HalfSpaceInTheta(301) : AngleGrid.UniformInTheta(-1.1, 1.4, 300);
        var p = ArrayFactor.Compute(z, a, K, grid);
        double scale = a.Sum(x => x.Magnitude);
        for (int i = 0; i < grid.Count; i++)
            Check.Absolute(0, (p.Field[i] - Naive(z, a, grid.Sines[i])).Magnitude / scale, 1e-12, "naive Σ a_n exp(j k z_n sin θ)");
    }

    [Theory]
    [InlineData(2)]
    [InlineData(9)]
    [InlineData(64)]
    [InlineData(1000)]
    public void Uniform_spacing_fast_path_matches_the_direct_sum(int n)
    {
        var z = ArrayGeometry.Uniform(n, 0.7 * Lambda);
        var a = RandomExcitations(n, 3 * n);
        var grid = AngleGrid.VisibleInSine(1027);
        var fast = ArrayFactor.Compute(z, a, K, grid, ElementPatterns.HalfWaveSlotHPlane);
        var direct = ArrayFactor.ComputeDirect(z, a, K, grid, ElementPatterns.HalfWaveSlotHPlane);
        double scale = a.Sum(x => x.Magnitude);
        for (int i = 0; i < grid.Count; i++)
            Check.Absolute(0, (fast.Field[i] - direct.Field[i]).Magnitude / scale, 1e-11, "same sum evaluated directly");
    }

    [Fact]
    public void A_progressive_phase_steers_the_beam_to_the_chosen_angle()
    {
        double theta0 = 20 * Math.PI / 180;
        var z = ArrayGeometry.Uniform(32, Lambda / 2);
        var a = z.Select(x => Complex.Exp(new Complex(0, -K * x * Math.Sin(theta0)))).ToArray();
        var m = PatternMetrics.Measure(ArrayFactor.Compute(z, a, K, AngleGrid.HalfSpaceInTheta(4001)));
        // Phase-steering condition ψ = k d (sin θ − sin θ0) (Balanis 2005, Sec. 6.3).
        Check.Absolute(theta0, m.BeamDirection.Radians, 1e-5, "phase steering, Balanis 2005, Sec. 6.3");
    }

    [Fact]
    public void Mismatched_inputs_are_rejected_with_what_to_change()
    {
        var e = Assert.Throws<ArgumentException>(() => ArrayFactor.Compute([0.0, 0.01], new double[] { 1 }, K, AngleGrid.VisibleInSine(11)));
        Assert.Contains("one excitation per element", e.Message);
        Assert.Throws<ArgumentOutOfRangeException>(() => ArrayFactor.Compute([0.0], new double[] { 1 }, -1, AngleGrid.VisibleInSine(11)));
        Assert.Throws<ArgumentOutOfRangeException>(() => AngleGrid.UniformInSine(-1.5, 1, 11));
        Assert.Throws<ArgumentOutOfRangeException>(() => AngleGrid.UniformInTheta(Quantities.Angle.FromDegrees(-30), Quantities.Angle.FromDegrees(95), 11));
        var g = AngleGrid.UniformInTheta(Quantities.Angle.FromDegrees(-30), Quantities.Angle.FromDegrees(30), 7);
        Check.Absolute(-Math.PI / 6, g.Theta[0], 1e-15, "degrees → radians");
        Check.Absolute(0, g.Theta[3], 0, "mirrored grid has an exact zero");
        Check.Absolute(-g.Sines[1], g.Sines[5], 0, "mirrored grid");
    }

    /// <summary>The bits of a field, hashed.</summary>
    private static string Digest(IReadOnlyList<Complex> field)
    {
        var bytes = new byte[field.Count * 16];
        for (int i = 0; i < field.Count; i++)
        {
            BitConverter.TryWriteBytes(bytes.AsSpan(16 * i), field[i].Real);
            BitConverter.TryWriteBytes(bytes.AsSpan(16 * i + 8), field[i].Imaginary);
        }
        return Convert.ToHexString(System.Security.Cryptography.SHA256.HashData(bytes));
    }

    [Theory]
    // Recorded with the four-lane, one-thread direct sum before the eight-lane and many-core one (main at 8bf4d0a).
    [InlineData(-1.2, 1.5, 8191, 1001, "A0665A44A32D0882F9491C6A1CE7EBA3F3539C364D25FE80E8AE7FCA42274AF8")]
    [InlineData(-Math.PI / 2, Math.PI / 2, 4096, 203, "34AAE3EC7D5AE23150B83A50A17DC36D1E9343F549B15889D1323B772C2F36AB")]
    public void The_direct_sum_keeps_its_bits(double lo, double hi, int angles, int elements, string digest)
    {
        // Issue 12: results stay bit-identical where the method is unchanged. The first case is large enough to spread
        // its angles over the cores (ParallelDirectSumWork); the second is symmetric and one-threaded.
        var z = Enumerable.Range(0, elements).Select(i => 0.7 * i + 0.01 * Math.Sin(i)).ToArray();
        var a = Enumerable.Range(0, elements).Select(i => Complex.FromPolarCoordinates(1 + 0.5 * Math.Cos(i), 0.3 * i)).ToArray();
        var pattern = ArrayFactor.ComputeDirect(z, a, 2 * Math.PI, AngleGrid.UniformInTheta(lo, hi, angles));
        Assert.Equal(digest, Digest(pattern.Field));
    }

    [Theory]
    [InlineData(997, 1500)]    // a scalar tail of 5 elements; one thread
    [InlineData(1003, 2048)]   // many cores
    public void Eight_lanes_and_four_lanes_give_the_same_bits_and_so_do_one_thread_and_many(int elements, int angles)
    {
        var rng = new Random(elements);
        var z = Enumerable.Range(0, elements).Select(i => 0.0213 * i + 1e-4 * rng.NextDouble()).ToArray();
        var a = RandomExcitations(elements, 3);
        var u = AngleGrid.UniformInTheta(-1.3, 1.1, angles).Sines.ToArray();
        var wide = ArrayFactor.DirectSum(z, a, K, u, wide: true);
        Assert.Equal(Digest(ArrayFactor.DirectSum(z, a, K, u, wide: false)), Digest(wide));
        var oneByOne = Enumerable.Range(0, angles).Select(j => ArrayFactor.DirectSum(z, a, K, u.AsSpan(j, 1), wide: false)[0]).ToArray();
        Assert.Equal(Digest(oneByOne), Digest(wide));
    }

    [Theory]
    [InlineData(1000, 22_000)]   // a band-sweep directivity grid of a 1,000-slot stick: 512-bit passes, then 256-bit, then scalar
    [InlineData(16, 37)]
    public void Equally_spaced_sums_give_the_same_bits_on_every_vector_width_as_one_angle_at_a_time(int elements, int angles)
    {
        // Issue 12: the Horner sums of an equally spaced array run 32, 8 or 1 angle(s) at a time with the same products
        // and sums per angle; a lone angle takes the scalar loop, so each angle alone must give the same bits.
        var z = Enumerable.Range(0, elements).Select(i => -0.0112 - 0.0223 * i).ToArray();
        var a = RandomExcitations(elements, 5);
        var u = AngleGrid.UniformInTheta(-1.4, 1.2, angles).Sines.ToArray();
        var all = ArrayFactor.AtSines(z, a, K, u);
        var probe = Enumerable.Range(0, 64).Select(j => (int)((long)j * (angles - 1) / 63)).Distinct().ToArray();
        var alone = probe.Select(j => ArrayFactor.AtSines(z, a, K, u.AsSpan(j, 1))[0]).ToArray();
        Assert.Equal(Digest(alone), Digest(probe.Select(j => all[j]).ToArray()));
    }
}
