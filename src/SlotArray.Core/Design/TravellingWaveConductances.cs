using System.Globalization;

namespace SlotArray.Core.Design;

/// <summary>Which closed form turns the power a slot must radiate into its conductance.</summary>
internal enum TravellingWaveConductanceForm
{
    /// <summary>
    /// Exact single shunt on a matched line (default): g = 2[(1 − p) − √(1 − 2p)]/p, p the fraction of the arriving
    /// power the slot must absorb; its reflection g²/(2 + g)² is booked as lost. Hard limit p ≤ 0.5.
    /// </summary>
    SingleShunt,
    /// <summary>Small-g form: g = P_n / (power arriving at slot n); reflections neglected.</summary>
    SmallConductance,
}

/// <summary>
/// Isolated-slot conductances of a travelling-wave (matched-load) array from the power each slot must radiate,
/// slot by slot from the feed, with the line loss of each section.
/// </summary>
/// <remarks>
/// <para>Small-g form [M: R. S. Elliott, <i>Antenna Theory and Design</i>, Prentice-Hall 1981, Ch. 8 (travelling-wave
/// arrays); R. C. Hansen, <i>Phased Array Antennas</i>, Wiley 1998; from memory, High confidence]: a slot of small
/// conductance g radiates g times the power arriving at it, so g_n = P_n / A_n, with A_n the power arriving at slot n.
/// Lossless, A_n = P_L + Σ_{m≥n} P_m.</para>
/// <para>Single shunt on a matched line [D: derived here from the reflection Γ = −g/(2 + g) of a
/// shunt conductance between matched lines]: the slot absorbs p = 4g/(2 + g)² of the arriving power, reflects
/// g²/(2 + g)² and passes 4/(2 + g)². Inverting, g = 2[(1 − p) − √(1 − 2p)]/p (the root with g ≤ 2); p ≤ 0.5 is the
/// hard limit reached at g = 2. The reflected power is booked as lost, so the power arriving at the next slot is
/// (A_n − P_n − R_n) e^{−2αd}. Neither form includes the phase-dependent recombination of the reflections: the
/// network refinement of <see cref="TravellingWaveDesigner"/> does.</para>
/// <para>Line loss: each section of length d between slots multiplies the power travelling on by e^{−2αd}
/// (α the TE10 attenuation in Np/m, D. M. Pozar, <i>Microwave Engineering</i>, 4th ed., 2012, eq. 3.96).</para>
/// </remarks>
internal static class TravellingWaveConductances
{
    /// <summary>
    /// Fraction of the arriving power a shunt conductance g on a matched line absorbs: p = 4g/(2 + g)² ([D], see remarks).
    /// </summary>
    /// <param name="conductance">Normalised conductance g = G/G0, ≥ 0.</param>
    public static double AbsorbedFraction(double conductance)
    {
        if (!(conductance >= 0) || !double.IsFinite(conductance))
            throw new ArgumentOutOfRangeException(nameof(conductance), conductance, "the conductance must be a finite number ≥ 0");
        return 4 * conductance / ((2 + conductance) * (2 + conductance));
    }

    /// <summary>Fraction of the arriving power a shunt conductance g on a matched line reflects: g²/(2 + g)².</summary>
    /// <param name="conductance">Normalised conductance g ≥ 0.</param>
    public static double ReflectedFraction(double conductance)
    {
        if (!(conductance >= 0) || !double.IsFinite(conductance))
            throw new ArgumentOutOfRangeException(nameof(conductance), conductance, "the conductance must be a finite number ≥ 0");
        return conductance * conductance / ((2 + conductance) * (2 + conductance));
    }

