using System.Collections.Immutable;

namespace SlotArray.Core.Patterns;

/// <summary>
/// The observation angles of a pattern cut: θ measured from broadside in the plane that contains the array axis,
/// θ &gt; 0 toward +z (architecture.md, "Conventions"), in radians, strictly increasing, within [−π/2, π/2].
/// </summary>
internal sealed class AngleGrid
{
    private AngleGrid(ImmutableArray<double> theta, ImmutableArray<double> sines, bool uniformInSine)
    {
        Theta = theta;
        Sines = sines;
        IsUniformInSine = uniformInSine;
    }

    /// <summary>The angles θ (rad), increasing.</summary>
    public ImmutableArray<double> Theta { get; }

    /// <summary>sin θ at each angle.</summary>
    public ImmutableArray<double> Sines { get; }

    /// <summary>True when the points are equally spaced in sin θ.</summary>
    public bool IsUniformInSine { get; }

    /// <summary>Number of angles.</summary>
    public int Count => Theta.Length;

    /// <summary><paramref name="count"/> angles equally spaced in θ from <paramref name="minimum"/> to <paramref name="maximum"/> (rad, inclusive).</summary>
    /// <param name="minimum">First angle, rad, ≥ −π/2.</param>
    /// <param name="maximum">Last angle, rad, ≤ π/2, &gt; minimum.</param>
    /// <param name="count">Number of angles, ≥ 3.</param>
    public static AngleGrid UniformInTheta(double minimum, double maximum, int count)
    {
        Validate(minimum, maximum, count, Math.PI / 2, "θ");
        var t = Spaced(minimum, maximum, count);
        var u = t.Select(Math.Sin).ToArray();
        if (minimum == -maximum) for (int i = 0; i < count / 2; i++) u[count - 1 - i] = -u[i];
        return new AngleGrid(ImmutableArray.Create(t), ImmutableArray.Create(u), false);
    }

    /// <summary><paramref name="count"/> angles equally spaced in θ from <paramref name="minimum"/> to <paramref name="maximum"/> (inclusive).</summary>
    /// <param name="minimum">First angle, ≥ −90°.</param>
    /// <param name="maximum">Last angle, ≤ 90°, &gt; minimum.</param>
    /// <param name="count">Number of angles, ≥ 3.</param>
    public static AngleGrid UniformInTheta(Quantities.Angle minimum, Quantities.Angle maximum, int count)
        => UniformInTheta(minimum.Radians, maximum.Radians, count);

    /// <summary>The whole front half-space, −90° … +90°, equally spaced in θ.</summary>
    /// <param name="count">Number of angles, ≥ 3.</param>
    public static AngleGrid HalfSpaceInTheta(int count) => UniformInTheta(-Math.PI / 2, Math.PI / 2, count);

    /// <summary><paramref name="count"/> points equally spaced in u = sin θ from <paramref name="minimum"/> to <paramref name="maximum"/> (inclusive).</summary>
    /// <param name="minimum">First sine, ≥ −1.</param>
    /// <param name="maximum">Last sine, ≤ 1, &gt; minimum.</param>
    /// <param name="count">Number of points, ≥ 3.</param>
    public static AngleGrid UniformInSine(double minimum, double maximum, int count)
    {
        Validate(minimum, maximum, count, 1, "sin θ");
        var u = Spaced(minimum, maximum, count);
        var t = u.Select(Math.Asin).ToArray();
        if (minimum == -maximum) for (int i = 0; i < count / 2; i++) t[count - 1 - i] = -t[i];
        return new AngleGrid(ImmutableArray.Create(t), ImmutableArray.Create(u), true);
    }

    /// <summary>The visible region −1 ≤ sin θ ≤ 1, equally spaced in sin θ.</summary>
    /// <param name="count">Number of points, ≥ 3.</param>
    public static AngleGrid VisibleInSine(int count) => UniformInSine(-1, 1, count);

    /// <summary>Equally spaced values, both ends exact, and exactly mirrored (x[N−1−i] = −x[i]) when minimum = −maximum.</summary>
    private static double[] Spaced(double minimum, double maximum, int count)
    {
        var x = new double[count];
        for (int i = 0; i < count; i++) x[i] = minimum + (maximum - minimum) * i / (count - 1);
        x[count - 1] = maximum;
        if (minimum == -maximum)
        {
            for (int i = 0; i < count / 2; i++) x[count - 1 - i] = -x[i];
            if (count % 2 == 1) x[count / 2] = 0;
        }
        return x;
    }

    private static void Validate(double minimum, double maximum, int count, double limit, string what)
    {
        if (count < 3) throw new ArgumentOutOfRangeException(nameof(count), count, "An angle grid needs at least 3 points: ask for more.");
        if (!(minimum >= -limit - 1e-15 && maximum <= limit + 1e-15 && maximum > minimum))
            throw new ArgumentOutOfRangeException(nameof(minimum), $"The {what} range [{minimum}, {maximum}] must be increasing and inside [−{limit}, {limit}].");
    }
}
