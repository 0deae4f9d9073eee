using System.Globalization;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Design;

/// <summary>
/// Isolated-slot design of a resonant (standing-wave) array of shunt slots: N resonant slots at λg/2 spacing,
/// alternating coupling sign, conductances g_n ∝ a_n² with Σ g_n = 1 (end feed; 1 per half for the centre feed), the short λg/4 (or 3λg/4) beyond the last slot.
/// </summary>
/// <remarks>
/// <para>Design rules [M: R. S. Elliott, <i>Antenna Theory and Design</i>, Prentice-Hall 1981,
/// Ch. 8; S. Silver, <i>Microwave Antenna Theory and Design</i>, MIT Rad. Lab. Ser. vol. 12, 1949]. At λg/2 spacing
/// every resonant slot sees the same mode-voltage magnitude with alternating sign; alternating the offset side
/// (the sign of the coupling function f ∝ sin(πx/a), Elliott 1983) cancels that sign, so all slots radiate in
/// phase and the power radiated by slot n is ∝ g_n. Hence g_n = a_n²/Σ a_m² and, with the short a quarter guide
/// wavelength beyond the last slot (an open circuit at that slot), the input admittance at resonance is Σ g_n = 1: matched.
/// A negative amplitude a_n flips the offset side of slot n.</para>
/// <para>Centre feed: the array is split into two halves of N/2 slots, each ended by its own short, joined by an ideal
/// series junction midway between slots N/2 and N/2 + 1 (a quarter guide wavelength from each). Model: the two halves
/// are in series at the junction, z_s = z_left + z_right, behind an ideal transformer to the feed guide,
/// z_feed = z_s/n² with n² = <see cref="CentreJunctionRatio"/> = 2 (the circuit of an E-plane series tee or of a centred
/// series coupling slot fed from a guide below, whose coupling sets n: C. G. Montgomery, R. H. Dicke and E. M. Purcell,
/// <i>Principles of Microwave Circuits</i>, MIT Rad. Lab. Ser. vol. 8, 1948, E-plane T-junction, from memory; choosing
/// n² = 2 is common practice, no source). The quarter-wave line inverts each half's input admittance
/// G_half = Σ_half g_n into the impedance z_half = G_half, so each half is matched to the junction (z_half = 1) when
/// Σ_half g_n = 1, i.e. g_n = 2 a_n²/Σ a_m² (Σ_all g_n = 2), and z_feed = (G_left + G_right)/2 = 1. The series current
/// makes the mode-voltage magnitude equal at every slot of both halves, so g_n ∝ a_n² holds across the junction.
/// Each half is then a resonant array of N/2 slots with its own Σ g = 1: half the stored energy per radiated watt of an
/// end-fed array of N slots, hence about twice its bandwidth (common practice, no source [C]; measured in the tests).
/// The series junction reverses E_y across it (symmetric excitation of an E-plane tee gives antiphase collinear
/// arms), so the offset alternation continues unbroken across the junction.</para>
/// <para>Isolated slots only: external mutual coupling and wall loss are not compensated (the network analysis
/// shows their effect).</para>
/// </remarks>
internal static class StandingWaveDesigner
{
    /// <summary>Impedance ratio n² of the centre-feed series junction, z_feed = (z_left + z_right)/n² (see remarks).</summary>
    public const double CentreJunctionRatio = 2;

