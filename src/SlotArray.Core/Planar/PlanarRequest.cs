using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Planar;

/// <summary>
/// What the planar designer needs: the aperture (<see cref="PlanarLayout"/>), its 2-D taper, the branch guide and its
/// slot model, the feed guide and where it is fed, and whether the external mutual coupling is designed in.
/// </summary>
/// <param name="Name">Name of the array (titles, file names; branch sticks are named "NAME branch k").</param>
/// <param name="BranchGuide">The guide of every branch (the slot model's guide).</param>
/// <param name="FeedGuide">The feed guide that crosses behind the branches at x = 0.</param>
/// <param name="DesignFrequency">Frequency at which the slots are resonant and the array matched.</param>
/// <param name="Layout">Slot positions on the aperture.</param>
/// <param name="Taper">The 2-D amplitude taper.</param>
/// <param name="Slot">The branch guide's slot model (longitudinal, offset-coupled).</param>
/// <param name="FeedPosition">Where the feed guide is fed: its centre (an ideal series tee) or its end.</param>
/// <param name="Coupled">True: Elliott's coupled design over all slots of the aperture; false: isolated slots.</param>
internal sealed record PlanarRequest(string Name, RectangularWaveguide BranchGuide, RectangularWaveguide FeedGuide, Frequency DesignFrequency,
    PlanarLayout Layout, ApertureTaper Taper, IShuntSlotModel Slot, FeedPosition FeedPosition, bool Coupled)
{
    /// <summary>End-mill diameter for round-ended slots; null for square ends.</summary>
    public Length? Cutter { get; init; }

    /// <summary>Tolerance of the coupled iteration (m, largest offset or length change); default 1e-7 m.</summary>
    public double Tolerance { get; init; } = 1e-7;

    /// <summary>Outer iterations allowed before <see cref="ConvergenceException"/>; default 60.</summary>
    public int MaximumIterations { get; init; } = 60;
}
