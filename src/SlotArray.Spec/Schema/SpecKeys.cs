using SlotArray.Core.Stick;
using SlotArray.Core.Waveguides;

namespace SlotArray.Spec.Schema;

/// <summary>
/// Every key of the YAML spec (version 1), section by section: the one source of truth. The parser takes its known
/// keys, ranges, defaults and "applies to" rules from here; <c>slotarray schema</c> writes the JSON Schema and
/// <c>slotarray init</c> the comments of its starter spec from the same definitions. To add a key: add it to its
/// section below, then read it in the matching <c>SpecBuilder</c> part (DEVELOPERS.md, "Adding a spec key").
/// </summary>
internal static class SpecKeys
{
    /// <summary>Slot count range: an array has at least two slots; above 1000 a mistake is likelier than a design.</summary>
    public const int MinSlots = 2, MaxSlots = 1000;
    /// <summary>n̄ range of the Taylor, Villeneuve and Bayliss tapers.</summary>
    public const int MinNbar = 2, MaxNbar = 50;
    /// <summary>Monte Carlo trial range.</summary>
    public const int MinTrials = 1, MaxTrials = 1_000_000;
    /// <summary>Relative permittivity range of the guide's filling.</summary>
    public const double MinPermittivity = 1, MaxPermittivity = 100;
    /// <summary>Cosine-pedestal exponent range.</summary>
    public const double MinExponent = 1, MaxExponent = 20;

    /// <summary>Range of <c>coupling_scale</c>: a calibration of the exterior mutual impedances, not a redesign of them.</summary>
    public const double MinCouplingScale = 0.25, MaxCouplingScale = 4;

    private static QuantityValue Q(QuantityKind kind, string range) => new([kind], range);
    private static QuantityValue GuideDistance(string range) => new([QuantityKind.GuideWavelengths, QuantityKind.Length], range);
    private static ChoiceValue Words<T>(IReadOnlyList<KeyValuePair<string, T>> table) where T : struct, Enum
    {
        var words = table.Select(p => p.Key).ToList();
        return new(words, [.. SpecNames.WordAliases.Where(a => words.Contains(a.Value)).Select(a => a.Key)], WordFolding.Words);
    }
    private static string[] TaperWords(params Core.Tapers.TaperType[] types) => [.. types.Select(SpecNames.Of)];

    private static readonly QuantityValue ToleranceLength = Q(QuantityKind.Length, "0 to 10 mm");

    /// <summary><c>tolerance.&lt;error&gt;: {sigma: …}</c>: a normally distributed error.</summary>
    public static readonly SpecSection Sigma = new("tolerance.sigma", "a normally distributed error given by its standard deviation",
    [
        new("sigma", ToleranceLength, "standard deviation of a normally distributed error") { Required = true, Example = "0.02 mm" },
    ]);

    private static readonly AnyOfValue Tolerance = new([ToleranceLength, new BlockValue(Sigma)]);

    private static readonly QuantityValue ToleranceAngle = Q(QuantityKind.Angle, "0 to 5 deg");

    /// <summary><c>tolerance.tilt: {sigma: …}</c>: a normally distributed tilt error.</summary>
    public static readonly SpecSection SigmaAngle = new("tolerance.tilt.sigma", "a normally distributed tilt error given by its standard deviation",
    [
        new("sigma", ToleranceAngle, "standard deviation of a normally distributed tilt error") { Required = true, Example = "0.05 deg" },
    ]);

    private static readonly AnyOfValue TiltTolerance = new([ToleranceAngle, new BlockValue(SigmaAngle)]);

