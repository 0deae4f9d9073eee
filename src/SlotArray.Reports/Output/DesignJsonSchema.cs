using System.Text.Json;
using System.Text.Json.Nodes;

namespace SlotArray.Reports;

/// <summary>
/// The JSON Schema (draft 2020-12) of <c>design.json</c> as <see cref="DesignJson"/> writes it: every key with its
/// meaning and unit (SI, named by the key's suffix), required unless the writer adds it only for some designs, no
/// other keys (<c>additionalProperties: false</c>). A number the writer cannot give (not finite) is null. Kept beside
/// the writer; a test validates the designs of every bundled spec and of a coupled design against it, so the two
/// cannot drift apart unnoticed.
/// </summary>
internal static class DesignJsonSchema
{
    /// <summary>The schema's identifier.</summary>
    public const string Id = "urn:slotarray:design-json:1";

    /// <summary>The schema as indented JSON text ending in a newline.</summary>
    public static string Text() => Build().ToJsonString(new JsonSerializerOptions
    {
        WriteIndented = true,
        TypeInfoResolver = new System.Text.Json.Serialization.Metadata.DefaultJsonTypeInfoResolver(),
        Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    }).ReplaceLineEndings("\n") + "\n";

    /// <summary>The schema as a JSON tree.</summary>
    public static JsonObject Build()
    {
        var root = Obj("everything a design run computed: SI units, the unit in each key's suffix; conductances normalised to G0",
            ("name", S("the spec's name"), true),
            ("frequency_hz", N("design frequency, Hz"), true),
            ("normalisation", S("how conductances and admittances are normalised"), true),
            ("band", Obj("analysis band", ("low_hz", N("low edge, Hz"), true), ("high_hz", N("high edge, Hz"), true)), true),
            ("guide", Obj("the waveguide",
                ("designation", S("catalogue size or 'custom'"), true), ("a_m", N("inside broad wall a, m"), true),
                ("b_m", N("inside narrow wall b, m"), true), ("wall_m", N("wall thickness, m"), true), ("metal", S("wall metal"), true),
                ("guide_wavelength_m", N("TE10 guide wavelength at the design frequency, m"), true),
                ("wave_impedance_ohm", N("TE10 wave impedance at the design frequency, ohm"), true)), true),
            ("slots", SlotsSchema(), true),
            ("termination", Obj("how the guide ends",
                ("type", S("short or load"), true), ("distance_m", N("last slot centre to the termination, m"), true),
                ("feed_position_m", N("feed reference plane from datum A, m"), false),
                ("far_short_position_m", N("centre feed: the far short from datum A, m"), false)), true),
            ("load", Obj("travelling-wave: the matched load", ("fraction", N("fraction of the input power asked for the load"), true),
                ("power_w_per_w_in", N("power reaching the load per watt in"), true)), false),
            ("travelling_wave", TravellingWaveSchema(), false),
            ("pointing", PointingSchema(), false),
            ("flare", FlareSchema(), false),
            ("filter", FilterSchema(), false),
            ("mutual_coupling", MutualCouplingSchema(), false),
            ("pattern", PatternSchema(), true),
            ("match", Obj("input match", ("s11_db_at_design", N("|S11| at the design frequency, dB"), true),
                ("vswr_at_design", N("VSWR at the design frequency"), true), ("bandwidth_vswr15_hz", N("VSWR ≤ 1.5 bandwidth, Hz"), true),
                ("bandwidth_vswr2_hz", N("VSWR ≤ 2 bandwidth, Hz"), true)), true),
            ("sweep", Arr("the band sweep", Obj("one frequency",
                ("frequency_hz", N("frequency, Hz"), true), ("s11_re", N("Re S11"), true), ("s11_im", N("Im S11"), true),
                ("beam_deg", N("beam direction, deg"), true), ("peak_sidelobe_db", N("peak sidelobe, dB"), true),
                ("gain_dbi", N("gain, dBi"), true), ("hpbw_deg", N("half-power beamwidth, deg"), true),
                ("cross_polar_db", N("peak cross-polar level, dB"), false))), true),
            ("inputs", Obj("the inputs in words", ("slot_type", S("slot type"), true), ("feed_type", S("feed type"), true),
                ("taper", S("taper"), true), ("slot_model", S("slot model"), true), ("datum", S("datum A"), true),
                ("cut_tolerance_m", N("machining tolerance of the cut list, m"), true)), true),
            ("fabrication", FabricationSchema(), false),
            ("slot_data", SlotDataSchema(), false),
            ("requirements", Arr("the spec's requirements, pass or fail", Obj("a requirement",
                ("description", S("what is required"), true), ("required", S("the requirement"), true),
                ("achieved", S("what the design achieves"), true), ("pass", B("met"), true))), true),
            ("warnings", StrArr("warnings"), true),
            ("cautions", StrArr("safety cautions"), true),
            ("tolerance", StrArr("tolerance summary lines (empty without a tolerance: block)"), true));
        var schema = new JsonObject
        {
            ["$schema"] = "https://json-schema.org/draft/2020-12/schema",
            ["$id"] = Id,
            ["title"] = "SlotArray design.json",
        };
        foreach (var (k, v) in root.ToList())
        {
            root.Remove(k);
            schema[k] = v;
        }
        return schema;
    }

