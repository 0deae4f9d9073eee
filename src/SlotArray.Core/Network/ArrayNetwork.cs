using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Network;

/// <summary>
/// Network analysis of a designed array: the guide as a lossy transmission line (see <see cref="LineNetwork"/>),
/// each slot a shunt admittance y_n(f) from the slot model at its actual coupling, length and frequency, the
/// terminations of the design, the feed at the design's feed plane (end feed) or series junction (centre feed).
/// </summary>
/// <remarks>
/// <para>Slot excitation for the pattern. In Elliott's formulation the slot voltage is V_n^s ∝ y_n V_n / f(x_n)
/// ((E1) of Elliott 1983 with Y^a = Y for isolated slots; R. S. Elliott, <i>Antenna Theory and Design</i>,
/// Prentice-Hall 1981, Ch. 8, from memory), with f ∝ sin(πx_n/a) the coupling function (Elliott 1983), odd in the offset.
/// For an isolated-slot model that f is not available, so this analysis uses the equivalent form
/// e_n = sign(c_n) · √P_n · e^{j arg(y_n V_n)}, P_n = ½ Re(y_n)|V_n|²/P_inc: the phase of y_n V_n plus the offset
/// side's sign (the sign of f), and the magnitude of a slot whose exterior pattern is fixed (the half-wave slot) and
/// whose radiated power is P_n. It equals V_n^s up to one constant factor whenever |f_n|² ∝ Re y_n at resonance, as
/// for Stevenson's slot (g_r = Γ0 f_r², Stevenson 1948).</para>
/// <para>Powers are fractions of the incident power; the balance radiated + wall loss + load + reflected = 1 holds
/// to rounding (<see cref="NetworkSolution.PowerBalanceError"/>).</para>
/// </remarks>
internal static class ArrayNetwork
{
    /// <summary>Solves the array at one frequency.</summary>
    /// <param name="design">The designed array.</param>
    /// <param name="slot">The slot model that gives y(coupling, length, f); normally the one the design used.</param>
    /// <param name="f">Frequency, within the guide's TE10 band.</param>
    public static NetworkSolution Solve(ArrayDesign design, IShuntSlotModel slot, Frequency f)
        => new Analyser(design, slot).Solve(f);

    /// <summary>Solves the array at <paramref name="points"/> equally spaced frequencies from low to high (both included) and at the design frequency.</summary>
    /// <param name="design">The designed array.</param>
    /// <param name="slot">The slot model.</param>
    /// <param name="low">Lower band edge.</param>
    /// <param name="high">Upper band edge, &gt; low.</param>
    /// <param name="points">Number of frequencies, ≥ 2.</param>
    public static FrequencySweep Sweep(ArrayDesign design, IShuntSlotModel slot, Frequency low, Frequency high, int points)
    {
        if (points < 2) throw new ArgumentOutOfRangeException(nameof(points), points, "a sweep needs at least 2 points");
        if (!(high > low)) throw new ArgumentOutOfRangeException(nameof(high), high.ToString(), $"the band's upper edge must exceed its lower edge {low}");
        var analyser = new Analyser(design, slot);
        var list = new NetworkSolution[points];
        for (int i = 0; i < points; i++)
        {
            double t = (double)i / (points - 1);
            list[i] = analyser.Solve(Frequency.FromHertz(low.Hertz + t * (high.Hertz - low.Hertz)));
        }
        return new FrequencySweep(design.DesignFrequency, analyser.Solve(design.DesignFrequency), Array.AsReadOnly(list));
    }

