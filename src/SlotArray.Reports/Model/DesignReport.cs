using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Reports.Model;

/// <summary>
/// Everything the output writers print about one designed array: a plain, immutable mirror of
/// <c>design.json</c> in SI units (m, Hz; angles in degrees and levels in dB where the name says so).
/// Conductances are normalised to the TE10 characteristic admittance G0 of the guide (g = G/G0).
/// Built from the Core results by an adapter; the writers read nothing else.
/// </summary>
public sealed record DesignReport
{
    /// <summary>Array name, used in titles and file names.</summary>
    public required string Name { get; init; }

    /// <summary>The spec's text as given (written back as spec.yaml so that <c>compare</c> can rebuild the design), or null.</summary>
    public string? SpecText { get; init; }

    /// <summary>
    /// The bytes of the spec's slot table (<c>slots.data</c>), written beside spec.yaml as <see cref="SlotTableFileName"/>
    /// so that the folder rebuilds its design on its own (<c>compare</c>, <c>verify</c>); null without a table.
    /// </summary>
    public byte[]? SlotTableBytes { get; init; }

    /// <summary>Name of the slot table's copy in a design folder.</summary>
    public const string SlotTableFileName = "slot-table.csv";

    /// <summary>Design frequency, Hz; &gt; 0.</summary>
    public required double FrequencyHz { get; init; }

    /// <summary>Lower edge of the analysis band, Hz; ≤ <see cref="FrequencyHz"/>.</summary>
    public required double BandLowHz { get; init; }

    /// <summary>Upper edge of the analysis band, Hz; ≥ <see cref="FrequencyHz"/>.</summary>
    public required double BandHighHz { get; init; }

    /// <summary>The guide the slots are cut in.</summary>
    public required GuideReport Guide { get; init; }

    /// <summary>The slots, in index order (index 1 first).</summary>
    public required IReadOnlyList<SlotReport> Slots { get; init; }

    /// <summary>How the array is terminated beyond the last slot.</summary>
    public required TerminationReport Termination { get; init; }

    /// <summary>Far-field figures and the pattern cut at the design frequency.</summary>
    public required PatternReport Pattern { get; init; }

    /// <summary>Input match at the design frequency and the matched bandwidths.</summary>
    public required MatchReport Match { get; init; }

    /// <summary>Figures at each frequency of the band, in increasing frequency.</summary>
    public required IReadOnlyList<SweepPoint> Sweep { get; init; }

    /// <summary>
    /// The input match alone over the match span (wide enough to show the VSWR band edges unless a span was asked for),
    /// in increasing frequency; empty when not computed (the writers then use <see cref="Sweep"/>).
    /// </summary>
    public IReadOnlyList<MatchPoint> MatchSweep { get; init; } = [];

    /// <summary>What the user asked for, in words, for the report's inputs section.</summary>
    public required InputsSummary Inputs { get; init; }

    /// <summary>Validity limits and other warnings, one sentence each; may be empty.</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];

    /// <summary>Safety cautions, one paragraph each; when empty the summary prints the standard caution.</summary>
    public IReadOnlyList<string> Cautions { get; init; } = [];

    /// <summary>The fabrication plan (datum A on the tube's end face, features, per-dimension tolerances, thermal
    /// expansion) the cut list, drawing and DXF files print; null in reports built without one (those writers then refuse).</summary>
    public Core.Fabrication.FabricationPlan? Fabrication { get; init; }

    /// <summary>Drawing number, revision, date, tool version and spec checksum printed on the cut list and the drawing.</summary>
    public DocumentInfo Document { get; init; } = DocumentInfo.Unnamed;

    /// <summary>Safety limits exceeded (e.g. the peak power above the derated waveguide handling), one sentence each; printed first. May be empty.</summary>
    public IReadOnlyList<string> SafetyExceedances { get; init; } = [];

    /// <summary>EIRP on the beam axis at the design frequency for the transmitter's powers; null without a transmitter.</summary>
    public EirpReport? Eirp { get; init; }

    /// <summary>One pass/fail result per requirement of the spec; may be empty.</summary>
    public IReadOnlyList<RequirementResult> Requirements { get; init; } = [];

    /// <summary>Optional summary lines of a tolerance (Monte Carlo) study; empty when none was run.</summary>
    public IReadOnlyList<string> Tolerance { get; init; } = [];

    /// <summary>Travelling-wave arrays: the power left for the matched load; null for a standing-wave array.</summary>
    public LoadReport? Load { get; init; }

