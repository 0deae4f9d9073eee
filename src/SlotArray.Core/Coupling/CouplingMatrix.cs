using System.Numerics;

namespace SlotArray.Core.Coupling;

/// <summary>
/// An immutable square complex matrix indexed by slot (0-based): mutual impedances (Ω) or mutual admittances (S)
/// between slots, as the producing method states. Symmetric when it comes from a reciprocal coupling model.
/// </summary>
internal sealed class CouplingMatrix
{
    private readonly Complex[] _values;

    private CouplingMatrix(int count, Complex[] values)
    {
        Count = count;
        _values = values;
    }

    /// <summary>Number of slots (rows = columns).</summary>
    public int Count { get; }

    /// <summary>The entry for slots m and n.</summary>
    public Complex this[int m, int n]
    {
        get
        {
            if ((uint)m >= (uint)Count) throw new ArgumentOutOfRangeException(nameof(m), m, $"slot index must be 0 … {Count - 1}");
            if ((uint)n >= (uint)Count) throw new ArgumentOutOfRangeException(nameof(n), n, $"slot index must be 0 … {Count - 1}");
            return _values[m * Count + n];
        }
    }

    /// <summary>An N × N matrix of zeros (no coupling).</summary>
    public static CouplingMatrix Zero(int count)
    {
        if (count < 0) throw new ArgumentOutOfRangeException(nameof(count), count, "the slot count must be zero or positive");
        return new CouplingMatrix(count, new Complex[count * count]);
    }

    /// <summary>A copy of a square array. Throws when the array is not square.</summary>
    public static CouplingMatrix FromArray(Complex[,] values)
    {
        ArgumentNullException.ThrowIfNull(values);
        int n = values.GetLength(0);
        if (values.GetLength(1) != n)
            throw new ArgumentException($"the matrix must be square, got {n} × {values.GetLength(1)}", nameof(values));
        var copy = new Complex[n * n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                copy[i * n + j] = values[i, j];
        return new CouplingMatrix(n, copy);
    }

    /// <summary>Wraps a row-major array the caller gives up (no copy); used by the fill routines.</summary>
    /// <summary>This matrix with every entry multiplied by <paramref name="factor"/>.</summary>
    public CouplingMatrix Times(Complex factor)
    {
        var values = new Complex[Count * Count];
        for (int i = 0; i < Count; i++)
            for (int j = 0; j < Count; j++) values[i * Count + j] = this[i, j] * factor;
        return new CouplingMatrix(Count, values);
    }

    internal static CouplingMatrix Adopt(int count, Complex[] rowMajor) => new(count, rowMajor);

    /// <summary>Every entry multiplied by a constant (e.g. the Babinet factor 2/η² that turns Ω into S).</summary>
    public CouplingMatrix Scale(Complex factor)
    {
        var v = new Complex[_values.Length];
        for (int i = 0; i < v.Length; i++) v[i] = factor * _values[i];
        return new CouplingMatrix(Count, v);
    }

    /// <summary>A copy as a two-dimensional array.</summary>
    public Complex[,] ToArray()
    {
        var a = new Complex[Count, Count];
        for (int i = 0; i < Count; i++)
            for (int j = 0; j < Count; j++)
                a[i, j] = _values[i * Count + j];
        return a;
    }
}
