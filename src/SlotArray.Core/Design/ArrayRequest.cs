using SlotArray.Core.Quantities;
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

    /// <summary><c>filter</c>: the polarisation filter in front of edge slots (<see cref="Marine.CrossPolarFilter"/>), or null for none.</summary>
    public Marine.FilterRequest? Filter { get; init; }

    /// <summary><c>flare</c>: the plates diverging from the slotted face that set the vertical beam (<see cref="Marine.SectoralFlare"/>), or null for none.</summary>
    public Marine.FlareRequest? Flare { get; init; }

    /// <summary>
    /// <c>environment.temperature</c> and <c>transmitter.frequency_tolerance</c>: the operating range of the pointing
    /// budget (<see cref="Marine.PointingBudget"/>), or null when neither is given.
    /// </summary>
    public Marine.OperatingRange? Operating { get; init; }
}

/// <summary>Kind of radiating slot.</summary>
public enum SlotType
{
    /// <summary>Longitudinal shunt slot in the broad wall, displaced from the centreline by an offset.</summary>
    Longitudinal,
    /// <summary>Inclined shunt slot in the narrow wall, cut into both broad walls ("edge slot").</summary>
    Edge,
    /// <summary>Centred inclined series slot in the broad wall.</summary>
    InclinedSeries,
}

/// <summary>Which slot-admittance model the designer uses.</summary>
public enum SlotModelKind
{
    /// <summary>Galerkin moment method with finite wall thickness (default).</summary>
    MomentMethod,
    /// <summary>Stevenson's closed-form resonant conductance (thin wall, resonant half-wave slot).</summary>
    Stevenson,
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
}

/// <summary>Feed arrangement.</summary>
public enum FeedType
{
    /// <summary>Resonant array: λg/2 spacing, short-circuit termination.</summary>
    StandingWave,
    /// <summary>Non-resonant array: spacing ≠ λg/2, matched load.</summary>
    TravellingWave,
}

/// <summary>Where a standing-wave array is fed.</summary>
public enum FeedPosition
{
    /// <summary>At one end; the other end is shorted.</summary>
    End,
    /// <summary>At the centre; both ends are shorted (two halves).</summary>
    Centre,
}

/// <summary>
/// A distance along the guide given either as a fraction of the guide wavelength at the design frequency
/// or as a fixed length. Exactly one of the two is set.
/// </summary>
/// <param name="GuideWavelengths">Fraction of λg at the design frequency, or null.</param>
/// <param name="Fixed">Fixed length, or null.</param>
public sealed record GuideDistance(double? GuideWavelengths, Length? Fixed)
{
    /// <summary>A distance in guide wavelengths.</summary>
    public static GuideDistance InGuideWavelengths(double n) => new(n, null);
    /// <summary>A fixed distance.</summary>
    public static GuideDistance OfLength(Length l) => new(null, l);
    /// <summary>Resolves the distance for a guide wavelength λg.</summary>
    public Length Resolve(Length guideWavelength) => Fixed ?? GuideWavelengths!.Value * guideWavelength;
}

/// <summary>Feed of the array.</summary>
/// <param name="Type">Standing-wave or travelling-wave.</param>
/// <param name="Spacing">Slot spacing (default 0.5 guide-wavelength for standing-wave).</param>
/// <param name="Position">End- or centre-fed (standing-wave only).</param>
/// <param name="LoadFraction">Travelling-wave: fraction of input power left for the load, 0 &lt; P_L &lt; 1.</param>
/// <param name="ShortDistance">Standing-wave: last slot centre to the short's inner face (default 0.25 guide-wavelength).</param>
public sealed record FeedRequest(FeedType Type, GuideDistance Spacing, FeedPosition Position, double LoadFraction, GuideDistance ShortDistance)
{
    /// <summary>Travelling-wave, <c>feed.load: auto</c>: the smallest load fraction the slots can deliver is chosen (<see cref="TravellingWaveLoad"/>); <see cref="LoadFraction"/> is then only the starting value.</summary>
    public bool AutoLoad { get; init; }

