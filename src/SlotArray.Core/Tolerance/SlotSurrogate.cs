using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Tolerance;

/// <summary>Builds a slot model for a (perturbed) guide and slot width: how the tolerance analysis reaches the slot model of the design.</summary>
/// <param name="guide">The guide, possibly with a perturbed broad wall or wall thickness.</param>
/// <param name="width">The slot width, possibly perturbed.</param>
internal delegate IShuntSlotModel SlotModelFactory(RectangularWaveguide guide, Length width);

/// <summary>
/// The slot model of one designed slot at the design frequency, made cheap for the Monte Carlo: a barycentric
/// Chebyshev surface (J.-P. Berrut and L. N. Trefethen, "Barycentric Lagrange interpolation", SIAM Review 46(3), 2004; from memory) of y(|c|, L) over the tolerance range of the coupling |c| and the length L (built once from the
/// real model), plus first-order terms for the slot width w, the wall thickness t and the guide's inside width a.
/// </summary>
/// <remarks>
/// <para>Why (|c|, L) in full and (w, t, a) to first order: the coupling and the length carry the slot's resonance,
/// the strongly non-linear part (Im y changes sign across the length range of a resonant slot), so the surface keeps
/// them exact to its interpolation error. Width, wall and guide width move y smoothly and weakly over machining
/// ranges; their terms are central differences of the real slot model, dy/dq = (y(q + h) − y(q − h))/(2h), with
/// h = the tolerance range (at least 0.01 mm for w and t, 0.02 mm for a, whose step must not be so small that the
/// moment method's mode truncation, set by a cutoff in k_c, jumps inside it). The cross terms (e.g. ∂²y/∂L∂t) are of
/// second order in the errors and are left out; the tests measure the resulting error against direct solves.</para>
/// <para>Outside the rectangle (normal errors beyond 4σ) the real model is solved directly, plus the same first-order
/// terms, so no draw is clamped.</para>
/// <para>Symmetry: y depends on |c| only (y(x) = y(−x) for the longitudinal slot; the tilt sign for the edge slot),
/// so slots of equal |c| and L share one surrogate.</para>
/// </remarks>
internal sealed class SlotSurrogate
{
    /// <summary>Step of the per-slot sensitivities (finite differences on the nominal design): 0.01 mm.</summary>
    public const double SensitivityStep = 1e-5;

    private readonly IShuntSlotModel model;
    private readonly Frequency frequency;

    /// <summary>Builds the surrogate of a slot of coupling |c| = <paramref name="coupling"/> and length <paramref name="length"/>.</summary>
    /// <param name="model">The design's slot model (nominal guide and width).</param>
    /// <param name="factory">Builds the model for a perturbed guide or width.</param>
    /// <param name="coupling">|c| of the slot (m or rad).</param>
    /// <param name="length">Slot length.</param>
    /// <param name="frequency">The design frequency.</param>
    /// <param name="couplingRange">Half-width of the coupling range (same unit as the coupling), ≥ 0.</param>
    /// <param name="lengthRange">Half-width of the length range, m, ≥ 0.</param>
    /// <param name="widthRange">Half-width of the slot-width errors, m, ≥ 0 (0: no width term).</param>
    /// <param name="wallRange">Half-width of the wall-thickness errors, m, ≥ 0 (0: no wall term).</param>
    /// <param name="guideWidthRange">Half-width of the guide-width errors, m, ≥ 0 (0: no guide term).</param>
    /// <param name="nodes">Chebyshev nodes per variable, odd; default 5.</param>
    public SlotSurrogate(IShuntSlotModel model, SlotModelFactory factory, double coupling, Length length, Frequency frequency,
        double couplingRange, double lengthRange, double widthRange, double wallRange, double guideWidthRange, int nodes = 5)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(factory);
        this.model = model;
        this.frequency = frequency;
        Coupling = Math.Abs(coupling);
        Length = length.Meters;
        double c0 = Coupling, l0 = Length;
        Surface = new BarycentricSurface(couplingRange, lengthRange, nodes,
            (dc, dl) => model.Admittance(c0 + dc, Quantities.Length.FromMeters(l0 + dl), frequency));
        Nominal = Surface.Centre;

