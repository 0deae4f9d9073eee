using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Stick;

/// <summary>
/// One designed slot. Axis convention (architecture.md, "Axes"): z runs along the guide from the datum, the
/// inner face of the near-end termination (for a standing-wave array the end short), z = 0 there, slots at z &gt; 0;
/// x runs across the broad wall from its centreline, positive toward the +x side wall.
/// </summary>
/// <param name="Index">1-based slot number; slot 1 is the one nearest the datum and numbers increase with z.</param>
/// <param name="Position">Slot centre z, measured from the datum.</param>
/// <param name="Coupling">Signed coupling parameter: offset x from the centreline (m) or tilt (rad), as <see cref="ArrayDesign.CouplingKind"/> says.</param>
/// <param name="Length">Equivalent rectangular length (resonant at the design frequency).</param>
/// <param name="Width">Slot width.</param>
/// <param name="Conductance">Designed resonant conductance g = G/G0 (normalised to the TE10 admittance).</param>
/// <param name="TargetAmplitude">Aperture amplitude asked of this slot, as given to the designer (signed).</param>
internal sealed record SlotDesign(int Index, Length Position, double Coupling, Length Length, Length Width,
    double Conductance, double TargetAmplitude);

/// <summary>
/// A designed array: the slots, the terminations and the feed, all positions from one datum (see
/// <see cref="SlotDesign"/> for the axes). Immutable; the network analysis (Core/Network) takes it as input.
/// </summary>
/// <remarks>
/// Line layout seen by the network analysis:
/// <list type="bullet">
/// <item>End feed: near termination at z = 0, slots 1..N, feed reference plane at <see cref="FeedPlane"/> (≥ z_N).</item>
/// <item>Centre feed: near termination at z = 0, slots 1..N/2, an ideal series junction at <see cref="FeedPlane"/>
/// (midway between slots N/2 and N/2 + 1) with impedance ratio <see cref="JunctionRatio"/>, slots N/2 + 1..N, and the far termination
/// <see cref="FarTermination"/> beyond slot N.</item>
/// </list>
/// </remarks>
/// <param name="Name">Array name (from the request).</param>
/// <param name="DesignFrequency">Frequency at which the slots are resonant and the array matched.</param>
/// <param name="Guide">The guide the slots are cut in.</param>
/// <param name="GuideWavelength">λg at the design frequency.</param>
/// <param name="Spacing">Slot centre spacing.</param>
/// <param name="Feed">End or centre feed.</param>
/// <param name="CouplingKind">Whether <see cref="SlotDesign.Coupling"/> is an offset or a tilt.</param>
/// <param name="SlotModelName">Name of the slot model used (for reports).</param>
/// <param name="Slots">The slots, ordered by index (= by z).</param>
/// <param name="NearTermination">Termination at the datum end; its plane is z = 0, <see cref="Termination.Distance"/> before slot 1.</param>
/// <param name="FarTermination">Centre feed only: the termination beyond slot N; null for an end-fed array.</param>
/// <param name="FeedPlane">z of the feed reference plane: S11 is referred to it.</param>
/// <param name="JunctionRatio">Centre feed: impedance ratio n² of the ideal series junction, z_feed = (z_left + z_right)/n²; 1 for an end feed.</param>
/// <param name="Warnings">Validity limits and cautions met while designing (deterministic order).</param>
internal sealed record ArrayDesign(
    string Name,
    Frequency DesignFrequency,
    RectangularWaveguide Guide,
    Length GuideWavelength,
    Length Spacing,
    FeedPosition Feed,
    SlotCouplingKind CouplingKind,
    string SlotModelName,
    IReadOnlyList<SlotDesign> Slots,
    Termination NearTermination,
    Termination? FarTermination,
    Length FeedPlane,
    double JunctionRatio,
    IReadOnlyList<DesignWarning> Warnings)
{
    /// <summary>Number of slots.</summary>
    public int Count => Slots.Count;

    /// <summary>
    /// Complex factor on the exterior mutual impedances wherever this design is analysed with coupling (1: the
    /// infinite-ground-plane model as it is); the designer copies it from its request.
    /// </summary>
    public System.Numerics.Complex MutualCouplingScale { get; init; } = System.Numerics.Complex.One;

    /// <summary>Sum of the designed conductances (1 for a matched end-fed design, 2 for a centre-fed one: 1 per half).</summary>
    public double TotalConductance => Slots.Sum(s => s.Conductance);
}