    /// <summary>The slots array: one entry per slot.</summary>
    private static JsonObject SlotsSchema() => Arr("one entry per slot, slot 1 nearest datum A", Obj("a slot",
        ("index", I("slot number from 1"), true), ("position_m", N("slot centre from datum A, m"), true),
        ("outside_slot_table", B("with slots.data: the slot lies outside the table (extrapolated)"), false),
        ("offset_m", N("signed offset from the broad-wall centreline, m (longitudinal slots)"), false),
        ("tilt_deg", N("signed tilt, deg (edge and inclined slots)"), false),
        ("cut_depth_m", N("edge slots: depth of cut into each broad wall, m"), false),
        ("length_m", N("equivalent rectangular length, m"), true), ("overall_length_m", N("overall length with the ends as cut, m"), true),
        ("width_m", N("width, m"), true), ("end", Enum("end form", "round", "square"), true),
        ("conductance", N("resonant conductance g = G/G0"), true), ("target_amplitude", N("taper amplitude asked"), true),
        ("achieved_amplitude", N("amplitude the network gives"), true), ("achieved_phase_deg", N("phase the network gives, deg"), true)));

    /// <summary>Travelling-wave figures.</summary>
    private static JsonObject TravellingWaveSchema() => Obj("travelling-wave figures",
        ("squint_deg", N("beam squint, deg"), true), ("scan_deg_per_100mhz", N("scan rate, deg per 100 MHz"), true),
        ("scan_from_sweep_deg_per_100mhz", N("scan rate from the sweep, deg per 100 MHz"), true),
        ("efficiency", N("radiated fraction of the input power"), true), ("wall_loss_w_per_w_in", N("wall loss per watt in"), true),
        ("refinement_iterations", I("refinement iterations"), true), ("refinement_residual_db", N("refinement residual, dB"), true),
        ("phase_error_deg", N("largest phase error off the progression, deg"), true),
        ("beam_asked_deg", N("direction asked for (feed.beam, else the phase condition at the spacing), deg"), true),
        ("beam_residual_deg", N("achieved beam minus the asked direction, deg"), true),
        ("pointing_correction", S("length-detuning, spacing or none"), true), ("spacing_m", N("slot spacing of the design, m"), true),
        ("load_auto", B("load chosen by feed.load: auto"), true));

    /// <summary>The beam over the operating range.</summary>
    private static JsonObject PointingSchema() => Obj("the beam over the operating range (temperature, transmitter frequency tolerance)",
        ("low_temperature_c", N("lowest operating temperature, degC"), true), ("high_temperature_c", N("highest operating temperature, degC"), true),
        ("frequency_tolerance_hz", N("transmitter frequency tolerance, Hz"), true), ("expansion_per_k", N("metal expansion coefficient, 1/K"), true),
        ("expansion_source", S("source of the coefficient"), true), ("nominal_beam_deg", N("beam at f0 and 20 degC, deg"), true),
        ("deg_per_k", N("beam drift per kelvin, deg"), true), ("deg_per_mhz", N("beam drift per MHz, deg"), true),
        ("worst_error_deg", N("worst bearing error over the range, deg"), true),
        ("cases", Arr("temperatures x frequencies", Obj("one case", ("temperature_c", N("degC"), true), ("frequency_hz", N("transmitter frequency, Hz"), true),
            ("equivalent_frequency_hz", N("equivalent frequency of the antenna as built, Hz"), true), ("beam_deg", N("beam, deg"), true),
            ("error_deg", N("beam minus nominal, deg"), true), ("from_sweep", B("read off the analysed sweep"), true))), true));

    /// <summary>The flare: the vertical beam and the antenna's total gain.</summary>
    private static JsonObject FlareSchema() => Obj("the flare (H-plane sectoral horn) in front of edge slots: the vertical beam and the antenna's total gain",
        ("throat_m", N("throat height, m"), true), ("aperture_m", N("aperture height, m"), true), ("length_m", N("depth from the slotted face, m"), true),
        ("chosen", StrArr("dimensions chosen by the tool"), true), ("vertical_hpbw_deg", N("vertical half-power beamwidth, deg"), true),
        ("required_vertical_hpbw_deg", N("requirements.vertical_beamwidth, deg"), false), ("first_sidelobe_db", N("first vertical sidelobe, dB"), true),
        ("phase_error_deg", N("largest phase error at the aperture edge, deg"), true), ("phase_error_loss_db", N("gain lost to the phase error, dB"), true),
        ("throat_loss_db", N("attenuation of the evanescent throat, dB"), true), ("cutoff_plane_m", N("where the plates reach half a wavelength apart, m"), true),
        ("total_directivity_dbi", N("antenna directivity, array x flare, dBi"), true), ("total_gain_dbi", N("antenna gain, dBi"), true),
        ("cut_elevation_deg", NumArr("vertical cut elevations, deg"), true), ("cut_level_db", NumArr("vertical cut, dB"), true));