    /// <summary>Travelling-wave arrays: squint, scan rate, efficiency and the designer's refinement; null otherwise.</summary>
    public TravellingWaveReport? TravellingWave { get; init; }

    /// <summary>The polarisation filter (<c>filter</c>); null without one.</summary>
    public FilterReport? Filter { get; init; }

    /// <summary>The flare (<c>flare</c>); null without one.</summary>
    public FlareReport? Flare { get; init; }

    /// <summary>The beam over the operating range (<c>environment</c>, <c>transmitter.frequency_tolerance</c>); null without one.</summary>
    public PointingReport? Pointing { get; init; }

    /// <summary>The flare's and the filter's plates (<c>parts.csv</c>); empty without either.</summary>
    public IReadOnlyList<PartRow> Parts { get; init; } = [];

    /// <summary><c>coupling: mutual</c>: the coupled and isolated-slot designs side by side; null otherwise.</summary>
    public CouplingReport? Coupling { get; init; }

    /// <summary><c>slots.data</c>: the user's slot table the design was made from; null for the built-in models.</summary>
    public SlotDataReport? SlotData { get; init; }
}

/// <summary>The user's slot table (<c>slots.data</c>) a design was made from: its identity, provenance, extent and fit residuals.</summary>
public sealed record SlotDataReport
{
    /// <summary>The file as the spec names it.</summary>
    public required string File { get; init; }

    /// <summary>SHA-256 of the file's bytes, lower-case hex.</summary>
    public required string Sha256 { get; init; }

    /// <summary>The file's <c>#</c> comment lines, in order.</summary>
    public required IReadOnlyList<string> Provenance { get; init; }

    /// <summary>Number of rows.</summary>
    public required int Rows { get; init; }

    /// <summary>The tabulated range in words, e.g. "offset 0.5 mm to 5.5 mm, L/L_r 0.9 to 1.1, 9.2 to 9.55 GHz".</summary>
    public required string Range { get; init; }

    /// <summary>Whether slots outside the table were allowed (<c>slots.extrapolate: true</c>).</summary>
    public required bool Extrapolate { get; init; }

    /// <summary>Leave-one-out residuals of the fits: RMS and largest ΔL_r/L_r, Δg_r/g_r (fractions) and |Δy|/g_r.</summary>
    public required IReadOnlyList<double> Residuals { get; init; }
}

/// <summary>
/// What identifies the fabrication documents: drawing number, revision, date (given by the user, never read from the
/// clock, so runs stay byte-identical), tool version and the spec's SHA-256.
/// </summary>
public sealed record DocumentInfo
{
    /// <summary>No drawing number, revision A, no date, no spec checksum.</summary>
    public static DocumentInfo Unnamed { get; } = new();

    /// <summary>Drawing number; null: the writers use the array name.</summary>
    public string? DrawingNumber { get; init; }

    /// <summary>Revision letter, "A" for the first issue; a revised cut list advances it and flags the changed rows.</summary>
    public string Revision { get; init; } = "A";

    /// <summary>Issue date as given on the command line (e.g. 2026-12-05); null: "not dated".</summary>
    public string? Date { get; init; }

    /// <summary>The tool's version (the assembly's informational version).</summary>
    public string ToolVersion { get; init; } = typeof(DocumentInfo).Assembly
        .GetCustomAttributes(typeof(System.Reflection.AssemblyInformationalVersionAttribute), false)
        .OfType<System.Reflection.AssemblyInformationalVersionAttribute>().FirstOrDefault()?.InformationalVersion ?? "unknown";

    /// <summary>SHA-256 of the spec file's bytes, lower-case hex; null when the report was not built from a file.</summary>
    public string? SpecSha256 { get; init; }

    /// <summary>Sheet size of the drawing: "A4", "A3" (default), "A1" or "A0" (ISO 216, landscape).</summary>
    public string Sheet { get; init; } = "A3";
}

/// <summary>EIRP = P G on the beam axis at the design frequency (IEEE Std 145-2013 definition, from memory).</summary>
public sealed record EirpReport
{
    /// <summary>EIRP at the peak transmitter power, W; null when no peak power was given.</summary>
    public double? PeakW { get; init; }

    /// <summary>EIRP at the average transmitter power, W; null when no average power was given.</summary>
    public double? AverageW { get; init; }
}