    /// <summary><c>guide</c>: the waveguide or tube the slots are cut in.</summary>
    public static readonly SpecSection Guide = new("guide", "the waveguide or rectangular tube the slots are cut in",
    [
        new("size", new ChoiceValue([.. WaveguideCatalogue.All.SelectMany(g => new[] { g.Designation, g.Iec })], [], WordFolding.Designation),
            "catalogue size (EIA WR or IEC R, 'slotarray guides' lists them); or give a and b") { DefaultText = "none: give size, or a and b", Example = "WR-90" },
        new("a", Q(QuantityKind.Length, "above 0, up to 10 m; larger than b"), "inside broad-wall width (overrides size)") { DefaultText = "from size", Example = "22.86 mm" },
        new("b", Q(QuantityKind.Length, "above 0, smaller than a"), "inside narrow-wall height (overrides size)") { DefaultText = "from size", Example = "10.16 mm" },
        new("wall", Q(QuantityKind.Length, "0 or more, smaller than a"), "wall thickness where the slots are cut") { Required = true, Example = "1.27 mm" },
        new("metal", new ChoiceValue([.. Metal.All.Select(m => m.Name)], [.. Metal.Aliases.Select(a => a.Key)], WordFolding.CaseOnly),
            "wall metal (sets the conductivity for the loss)") { Default = "aluminium", DefaultText = "aluminium (warning)" },
        new("conductivity", Q(QuantityKind.Conductivity, "above 0, up to 1e9 S/m"), "wall conductivity, instead of metal") { Example = "3.5e7 S/m" },
        new("permittivity", new NumberValue(MinPermittivity, MaxPermittivity), "relative permittivity εr of the filling") { Default = 1L },
        new("roughness", Q(QuantityKind.Length, "0 to 1 mm"), "RMS surface roughness of the inside walls") { Default = "0 mm" },
    ])
    {
        RequireOneOf = [["size"], ["a", "b"]],
        Exclusive = [("metal", "conductivity")],
    };

    /// <summary><c>slots</c>: the radiating slots.</summary>
    public static readonly SpecSection Slots = new("slots", "the radiating slots",
    [
        new("type", Words(SpecNames.SlotTypes), "longitudinal broad-wall, inclined narrow-wall (edge) or inclined series slots") { Required = true, Example = "longitudinal" },
        new("count", new IntegerValue(MinSlots, MaxSlots), "number of slots") { Required = true, Example = "16" },
        new("width", Q(QuantityKind.Length, "above 0, less than a/2; 0.002 to 0.2 wavelength for longitudinal slots, less than b for edge slots"), "slot width") { Required = true, Example = "1.6 mm" },
        new("cutter", Q(QuantityKind.Length, "above 0, no larger than the width"), "end-mill diameter: round-ended slots")
            { DefaultText = "omitted: square ends", Example = "1.6 mm" },
        new("model", Words(SpecNames.SlotModels), "slot admittance model") { Default = "moment-method" },
        new("surround", Words(SpecNames.Surrounds), "edge slots: what they radiate into (bare tube, flush in a ground plane, into a flare); picks the full-wave calibration") { DefaultText = "tube; flare when the spec has a flare" },
        new("data", new TextValue(MaxLength: 4096), "your own slot table (CSV, README 'Your own slot table'), path relative to the spec; replaces the model")
            { DefaultText = "none: the model" },
        new("extrapolate", new BooleanValue(), "with data: design slots outside the table (flagged in the cut list and summary) instead of refusing")
            { DefaultText = "false" },
    ])
    {
        Exclusive = [("model", "data")],
    };

    private static readonly string[] StandingWave = [SpecNames.Of(Core.Stick.FeedType.StandingWave)];
    private static readonly string[] TravellingWave = [SpecNames.Of(Core.Stick.FeedType.TravellingWave)];

