using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>
/// Round-ended slots cut with an end mill, and the equal-area rule that relates their overall (tip-to-tip) length to
/// the equivalent rectangular length the electrical models assume.
/// </summary>
/// <remarks>
/// Equal-area rule [C: common practice, no authoritative source found]: the round-ended slot
/// has the area of the rectangular slot of length L_eq and the same width. With a cutter of diameter D_t equal to the
/// width w the ends are semicircles of radius w/2 and L_o = L_eq + (1 − π/4) w (w = 1.5875 mm: +0.3407 mm,
/// [N]). With a cutter narrower than the slot (several passes) the four corners keep the cutter
/// radius r = D_t/2; the same rule then gives L_o = L_eq + (4 − π) r²/w [D: this project, the area of the four corner
/// fillets], which reduces to the first form at r = w/2. Oliner (1957, Part II) measured a difference between round and
/// rectangular ends but no numeric correction was confirmed, so treat this as a default to calibrate.
/// </remarks>
internal static class RoundEndedSlot
{
    /// <summary>Overall tip-to-tip length from the equivalent rectangular length: L_o = L_eq + (4 − π) r²/w, r = D_t/2
    /// (= L_eq + (1 − π/4) w when D_t = w).</summary>
    /// <param name="equivalentLength">Equivalent rectangular length L_eq, &gt; 0.</param>
    /// <param name="width">Slot width w, &gt; 0.</param>
    /// <param name="cutterDiameter">End-mill diameter D_t, 0 &lt; D_t ≤ w; null: equal to the width.</param>
    public static Length OverallLength(Length equivalentLength, Length width, Length? cutterDiameter = null)
    {
        RequirePositive(equivalentLength, nameof(equivalentLength));
        var overall = equivalentLength + LengthCorrection(width, cutterDiameter);
        if (overall < Cutter(width, cutterDiameter))
            throw new ArgumentOutOfRangeException(nameof(equivalentLength), equivalentLength.ToString(),
                $"a round-ended slot {equivalentLength} long (equivalent) is shorter than its cutter {Cutter(width, cutterDiameter)}: check the length");
        return overall;
    }

    /// <summary>Equivalent rectangular length from the overall length, the inverse of <see cref="OverallLength"/>.</summary>
    /// <param name="overallLength">Tip-to-tip length L_o ≥ cutter diameter.</param>
    /// <param name="width">Slot width w, &gt; 0.</param>
    /// <param name="cutterDiameter">End-mill diameter D_t, 0 &lt; D_t ≤ w; null: equal to the width.</param>
    public static Length EquivalentLength(Length overallLength, Length width, Length? cutterDiameter = null)
    {
        RequirePositive(overallLength, nameof(overallLength));
        if (overallLength < Cutter(width, cutterDiameter))
            throw new ArgumentOutOfRangeException(nameof(overallLength), overallLength.ToString(),
                $"a round-ended slot cannot be shorter than its cutter {Cutter(width, cutterDiameter)}");
        return overallLength - LengthCorrection(width, cutterDiameter);
    }

    /// <summary>L_o − L_eq = (4 − π) r²/w with r = D_t/2 (equal-area rule, see remarks).</summary>
    /// <param name="width">Slot width w, &gt; 0.</param>
    /// <param name="cutterDiameter">End-mill diameter D_t, 0 &lt; D_t ≤ w; null: equal to the width.</param>
    public static Length LengthCorrection(Length width, Length? cutterDiameter = null)
    {
        double r = EndRadius(width, cutterDiameter).Meters;
        return Length.FromMeters((4 - Math.PI) * r * r / width.Meters);
    }

    /// <summary>End (corner) radius: the cutter radius D_t/2, which is w/2 (full semicircular ends) when D_t = w.</summary>
    /// <param name="width">Slot width w, &gt; 0.</param>
    /// <param name="cutterDiameter">End-mill diameter D_t, 0 &lt; D_t ≤ w; null: equal to the width.</param>
    public static Length EndRadius(Length width, Length? cutterDiameter = null) => 0.5 * Cutter(width, cutterDiameter);

    private static Length Cutter(Length width, Length? cutterDiameter)
    {
        RequirePositive(width, nameof(width));
        var d = cutterDiameter ?? width;
        RequirePositive(d, nameof(cutterDiameter));
        if (d.Meters > width.Meters * (1 + 1e-12))
            throw new ArgumentOutOfRangeException(nameof(cutterDiameter), d.ToString(),
                $"a cutter of {d} cannot cut a slot {width} wide: use a cutter no larger than the width");
        return d;
    }

    private static void RequirePositive(Length l, string name)
    {
        if (!(double.IsFinite(l.Meters) && l.Meters > 0)) throw new ArgumentOutOfRangeException(name, l.ToString(), $"{name} must be a positive length");
    }
}