    /// <summary>
    /// The band around the design frequency where VSWR ≤ <paramref name="vswrLimit"/>, found by stepping outward
    /// from the design frequency in <paramref name="step"/> and refining each edge by bisection to 1e-9 of the design
    /// frequency; an edge not found before <paramref name="searchLow"/>/<paramref name="searchHigh"/> is reported
    /// there as limited. Null when the VSWR at the design frequency already exceeds the limit.
    /// </summary>
    /// <param name="design">The designed array.</param>
    /// <param name="slot">The slot model.</param>
    /// <param name="vswrLimit">VSWR limit, &gt; 1 (e.g. 1.5 or 2).</param>
    /// <param name="searchLow">Lowest frequency searched.</param>
    /// <param name="searchHigh">Highest frequency searched.</param>
    /// <param name="step">Search step; smaller than the narrowest feature expected (e.g. 0.1 % of f0).</param>
    public static MatchBand? FindBand(ArrayDesign design, IShuntSlotModel slot, double vswrLimit, Frequency searchLow,
        Frequency searchHigh, Frequency step)
    {
        if (!(vswrLimit > 1)) throw new ArgumentOutOfRangeException(nameof(vswrLimit), vswrLimit, "the VSWR limit must exceed 1");
        if (!(step.Hertz > 0)) throw new ArgumentOutOfRangeException(nameof(step), step.ToString(), "the search step must be positive");
        var analyser = new Analyser(design, slot);
        double f0 = design.DesignFrequency.Hertz;
        double Excess(double hz) => analyser.Solve(Frequency.FromHertz(hz)).Vswr - vswrLimit;
        if (Excess(f0) > 0) return null;
        var (lo, loLimited) = Edge(Excess, f0, -step.Hertz, searchLow.Hertz);
        var (hi, hiLimited) = Edge(Excess, f0, step.Hertz, searchHigh.Hertz);
        return new MatchBand(vswrLimit, Frequency.FromHertz(lo), Frequency.FromHertz(hi), loLimited, hiLimited, design.DesignFrequency);
    }

    private static (double Edge, bool Limited) Edge(Func<double, double> excess, double f0, double step, double bound)
    {
        double inside = f0;
        while (true)
        {
            double next = inside + step;
            if (step < 0 ? next <= bound : next >= bound)
            {
                if (excess(bound) <= 0) return (bound, true);
                next = bound;
            }
            if (excess(next) > 0)
            {
                double outside = next;
                while (Math.Abs(outside - inside) > 1e-9 * f0)
                {
                    double mid = 0.5 * (inside + outside);
                    if (excess(mid) > 0) outside = mid; else inside = mid;
                }
                return (0.5 * (inside + outside), false);
            }
            inside = next;
        }
    }

    /// <summary>VSWR (1 + |Γ|)/(1 − |Γ|) of a reflection magnitude |Γ|; +∞ at |Γ| ≥ 1.</summary>
    public static double VswrOf(double reflectionMagnitude)
        => reflectionMagnitude >= 1 ? double.PositiveInfinity : (1 + reflectionMagnitude) / (1 - reflectionMagnitude);

    /// <summary>Reflection magnitude |Γ| = (VSWR − 1)/(VSWR + 1) of a VSWR ≥ 1.</summary>
    public static double ReflectionOf(double vswr) => (vswr - 1) / (vswr + 1);

    /// <summary>Holds the line geometry and the slot geometry of one design; solves it at any frequency.</summary>
    private sealed class Analyser
    {
        private readonly ArrayDesign design;
        private readonly IShuntSlotModel slot;
        private readonly LineNetwork line;
        private readonly double[] signs;

        public Analyser(ArrayDesign design, IShuntSlotModel slot)
        {
            ArgumentNullException.ThrowIfNull(design);
            ArgumentNullException.ThrowIfNull(slot);
            this.design = design;
            this.slot = slot;
            line = new LineNetwork(design.Guide, design.Slots.Select(s => s.Position.Meters).ToArray(),
                design.NearTermination, design.Feed == FeedPosition.Centre ? design.FarTermination
                    ?? throw new ArgumentException("a centre-fed design needs a far termination", nameof(design)) : null,
                design.FeedPlane.Meters, design.JunctionRatio);
            signs = design.Slots.Select(s => (double)Math.Sign(s.Coupling)).ToArray();
        }

        public NetworkSolution Solve(Frequency f)
        {
            var y = new Complex[design.Count];
            for (int i = 0; i < y.Length; i++)
            {
                var s = design.Slots[i];
                y[i] = slot.Admittance(s.Coupling, s.Length, f);
            }
            return line.Solve(f, y, signs);
        }
    }
}