    /// <summary><c>feed</c>: how the guide is fed and ended.</summary>
    public static readonly SpecSection Feed = new("feed", "how the guide is fed and how it ends",
    [
        new("type", Words(SpecNames.FeedTypes), "standing-wave (ends in a short) or travelling-wave (ends in a load)") { Required = true, Example = "standing-wave" },
        new("spacing", GuideDistance("between 0 and 1 guide-wavelength"), "slot spacing along the guide, in guide wavelengths or a length")
            { Default = "0.5 guide-wavelength", DefaultText = "0.5 guide-wavelength (standing-wave); travelling-wave: give spacing or beam" },
        new("beam", Q(QuantityKind.Angle, "-80 deg to +80 deg, + toward the load end"),
            "travelling-wave: main-beam direction asked for, instead of spacing; the spacing is solved from sin θ = λ/λg − λ/(2d) and reported")
            { DefaultText = "none: the spacing sets the beam", AppliesTo = TravellingWave, Example = "-4.5 deg" },
        new("position", Words(SpecNames.FeedPositions), "where a standing-wave array is fed") { Default = "end", AppliesTo = StandingWave },
        new("load", new AnyOfValue([Q(QuantityKind.Percent, "between 0 % and 100 % (exclusive)"), new ChoiceValue(["auto"], [], WordFolding.Words)]),
            "fraction of the input power left for the load; auto: the smallest the slots can deliver for the count and taper")
            { Default = "5 %", DefaultText = "5 % (warning)", AppliesTo = TravellingWave },
        new("short", GuideDistance("between 0 and 1 guide-wavelength"), "last slot centre to the end short")
            { Default = "0.25 guide-wavelength", AppliesTo = StandingWave },
        new("guide", new BlockValue(Guide), "planar arrays: the feed guide behind the branches (its λg/2 sets the pitch)")
            { DefaultText = "the branch guide's section, broad wall solved for the pitch", AppliesTo = StandingWave },
    ])
    {
        Exclusive = [("spacing", "beam")],
    };

    /// <summary>The taper word of Hansen's circular Taylor distribution (planar arrays with a circle or ellipse outline).</summary>
    public const string CircularTaylor = "circular-taylor";

    private static readonly string[] SidelobeTapers = [.. TaperWords(Core.Tapers.TaperType.Chebyshev, Core.Tapers.TaperType.Taylor,
        Core.Tapers.TaperType.Villeneuve, Core.Tapers.TaperType.TaylorOneParameter, Core.Tapers.TaperType.Bayliss), CircularTaylor];
    private static readonly string[] NbarTapers = [.. TaperWords(Core.Tapers.TaperType.Taylor, Core.Tapers.TaperType.Villeneuve, Core.Tapers.TaperType.Bayliss), CircularTaylor];
    private static readonly string[] PedestalTaper = TaperWords(Core.Tapers.TaperType.CosinePedestal);
    private static readonly string[] GivenTaper = TaperWords(Core.Tapers.TaperType.Given);

    /// <summary><c>taper</c>: the aperture amplitude distribution.</summary>
    public static readonly SpecSection Taper = new("taper", "the aperture amplitude distribution (sum or difference pattern)",
    [
        new("type", new ChoiceValue([.. SpecNames.TaperTypes.Select(p => p.Key), CircularTaylor], [], WordFolding.Words),
            "taper family (circular-taylor: the whole aperture of a planar array with a circle or ellipse outline)") { Required = true, Example = "taylor" },
        new("sidelobes", Q(QuantityKind.Decibels, "-100 dB up to -13.3 dB (chebyshev: up to -1 dB; bayliss: -60 dB to -15 dB)"), "design sidelobe level")
            { AppliesTo = SidelobeTapers, RequiredFor = SidelobeTapers, Example = "-26 dB" },
        new("nbar", new IntegerValue(MinNbar, MaxNbar), "number of nearly equal sidelobes next to the main beam") { Default = 4L, AppliesTo = NbarTapers },
        new("edge", Q(QuantityKind.Decibels, "-100 dB to 0 dB (negative)"), "cosine-pedestal: edge level")
            { AppliesTo = PedestalTaper, RequiredFor = PedestalTaper, Example = "-20 dB" },
        new("exponent", new NumberValue(MinExponent, MaxExponent), "cosine-pedestal: exponent of the cosine") { Default = 2L, AppliesTo = PedestalTaper },
        new("weights", new ListValue(new NumberValue(null, null), 1, null), "given: one amplitude per slot (any signs)")
            { AppliesTo = GivenTaper, RequiredFor = GivenTaper, Example = "[0.5, 1, 1, 0.5]" },
    ]);

    /// <summary><c>tolerance.systematic</c>: the same error on every slot.</summary>
    public static readonly SpecSection Systematic = new("tolerance.systematic", "the same error on every slot",
    [
        new("length", Q(QuantityKind.Length, "within ±10 mm"), "error added to every slot length") { Default = "0 mm" },
        new("offset", Q(QuantityKind.Length, "within ±10 mm"), "broad-wall slots: error added to every slot offset") { Default = "0 mm" },
    ]);