    /// <summary>
    /// The conductance g ≤ 2 of a shunt on a matched line that absorbs the fraction p of the arriving power:
    /// g = 2[(1 − p) − √(1 − 2p)]/p ([D], the inverse of <see cref="AbsorbedFraction"/>); written as g = 2p/[(1 − p) + √(1 − 2p)] (the same
    /// value, free of cancellation at small p). Throws <see cref="InfeasibleDesignException"/> for p &gt; 0.5.
    /// </summary>
    /// <param name="fraction">p, 0 ≤ p ≤ 0.5.</param>
    public static double SingleShuntConductance(double fraction)
    {
        if (!(fraction >= 0) || !double.IsFinite(fraction))
            throw new ArgumentOutOfRangeException(nameof(fraction), fraction, "the absorbed fraction must be a finite number ≥ 0");
        if (fraction > 0.5)
            throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                $"a shunt slot on a matched line can absorb at most half the power arriving at it, but p = {fraction:0.###} is asked: leave more power for the load or use more slots"));
        return 2 * fraction / ((1 - fraction) + Math.Sqrt(1 - 2 * fraction));
    }

    /// <summary>
    /// Conductances of slots numbered FROM THE FEED (index 0 first) that radiate the powers <paramref name="powers"/>
    /// (fractions of the power arriving at the first slot), with the given form and section loss.
    /// </summary>
    /// <param name="powers">P_n, power each slot radiates, ≥ 0, fractions of the power arriving at the first slot; feed first.</param>
    /// <param name="form">Small-g or single-shunt form.</param>
    /// <param name="sectionTransmission">e^{−2αd} per section between neighbouring slots, 0 &lt; T ≤ 1 (1: lossless).</param>
    /// <param name="slotNumber">Maps an index from the feed to the slot number printed in messages; identity + 1 when null.</param>
    /// <exception cref="InfeasibleDesignException">A slot must absorb more than the form allows (single shunt: p &gt; 0.5), or more power than arrives.</exception>
    public static TravellingWaveBudget FromFeed(IReadOnlyList<double> powers, TravellingWaveConductanceForm form,
        double sectionTransmission = 1, Func<int, int>? slotNumber = null)
    {
        ArgumentNullException.ThrowIfNull(powers);
        if (!(sectionTransmission > 0 && sectionTransmission <= 1))
            throw new ArgumentOutOfRangeException(nameof(sectionTransmission), sectionTransmission, "the section transmission e^(-2 alpha d) must lie in (0, 1]");
        slotNumber ??= i => i + 1;
        int n = powers.Count;
        var g = new double[n];
        var arriving = new double[n];
        double a = 1, reflected = 0, wall = 0;
        for (int i = 0; i < n; i++)
        {
            if (i > 0)
            {
                wall += a * (1 - sectionTransmission);
                a *= sectionTransmission;
            }
            arriving[i] = a;
            double pn = powers[i];
            if (!(pn >= 0) || !double.IsFinite(pn))
                throw new ArgumentOutOfRangeException(nameof(powers), pn, $"slot {slotNumber(i)}: the power to radiate must be a finite number ≥ 0");
            double p = pn / a;
            if (form == TravellingWaveConductanceForm.SmallConductance)
            {
                if (p >= 1)
                    throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                        $"slot {slotNumber(i)} must radiate {pn:0.#####} of the input power but only {a:0.#####} arrives at it: leave less power for the load, reduce the line loss or use a gentler taper"));
                g[i] = p;
                a -= pn;
            }
            else
            {
                if (p > 0.5)
                    throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                        $"slot {slotNumber(i)} must absorb p = {p:0.###} of the {a:0.#####} arriving at it, beyond the 0.5 a shunt slot on a matched line can take (a shunt g on a matched line absorbs 4g/(2 + g)², at most 0.5 at g = 2): leave more power for the load, use more slots or a gentler taper"));
                g[i] = SingleShuntConductance(p);
                double r = ReflectedFraction(g[i]) * a;
                reflected += r;
                a -= pn + r;
            }
        }
        return new TravellingWaveBudget(Array.AsReadOnly(g), Array.AsReadOnly(arriving), a, reflected, wall);
    }
}

/// <summary>The isolated-slot power budget of a travelling-wave array, slots numbered from the feed.</summary>
/// <param name="Conductances">g_n from the feed, normalised to G0.</param>
/// <param name="ArrivingPowers">Power arriving at each slot, fractions of the power arriving at the first.</param>
/// <param name="PowerPastLastSlot">Power travelling on past the last slot (toward the load).</param>
/// <param name="ReflectedPower">Sum of the slots' reflections booked as lost (single-shunt form; 0 for small g).</param>
/// <param name="WallLoss">Power lost in the walls of the sections between slots.</param>
internal sealed record TravellingWaveBudget(
    IReadOnlyList<double> Conductances,
    IReadOnlyList<double> ArrivingPowers,
    double PowerPastLastSlot,
    double ReflectedPower,
    double WallLoss);