/// <summary>The matched load of a travelling-wave array.</summary>
public sealed record LoadReport
{
    /// <summary>Fraction of the input power the spec asked for the load (feed.load), 0 … 1.</summary>
    public required double Fraction { get; init; }

    /// <summary>Power the network analysis delivers into the load at the design frequency, watts per watt of incident power.</summary>
    public required double PowerWPerWIn { get; init; }
}

/// <summary>Travelling-wave figures at the design frequency and across the band.</summary>
public sealed record TravellingWaveReport
{
    /// <summary>Beam squint from the phase condition sin θ = λ/λg − λ/(2d), degrees, positive toward the load end (Elliott 1981, Ch. 8).</summary>
    public required double SquintDeg { get; init; }

    /// <summary>Scan rate dθ/df from the phase condition at the design frequency, degrees per 100 MHz.</summary>
    public required double ScanDegPer100MHz { get; init; }

    /// <summary>Scan rate from the network patterns: least-squares slope of the beam direction over the sweep, degrees per 100 MHz.</summary>
    public required double ScanFromSweepDegPer100MHz { get; init; }

    /// <summary>Radiation efficiency at the design frequency: radiated / accepted power (the rest goes to the load and the walls).</summary>
    public required double Efficiency { get; init; }

    /// <summary>Power lost in the guide walls at the design frequency, watts per watt of incident power.</summary>
    public required double WallLossWPerWIn { get; init; }

    /// <summary>Network refinement iterations of the designer.</summary>
    public required int RefinementIterations { get; init; }

    /// <summary>Final refinement residual: largest |10 log10(P_n/T_n)| over the slots, dB (power).</summary>
    public required double RefinementResidualDb { get; init; }

    /// <summary>Largest departure of the slot phases from the travelling-wave progression, degrees (mean removed).</summary>
    public required double PhaseErrorDeg { get; init; }

    /// <summary>The direction asked for (<c>feed.beam</c>, else the phase condition at the given spacing), degrees, + toward the load end.</summary>
    public double BeamAskedDeg { get; init; } = double.NaN;

    /// <summary>Achieved main-beam direction (network and pattern at the design frequency) minus the asked one, degrees.</summary>
    public double BeamResidualDeg { get; init; } = double.NaN;

    /// <summary>How the beam was put where asked: "length-detuning", "spacing" or "none".</summary>
    public string PointingCorrection { get; init; } = "none";

    /// <summary>Slot spacing of the design, m (solved from <c>feed.beam</c> or moved by the spacing correction).</summary>
    public double SpacingM { get; init; } = double.NaN;

    /// <summary>Whether the load fraction was chosen by <c>feed.load: auto</c>.</summary>
    public bool LoadAuto { get; init; }
}

/// <summary>The waveguide: inside dimensions, wall, metal and the TE10 figures at the design frequency.</summary>
public sealed record GuideReport
{
    /// <summary>Standard designation (e.g. "WR-90") or a description of a custom tube.</summary>
    public required string Designation { get; init; }

    /// <summary>Broad-wall inside width a, m; &gt; 0.</summary>
    public required double A { get; init; }

    /// <summary>Narrow-wall inside height b, m; &gt; 0.</summary>
    public required double B { get; init; }

    /// <summary>Wall thickness where the slots are cut, m; &gt; 0.</summary>
    public required double Wall { get; init; }

    /// <summary>Metal name (e.g. "aluminium") or its conductivity in words.</summary>
    public required string Metal { get; init; }

    /// <summary>TE10 guide wavelength at the design frequency, m.</summary>
    public required double GuideWavelength { get; init; }

    /// <summary>TE10 wave impedance at the design frequency, Ω (the Touchstone reference resistance).</summary>
    public required double WaveImpedanceOhm { get; init; }
}

/// <summary>End form of a milled slot.</summary>
public enum SlotEndForm
{
    /// <summary>Semicircular ends of radius width/2, as an end mill of diameter = width cuts them.</summary>
    Round,

    /// <summary>Square (rectangular) ends: needs EDM, broaching or a punch.</summary>
    Square,
}

/// <summary>
/// One slot. A broad-wall slot has <see cref="Offset"/>; an edge (narrow-wall) slot has <see cref="TiltDeg"/>
/// and <see cref="CutDepth"/> instead. Exactly one of Offset and TiltDeg is set.
/// </summary>
public sealed record SlotReport
{
    /// <summary>Slot number, 1-based, in order of increasing distance from the datum or as the designer numbers them.</summary>
    public required int Index { get; init; }

