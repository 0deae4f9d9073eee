using SlotArray.Core.Quantities;
using Complex = System.Numerics.Complex;

namespace SlotArray.Core.Patterns;

/// <summary>The cross-polarised cut of an array of tilted (edge) slots and its peak.</summary>
/// <param name="Pattern">Cross-polarised field on the same grid and scale as the co-polarised cut.</param>
/// <param name="PeakLevelDb">Peak cross-polarised power relative to the co-polarised peak, dB.</param>
/// <param name="PeakDirection">Where the cross-polarised peak lies (θ from broadside, positive toward the datum end as in the co-polar cut).</param>
/// <param name="PowerRatio">∫|E_x|² du / ∫|E_co|² du over the cut (u = sin θ): the cross-polarised share of the radiated power, relative to the co-polarised.</param>
internal sealed record CrossPolarFigures(Pattern Pattern, double PeakLevelDb, Angle PeakDirection, double PowerRatio);

/// <summary>
/// Co- and cross-polarised far field of narrow-wall (edge) slots tilted ±θ_n, in the plane containing the guide axis
/// and the narrow-wall normal: a second array factor for the cross-polarised components (derived here [D]; see <c>EdgeSlotCrossPolarization</c>).
/// </summary>
/// <remarks>
/// <para>Decomposition [D: this project, from the far field of a magnetic current, E ∝ r̂ × M; C. A. Balanis,
/// <i>Antenna Theory</i>, 3rd ed., Wiley 2005, Ch. 12 (field equivalence), from memory]: a slot tilted θ_n from the
/// direction across the narrow wall (ŷ) carries a magnetic current along ŝ = cos θ_n ŷ + sin θ_n ẑ, ẑ the guide axis.
/// In the plane of the guide axis and the wall normal x̂, with r̂ = cos ψ x̂ + sin ψ ẑ (ψ from broadside):
/// r̂ × ŷ has unit length, so the ŷ component (∝ cos θ_n) radiates the co-polarised field (E in the plane of the cut:
/// horizontal polarisation for a horizontal guide) UNIFORMLY over the half-space: in that plane the slot is seen in
/// its E-plane (Balanis 2005, slot as the dual of the half-wave dipole: the plane perpendicular to the slot axis is uniform over the half-space);
/// |r̂ × ẑ| = cos ψ, so the ẑ component (∝ sin θ_n) radiates the cross-polarised field (E along ŷ) with the element
/// pattern cos ψ. The half-wave slot's own length factor F(u) = cos(πu/2)/(1 − u²), u = ŝ·r̂ = sin θ_n sin ψ, stays above 0.94
/// for the tilts in use (|sin θ_n| ≤ 0.5; above 0.99 for θ_n = 15°, ψ = 45°) and is omitted for both. Finite narrow face: the wall is only b + 2t tall, so
/// the true co-polar element pattern falls off toward grazing; an infinite ground plane is assumed (as everywhere
/// in the pattern analysis).</para>
/// <para>Excitations: the network's slot excitation e_n is proportional to the slot voltage, which carries the sign
/// of the tilt; the co-polarised source is e_n cos θ_n and the cross-polarised e_n sin θ_n (θ_n signed), whose sign
/// no longer alternates with the tilts. The cross-polarised sources therefore lack the π alternation: for a
/// standing-wave array (broadside co-polar beam) they add in phase at sin ψ = ±λ/(2d), for a travelling-wave array at
/// sin ψ = sin θ_b ± λ/(2d), with a peak tan θ below the co-polar beam for equal tilts before element weighting
/// ([D], <c>EdgeSlotCrossPolarization</c>).</para>
/// </remarks>
internal static class CrossPolarPattern
{
    /// <summary>Co-polarised element pattern of an edge slot in the plane of the guide axis: 1 (uniform over the half-space; see remarks).</summary>
    public static Func<double, double> EdgeSlotCoPolarElement { get; } = _ => 1.0;

    /// <summary>Cross-polarised element pattern of an edge slot's axial component in that plane: cos ψ (see remarks).</summary>
    public static Func<double, double> EdgeSlotCrossPolarElement { get; } = Math.Cos;

    /// <summary>The co-polarised sources e_n cos θ_n of slots with signed tilts θ_n.</summary>
    /// <param name="excitations">Slot excitations e_n (∝ slot voltage, carrying the tilt's sign).</param>
    /// <param name="tilts">Signed tilts θ_n, rad.</param>
    public static Complex[] CoPolarSources(IReadOnlyList<Complex> excitations, IReadOnlyList<double> tilts)
        => Scaled(excitations, tilts, Math.Cos);

    /// <summary>The cross-polarised sources e_n sin θ_n of slots with signed tilts θ_n.</summary>
    /// <param name="excitations">Slot excitations e_n.</param>
    /// <param name="tilts">Signed tilts θ_n, rad.</param>
    public static Complex[] CrossPolarSources(IReadOnlyList<Complex> excitations, IReadOnlyList<double> tilts)
        => Scaled(excitations, tilts, Math.Sin);

    /// <summary>
    /// The cross-polarised cut and its peak relative to the peak of <paramref name="coPolar"/> (computed on the same
    /// grid, from the same excitations and positions, with the co-polarised sources).
    /// </summary>
    /// <param name="positions">Element positions along the pattern's axis (as passed for the co-polar cut), m.</param>
    /// <param name="excitations">Slot excitations e_n (not yet split).</param>
    /// <param name="tilts">Signed tilts θ_n, rad.</param>
    /// <param name="wavenumber">Free-space wavenumber, rad/m.</param>
    /// <param name="coPolar">The co-polarised cut.</param>
    /// <param name="crossElement">Cross-polarised element pattern; <see cref="EdgeSlotCrossPolarElement"/> when null, or
    /// <see cref="ElementPatterns.Isotropic"/> for the level before element weighting.</param>
    public static CrossPolarFigures Compute(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations,
        IReadOnlyList<double> tilts, double wavenumber, Pattern coPolar, Func<double, double>? crossElement = null)
    {
        ArgumentNullException.ThrowIfNull(coPolar);
        var cross = ArrayFactor.Compute(positions, CrossPolarSources(excitations, tilts), wavenumber, coPolar.Grid,
            crossElement ?? EdgeSlotCrossPolarElement);
        int i0 = cross.Power.IndexOf(cross.PeakPower);
        var (dir, peak) = LobeSearch.RefineMaximum(cross.Theta, cross.Power, i0);
        var u = coPolar.Grid.Sines;
        int last = u.Length - 1;
        double ratio = LobeSearch.IntegrateInSine(u, cross.Power, 0, last) / LobeSearch.IntegrateInSine(u, coPolar.Power, 0, last);
        return new CrossPolarFigures(cross, LobeSearch.Db(peak / coPolar.PeakPower), Angle.FromRadians(dir), ratio);
    }

    private static Complex[] Scaled(IReadOnlyList<Complex> excitations, IReadOnlyList<double> tilts, Func<double, double> f)
    {
        ArgumentNullException.ThrowIfNull(excitations);
        ArgumentNullException.ThrowIfNull(tilts);
        if (excitations.Count != tilts.Count)
            throw new ArgumentException($"{excitations.Count} excitations but {tilts.Count} tilts: give one tilt per slot", nameof(tilts));
        var s = new Complex[excitations.Count];
        for (int i = 0; i < s.Length; i++) s[i] = excitations[i] * f(tilts[i]);
        return s;
    }
}