    /// <summary><c>tolerance</c>: machining errors for the Monte Carlo analysis.</summary>
    public static readonly SpecSection ToleranceBlock = new("tolerance", "machining errors for the Monte Carlo analysis: '0.02 mm' is uniform ±, '{sigma: 0.02 mm}' normal",
    [
        new("offset", Tolerance, "broad-wall slots: error of each slot's offset from the centreline") { DefaultText = "no error", Example = "0.02 mm" },
        new("tilt", TiltTolerance, "edge slots: error of each slot's tilt")
            { DefaultText = "no error (the cut list states ±0.025 mm at the slot's end, common practice)", Example = "0.1 deg" },
        new("depth", Tolerance, "edge slots: error of each slot's depth of cut into each broad wall")
            { DefaultText = "no error (the cut list states half the length tolerance, which keeps the cut path within it)", Example = "0.02 mm" },
        new("length", Tolerance, "error of each slot's length") { DefaultText = "no error", Example = "0.02 mm" },
        new("position", Tolerance, "error of each slot's position along the guide") { DefaultText = "no error", Example = "0.02 mm" },
        new("width", Tolerance, "error of each slot's width") { DefaultText = "no error", Example = "0.02 mm" },
        new("guide_width", Tolerance, "error of the tube's inside broad wall a") { DefaultText = "no error", Example = "0.02 mm" },
        new("wall", Tolerance, "error of the wall thickness") { DefaultText = "no error", Example = "0.02 mm" },
        new("systematic", new BlockValue(Systematic), "the same error on every slot") { DefaultText = "none" },
        new("trials", new IntegerValue(MinTrials, MaxTrials), "Monte Carlo trials") { Default = 1000L },
        new("seed", new IntegerValue(0, int.MaxValue), "random seed (same seed, same results)") { Default = 1L },
    ]);

    private static readonly string VswrPattern = @"^\s*" + QuantityParser.NumberPattern + @"\s*(?::1)?\s*$";

    /// <summary><c>requirements</c>: what the antenna must meet (pass or fail in the report).</summary>
    public static readonly SpecSection Requirements = new("requirements", "what the antenna must meet (pass or fail in the report)",
    [
        new("sidelobes", Q(QuantityKind.Decibels, "-100 dB to 0 dB (negative)"), "highest sidelobe allowed") { DefaultText = "the taper's design level", Example = "-24 dB" },
        new("cross_polar", Q(QuantityKind.Decibels, "-100 dB to 0 dB (negative)"), "highest cross-polar level allowed") { DefaultText = "not checked", Example = "-25 dB" },
        new("vswr", new AnyOfValue([new NumberValue(1, 100, ExclusiveMinimum: true), new TextValue(VswrPattern)]),
            "highest VSWR over the whole band, e.g. 1.5 or '1.5:1'") { DefaultText = "not checked", Example = "1.5" },
        new("vertical_beamwidth", Q(QuantityKind.Angle, "above 0 deg, below 180 deg"), "vertical half-power beamwidth of the flare, met within ±1 deg; flare: auto chooses the aperture for it")
            { DefaultText = "not checked", Example = "22 deg" },
    ]);

    /// <summary><c>transmitter</c>: powers for the exposure and power-handling screening.</summary>
    public static readonly SpecSection Transmitter = new("transmitter", "transmitter powers for the RF exposure and power-handling screening",
    [
        new("peak_power", Q(QuantityKind.Power, "above 0, up to 1000 MW"), "peak transmitter power") { DefaultText = "no estimate", Example = "25 kW" },
        new("average_power", Q(QuantityKind.Power, "above 0, up to the peak power"), "average transmitter power") { DefaultText = "no estimate", Example = "20 W" },
        new("frequency_tolerance", Q(QuantityKind.Frequency, "0 Hz or more, below the design frequency"), "± tolerance of the transmitter frequency, for the pointing budget")
            { DefaultText = "0 Hz", Example = "30 MHz" },
    ]);

