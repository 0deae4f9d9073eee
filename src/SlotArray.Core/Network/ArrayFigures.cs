using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Network;

/// <summary>
/// The figures of a designed array at one frequency: the network (match, power budget) and the far field built from
/// the network's slot excitations.
/// </summary>
/// <param name="Network">The network solution at this frequency.</param>
/// <param name="Pattern">The far-field cut in the plane of the guide axis (see <see cref="ArrayFigures"/> for the angle convention).</param>
/// <param name="Metrics">Beam direction, HPBW, sidelobes of that cut.</param>
/// <param name="Directivity">Directivity in the beam direction (half-space, half-wave slot element), dimensionless.</param>
/// <param name="Gain">Gain including mismatch and loss: D × radiation efficiency × (1 − |S11|²) = D × P_rad/P_inc.</param>
internal sealed record FrequencyFigures(NetworkSolution Network, Pattern Pattern, PatternMetrics Metrics, double Directivity, double Gain)
{
    /// <summary>Edge (tilted) slots: the cross-polarised cut and its peak relative to the co-polar beam; null for untilted slots.</summary>
    public CrossPolarFigures? CrossPolar { get; init; }

    /// <summary>The analysis frequency.</summary>
    public Frequency Frequency => Network.Frequency;

    /// <summary>Directivity, dBi.</summary>
    public double DirectivityDbi => Patterns.Directivity.ToDbi(Directivity);

    /// <summary>Gain, dBi.</summary>
    public double GainDbi => Patterns.Directivity.ToDbi(Gain);
}

/// <summary>
/// Far-field figures from the network's slot excitations: the array factor of the excitations
/// <see cref="NetworkSolution.Excitations"/> at the slot positions times the half-wave slot's element pattern in the
/// plane of the guide axis (<c>ElementPatterns.HalfWaveSlotHPlane</c>; pattern multiplication, C. A. Balanis, <i>Antenna Theory</i>,
/// 3rd ed., Wiley 2005, Sec. 6.2), the metrics of the Patterns library, the half-space directivity
/// (the IEEE Std 145-2013 definition over the front half-space) and gain = D × η_rad × (1 − |S11|²) (η_rad = radiated/accepted power; the IEEE Std 145
/// gain times the mismatch factor, i.e. the realised gain). Isolated slots: no mutual coupling, infinite ground plane.
/// </summary>
/// <remarks>
/// Angle convention (architecture.md, "Axes"): θ from broadside in the plane containing the guide axis, θ &gt; 0
/// toward the datum end, i.e. toward the end short (or load) at z = 0, away from the end feed; for a centre feed,
/// also toward the datum end. The Patterns library measures θ &gt; 0 toward +z, so the positions are passed as −z_n.
/// </remarks>
internal static class ArrayFigures
{
    /// <summary>
    /// The default grid: uniform in θ over the half-space, at least 1801 points and about 32 per lobe width
    /// λ/(N d) in sin θ, so that the metrics resolve every lobe.
    /// </summary>
    /// <param name="design">The design (slot count and spacing).</param>
    /// <param name="f">The highest frequency to be analysed.</param>
    public static AngleGrid DefaultGrid(ArrayDesign design, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(design);
        double aperture = design.Count * design.Spacing.Meters / f.FreeSpaceWavelength.Meters;
        int count = Math.Max(1801, 2 * (int)Math.Ceiling(32 * aperture) + 1);
        return AngleGrid.HalfSpaceInTheta(count);
    }

    /// <summary>The figures at the frequency of one network solution.</summary>
    /// <param name="design">The design that was analysed.</param>
    /// <param name="network">Its network solution.</param>
    /// <param name="grid">Angles of the cut; <see cref="DefaultGrid"/> when null.</param>
    public static FrequencyFigures At(ArrayDesign design, NetworkSolution network, AngleGrid? grid = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(network);
        // Positions −z_n (see remarks), listed in increasing order (slot N first) so that equally spaced slots take the
        // array factor's fast path; the excitations follow the same order.
        int n = design.Count;
        var positions = new double[n];
        var excitations = new System.Numerics.Complex[n];
        for (int i = 0; i < n; i++)
        {
            positions[i] = -design.Slots[n - 1 - i].Position.Meters;
            excitations[i] = network.Excitations[n - 1 - i];
        }
        double k = network.Frequency.FreeSpaceWavenumber;
        grid ??= DefaultGrid(design, network.Frequency);
        if (design.CouplingKind == Slots.SlotCouplingKind.Tilt)
        {
            var tilts = Enumerable.Range(0, n).Select(i => design.Slots[n - 1 - i].Coupling).ToArray();
            var co = CrossPolarPattern.CoPolarSources(excitations, tilts);
            var coPattern = ArrayFactor.Compute(positions, co, k, grid, CrossPolarPattern.EdgeSlotCoPolarElement);
            var coMetrics = PatternMetrics.Measure(coPattern);
            var cross = CrossPolarPattern.Compute(positions, excitations, tilts, k, coPattern);
            // Uniform element over the half-space: ∫|AF|² du = 2 Σ a_m a_n* sinc(kΔz), so the half-space directivity is exactly
            // twice the isotropic full-sphere one (IEEE Std 145-2013 definition), in closed form.
            double dCo = 2 * Patterns.Directivity.Isotropic(positions, co, k, coMetrics.BeamDirection.Radians);
            double dEdge = dCo / (1 + cross.PowerRatio);
            return new FrequencyFigures(network, coPattern, coMetrics, dEdge, dEdge * network.RadiatedPower) { CrossPolar = cross };
        }
        var element = ElementPatterns.HalfWaveSlotHPlane;
        var pattern = ArrayFactor.Compute(positions, excitations, k, grid, element);
        var metrics = PatternMetrics.Measure(pattern);
        double d = Patterns.Directivity.HalfSpace(positions, excitations, k, element, metrics.BeamDirection.Radians);
        return new FrequencyFigures(network, pattern, metrics, d, d * network.RadiatedPower);
    }

    /// <summary>The figures at the design frequency and at every point of a sweep, on one grid.</summary>
    /// <param name="design">The design that was swept.</param>
    /// <param name="sweep">Its sweep.</param>
    /// <param name="grid">Angles of the cut; <see cref="DefaultGrid"/> at the sweep's highest frequency when null.</param>
    public static (FrequencyFigures AtDesign, IReadOnlyList<FrequencyFigures> Points) ForSweep(ArrayDesign design, FrequencySweep sweep,
        AngleGrid? grid = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var top = sweep.Points.Count > 0 ? sweep.Points[^1].Frequency : sweep.DesignFrequency;
        var g = grid ?? DefaultGrid(design, top > sweep.DesignFrequency ? top : sweep.DesignFrequency);
        // Each point is an independent pure computation written to its own slot: parallel and still deterministic.
        var points = new FrequencyFigures[sweep.Points.Count];
        Parallel.For(0, points.Length, i => points[i] = At(design, sweep.Points[i], g));
        return (At(design, sweep.AtDesign, g), Array.AsReadOnly(points));
    }
}