    /// <summary>Slot centre measured along the guide from the datum, m.</summary>
    public required double Position { get; init; }

    /// <summary><c>slots.data</c> only: true when the slot lies outside the table (extrapolated; <c>slots.extrapolate: true</c>).</summary>
    public bool OutsideSlotTable { get; init; }

    /// <summary>Signed offset of the slot centre from the broad-wall centreline, m; positive toward the +x side wall; null for edge slots.</summary>
    public double? Offset { get; init; }

    /// <summary>Signed tilt of an edge slot from the transverse direction, degrees; null for broad-wall slots.</summary>
    public double? TiltDeg { get; init; }

    /// <summary>Depth of cut of an edge slot into each broad wall, from the outer narrow-wall face, m; null for broad-wall slots.</summary>
    public double? CutDepth { get; init; }

    /// <summary>Equivalent rectangular (electrical) length, m.</summary>
    public required double Length { get; init; }

    /// <summary>Overall tip-to-tip length as cut, m (equals <see cref="Length"/> for square ends).</summary>
    public required double OverallLength { get; init; }

    /// <summary>Slot width (= cutter diameter for round ends), m.</summary>
    public required double Width { get; init; }

    /// <summary>End form.</summary>
    public required SlotEndForm EndForm { get; init; }

    /// <summary>Normalised resonant conductance g = G/G0 (series slots: normalised resistance).</summary>
    public required double Conductance { get; init; }

    /// <summary>Designed (taper) aperture amplitude, linear, any common scale.</summary>
    public required double TargetAmplitude { get; init; }

    /// <summary>Achieved aperture amplitude from the network analysis, linear, on the same scale as the target.</summary>
    public required double AchievedAmplitude { get; init; }

    /// <summary>Achieved phase of the slot excitation, degrees.</summary>
    public required double AchievedPhaseDeg { get; init; }
}

/// <summary>The termination beyond the last slot.</summary>
public sealed record TerminationReport
{
    /// <summary>Kind, e.g. "short" or "matched-load".</summary>
    public required string Type { get; init; }

    /// <summary>Distance from the inner face of the short (or the load) to the nearest slot centre, m (at the datum end: slot 1).</summary>
    public required double Distance { get; init; }

    /// <summary>The feed reference plane (where S11 is referred), m from datum A: the last slot centre for an end feed,
    /// the series junction for a centre feed; null when not known.</summary>
    public double? FeedPosition { get; init; }

    /// <summary>Centre feed only: the inner face of the second end short beyond the last slot, m from datum A; null for an end feed.</summary>
    public double? FarShortPosition { get; init; }
}

/// <summary>Pattern figures at the design frequency in the plane containing the guide axis, and the cut itself.</summary>
public sealed record PatternReport
{
    /// <summary>Beam direction from broadside, degrees (positive toward the short/load end).</summary>
    public required double BeamDeg { get; init; }

    /// <summary>Half-power beamwidth, degrees.</summary>
    public required double HpbwDeg { get; init; }

    /// <summary>Peak sidelobe relative to the beam peak, dB (negative).</summary>
    public required double PeakSidelobeDb { get; init; }

    /// <summary>First sidelobe relative to the beam peak, dB (negative).</summary>
    public required double FirstSidelobeDb { get; init; }

    /// <summary>Directivity, dBi.</summary>
    public required double DirectivityDbi { get; init; }

    /// <summary>Gain (directivity × radiation efficiency × (1 − |S11|²)), dBi.</summary>
    public required double GainDbi { get; init; }

    /// <summary>The taper's design sidelobe level, dB (negative); drawn on the pattern plot.</summary>
    public required double DesignSidelobeDb { get; init; }

    /// <summary>Angles of the pattern cut from broadside, degrees, increasing.</summary>
    public required IReadOnlyList<double> CutAngleDeg { get; init; }

    /// <summary>Pattern level at each angle of <see cref="CutAngleDeg"/>, dB relative to the beam peak.</summary>
    public required IReadOnlyList<double> CutLevelDb { get; init; }

    /// <summary>Edge slots: peak cross-polarised level relative to the co-polar beam peak, dB; null otherwise.</summary>
    public double? CrossPolarDb { get; init; }

    /// <summary>Edge slots: direction of that cross-polar peak, degrees from broadside; null otherwise.</summary>
    public double? CrossPolarDirectionDeg { get; init; }