    /// <summary>The polarisation filter and the cross-polar level before and after it.</summary>
    private static JsonObject FilterSchema() => Obj("the polarisation filter in front of edge slots and the cross-polar level before and after it",
        ("spacing_m", N("plate pitch, centre to centre, m"), true), ("depth_m", N("plate depth, m"), true), ("thickness_m", N("plate thickness, m"), true),
        ("chosen", StrArr("dimensions chosen by the tool"), true), ("cutoff_te1_hz", N("TE1 cutoff of the clear gap, Hz"), true),
        ("attenuation_db_per_mm_at_design", N("TE1 attenuation per mm at the design frequency, dB"), true),
        ("attenuation_at_design_db", N("cross-polar attenuation at the design frequency, dB"), true),
        ("smallest_attenuation_db", N("smallest cross-polar attenuation over the band, dB"), true),
        ("wanted_loss_db", N("largest loss of the wanted polarisation over the band, dB"), true),
        ("margin_db", N("margin of the automatic depth below the requirement, dB"), true),
        ("bare_worst_db", N("worst cross-polar peak before the filter, dB"), true), ("bare_worst_frequency_hz", N("its frequency, Hz"), true),
        ("filtered_worst_db", N("worst cross-polar peak after the filter, dB"), true), ("filtered_worst_frequency_hz", N("its frequency, Hz"), true),
        ("requirement_db", N("requirements.cross_polar, dB"), false),
        ("bare_cross_level_db", NumArr("bare cross-polar cut at the design frequency, dB"), true));

    /// <summary>coupling: mutual: the coupled and isolated-slot designs and the iterations.</summary>
    private static JsonObject MutualCouplingSchema() => Obj("coupling: mutual: Elliott's design against the isolated-slot design",
        ("method", S("what was done"), true),
        ("coupled_design", Figures("figures of the coupled design"), true),
        ("isolated_slot_design", Figures("figures of the isolated-slot design, analysed with coupling"), true),
        ("tolerance_m", N("iteration tolerance, m"), true), ("surrogate_error", N("largest error of the slot surrogate"), true),
        ("iterations", Arr("the iterations", Obj("one iteration",
            ("index", I("iteration number"), true), ("max_offset_change_m", N("largest offset change, m"), true),
            ("max_length_change_m", N("largest length change, m"), true), ("worst_slot", I("slot that moved most"), true),
            ("match_error", N("|sum of active admittances - target|"), true))), true));

    /// <summary>The pattern figures and cut.</summary>
    private static JsonObject PatternSchema() => Obj("far-field pattern in the plane of the guide axis",
        ("beam_deg", N("beam direction from broadside, deg"), true), ("hpbw_deg", N("half-power beamwidth, deg"), true),
        ("peak_sidelobe_db", N("peak sidelobe, dB"), true), ("first_sidelobe_db", N("first sidelobe, dB"), true),
        ("directivity_dbi", N("directivity, dBi"), true), ("gain_dbi", N("gain, dBi"), true),
        ("design_sidelobe_db", N("the taper's design sidelobe level, dB"), true),
        ("cut", Obj("the pattern cut", ("angle_deg", NumArr("angles, deg"), true), ("level_db", NumArr("co-polar level, dB"), true),
            ("cross_level_db", NumArr("cross-polar level, dB (edge slots)"), false)), true),
        ("cross_polar_db", N("peak cross-polar level, dB"), false), ("cross_polar_direction_deg", N("its direction, deg"), false),
        ("transverse_face_width_m", N("outside width of the slotted face (a + 2t broad-wall, b + 2t edge slots), m"), true),
        ("transverse_hpbw_lower_bound_deg", N("lower bound on the transverse-plane (E-plane) half-power beamwidth from that width "
            + "(uniform aperture of the face's width; the true beam is broader, edge diffraction); null when the face is narrower "
            + "than 0.443 wavelength and the pattern wraps behind the tube, deg"), true));

