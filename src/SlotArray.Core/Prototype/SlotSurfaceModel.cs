using System.Collections.Concurrent;
using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Tolerance;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Prototype;

/// <summary>
/// The design's slot model made cheap for fitting: around each slot of the plate as cut, a barycentric Chebyshev
/// surface of y(|c|, L) (J.-P. Berrut and L. N. Trefethen, "Barycentric Lagrange interpolation", SIAM Review 46(3),
/// 2004; from memory) at each frequency asked for, built once from the real model (lazily, per frequency), so that the
/// thousands of network solutions of a fit do not each solve the moment method. A query outside every surface falls
/// back to the real model. Wrap it in a <see cref="FrequencyInterpolatedSlotModel"/> so that it is only asked at node
/// frequencies.
/// </summary>
internal sealed class SlotSurfaceModel : IShuntSlotModel
{
    private readonly IShuntSlotModel inner;
    private readonly (double C, double L)[] bases;
    private readonly double couplingRange;
    private readonly double lengthRange;
    private readonly int nodes;
    private readonly int couplingNodes;
    private readonly ConcurrentDictionary<(int Base, double Hz), Lazy<BarycentricSurface>> surfaces = new();

    /// <summary>Surfaces around the given slots.</summary>
    /// <param name="inner">The real slot model.</param>
    /// <param name="slots">(coupling, length) of each slot as cut; slots of equal |c| and L share one surface.</param>
    /// <param name="lengthFraction">Half-width of each surface in length, as a fraction of the slot's length (e.g. 0.03).</param>
    /// <param name="couplingFraction">Half-width in |c|, as a fraction of the largest |c| (e.g. 0.1).</param>
    /// <param name="nodes">Chebyshev nodes in length (odd, ≥ 3).</param>
    /// <param name="couplingNodes">Chebyshev nodes in coupling (odd, ≥ 3).</param>
    public SlotSurfaceModel(IShuntSlotModel inner, IReadOnlyList<(double Coupling, Length Length)> slots, double lengthFraction, double couplingFraction,
        int nodes = 5, int couplingNodes = 5)
    {
        ArgumentNullException.ThrowIfNull(inner);
        ArgumentNullException.ThrowIfNull(slots);
        this.inner = inner;
        this.nodes = nodes;
        this.couplingNodes = couplingNodes;
        bases = slots.Select(s => (Math.Abs(s.Coupling), s.Length.Meters)).Distinct().OrderBy(b => b.Item1).ThenBy(b => b.Item2).ToArray();
        lengthRange = lengthFraction * bases.Max(b => b.L);
        couplingRange = couplingFraction * bases.Max(b => b.C);
    }

    /// <inheritdoc />
    public RectangularWaveguide Guide => inner.Guide;

    /// <inheritdoc />
    public Length Width => inner.Width;

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => inner.CouplingKind;

    /// <inheritdoc />
    public string Name => inner.Name;

    /// <inheritdoc />
    public double MaximumCoupling => inner.MaximumCoupling;

    /// <inheritdoc />
    public Complex Admittance(double coupling, Length length, Frequency f)
    {
        double c = Math.Abs(coupling), l = length.Meters;
        int best = -1;
        double bestDistance = double.PositiveInfinity;
        // Bases are sorted by |c|: only those within the coupling range are candidates.
        int first = 0, last = bases.Length;
        while (first < last) { int mid = (first + last) / 2; if (bases[mid].C < c - couplingRange) first = mid + 1; else last = mid; }
        for (int i = first; i < bases.Length && bases[i].C <= c + couplingRange; i++)
        {
            double dc = (c - bases[i].C) / couplingRange, dl = (l - bases[i].L) / lengthRange;
            double d = dc * dc + dl * dl;
            if (Math.Abs(dc) <= 1 && Math.Abs(dl) <= 1 && d < bestDistance) { best = i; bestDistance = d; }
        }
        if (best < 0) return inner.Admittance(c, length, f);
        var (c0, l0) = bases[best];
        var surface = surfaces.GetOrAdd((best, f.Hertz), key => new Lazy<BarycentricSurface>(() =>
            new BarycentricSurface(couplingRange, lengthRange, couplingNodes, (dc, dl) => inner.Admittance(c0 + dc, Length.FromMeters(l0 + dl), f), nodes))).Value;
        return surface.Evaluate(c - c0, l - l0);
    }

    /// <inheritdoc />
    public SlotResonance Resonance(double coupling, Frequency f) => inner.Resonance(coupling, f);

    /// <inheritdoc />
    public SlotResonance ForConductance(double conductance, Frequency f) => inner.ForConductance(conductance, f);

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => inner.MaximumConductance(f);

    /// <inheritdoc />
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f) => inner.Warnings(coupling, f);
}