        var guide = model.Guide;
        var w = model.Width;
        Complex At(IShuntSlotModel m) => m.Admittance(c0, Quantities.Length.FromMeters(l0), frequency);
        Complex Difference(Func<double, IShuntSlotModel> perturbed, double h) => (At(perturbed(h)) - At(perturbed(-h))) / (2 * h);
        IShuntSlotModel Wide(double h) => factory(guide, w + Quantities.Length.FromMeters(h));
        IShuntSlotModel Thick(double h) => factory(guide with { WallThickness = guide.WallThickness + Quantities.Length.FromMeters(h) }, w);
        IShuntSlotModel Broad(double h) => factory(guide with { BroadWall = guide.BroadWall + Quantities.Length.FromMeters(h) }, w);

        WidthPlus = At(Wide(SensitivityStep));
        WidthMinus = At(Wide(-SensitivityStep));
        double hw = Math.Max(widthRange, SensitivityStep);
        DWidth = widthRange == 0 ? Complex.Zero
            : hw == SensitivityStep ? (WidthPlus - WidthMinus) / (2 * hw) : Difference(Wide, hw);
        DWall = wallRange == 0 ? Complex.Zero : Difference(Thick, Math.Max(wallRange, SensitivityStep));
        DGuideWidth = guideWidthRange == 0 ? Complex.Zero : Difference(Broad, Math.Max(guideWidthRange, 2 * SensitivityStep));
    }

    /// <summary>|c| of the nominal slot.</summary>
    public double Coupling { get; }

    /// <summary>Nominal length, m.</summary>
    public double Length { get; }

    /// <summary>The (|c|, L) surface.</summary>
    public BarycentricSurface Surface { get; }

    /// <summary>y at the nominal slot: the slot model's value exactly.</summary>
    public Complex Nominal { get; }

    /// <summary>dy/dw, 1/m (0 when the width has no tolerance).</summary>
    public Complex DWidth { get; }

    /// <summary>dy/dt of the wall thickness, 1/m (0 when the wall has no tolerance).</summary>
    public Complex DWall { get; }

    /// <summary>dy/da of the guide's inside width at fixed offset from the centreline, 1/m (0 when a has no tolerance).</summary>
    public Complex DGuideWidth { get; }

    /// <summary>y of the slot model at width w + <see cref="SensitivityStep"/>.</summary>
    public Complex WidthPlus { get; }

    /// <summary>y of the slot model at width w − <see cref="SensitivityStep"/>.</summary>
    public Complex WidthMinus { get; }

    /// <summary>
    /// y of the perturbed slot: |c| + <paramref name="dCoupling"/>, L + <paramref name="dLength"/> from the surface (or the
    /// real model outside it), plus the first-order width, wall and guide-width terms. All zero: <see cref="Nominal"/> exactly.
    /// </summary>
    public Complex Admittance(double dCoupling, double dLength, double dWidth, double dWall, double dGuideWidth)
    {
        Complex y = Surface.Contains(dCoupling, dLength)
            ? Surface.Evaluate(dCoupling, dLength)
            : Direct(dCoupling, dLength);
        if (dWidth != 0) y += dWidth * DWidth;
        if (dWall != 0) y += dWall * DWall;
        if (dGuideWidth != 0) y += dGuideWidth * DGuideWidth;
        return y;
    }

    /// <summary>The real slot model at |c| + <paramref name="dCoupling"/>, L + <paramref name="dLength"/> (nominal guide and width).</summary>
    public Complex Direct(double dCoupling, double dLength)
        => model.Admittance(Coupling + dCoupling, Quantities.Length.FromMeters(Length + dLength), frequency);
}
