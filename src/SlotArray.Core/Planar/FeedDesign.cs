using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Planar;

/// <summary>
/// The feed half of <see cref="PlanarDesigner"/>: each branch's power share, the series resistance its coupling slot
/// must present in the feed guide, the slot's rotation and the signs that drive every branch in phase (the formulas
/// are in <see cref="PlanarDesigner"/>'s remarks).
/// </summary>
internal static class FeedDesign
{
    /// <summary>The design with its coupling slots filled in.</summary>
    public static PlanarDesign Apply(PlanarDesign design, PlanarRequest request, List<DesignWarning> warnings)
    {
        var f0 = design.DesignFrequency;
        var branchGuide = design.BranchGuide;
        var feed = design.FeedGuide;
        int k = design.Branches.Count;
        var power = new double[k];
        for (int b = 0; b < k; b++)
        {
            var br = design.Branches[b];
            double s = 0;
            for (int m = 0; m < br.SlotIndices.Count; m++)
            {
                var slot = br.Stick.Slots[m];
                s += ElliottDesigner.F(branchGuide, f0, Math.Abs(slot.Coupling), slot.Length.Meters) * Math.Abs(design.Amplitudes[br.SlotIndices[m]]);
            }
            power[b] = s * s;
        }
        var r = Resistances(power, design.FeedPosition, design.Branches.Select(b => b.Y).ToArray());
        var width = design.Branches[0].Stick.Slots[0].Width;
        var length = CouplingSlot.ResonantLength(feed, f0);
        var branches = new PlanarBranch[k];
        for (int b = 0; b < k; b++)
        {
            var br = design.Branches[b];
            double ratio = r[b] / StandingWaveDesigner.CentreJunctionRatio;
            var tilt = CouplingSlot.TiltForRatio(feed, branchGuide, ratio, f0, br.Number);
            RequireFit(feed, branchGuide, tilt, length, width, request.Cutter, br.Number);
            foreach (var w in InclinedSeriesSlot.Warnings(feed, tilt, width, f0))
                if (!warnings.Contains(w)) warnings.Add(w);
            branches[b] = br with { Coupling = new CouplingSlotDesign(br.Number, br.Y, tilt, length, width, r[b], 1 / ratio) };
        }
        var draft = design with { Branches = branches, Warnings = warnings.AsReadOnly() };
        return WithSigns(draft, request);
    }

    /// <summary>
    /// r_k of each branch: end feed P_k/ΣP; centre feed P·P_k/P_half² (each half of the feed guide matched to the series tee).
    /// </summary>
    /// <param name="power">Power share of each branch (any scale).</param>
    /// <param name="position">End or centre feed.</param>
    /// <param name="y">Each branch's y (the centre feed splits at y = 0).</param>
    public static double[] Resistances(IReadOnlyList<double> power, FeedPosition position, IReadOnlyList<double> y)
    {
        ArgumentNullException.ThrowIfNull(power);
        ArgumentNullException.ThrowIfNull(y);
        double total = power.Sum();
        var r = new double[power.Count];
        if (position == FeedPosition.End)
        {
            for (int b = 0; b < r.Length; b++) r[b] = power[b] / total;
            return r;
        }
        double low = 0, high = 0;
        for (int b = 0; b < r.Length; b++) if (y[b] < 0) low += power[b]; else high += power[b];
        for (int b = 0; b < r.Length; b++)
        {
            double half = y[b] < 0 ? low : high;
            r[b] = total * power[b] / (half * half);
        }
        return r;
    }

    /// <summary>
    /// The coupling slot must lie inside both guides' broad walls where they cross, with metal left at the walls (touching
    /// counts as running into them, as for the radiating slots in <see cref="Fabrication.SlotClearance"/>): its ends
    /// ±(L_o/2)(sin θ, cos θ) and half width w/2 within a_feed/2 across the feed and a_branch/2 across the branch (x across
    /// the feed, y along it), L_o the tip-to-tip length (<see cref="RoundEndedSlot.OverallLength"/> when cut with an end
    /// mill). The coupling slots of two branches then lie in different branch guides, with their common wall between them,
    /// and cannot meet; nor can a coupling slot meet a radiating slot, which is in the other broad wall of the branch [D].
    /// </summary>
    private static void RequireFit(Waveguides.RectangularWaveguide feed, Waveguides.RectangularWaveguide branch, Angle tilt, Length length, Length width,
        Length? cutter, int number)
    {
        double overall = length.Meters + (cutter is { } c0 ? RoundEndedSlot.LengthCorrection(width, c0).Meters : 0);
        double s = Math.Abs(Math.Sin(tilt.Radians)), c = Math.Abs(Math.Cos(tilt.Radians)), h = 0.5 * overall, w = 0.5 * width.Meters;
        double acrossFeed = h * s + w * c, acrossBranch = h * c + w * s;
        if (acrossFeed >= 0.5 * feed.BroadWall.Meters || acrossBranch >= 0.5 * branch.BroadWall.Meters)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"branch {number}: its coupling slot ({overall * 1e3:0.##} mm tip to tip, {width.Millimeters:0.##} mm wide, at {tilt.Degrees:0.#} deg) reaches {2 * acrossFeed * 1e3:0.##} mm across the feed guide (a = {feed.BroadWall.Millimeters:0.##} mm) and {2 * acrossBranch * 1e3:0.##} mm across the branch guide (a = {branch.BroadWall.Millimeters:0.##} mm): it runs into {(acrossFeed >= 0.5 * feed.BroadWall.Meters ? "the feed guide's side walls" : "the branch guide's side walls")}; widen the narrower guide, use narrower slots or change the taper across the branches"));
    }

    /// <summary>Sets each coupling slot's rotation sign so that every branch is driven in phase with the first (from the network at f0).</summary>
    private static PlanarDesign WithSigns(PlanarDesign design, PlanarRequest request)
    {
        int k = design.Branches.Count;
        var ones = Enumerable.Repeat(1.0, k).ToArray();
        // The signs depend on the lines only (which half-wave the current is in at each coupling slot): found from the
        // network without the exterior coupling, where every branch is exactly in phase or in antiphase.
        var sol = PlanarNetwork.Solve(design, request.Slot, design.DesignFrequency, false, ones);
        var phase = new Complex[k];
        for (int b = 0; b < k; b++)
            foreach (int i in design.Branches[b].SlotIndices)
                phase[b] += sol.Excitations[i] / design.Amplitudes[i];
        var branches = new PlanarBranch[k];
        for (int b = 0; b < k; b++)
        {
            var br = design.Branches[b];
            double sign = (phase[b] * Complex.Conjugate(phase[0])).Real >= 0 ? 1 : -1;
            branches[b] = br with { Coupling = br.Coupling with { Tilt = Angle.FromRadians(sign * br.Coupling.Tilt.Radians) } };
        }
        return design with { Branches = branches };
    }
}
