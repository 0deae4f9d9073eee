using System.Numerics;
using MathNet.Numerics.LinearAlgebra;
using SlotArray.Core.Network;

namespace SlotArray.Core.Tests.Network;

/// <summary>
/// The coupled network's LU against MathNet.Numerics 5.0.0's dense complex LU (a general-purpose reference library):
/// the same factors and solution to the bit, so that the coupled results did not change when it replaced MathNet's.
/// </summary>
public class ComplexLuTests
{
    private static Complex[] Random(int n, int seed, bool dominant)
    {
        var rnd = new Random(seed);
        var a = new Complex[n * n];
        for (int i = 0; i < a.Length; i++) a[i] = new Complex(rnd.NextDouble() - 0.5, rnd.NextDouble() - 0.5);
        if (dominant) for (int i = 0; i < n; i++) a[i * n + i] += n;
        return a;
    }

    [Theory]
    [InlineData(1, 1, false)]
    [InlineData(2, 2, false)]
    [InlineData(5, 3, false)]
    [InlineData(16, 4, true)]
    [InlineData(37, 5, false)]
    [InlineData(64, 6, false)]
    [InlineData(64, 7, true)]
    [InlineData(101, 8, false)]
    public void Solves_bit_for_bit_as_MathNet_does(int n, int seed, bool dominant)
    {
        // Reference: MathNet.Numerics 5.0.0, Matrix<Complex>.LU().Solve (managed provider).
        var a = Random(n, seed, dominant);
        var rnd = new Random(seed + 100);
        var b = Enumerable.Range(0, n).Select(_ => new Complex(rnd.NextDouble(), rnd.NextDouble())).ToArray();
        var expected = Matrix<Complex>.Build.Dense(n, n, (Complex[])a.Clone()).LU().Solve(MathNet.Numerics.LinearAlgebra.Vector<Complex>.Build.DenseOfArray(b)).ToArray();
        var got = ComplexLu.Factor(a, n).Solve(b);
        for (int i = 0; i < n; i++)
        {
            Assert.Equal(BitConverter.DoubleToInt64Bits(expected[i].Real), BitConverter.DoubleToInt64Bits(got[i].Real));
            Assert.Equal(BitConverter.DoubleToInt64Bits(expected[i].Imaginary), BitConverter.DoubleToInt64Bits(got[i].Imaginary));
        }
    }

    [Fact]
    public void Pivots_past_a_zero_leading_element()
    {
        // [[0, 1], [1, 0]] x = (2, 3) → x = (3, 2): needs the row exchange (any linear-algebra text; Golub & Van Loan 2013, Sec. 3.4).
        Complex[] a = [0, 1, 1, 0];   // column-major
        var x = ComplexLu.Factor(a, 2).Solve([2, 3]);
        Assert.Equal(new Complex(3, 0), x[0]);
        Assert.Equal(new Complex(2, 0), x[1]);
    }

    [Fact]
    public void Refuses_a_right_hand_side_of_the_wrong_length()
        => Assert.Throws<ArgumentException>(() => ComplexLu.Factor(Random(3, 1, true), 3).Solve(new Complex[2]));
}
