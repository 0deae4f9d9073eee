using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Planar;

/// <summary>The coupling slot of one branch in the feed guide's broad wall (see <see cref="CouplingSlot"/>).</summary>
/// <param name="Branch">1-based branch number.</param>
/// <param name="Y">Centre y on the aperture (the branch's centre line; x = 0), m.</param>
/// <param name="Tilt">Rotation from the feed guide's axis, signed (the sign alternates so that every branch is driven in phase).</param>
/// <param name="Length">Length (Stevenson's resonant λ/2).</param>
/// <param name="Width">Width (the radiating slots' width).</param>
/// <param name="Resistance">Normalised series resistance r_k = R/Z_TE it presents in the feed guide at f0 (with its branch matched).</param>
/// <param name="RatioSquared">n_k² = z_branch/z_feed at f0 (1/(r_f/r_b)).</param>
internal sealed record CouplingSlotDesign(int Branch, double Y, Angle Tilt, Length Length, Length Width, double Resistance, double RatioSquared);

/// <summary>One branch: a centre-fed standing-wave stick placed on the aperture, and its coupling slot.</summary>
/// <param name="Number">1-based branch number.</param>
/// <param name="Y">Centre line y on the aperture, m.</param>
/// <param name="Stick">The designed stick (positions z from its own datum, the near end short at x = −z_feed).</param>
/// <param name="SlotIndices">The 0-based indices of its slots in <see cref="PlanarLayout.Slots"/>, in stick order.</param>
/// <param name="Coupling">Its coupling slot.</param>
internal sealed record PlanarBranch(int Number, double Y, ArrayDesign Stick, IReadOnlyList<int> SlotIndices, CouplingSlotDesign Coupling)
{
    /// <summary>Aperture x of stick position z: z − z_feed (the feed plane is the branch centre).</summary>
    public double ApertureX(Length z) => z.Meters - Stick.FeedPlane.Meters;
}

/// <summary>
/// A designed planar array: branch sticks plus the feed guide and its coupling slots.
/// </summary>
/// <param name="Name">Array name.</param>
/// <param name="DesignFrequency">Design frequency.</param>
/// <param name="Layout">The aperture.</param>
/// <param name="Amplitudes">The 2-D taper's amplitude of every slot, in <see cref="PlanarLayout.Slots"/> order (max 1).</param>
/// <param name="TaperMethod">The taper's method, for reports.</param>
/// <param name="Branches">The fed branches in order of y.</param>
/// <param name="FeedGuide">The feed guide.</param>
/// <param name="FeedPosition">Centre (series tee between the middle branches) or end (input beyond branch 1's side).</param>
/// <param name="FeedShortDistance">Distance from the outermost coupling slots to the feed guide's end shorts (λg/2 of the feed).</param>
/// <param name="FeedInputDistance">End feed: distance from the input plane to the first coupling slot; centre: pitch/2.</param>
/// <param name="Coupled">Whether the external coupling of all slots was designed in.</param>
/// <param name="Iterations">The coupled iteration's history (empty when uncoupled).</param>
/// <param name="Warnings">Validity limits met.</param>
internal sealed record PlanarDesign(string Name, Frequency DesignFrequency, PlanarLayout Layout, IReadOnlyList<double> Amplitudes, string TaperMethod,
    IReadOnlyList<PlanarBranch> Branches, RectangularWaveguide FeedGuide, FeedPosition FeedPosition, Length FeedShortDistance, Length FeedInputDistance,
    bool Coupled, IReadOnlyList<ElliottIteration> Iterations, IReadOnlyList<DesignWarning> Warnings)
{
    /// <summary>The branch guide (every branch's).</summary>
    public RectangularWaveguide BranchGuide => Branches[0].Stick.Guide;

    /// <summary>The slot design of aperture slot i (0-based, layout order) and its branch.</summary>
    public (PlanarBranch Branch, SlotDesign Slot) SlotAt(int i)
    {
        foreach (var b in Branches)
        {
            int k = IndexIn(b.SlotIndices, i);
            if (k >= 0) return (b, b.Stick.Slots[k]);
        }
        throw new ArgumentOutOfRangeException(nameof(i), i, "no such aperture slot");
    }

    /// <summary>Aperture y of slot i's centre: its branch's centre line plus its signed offset.</summary>
    public double SlotY(int i)
    {
        var (b, s) = SlotAt(i);
        return b.Y + s.Coupling;
    }

    private static int IndexIn(IReadOnlyList<int> list, int value)
    {
        for (int k = 0; k < list.Count; k++) if (list[k] == value) return k;
        return -1;
    }
}
