using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Design;

/// <summary>
/// What the user asked for, validated and in SI units: the immutable hand-over from the spec to the designer.
/// Built by SlotArray.Spec from the YAML spec (architecture.md, "Spec"); tests build it directly.
/// </summary>
/// <param name="Name">Array name, used in titles and file names.</param>
/// <param name="DesignFrequency">Frequency at which the array is synthesised.</param>
/// <param name="BandLow">Lower edge of the analysis band (≤ DesignFrequency).</param>
/// <param name="BandHigh">Upper edge of the analysis band (≥ DesignFrequency).</param>
/// <param name="Guide">The guide, its wall and metal.</param>
/// <param name="Slots">Slot type, count, width and model.</param>
/// <param name="Feed">Standing-wave or travelling-wave feed, spacing, termination.</param>
/// <param name="Taper">The aperture taper.</param>
/// <param name="Coupling">Whether the design includes external mutual coupling.</param>
/// <param name="Tolerance">Machining tolerances for the Monte Carlo, or null.</param>
/// <param name="Requirements">What the antenna must meet (pass/fail in the report).</param>
/// <param name="Transmitter">Transmitter powers for the safety checks, or null.</param>
public sealed record ArrayRequest(
    string Name,
    Frequency DesignFrequency,
    Frequency BandLow,
    Frequency BandHigh,
    RectangularWaveguide Guide,
    SlotRequest Slots,
    FeedRequest Feed,
    TaperRequest Taper,
    CouplingMode Coupling,
    ToleranceRequest? Tolerance,
    Requirements Requirements,
    TransmitterRequest? Transmitter)
{
    /// <summary>
    /// <c>fabrication.prototype_margin</c>: fractional change of every slot length on the plate to be cut, e.g. −0.005 for
    /// a first plate whose slots are cut 0.5 % short on purpose so that they can be trimmed up after measurement (common
    /// practice, no source); 0 (default) cuts the designed lengths. The analysis and every output describe the plate as cut.
    /// </summary>
    public double PrototypeMargin { get; init; }

    /// <summary>
    /// <c>coupling_scale</c> and <c>coupling_phase</c>: a complex factor on every exterior mutual impedance of the coupled
    /// design and analysis (<see cref="Network.CoupledSlotImpedances.Scaled"/>); 1 (default) keeps the infinite-ground-plane
    /// model as it is. A calibration of that model for the real outside of the tube, measured full-wave (<c>verify</c> fits it).
    /// </summary>
    public System.Numerics.Complex MutualCouplingScale { get; init; } = System.Numerics.Complex.One;

    /// <summary><c>filter</c>: the polarisation filter in front of edge slots (<see cref="Marine.CrossPolarFilter"/>), or null for none.</summary>
    public Marine.FilterRequest? Filter { get; init; }

    /// <summary><c>flare</c>: the plates diverging from the slotted face that set the vertical beam (<see cref="Marine.SectoralFlare"/>), or null for none.</summary>
    public Marine.FlareRequest? Flare { get; init; }

    /// <summary>
    /// <c>environment.temperature</c> and <c>transmitter.frequency_tolerance</c>: the operating range of the pointing
    /// budget (<see cref="Marine.PointingBudget"/>), or null when neither is given.
    /// </summary>
    public Marine.OperatingRange? Operating { get; init; }

    /// <summary>A planar array (branch guides fed by a feed guide, spec <c>array: {type: planar, …}</c>); null for one stick.</summary>
    internal PlanarArrayRequest? Planar { get; init; }
}

/// <summary>Slots of the array.</summary>
/// <param name="Type">Slot type.</param>
/// <param name="Count">Number of slots, ≥ 2.</param>
/// <param name="Width">Slot width.</param>
/// <param name="Cutter">End-mill diameter for round-ended slots, or null for square ends.</param>
/// <param name="Model">Slot-admittance model.</param>
public sealed record SlotRequest(SlotType Type, int Count, Length Width, Length? Cutter, SlotModelKind Model)
{
    /// <summary><c>slots.data</c>: the user's slot table that replaces the built-in model, or null.</summary>
    public Slots.Tables.SlotTable? Data { get; init; }

    /// <summary><c>slots.extrapolate</c>: allow (and flag) slots outside the table instead of refusing the design.</summary>
    public bool Extrapolate { get; init; }

    /// <summary><c>slots.surround</c>: what edge slots radiate into (picks the edge-slot model's full-wave calibration).</summary>
    public EdgeSlotSurround Surround { get; init; } = EdgeSlotSurround.Tube;
}

/// <summary>Whether external mutual coupling between slots is designed for.</summary>
public enum CouplingMode
{
    /// <summary>Isolated-slot design.</summary>
    None,
    /// <summary>Elliott's design procedure with mutual coupling.</summary>
    Mutual,
}

/// <summary>What the antenna must meet; each null entry is not checked.</summary>
/// <param name="SidelobesDb">Peak sidelobe level, dB, negative; null: the taper's design level.</param>
/// <param name="CrossPolarDb">Peak cross-polar level, dB, negative.</param>
/// <param name="Vswr">Maximum VSWR over the whole band, &gt; 1.</param>
public sealed record Requirements(double? SidelobesDb, double? CrossPolarDb, double? Vswr)
{
    /// <summary>No explicit requirement.</summary>
    public static Requirements None { get; } = new(null, null, null);

    /// <summary><c>requirements.vertical_beamwidth</c>: the vertical half-power beamwidth asked of the flare (met within ±<see cref="Verdicts.RequirementChecks.VerticalBeamwidthToleranceDegrees"/>), or null.</summary>
    public Quantities.Angle? VerticalBeamwidth { get; init; }
}

/// <summary>Transmitter powers for the safety checks.</summary>
/// <param name="PeakPower">Peak power, W, or null.</param>
/// <param name="AveragePower">Time-averaged power, W, or null.</param>
public sealed record TransmitterRequest(double? PeakPower, double? AveragePower);