    /// <summary>
    /// Designs the stick. Its amplitudes a_n are those of slot n (slot 1 nearest the datum short); any signs, not all
    /// zero. Throws <see cref="InfeasibleDesignException"/> when the slot model cannot give a needed conductance or the
    /// taper does not fit the slot count, and <see cref="ArgumentException"/> for a stick that is not a standing-wave
    /// array or a slot model for another guide.
    /// </summary>
    /// <param name="stick">The stick: guide, design frequency, slot count, feed, amplitudes and slot model (its guide and width are used as they are).</param>
    public static StandingWaveDesign Design(StickRequest stick)
    {
        ArgumentNullException.ThrowIfNull(stick);
        var slot = stick.Slot;
        var amplitudes = stick.Amplitudes;
        if (stick.Feed.Type != FeedType.StandingWave)
            throw new ArgumentException($"the standing-wave designer was given a {stick.Feed.Type} feed", nameof(stick));

        if (slot.Guide != stick.Guide)
            throw new ArgumentException(
                $"the slot model is for the guide {slot.Guide.Designation} ({slot.Guide.BroadWall} × {slot.Guide.NarrowWall}, wall {slot.Guide.WallThickness}), not the request's {stick.Guide.Designation} ({stick.Guide.BroadWall} × {stick.Guide.NarrowWall}, wall {stick.Guide.WallThickness})",
                nameof(stick));
        int n = stick.Count;
        bool centre = stick.Feed.Position == FeedPosition.Centre;
        CheckTaper(stick, n, centre);

        var f0 = stick.DesignFrequency;
        var lambdaG = stick.Guide.GuideWavelength(f0);
        var spacing = stick.Feed.Spacing.Resolve(lambdaG);
        var shortDistance = stick.Feed.ShortDistance.Resolve(lambdaG);
        if (!(spacing.Meters > 0) || !double.IsFinite(spacing.Meters))
            throw new InfeasibleDesignException($"the slot spacing {spacing} is not a positive length: give feed.spacing > 0");
        if (!(shortDistance.Meters > 0) || !double.IsFinite(shortDistance.Meters))
            throw new InfeasibleDesignException($"the short distance {shortDistance} is not a positive length: give a positive short distance");

        double sumSquares = amplitudes.Sum(a => a * a);
        double halves = centre ? CentreJunctionRatio : 1;   // Σ g = 1 per matched line (see remarks)
        var g = amplitudes.Select(a => halves * a * a / sumSquares).ToArray();
        CheckConductances(g, slot, f0);

        var warnings = new List<DesignWarning>();
        var slots = new SlotDesign[n];
        for (int i = 0; i < n; i++)
        {
            var r = slot.ForConductance(g[i], f0);
            // Alternation (−1)^(i) for both feeds (see remarks); a negative amplitude flips the side.
            double side = (i % 2 == 0 ? 1.0 : -1.0) * Math.Sign(amplitudes[i]);
            double coupling = side * Math.Abs(r.Coupling);
            var z = shortDistance + (double)i * spacing;
            slots[i] = new SlotDesign(i + 1, z, coupling, r.ResonantLength, slot.Width, g[i], amplitudes[i]);
            foreach (var w in slot.Warnings(coupling, f0))
                if (!warnings.Contains(w)) warnings.Add(w);
        }

        AddRuleWarnings(warnings, f0, lambdaG, spacing, shortDistance, centre);

        var near = Termination.ShortAt(shortDistance);
        var far = centre ? Termination.ShortAt(shortDistance) : null;
        var feedPlane = centre
            ? slots[n / 2 - 1].Position + 0.5 * spacing
            : slots[n - 1].Position;
        var design = new ArrayDesign(stick.Name, f0, stick.Guide, lambdaG, spacing, stick.Feed.Position,
            slot.CouplingKind, slot.Name, Array.AsReadOnly(slots), near, far, feedPlane, centre ? CentreJunctionRatio : 1, warnings.AsReadOnly());
        Fabrication.SlotClearance.Require(design, stick.Cutter);
        return new StandingWaveDesign(design);
    }

    private static void CheckTaper(StickRequest stick, int n, bool centre)
    {
        TaperChecks.Require(stick, "standing-wave");
        if (centre && n % 2 != 0)
            throw new InfeasibleDesignException(
                $"a centre-fed array is two equal halves, but the request has an odd slot count {n}: use {n - 1} or {n + 1} slots, or feed at the end");
    }

    private static void CheckConductances(double[] g, IShuntSlotModel slot, Frequency f0)
    {
        double gMax = slot.MaximumConductance(f0);
        int worst = 0;
        for (int i = 1; i < g.Length; i++) if (g[i] > g[worst]) worst = i;
        if (g[worst] <= gMax) return;
        int over = g.Count(v => v > gMax);
        // g_n scales as 1/N for a taper of fixed shape, so this many slots bring the largest within reach.
        int needed = (int)Math.Ceiling(g.Length * g[worst] / gMax);
        throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
            $"slot {worst + 1} needs g = {g[worst]:0.000}, above the {gMax:0.000} this guide can give at {f0} ({over} of {g.Length} slots exceed it): use more slots (about {needed} or more) or a gentler taper"));
    }

    private static void AddRuleWarnings(List<DesignWarning> warnings, Frequency f0, Length lambdaG, Length spacing,
        Length shortDistance, bool centre)
    {
        var lambda = f0.FreeSpaceWavelength;
        if (spacing >= lambda)
            warnings.Add(new DesignWarning("grating-lobe", string.Create(CultureInfo.InvariantCulture,
                $"slot spacing {spacing} is not less than the free-space wavelength {lambda} at {f0}: grating lobes appear in real space")));
        double sp = spacing / lambdaG;
        if (Math.Abs(sp - 0.5) > 1e-6)
            warnings.Add(new DesignWarning("spacing-not-half-guide-wavelength", string.Create(CultureInfo.InvariantCulture,
                $"slot spacing {spacing} is {sp:0.0000} guide wavelengths, not 0.5: the slots no longer add in phase and the array is not matched at {f0}{(centre ? "; the series junction also assumes a quarter guide wavelength to the nearest slots" : "")}")));
        double q = shortDistance / lambdaG * 4;
        double nearestOdd = 2 * Math.Round((q - 1) / 2) + 1;
        if (Math.Abs(q - nearestOdd) > 4e-6)
            warnings.Add(new DesignWarning("short-not-odd-quarter-wave", string.Create(CultureInfo.InvariantCulture,
                $"the short is {shortDistance} ({shortDistance / lambdaG:0.0000} guide wavelengths) beyond the end slot, not an odd multiple of a quarter guide wavelength: the end slot does not see an open circuit at {f0}")));
    }
}