    private static readonly ChoiceValue AutoWord = new(["auto"], [], WordFolding.Words);

    /// <summary><c>filter</c>: the polarisation filter of plates in front of edge slots.</summary>
    public static readonly SpecSection Filter = new("filter", "polarisation filter: thin metal plates across the aperture, normal to the guide axis (edge slots)",
    [
        new("spacing", new AnyOfValue([Q(QuantityKind.Length, "above the thickness, below half a wavelength plus the thickness"), AutoWord]),
            "plate pitch along the guide axis, centre to centre; auto: the slot spacing over the smallest whole number that leaves a clear gap of at most 0.35 wavelength at the top of the band")
            { DefaultText = "auto", Example = "12 mm" },
        new("depth", new AnyOfValue([Q(QuantityKind.Length, "above 0, up to 1 m"), AutoWord]),
            "plate depth out from the slotted face; auto: the depth that meets requirements.cross_polar with a 3 dB margin")
            { DefaultText = "auto", Example = "15 mm" },
        new("thickness", Q(QuantityKind.Length, "0 or more, below the spacing"), "plate thickness") { Default = "0.5 mm" },
    ]);

    /// <summary><c>flare</c>: two plates diverging from the slotted face (edge slots), setting the vertical beam.</summary>
    public static readonly SpecSection Flare = new("flare", "two plates diverging from the slotted narrow-wall face that set the vertical beam (edge slots)",
    [
        new("length", new AnyOfValue([Q(QuantityKind.Length, "above 0, up to 10 m"), AutoWord]),
            "depth from the slotted face to the aperture; auto: from the aperture and the phase error")
            { DefaultText = "auto", Example = "150 mm" },
        new("aperture", new AnyOfValue([Q(QuantityKind.Length, "above half a wavelength, up to 10 m"), AutoWord]),
            "aperture height between the plates' outer edges; auto: the height that gives requirements.vertical_beamwidth")
            { DefaultText = "auto", Example = "100 mm" },
        new("phase_error", Q(QuantityKind.Angle, "above 0 deg, up to 360 deg"), "largest phase error at the aperture edge an automatic flare may have")
            { Default = "90 deg" },
    ]);

    /// <summary><c>environment</c>: the operating conditions of the pointing budget.</summary>
    public static readonly SpecSection Environment = new("environment", "operating conditions: the guide's temperature range for the pointing budget",
    [
        new("temperature", new ListValue(Q(QuantityKind.Temperature, "-100 degC to 200 degC, low ≤ high"), 2, 2), "operating temperature range of the guide [low, high]")
            { DefaultText = "20 degC only", Example = "[-25 degC, 55 degC]" },
    ]);

    /// <summary><c>fabrication</c>: how the plate is to be cut.</summary>
    public static readonly SpecSection Fabrication = new("fabrication", "how the plate is to be cut",
    [
        new("prototype_margin", Q(QuantityKind.Percent, "-5 % to +5 %"),
            "every slot cut this much longer (+) or shorter (-) than designed; a first plate cut short (e.g. -0.5 %) can be trimmed up after 'slotarray compare' (common practice, no source)")
            { DefaultText = "0 %: the designed lengths" },
    ]);

    private static readonly string[] Planar = ["planar"];

    /// <summary><c>array</c>: one stick (linear) or a planar array of branch guides fed by a feed guide.</summary>
    public static readonly SpecSection ArrayLayout = new("array", "linear (one guide) or planar (branch guides side by side, fed by a feed guide behind them)",
    [
        new("type", new ChoiceValue(["linear", "planar"], [], WordFolding.Words), "linear: one guide; planar: branches fed through coupling slots")
            { Default = "linear" },
        new("branches", new IntegerValue(1, 200), "planar: number of branch guides of the bounding rectangle (slots.count is the slots per branch)")
            { AppliesTo = Planar, RequiredFor = Planar, Example = "12" },
        new("pitch", new AnyOfValue([Q(QuantityKind.Length, "at least the branch guide's a plus the common wall"), AutoWord]),
            "planar: branch centre-line spacing; auto: a + common wall (or λg/2 of a given feed guide), the feed guide's a solved to match")
            { Default = "auto", AppliesTo = Planar },
        new("common_wall", Q(QuantityKind.Length, "0 or more, up to 20 mm"), "planar: thickness of the wall two neighbouring branch guides share")
            { Default = "1 mm", AppliesTo = Planar },
        new("outline", new ChoiceValue(["rectangle", "circle", "ellipse"], [], WordFolding.Words),
            "planar: aperture outline; slots whose centres fall outside are left out") { Default = "rectangle", AppliesTo = Planar },
    ]);

