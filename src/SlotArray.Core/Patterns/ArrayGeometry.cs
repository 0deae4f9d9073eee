namespace SlotArray.Core.Patterns;

/// <summary>Element positions along the array axis (metres).</summary>
internal static class ArrayGeometry
{
    /// <summary>
    /// N equally spaced positions centred on z = 0: z_n = (n − (N − 1)/2)·d, n = 0 … N − 1
    /// (Balanis, <i>Antenna Theory</i>, 3rd ed., 2005, Sec. 6.3, array centred on the origin).
    /// </summary>
    /// <param name="count">Number of elements, ≥ 1.</param>
    /// <param name="spacing">Element spacing d, m, &gt; 0.</param>
    public static double[] Uniform(int count, double spacing)
    {
        if (count < 1) throw new ArgumentOutOfRangeException(nameof(count), count, "An array needs at least one element.");
        if (!(spacing > 0) || double.IsInfinity(spacing))
            throw new ArgumentOutOfRangeException(nameof(spacing), spacing, "The element spacing must be a positive, finite length in metres.");
        var z = new double[count];
        for (int n = 0; n < count; n++) z[n] = (n - (count - 1) / 2.0) * spacing;
        return z;
    }

    /// <summary>
    /// True when the positions are equally spaced (to 1e-12 of the span) and increasing; returns the spacing.
    /// </summary>
    /// <param name="positions">Element positions, m.</param>
    /// <param name="spacing">The common spacing, m, when true.</param>
    public static bool IsUniform(IReadOnlyList<double> positions, out double spacing)
    {
        spacing = 0;
        int n = positions.Count;
        if (n < 2) return false;
        double d = (positions[n - 1] - positions[0]) / (n - 1);
        if (!(d > 0)) return false;
        double tol = 1e-12 * (positions[n - 1] - positions[0]);
        for (int i = 0; i < n; i++)
            if (Math.Abs(positions[i] - (positions[0] + i * d)) > tol) return false;
        spacing = d;
        return true;
    }
}
