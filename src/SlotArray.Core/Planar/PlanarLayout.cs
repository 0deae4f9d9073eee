using SlotArray.Core.Design;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Planar;

/// <summary>
/// One radiating slot's place on the aperture. Aperture axes: origin at the aperture centre, x along the branches,
/// y across them (branch 1 at the most negative y), z out of the radiating face.
/// </summary>
/// <param name="Branch">1-based branch number (increasing with y).</param>
/// <param name="Index">1-based slot number within its branch (increasing with x).</param>
/// <param name="Column">0-based column of the bounding grid (the same x for every branch).</param>
/// <param name="X">Slot centre x, m.</param>
/// <param name="Y">The branch's centre line y, m (the slot's own offset from it is a design result).</param>
internal readonly record struct ApertureSlot(int Branch, int Index, int Column, double X, double Y);

/// <summary>
/// Where the radiating slots of a planar array sit: <see cref="Branches"/> parallel branch guides at pitch
/// <see cref="Pitch"/>, each with slots at spacing <see cref="Spacing"/> (λg/2 of the branch guide for a standing-wave
/// branch), the bounding grid <see cref="Columns"/> × <see cref="Branches"/> clipped to the <see cref="Outline"/>.
/// The branches are fed at their centre (x = 0), where the feed guide crosses behind them; so the slots of a branch
/// sit symmetrically at x = ±(i − ½) d and the bounding grid has an even number of columns.
/// </summary>
/// <param name="Branches">Branch count M of the bounding grid, ≥ 1.</param>
/// <param name="Columns">Slots per branch N of the bounding grid (even, ≥ 2).</param>
/// <param name="Spacing">Slot spacing d along the branches.</param>
/// <param name="Pitch">Branch pitch (centre line to centre line across).</param>
/// <param name="Outline">The outline that clips the grid.</param>
/// <param name="Slots">The kept slots, ordered by branch, then x.</param>
internal sealed record PlanarLayout(int Branches, int Columns, Length Spacing, Length Pitch, PlanarOutline Outline, IReadOnlyList<ApertureSlot> Slots)
{
    /// <summary>Largest bounding grid (branches × slots per branch) accepted.</summary>
    public const int MaximumSlots = 2500;

    /// <summary>Number of kept slots.</summary>
    public int Count => Slots.Count;

    /// <summary>Half-width of the bounding rectangle along x, N d/2 (each slot owns a cell d × pitch).</summary>
    public double HalfLengthX => 0.5 * Columns * Spacing.Meters;

    /// <summary>Half-width of the bounding rectangle along y, M p/2.</summary>
    public double HalfLengthY => 0.5 * Branches * Pitch.Meters;

    /// <summary>Semi-axes (m) of the outline's ellipse (circle: both the smaller half-width); the rectangle's half-widths for a rectangle.</summary>
    public (double X, double Y) SemiAxes => Outline switch
    {
        PlanarOutline.Circle => (Math.Min(HalfLengthX, HalfLengthY), Math.Min(HalfLengthX, HalfLengthY)),
        _ => (HalfLengthX, HalfLengthY),
    };

    /// <summary>Aperture area (m²): the kept slots' cells, count × d × pitch.</summary>
    public double Area => Count * Spacing.Meters * Pitch.Meters;

    /// <summary>The kept slots of one branch (1-based), ordered by x; empty when the outline removed them all.</summary>
    /// <param name="branch">1-based branch number.</param>
    public IReadOnlyList<ApertureSlot> BranchSlots(int branch) => Slots.Where(s => s.Branch == branch).ToArray();

    /// <summary>The branch numbers that kept any slot, in order.</summary>
    public IReadOnlyList<int> FedBranches => Slots.Select(s => s.Branch).Distinct().OrderBy(b => b).ToArray();

    /// <summary>
    /// Builds the layout. Throws <see cref="ArgumentException"/> for an odd column count (a centre-fed branch needs its
    /// feed point between two slots) and <see cref="InfeasibleDesignException"/> when the outline leaves a branch with
    /// a single slot or none at all overall.
    /// </summary>
    /// <param name="branches">Branch count M of the bounding grid, 1 … 200.</param>
    /// <param name="columns">Slots per branch N of the bounding grid, even, 2 … 1000; branches × columns ≤ <see cref="MaximumSlots"/>.</param>
    /// <param name="spacing">Slot spacing along the branches, &gt; 0.</param>
    /// <param name="pitch">Branch pitch, &gt; 0.</param>
    /// <param name="outline">The clipping outline.</param>
    public static PlanarLayout Create(int branches, int columns, Length spacing, Length pitch, PlanarOutline outline)
    {
        if (branches < 1 || branches > 200) throw new ArgumentOutOfRangeException(nameof(branches), branches, "a planar array needs 1 … 200 branches");
        if (columns < 2 || columns > 1000) throw new ArgumentOutOfRangeException(nameof(columns), columns, "each branch needs 2 … 1000 slots");
        if ((long)branches * columns > MaximumSlots)
            throw new InfeasibleDesignException($"{branches} branches × {columns} slots is {(long)branches * columns} slots; the planar design here handles at most {MaximumSlots} (its coupled network is one dense system): use fewer slots or branches");
        if (columns % 2 != 0)
            throw new ArgumentException($"slots.count = {columns}: a centre-fed branch needs an even number of slots (its coupling slot sits between the middle two); use {columns + 1} or {columns - 1}", nameof(columns));
        if (!(spacing.Meters > 0) || !(pitch.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(spacing), "the slot spacing and the branch pitch must be positive");
        var probe = new PlanarLayout(branches, columns, spacing, pitch, outline, []);
        var (rx, ry) = probe.SemiAxes;
        var list = new List<ApertureSlot>();
        for (int b = 1; b <= branches; b++)
        {
            double y = (b - 1 - 0.5 * (branches - 1)) * pitch.Meters;
            int index = 0;
            for (int c = 0; c < columns; c++)
            {
                double x = (c - 0.5 * (columns - 1)) * spacing.Meters;
                bool inside = outline == PlanarOutline.Rectangle || (x / rx) * (x / rx) + (y / ry) * (y / ry) <= 1 + 1e-12;
                if (inside) list.Add(new ApertureSlot(b, ++index, c, x, y));
            }
            if (index == 1)
                throw new InfeasibleDesignException($"the {outline.ToString().ToLowerInvariant()} outline leaves branch {b} with one slot: a centre-fed branch needs slots on both sides of its feed; use more slots per branch or fewer branches");
        }
        if (list.Count == 0) throw new InfeasibleDesignException("the outline leaves no slot inside: enlarge the grid");
        return probe with { Slots = list.AsReadOnly() };
    }
}