    /// <summary>Travelling-wave, <c>feed.beam</c>: the direction asked for, from which <see cref="Spacing"/> was solved (<see cref="TravellingWaveBeam.SpacingFor"/>); null when the spacing was given.</summary>
    public Quantities.Angle? Beam { get; init; }
}

/// <summary>Aperture taper families.</summary>
public enum TaperType
{
    /// <summary>Equal amplitudes.</summary>
    Uniform,
    /// <summary>Dolph-Chebyshev equal-ripple sidelobes.</summary>
    Chebyshev,
    /// <summary>Taylor n̄ line source, sampled.</summary>
    Taylor,
    /// <summary>Villeneuve n̄ for discrete arrays.</summary>
    Villeneuve,
    /// <summary>Taylor one-parameter (B).</summary>
    TaylorOneParameter,
    /// <summary>cos^q on a pedestal.</summary>
    CosinePedestal,
    /// <summary>Bayliss difference pattern.</summary>
    Bayliss,
    /// <summary>User-given weights.</summary>
    Given,
}

/// <summary>The aperture taper.</summary>
/// <param name="Type">Taper family.</param>
/// <param name="SidelobeLevelDb">Design sidelobe level, dB, negative (e.g. −26); ignored by uniform and given.</param>
/// <param name="Nbar">n̄ for Taylor, Villeneuve and Bayliss (≥ 2).</param>
/// <param name="EdgeLevelDb">cosine-pedestal: edge level, dB, negative (e.g. −20).</param>
/// <param name="Exponent">cosine-pedestal: exponent q ≥ 1 (default 2).</param>
/// <param name="Weights">given: the weights, any signs; null otherwise.</param>
public sealed record TaperRequest(TaperType Type, double SidelobeLevelDb, int Nbar, double EdgeLevelDb, double Exponent,
    IReadOnlyList<double>? Weights)
{
    /// <summary>A uniform taper.</summary>
    public static TaperRequest Uniform { get; } = new(TaperType.Uniform, -13.26, 4, -20, 2, null);
}

/// <summary>Whether external mutual coupling between slots is designed for.</summary>
public enum CouplingMode
{
    /// <summary>Isolated-slot design.</summary>
    None,
    /// <summary>Elliott's design procedure with mutual coupling.</summary>
    Mutual,
}

/// <summary>Statistical law of one machining error.</summary>
public enum ErrorDistribution
{
    /// <summary>Uniform in ±value.</summary>
    Uniform,
    /// <summary>Normal with standard deviation value.</summary>
    Normal,
}

/// <summary>One machining tolerance.</summary>
/// <param name="Value">Half-width (uniform ±) or standard deviation (normal).</param>
/// <param name="Distribution">Uniform or normal.</param>
public sealed record Tolerance(Length Value, ErrorDistribution Distribution)
{
    /// <summary>No error.</summary>
    public static Tolerance None { get; } = new(Length.Zero, ErrorDistribution.Uniform);
}

/// <summary>Machining tolerances for the Monte Carlo analysis.</summary>
/// <param name="Offset">Slot offset from the centreline (or, for edge slots, taken as a tilt-equivalent error at the slot end).</param>
/// <param name="Length">Slot length.</param>
/// <param name="Position">Slot centre along the guide.</param>
/// <param name="Width">Slot width.</param>
/// <param name="GuideWidth">Inside broad dimension a of the tube.</param>
/// <param name="Wall">Wall thickness.</param>
/// <param name="SystematicLength">The same length error on every slot (added to the random one).</param>
/// <param name="SystematicOffset">The same offset error on every slot.</param>
/// <param name="Trials">Number of Monte Carlo trials, ≥ 1.</param>
/// <param name="Seed">Random seed; the same seed gives identical results.</param>
public sealed record ToleranceRequest(Tolerance Offset, Tolerance Length, Tolerance Position, Tolerance Width,
    Tolerance GuideWidth, Tolerance Wall, Length SystematicLength, Length SystematicOffset, int Trials, int Seed);

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