    /// <summary>The top level of the spec.</summary>
    public static readonly SpecSection Root = new("", "a SlotArray spec (version 1): one slotted-waveguide array from requirements to metal",
    [
        new("spec", new IntegerValue(1, 1), "spec format version") { Required = true, Example = "1" },
        new("name", new TextValue(@"^[^/\\:*?""<>|\u0000-\u001f\u007f-\u009f]+$"), "used in titles and file names (1 to 100 characters, no / \\ : * ? \" < > |)")
            { Required = true, Example = "harbour-sensor-16" },
        new("frequency", Q(QuantityKind.Frequency, "1 MHz to 1000 GHz, inside the guide's single-mode band"), "design frequency") { Required = true, Example = "9.41 GHz" },
        new("band", new ListValue(Q(QuantityKind.Frequency, "low above the TE10 cutoff, low < high"), 2, 2), "analysis band [low, high] containing the design frequency")
            { DefaultText = "frequency ± 2 % (warning)", Example = "[9.35 GHz, 9.47 GHz]" },
        new("guide", new BlockValue(Guide), Guide.Description) { Required = true },
        new("slots", new BlockValue(Slots), Slots.Description) { Required = true },
        new("feed", new BlockValue(Feed), Feed.Description) { Required = true },
        new("taper", new BlockValue(Taper), Taper.Description) { DefaultText = "uniform (warning)" },
        new("array", new BlockValue(ArrayLayout), ArrayLayout.Description) { DefaultText = "linear" },
        new("taper_across", new BlockValue(Taper), "planar arrays: the taper across the branches (separable with taper along them)")
            { DefaultText = "planar: the same as taper (warning)" },
        new("coupling", Words(SpecNames.CouplingModes), "mutual: Elliott's design with mutual coupling between slots") { Default = "none" },
        new("coupling_scale", new NumberValue(MinCouplingScale, MaxCouplingScale), "longitudinal slots: magnitude of a factor on every exterior mutual impedance of the coupled design and analysis, a full-wave calibration of the infinite-ground-plane model for the tube (verify prints it)") { Default = 1L, Example = "0.9" },
        new("coupling_phase", Q(QuantityKind.Angle, "-90 deg to +90 deg"), "phase of that factor") { Default = "0 deg", Example = "-25 deg" },
        new("tolerance", new BlockValue(ToleranceBlock), "machining tolerances for the Monte Carlo analysis") { DefaultText = "no tolerance analysis" },
        new("requirements", new BlockValue(Requirements), Requirements.Description) { DefaultText = "none" },
        new("transmitter", new BlockValue(Transmitter), Transmitter.Description) { DefaultText = "no exposure estimate" },
        new("fabrication", new BlockValue(Fabrication), Fabrication.Description) { DefaultText = "the designed lengths" },
        new("filter", new AnyOfValue([new BlockValue(Filter), AutoWord]), Filter.Description + "; auto: every dimension chosen") { DefaultText = "none" },
        new("environment", new BlockValue(Environment), Environment.Description) { DefaultText = "20 degC only" },
        new("flare", new AnyOfValue([new BlockValue(Flare), AutoWord]), Flare.Description + "; auto: length and aperture chosen") { DefaultText = "none" },
    ]);

    /// <summary>Every block, the top level first.</summary>
    public static IReadOnlyList<SpecSection> All { get; } = [Root, Guide, Slots, Feed, Taper, ArrayLayout, ToleranceBlock, Systematic, Sigma, SigmaAngle, Requirements, Transmitter, Fabrication, Filter, Flare, Environment];
}
