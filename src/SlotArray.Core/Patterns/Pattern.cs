using System.Collections.Immutable;
using Complex = System.Numerics.Complex;

namespace SlotArray.Core.Patterns;

/// <summary>
/// A sampled far-field pattern cut: the complex field (array factor times element pattern, unnormalised) at each
/// angle of a grid. Immutable.
/// </summary>
internal sealed class Pattern
{
    /// <summary>Wraps a sampled field; <paramref name="field"/> has one value per grid angle.</summary>
    /// <param name="grid">The angles.</param>
    /// <param name="field">Complex field at each angle (any scale).</param>
    public Pattern(AngleGrid grid, ImmutableArray<Complex> field)
    {
        ArgumentNullException.ThrowIfNull(grid);
        if (field.Length != grid.Count)
            throw new ArgumentException($"The field has {field.Length} values but the grid has {grid.Count} angles.", nameof(field));
        Grid = grid;
        Field = field;
        var p = new double[field.Length];
        double peak = 0;
        for (int i = 0; i < p.Length; i++)
        {
            Complex f = field[i];
            p[i] = f.Real * f.Real + f.Imaginary * f.Imaginary;
            if (p[i] > peak) peak = p[i];
        }
        Power = ImmutableArray.Create(p);
        PeakPower = peak;
    }

    /// <summary>The angles of the cut.</summary>
    public AngleGrid Grid { get; }

    /// <summary>The complex field at each angle.</summary>
    public ImmutableArray<Complex> Field { get; }

    /// <summary>|field|² at each angle.</summary>
    public ImmutableArray<double> Power { get; }

    /// <summary>The largest |field|² on the grid.</summary>
    public double PeakPower { get; }

    /// <summary>The angles θ (rad).</summary>
    public ImmutableArray<double> Theta => Grid.Theta;

    /// <summary>
    /// Power relative to the grid peak, dB (10 log10(|F|²/max|F|²)), floored at <paramref name="floorDb"/> so that
    /// exact nulls stay finite.
    /// </summary>
    /// <param name="floorDb">Lowest value returned, dB (default −300).</param>
    public double[] RelativeDecibels(double floorDb = -300)
    {
        var db = new double[Power.Length];
        for (int i = 0; i < db.Length; i++)
            db[i] = PeakPower > 0 && Power[i] > 0 ? Math.Max(floorDb, 10 * Math.Log10(Power[i] / PeakPower)) : floorDb;
        return db;
    }
}