    /// <summary>Edge slots: cross-polarised level at each angle of <see cref="CutAngleDeg"/>, dB relative to the co-polar peak; empty otherwise.</summary>
    public IReadOnlyList<double> CrossCutLevelDb { get; init; } = [];

    /// <summary>Outside width of the slotted face (a + 2t broad-wall, b + 2t edge slots), m; NaN when unknown.</summary>
    public double TransverseFaceWidth { get; init; } = double.NaN;

    /// <summary>
    /// Lower bound on the transverse-plane (E-plane) half-power beamwidth set by that face's width at the design frequency,
    /// degrees (<see cref="Core.Patterns.FiniteFaceBeamwidth"/>); NaN when the face is too narrow to form a beam (the pattern wraps behind the tube).
    /// </summary>
    public double TransverseHpbwLowerBoundDeg { get; init; } = double.NaN;
}

/// <summary>Input match.</summary>
public sealed record MatchReport
{
    /// <summary>|S11| at the design frequency, dB.</summary>
    public required double S11DbAtDesign { get; init; }

    /// <summary>VSWR at the design frequency.</summary>
    public required double VswrAtDesign { get; init; }

    /// <summary>Width of the band around the design frequency where VSWR ≤ 1.5, Hz (0 if none).</summary>
    public required double BandwidthVswr15Hz { get; init; }

    /// <summary>Width of the band around the design frequency where VSWR ≤ 2.0, Hz (0 if none).</summary>
    public required double BandwidthVswr2Hz { get; init; }
}

/// <summary>Figures at one frequency of the sweep.</summary>
public sealed record SweepPoint
{
    /// <summary>Frequency, Hz.</summary>
    public required double FrequencyHz { get; init; }

    /// <summary>Input reflection coefficient at the feed port, normalised to the guide's TE10 wave impedance.</summary>
    public required System.Numerics.Complex S11 { get; init; }

    /// <summary>Beam direction from broadside, degrees.</summary>
    public required double BeamDeg { get; init; }

    /// <summary>Peak sidelobe relative to the beam peak, dB.</summary>
    public required double PeakSidelobeDb { get; init; }

    /// <summary>Gain, dBi.</summary>
    public required double GainDbi { get; init; }

    /// <summary>Half-power beamwidth, degrees (NaN when not measured).</summary>
    public double HpbwDeg { get; init; } = double.NaN;

    /// <summary>Edge slots: peak cross-polarised level relative to the co-polar peak, dB; null otherwise.</summary>
    public double? CrossPolarDb { get; init; }
}

/// <summary>The input reflection at one frequency of the match sweep.</summary>
public sealed record MatchPoint
{
    /// <summary>Frequency, Hz.</summary>
    public required double FrequencyHz { get; init; }

    /// <summary>Input reflection coefficient at the feed port, normalised to the guide's TE10 wave impedance.</summary>
    public required System.Numerics.Complex S11 { get; init; }
}

/// <summary>The outcome of one requirement of the spec.</summary>
public sealed record RequirementResult
{
    /// <summary>What is required, e.g. "peak sidelobe over the band".</summary>
    public required string Description { get; init; }

    /// <summary>The required value in words with unit, e.g. "≤ -26.0 dB".</summary>
    public required string Required { get; init; }

    /// <summary>The achieved value in words with unit, e.g. "-27.3 dB (worst at 9.30 GHz)".</summary>
    public required string Achieved { get; init; }

    /// <summary>Whether the requirement is met.</summary>
    public required bool Passed { get; init; }
}

/// <summary>The inputs in words, for the report.</summary>
public sealed record InputsSummary
{
    /// <summary>Slot type, e.g. "longitudinal" or "edge".</summary>
    public required string SlotType { get; init; }

    /// <summary>Feed type, e.g. "standing-wave, end-fed".</summary>
    public required string FeedType { get; init; }

    /// <summary>Taper in words, e.g. "Taylor, -26 dB, nbar 4".</summary>
    public required string TaperDescription { get; init; }

    /// <summary>Name of the slot model used, e.g. "moment method (finite wall)".</summary>
    public required string SlotModelName { get; init; }

    /// <summary>The longitudinal datum in words, e.g. "inner face of end short".</summary>
    public string DatumDescription { get; init; } = "inner face of end short";

    /// <summary>Machining tolerance (±) printed on every cut-list row, m; ≥ 0.</summary>
    public required double CutTolerance { get; init; }
}