    /// <summary>The fabrication plan.</summary>
    private static JsonObject FabricationSchema() => Obj("the fabrication plan: datum A (the tube's machined end face), tube length, features and each slot's tolerances, SI, from datum A",
        ("drawing_number", S("drawing number"), true), ("revision", S("revision letter"), true),
        ("date", S("date given on the command line (never the clock)"), false), ("tool_version", S("tool version"), true),
        ("spec_sha256", S("SHA-256 of the spec file"), false), ("datum", S("what datum A is"), true),
        ("datum_to_design_origin_m", N("datum A to the design origin (inner face of the end short or load plane), m"), true),
        ("end_plate_thickness_m", N("end plate thickness, m"), true),
        ("tube_length_m", N("overall tube length, m"), true), ("tube_length_tolerance_m", N("tube length tolerance, ± m"), true),
        ("reference_temperature_c", N("temperature the dimensions hold at, degC"), true),
        ("expansion_per_k", N("linear expansion coefficient of the metal, 1/K"), true),
        ("expansion_source", S("source of the expansion coefficient"), true),
        ("tube_change_m_per_k", N("tube length change per kelvin, m/K"), true),
        ("features", Arr("tube features from datum A", Obj("a feature",
            ("key", S("feature key"), true), ("name", S("feature in words"), true),
            ("position_from_datum_m", N("position from datum A, m"), true), ("tolerance_m", N("position tolerance, ± m"), true),
            ("tolerance_source", S("where the tolerance comes from"), true), ("changed", B("changed from the previous revision"), true))), true),
        ("slots", Arr("each slot's position from datum A and its tolerances", Obj("a slot",
            ("index", I("slot number from 1"), true), ("position_from_datum_m", N("slot centre from datum A, m"), true),
            ("position_tolerance_m", N("position tolerance, ± m"), true),
            ("offset_tolerance_m", N("offset tolerance, ± m (longitudinal slots)"), false),
            ("tilt_tolerance_deg", N("tilt tolerance, ± deg (edge slots)"), false),
            ("cut_depth_tolerance_m", N("cut depth tolerance, ± m (edge slots)"), false),
            ("length_tolerance_m", N("length tolerance, ± m"), true), ("width_tolerance_m", N("width tolerance, ± m"), true),
            ("end_radius_m", N("end radius of a round-ended slot, m"), false),
            ("changed", B("changed from the previous revision"), true))), true));

    /// <summary>slots.data: the user's slot table.</summary>
    private static JsonObject SlotDataSchema() => Obj("slots.data: the user's slot table",
        ("file", S("table file"), true), ("sha256", S("SHA-256 of the table"), true), ("provenance", StrArr("provenance lines"), true),
        ("rows", I("rows"), true), ("range", S("range covered"), true), ("extrapolate", B("slots outside the table allowed"), true),
        ("fit_residuals_leave_one_out", Obj("leave-one-out fit residuals",
            ("resonant_length_rms", N("resonant length, rms (fraction)"), true), ("resonant_length_max", N("resonant length, max (fraction)"), true),
            ("resonant_conductance_rms", N("resonant conductance, rms (fraction)"), true),
            ("resonant_conductance_max", N("resonant conductance, max (fraction)"), true),
            ("admittance_rms", N("y/g_r, rms"), true), ("admittance_max", N("y/g_r, max"), true)), true));

    private static JsonObject N(string d) => new() { ["description"] = d, ["type"] = Types("number", "null") };
    private static JsonObject I(string d) => new() { ["description"] = d, ["type"] = "integer" };
    private static JsonObject S(string d) => new() { ["description"] = d, ["type"] = "string" };
    private static JsonObject B(string d) => new() { ["description"] = d, ["type"] = "boolean" };
    private static JsonObject Enum(string d, params string[] words) => new() { ["description"] = d, ["enum"] = Types(words) };
    private static JsonObject Figures(string d) => Obj(d,
        ("s11_db_at_design", N("|S11| at the design frequency, dB"), true), ("best_match_hz", N("frequency of the best match, Hz"), true),
        ("s11_db_at_best_match", N("|S11| there, dB"), true), ("peak_sidelobe_db", N("peak sidelobe, dB"), true));
    private static JsonObject Arr(string d, JsonObject item) => new() { ["description"] = d, ["type"] = "array", ["items"] = item };
    private static JsonObject NumArr(string d) => Arr(d, new JsonObject { ["type"] = Types("number", "null") });
    private static JsonObject StrArr(string d) => Arr(d, new JsonObject { ["type"] = "string" });
    private static JsonArray Types(params string[] t) => new([.. t.Select(x => (JsonNode)x!)]);

    private static JsonObject Obj(string d, params (string Key, JsonObject Value, bool Required)[] props)
    {
        var p = new JsonObject();
        foreach (var (k, v, _) in props) p[k] = v;
        return new JsonObject
        {
            ["description"] = d,
            ["type"] = "object",
            ["properties"] = p,
            ["required"] = Types([.. props.Where(x => x.Required).Select(x => x.Key)]),
            ["additionalProperties"] = false,
        };
    }
}
