using System.Numerics;
using System.Text.Encodings.Web;
using System.Text.Json;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>design.json</c>: the whole report, SI with unit-suffixed keys (issue 5 names the keys; more are added, none
/// renamed). Numbers are written in the shortest round-trip form; a non-finite number is written as null.
/// Keys are written in a fixed order, two-space indent, "\n" line ends, UTF-8 without byte-order mark.
/// </summary>
internal static class DesignJson
{
    /// <summary>Writes the report as JSON to <paramref name="stream"/>.</summary>
    public static void Write(DesignReport report, Stream stream)
    {
        var options = new JsonWriterOptions
        {
            Indented = true,
            NewLine = "\n",
            Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        };
        using (var w = new Utf8JsonWriter(stream, options))
            WriteReport(w, report);
        stream.WriteByte((byte)'\n');
    }

    /// <summary>The JSON text of the report (as <see cref="Write"/> writes it).</summary>
    public static string ToText(DesignReport report)
    {
        using var ms = new MemoryStream();
        Write(report, ms);
        return new System.Text.UTF8Encoding(false).GetString(ms.ToArray());
    }

    private static void WriteReport(Utf8JsonWriter w, DesignReport r)
    {
        w.WriteStartObject();
        WriteHeader(w, r);
        WriteSlots(w, r);
        WriteTermination(w, r);
        WriteTravellingWave(w, r);
        WriteFlareAndFilter(w, r);
        WriteCoupling(w, r);
        WritePattern(w, r);
        WriteMatch(w, r);
        WriteInputs(w, r);
        WriteRequirements(w, r);
        Strings(w, "warnings", r.Warnings);
        Strings(w, "cautions", r.Cautions);
        Strings(w, "tolerance", r.Tolerance);
        w.WriteEndObject();
    }

    /// <summary>Name, frequency, normalisation, band and guide.</summary>
    private static void WriteHeader(Utf8JsonWriter w, DesignReport r)
    {
        w.WriteString("name", r.Name);
        Num(w, "frequency_hz", r.FrequencyHz);
        w.WriteString("normalisation", Invariant.Normalisation);
        w.WriteStartObject("band");
        Num(w, "low_hz", r.BandLowHz);
        Num(w, "high_hz", r.BandHighHz);
        w.WriteEndObject();

        w.WriteStartObject("guide");
        w.WriteString("designation", r.Guide.Designation);
        Num(w, "a_m", r.Guide.A);
        Num(w, "b_m", r.Guide.B);
        Num(w, "wall_m", r.Guide.Wall);
        w.WriteString("metal", r.Guide.Metal);
        Num(w, "guide_wavelength_m", r.Guide.GuideWavelength);
        Num(w, "wave_impedance_ohm", r.Guide.WaveImpedanceOhm);
        w.WriteEndObject();
    }

    /// <summary>One object per slot: geometry, conductance, target and achieved excitation.</summary>
    private static void WriteSlots(Utf8JsonWriter w, DesignReport r)
    {
        w.WriteStartArray("slots");
        foreach (var s in r.Slots)
        {
            w.WriteStartObject();
            w.WriteNumber("index", s.Index);
            Num(w, "position_m", s.Position);
            if (r.SlotData is not null) w.WriteBoolean("outside_slot_table", s.OutsideSlotTable);
            if (s.Offset is { } x) Num(w, "offset_m", x);
            if (s.TiltDeg is { } t) Num(w, "tilt_deg", t);
            if (s.CutDepth is { } d) Num(w, "cut_depth_m", d);
            Num(w, "length_m", s.Length);
            Num(w, "overall_length_m", s.OverallLength);
            Num(w, "width_m", s.Width);
            w.WriteString("end", EndName(s.EndForm));
            Num(w, "conductance", s.Conductance);
            Num(w, "target_amplitude", s.TargetAmplitude);
            Num(w, "achieved_amplitude", s.AchievedAmplitude);
            Num(w, "achieved_phase_deg", s.AchievedPhaseDeg);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    /// <summary>The near termination and feed, then the fabrication plan.</summary>
    private static void WriteTermination(Utf8JsonWriter w, DesignReport r)
    {
        w.WriteStartObject("termination");
        w.WriteString("type", r.Termination.Type);
        Num(w, "distance_m", r.Termination.Distance);
        if (r.Termination.FeedPosition is { } feed) Num(w, "feed_position_m", feed);
        if (r.Termination.FarShortPosition is { } far) Num(w, "far_short_position_m", far);
        w.WriteEndObject();
        if (r.Fabrication is { } plan) WriteFabrication(w, r, plan);
    }

    /// <summary>Travelling-wave arrays: the load and the designer's figures.</summary>
    private static void WriteTravellingWave(Utf8JsonWriter w, DesignReport r)
    {
        if (r.Load is { } load)
        {
            w.WriteStartObject("load");
            Num(w, "fraction", load.Fraction);
            Num(w, "power_w_per_w_in", load.PowerWPerWIn);
            w.WriteEndObject();
        }
        if (r.TravellingWave is { } tw)
        {
            w.WriteStartObject("travelling_wave");
            Num(w, "squint_deg", tw.SquintDeg);
            Num(w, "scan_deg_per_100mhz", tw.ScanDegPer100MHz);
            Num(w, "scan_from_sweep_deg_per_100mhz", tw.ScanFromSweepDegPer100MHz);
            Num(w, "efficiency", tw.Efficiency);
            Num(w, "wall_loss_w_per_w_in", tw.WallLossWPerWIn);
            w.WriteNumber("refinement_iterations", tw.RefinementIterations);
            Num(w, "refinement_residual_db", tw.RefinementResidualDb);
            Num(w, "phase_error_deg", tw.PhaseErrorDeg);
            Num(w, "beam_asked_deg", tw.BeamAskedDeg);
            Num(w, "beam_residual_deg", tw.BeamResidualDeg);
            w.WriteString("pointing_correction", tw.PointingCorrection);
            Num(w, "spacing_m", tw.SpacingM);
            w.WriteBoolean("load_auto", tw.LoadAuto);
            w.WriteEndObject();
        }
        WritePointing(w, r);
    }

    /// <summary>The beam over the operating range (temperature, transmitter frequency tolerance).</summary>
    private static void WritePointing(Utf8JsonWriter w, DesignReport r)
    {
        if (r.Pointing is { } pt)
        {
            w.WriteStartObject("pointing");
            Num(w, "low_temperature_c", pt.LowC);
            Num(w, "high_temperature_c", pt.HighC);
            Num(w, "frequency_tolerance_hz", pt.FrequencyToleranceHz);
            Num(w, "expansion_per_k", pt.ExpansionPerKelvin);
            w.WriteString("expansion_source", pt.ExpansionSource);
            Num(w, "nominal_beam_deg", pt.NominalBeamDeg);
            Num(w, "deg_per_k", pt.DegPerKelvin);
            Num(w, "deg_per_mhz", pt.DegPerMhz);
            Num(w, "worst_error_deg", pt.WorstErrorDeg);
            w.WriteStartArray("cases");
            foreach (var row in pt.Rows)
            {
                w.WriteStartObject();
                Num(w, "temperature_c", row.TemperatureC);
                Num(w, "frequency_hz", row.FrequencyHz);
                Num(w, "equivalent_frequency_hz", row.EquivalentFrequencyHz);
                Num(w, "beam_deg", row.BeamDeg);
                Num(w, "error_deg", row.ErrorDeg);
                w.WriteBoolean("from_sweep", row.FromSweep);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
    }

    /// <summary>The antenna's add-ons in front of the slots: the flare and the polarisation filter.</summary>
    private static void WriteFlareAndFilter(Utf8JsonWriter w, DesignReport r)
    {
        if (r.Flare is { } fl)
        {
            w.WriteStartObject("flare");
            Num(w, "throat_m", fl.ThroatM);
            Num(w, "aperture_m", fl.ApertureM);
            Num(w, "length_m", fl.LengthM);
            Strings(w, "chosen", fl.Chosen);
            Num(w, "vertical_hpbw_deg", fl.VerticalHpbwDeg);
            if (fl.RequiredVerticalHpbwDeg is { } rv) Num(w, "required_vertical_hpbw_deg", rv);
            Num(w, "first_sidelobe_db", fl.FirstSidelobeDb);
            Num(w, "phase_error_deg", fl.PhaseErrorDeg);
            Num(w, "phase_error_loss_db", fl.PhaseErrorLossDb);
            Num(w, "throat_loss_db", fl.ThroatLossDb);
            Num(w, "cutoff_plane_m", fl.CutoffPlaneM);
            Num(w, "total_directivity_dbi", fl.TotalDirectivityDbi);
            Num(w, "total_gain_dbi", fl.TotalGainDbi);
            NumArray(w, "cut_elevation_deg", fl.CutElevationDeg);
            NumArray(w, "cut_level_db", fl.CutLevelDb);
            w.WriteEndObject();
        }
        if (r.Filter is { } flt)
        {
            w.WriteStartObject("filter");
            Num(w, "spacing_m", flt.SpacingM);
            Num(w, "depth_m", flt.DepthM);
            Num(w, "thickness_m", flt.ThicknessM);
            Strings(w, "chosen", flt.Chosen);
            Num(w, "cutoff_te1_hz", flt.CutoffTe1Hz);
            Num(w, "attenuation_db_per_mm_at_design", flt.AttenuationDbPerMmAtDesign);
            Num(w, "attenuation_at_design_db", flt.AttenuationAtDesignDb);
            Num(w, "smallest_attenuation_db", flt.SmallestAttenuationDb);
            Num(w, "wanted_loss_db", flt.WantedLossDb);
            Num(w, "margin_db", flt.MarginDb);
            Num(w, "bare_worst_db", flt.BareWorstDb);
            Num(w, "bare_worst_frequency_hz", flt.BareWorstFrequencyHz);
            Num(w, "filtered_worst_db", flt.FilteredWorstDb);
            Num(w, "filtered_worst_frequency_hz", flt.FilteredWorstFrequencyHz);
            if (flt.RequirementDb is { } fr) Num(w, "requirement_db", fr);
            NumArray(w, "bare_cross_level_db", flt.BareCrossCutLevelDb);
            w.WriteEndObject();
        }
    }

    /// <summary>Mutual-coupling designs: the coupled and isolated-slot figures and Elliott's iterations.</summary>
    private static void WriteCoupling(Utf8JsonWriter w, DesignReport r)
    {
        if (r.Coupling is { } c)
        {
            w.WriteStartObject("mutual_coupling");
            w.WriteString("method", "Elliott's design procedure; both designs analysed with external mutual coupling");
            WriteCoupledFigures(w, "coupled_design", c.Coupled);
            WriteCoupledFigures(w, "isolated_slot_design", c.Uncoupled);
            Num(w, "tolerance_m", c.Tolerance);
            Num(w, "surrogate_error", c.SurrogateError);
            w.WriteStartArray("iterations");
            foreach (var it in c.Iterations)
            {
                w.WriteStartObject();
                w.WriteNumber("index", it.Index);
                Num(w, "max_offset_change_m", it.MaximumOffsetChange);
                Num(w, "max_length_change_m", it.MaximumLengthChange);
                w.WriteNumber("worst_slot", it.WorstSlot);
                Num(w, "match_error", it.MatchError);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
    }

    /// <summary>The pattern figures and cut at the design frequency.</summary>
    private static void WritePattern(Utf8JsonWriter w, DesignReport r)
    {
        var p = r.Pattern;
        w.WriteStartObject("pattern");
        Num(w, "beam_deg", p.BeamDeg);
        Num(w, "hpbw_deg", p.HpbwDeg);
        Num(w, "peak_sidelobe_db", p.PeakSidelobeDb);
        Num(w, "first_sidelobe_db", p.FirstSidelobeDb);
        Num(w, "directivity_dbi", p.DirectivityDbi);
        Num(w, "gain_dbi", p.GainDbi);
        Num(w, "design_sidelobe_db", p.DesignSidelobeDb);
        w.WriteStartObject("cut");
        NumArray(w, "angle_deg", p.CutAngleDeg);
        NumArray(w, "level_db", p.CutLevelDb);
        if (p.CrossCutLevelDb.Count > 0) NumArray(w, "cross_level_db", p.CrossCutLevelDb);
        w.WriteEndObject();
        if (p.CrossPolarDb is { } xp) Num(w, "cross_polar_db", xp);
        if (p.CrossPolarDirectionDeg is { } xd) Num(w, "cross_polar_direction_deg", xd);
        Num(w, "transverse_face_width_m", p.TransverseFaceWidth);
        Num(w, "transverse_hpbw_lower_bound_deg", p.TransverseHpbwLowerBoundDeg);
        w.WriteEndObject();
    }

    /// <summary>The match at the design frequency and the band sweep.</summary>
    private static void WriteMatch(Utf8JsonWriter w, DesignReport r)
    {
        w.WriteStartObject("match");
        Num(w, "s11_db_at_design", r.Match.S11DbAtDesign);
        Num(w, "vswr_at_design", r.Match.VswrAtDesign);
        Num(w, "bandwidth_vswr15_hz", r.Match.BandwidthVswr15Hz);
        Num(w, "bandwidth_vswr2_hz", r.Match.BandwidthVswr2Hz);
        w.WriteEndObject();

        w.WriteStartArray("sweep");
        foreach (var q in r.Sweep)
        {
            w.WriteStartObject();
            Num(w, "frequency_hz", q.FrequencyHz);
            Num(w, "s11_re", q.S11.Real);
            Num(w, "s11_im", q.S11.Imaginary);
            Num(w, "beam_deg", q.BeamDeg);
            Num(w, "peak_sidelobe_db", q.PeakSidelobeDb);
            Num(w, "gain_dbi", q.GainDbi);
            Num(w, "hpbw_deg", q.HpbwDeg);
            if (q.CrossPolarDb is { } qx) Num(w, "cross_polar_db", qx);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    /// <summary>The inputs in words and the user's slot table, if any.</summary>
    private static void WriteInputs(Utf8JsonWriter w, DesignReport r)
    {
        var i = r.Inputs;
        w.WriteStartObject("inputs");
        w.WriteString("slot_type", i.SlotType);
        w.WriteString("feed_type", i.FeedType);
        w.WriteString("taper", i.TaperDescription);
        w.WriteString("slot_model", i.SlotModelName);
        w.WriteString("datum", i.DatumDescription);
        Num(w, "cut_tolerance_m", i.CutTolerance);
        w.WriteEndObject();

        if (r.SlotData is { } sd)
        {
            w.WriteStartObject("slot_data");
            w.WriteString("file", sd.File);
            w.WriteString("sha256", sd.Sha256);
            Strings(w, "provenance", sd.Provenance);
            w.WriteNumber("rows", sd.Rows);
            w.WriteString("range", sd.Range);
            w.WriteBoolean("extrapolate", sd.Extrapolate);
            w.WriteStartObject("fit_residuals_leave_one_out");
            string[] keys = ["resonant_length_rms", "resonant_length_max", "resonant_conductance_rms", "resonant_conductance_max", "admittance_rms", "admittance_max"];
            for (int k = 0; k < keys.Length; k++) Num(w, keys[k], sd.Residuals[k]);
            w.WriteEndObject();
            w.WriteEndObject();
        }
    }

    /// <summary>One object per requirement verdict.</summary>
    private static void WriteRequirements(Utf8JsonWriter w, DesignReport r)
    {
        w.WriteStartArray("requirements");
        foreach (var q in r.Requirements)
        {
            w.WriteStartObject();
            w.WriteString("description", q.Description);
            w.WriteString("required", q.Required);
            w.WriteString("achieved", q.Achieved);
            w.WriteBoolean("pass", q.Passed);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    /// <summary>The fabrication plan: datum A, tube length, features and each slot's tolerances (SI, from datum A).</summary>
    private static void WriteFabrication(Utf8JsonWriter w, DesignReport r, Core.Fabrication.FabricationPlan plan)
    {
        w.WriteStartObject("fabrication");
        w.WriteString("drawing_number", r.Document.DrawingNumber ?? r.Name);
        w.WriteString("revision", r.Document.Revision);
        if (r.Document.Date is { } date) w.WriteString("date", date);
        w.WriteString("tool_version", r.Document.ToolVersion);
        if (r.Document.SpecSha256 is { } sha) w.WriteString("spec_sha256", sha);
        w.WriteString("datum", plan.Datum);
        Num(w, "datum_to_design_origin_m", plan.DesignOrigin.Meters);
        Num(w, "end_plate_thickness_m", plan.EndPlateThickness.Meters);
        Num(w, "tube_length_m", plan.TubeLength.Meters);
        Num(w, "tube_length_tolerance_m", plan.TubeLengthTolerance.Value);
        Num(w, "reference_temperature_c", Core.Fabrication.ThermalExpansion.ReferenceTemperatureCelsius);
        if (plan.Thermal is { } th)
        {
            Num(w, "expansion_per_k", th.Coefficient);
            w.WriteString("expansion_source", th.Source);
            Num(w, "tube_change_m_per_k", plan.ChangePerKelvin!.Value.Meters);
        }
        w.WriteStartArray("features");
        foreach (var f in plan.Features)
        {
            w.WriteStartObject();
            w.WriteString("key", f.Key);
            w.WriteString("name", f.Name);
            Num(w, "position_from_datum_m", f.Position.Meters);
            Num(w, "tolerance_m", f.Tolerance.Value);
            w.WriteString("tolerance_source", f.Tolerance.Source);
            w.WriteBoolean("changed", plan.Changed.Contains(f.Key));
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteStartArray("slots");
        foreach (var s in plan.Slots)
        {
            w.WriteStartObject();
            w.WriteNumber("index", s.Row.Slot);
            Num(w, "position_from_datum_m", s.Position.Meters);
            Num(w, "position_tolerance_m", s.PositionTolerance.Value);
            if (s.OffsetTolerance is { } ot) Num(w, "offset_tolerance_m", ot.Value);
            if (s.TiltTolerance is { } tt) Num(w, "tilt_tolerance_deg", tt.Value * 180 / Math.PI);
            if (s.CutDepthTolerance is { } dt) Num(w, "cut_depth_tolerance_m", dt.Value);
            Num(w, "length_tolerance_m", s.LengthTolerance.Value);
            Num(w, "width_tolerance_m", s.WidthTolerance.Value);
            if (s.Row.EndRadius is { } er) Num(w, "end_radius_m", er.Meters);
            w.WriteBoolean("changed", plan.Changed.Contains(s.Key));
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void Num(Utf8JsonWriter w, string key, double v)
    {
        if (double.IsFinite(v)) w.WriteNumber(key, v);
        else w.WriteNull(key);
    }

    private static void NumArray(Utf8JsonWriter w, string key, IReadOnlyList<double> values)
    {
        w.WriteStartArray(key);
        foreach (double v in values)
        {
            if (double.IsFinite(v)) w.WriteNumberValue(v);
            else w.WriteNullValue();
        }
        w.WriteEndArray();
    }

    private static void Strings(Utf8JsonWriter w, string key, IReadOnlyList<string> values)
    {
        w.WriteStartArray(key);
        foreach (string v in values) w.WriteStringValue(v);
        w.WriteEndArray();
    }

    private static string EndName(SlotEndForm e) => e == SlotEndForm.Round ? "round" : "square";

    /// <summary>Reads a report written by <see cref="Write"/> (round trip); a null number reads back as NaN.</summary>
    /// <exception cref="JsonException">The text is not JSON or lacks a key the writer always writes.</exception>
    public static DesignReport Read(Stream stream)
    {
        using var doc = JsonDocument.Parse(stream);
        var root = doc.RootElement;
        var g = root.GetProperty("guide");
        var p = root.GetProperty("pattern");
        var m = root.GetProperty("match");
        var t = root.GetProperty("termination");
        var inp = root.GetProperty("inputs");
        var band = root.GetProperty("band");
        return new DesignReport
        {
            Name = Str(root, "name"),
            FrequencyHz = D(root, "frequency_hz"),
            BandLowHz = D(band, "low_hz"),
            BandHighHz = D(band, "high_hz"),
            Guide = new GuideReport
            {
                Designation = Str(g, "designation"),
                A = D(g, "a_m"),
                B = D(g, "b_m"),
                Wall = D(g, "wall_m"),
                Metal = Str(g, "metal"),
                GuideWavelength = D(g, "guide_wavelength_m"),
                WaveImpedanceOhm = D(g, "wave_impedance_ohm"),
            },
            Slots = ReadSlots(root),
            Termination = new TerminationReport
            {
                Type = Str(t, "type"),
                Distance = D(t, "distance_m"),
                FeedPosition = OptD(t, "feed_position_m"),
                FarShortPosition = OptD(t, "far_short_position_m"),
            },
            Pattern = ReadPattern(p),
            Match = new MatchReport
            {
                S11DbAtDesign = D(m, "s11_db_at_design"),
                VswrAtDesign = D(m, "vswr_at_design"),
                BandwidthVswr15Hz = D(m, "bandwidth_vswr15_hz"),
                BandwidthVswr2Hz = D(m, "bandwidth_vswr2_hz"),
            },
            Sweep = ReadSweep(root),
            Inputs = new InputsSummary
            {
                SlotType = Str(inp, "slot_type"),
                FeedType = Str(inp, "feed_type"),
                TaperDescription = Str(inp, "taper"),
                SlotModelName = Str(inp, "slot_model"),
                DatumDescription = Str(inp, "datum"),
                CutTolerance = D(inp, "cut_tolerance_m"),
            },
            Requirements = [.. root.GetProperty("requirements").EnumerateArray().Select(q => new RequirementResult
            {
                Description = Str(q, "description"),
                Required = Str(q, "required"),
                Achieved = Str(q, "achieved"),
                Passed = q.GetProperty("pass").GetBoolean(),
            })],
            Warnings = StringList(root, "warnings"),
            Cautions = StringList(root, "cautions"),
            Tolerance = StringList(root, "tolerance"),
            Pointing = root.TryGetProperty("pointing", out var pt) ? ReadPointing(pt) : null,
            Flare = root.TryGetProperty("flare", out var fl) ? ReadFlare(fl) : null,
            Filter = root.TryGetProperty("filter", out var flt) ? ReadFilter(flt) : null,
            Load = root.TryGetProperty("load", out var ld)
                ? new LoadReport { Fraction = D(ld, "fraction"), PowerWPerWIn = D(ld, "power_w_per_w_in") } : null,
            TravellingWave = ReadTravellingWave(root),
        };
    }

    private static IReadOnlyList<SlotReport> ReadSlots(JsonElement root)
    {
        return [.. root.GetProperty("slots").EnumerateArray().Select(s => new SlotReport
        {
            Index = s.GetProperty("index").GetInt32(),
            Position = D(s, "position_m"),
            Offset = OptD(s, "offset_m"),
            TiltDeg = OptD(s, "tilt_deg"),
            CutDepth = OptD(s, "cut_depth_m"),
            Length = D(s, "length_m"),
            OverallLength = D(s, "overall_length_m"),
            Width = D(s, "width_m"),
            EndForm = Str(s, "end") == "round" ? SlotEndForm.Round : SlotEndForm.Square,
            Conductance = D(s, "conductance"),
            TargetAmplitude = D(s, "target_amplitude"),
            AchievedAmplitude = D(s, "achieved_amplitude"),
            AchievedPhaseDeg = D(s, "achieved_phase_deg"),
        })];
    }

    private static PatternReport ReadPattern(JsonElement p)
    {
        return new PatternReport
        {
            BeamDeg = D(p, "beam_deg"),
            HpbwDeg = D(p, "hpbw_deg"),
            PeakSidelobeDb = D(p, "peak_sidelobe_db"),
            FirstSidelobeDb = D(p, "first_sidelobe_db"),
            DirectivityDbi = D(p, "directivity_dbi"),
            GainDbi = D(p, "gain_dbi"),
            DesignSidelobeDb = D(p, "design_sidelobe_db"),
            CutAngleDeg = Doubles(p.GetProperty("cut").GetProperty("angle_deg")),
            CutLevelDb = Doubles(p.GetProperty("cut").GetProperty("level_db")),
            CrossCutLevelDb = p.GetProperty("cut").TryGetProperty("cross_level_db", out var xc) ? Doubles(xc) : [],
            CrossPolarDb = OptD(p, "cross_polar_db"),
            CrossPolarDirectionDeg = OptD(p, "cross_polar_direction_deg"),
            TransverseFaceWidth = D(p, "transverse_face_width_m"),
            TransverseHpbwLowerBoundDeg = D(p, "transverse_hpbw_lower_bound_deg"),
        };
    }

    private static IReadOnlyList<SweepPoint> ReadSweep(JsonElement root)
    {
        return [.. root.GetProperty("sweep").EnumerateArray().Select(q => new SweepPoint
        {
            FrequencyHz = D(q, "frequency_hz"),
            S11 = new Complex(D(q, "s11_re"), D(q, "s11_im")),
            BeamDeg = D(q, "beam_deg"),
            PeakSidelobeDb = D(q, "peak_sidelobe_db"),
            GainDbi = D(q, "gain_dbi"),
            HpbwDeg = OptD(q, "hpbw_deg") ?? double.NaN,
            CrossPolarDb = OptD(q, "cross_polar_db"),
        })];
    }

    private static TravellingWaveReport? ReadTravellingWave(JsonElement root)
    {
        return root.TryGetProperty("travelling_wave", out var tw)
            ? new TravellingWaveReport
            {
                SquintDeg = D(tw, "squint_deg"),
                ScanDegPer100MHz = D(tw, "scan_deg_per_100mhz"),
                ScanFromSweepDegPer100MHz = D(tw, "scan_from_sweep_deg_per_100mhz"),
                Efficiency = D(tw, "efficiency"),
                WallLossWPerWIn = D(tw, "wall_loss_w_per_w_in"),
                RefinementIterations = tw.GetProperty("refinement_iterations").GetInt32(),
                RefinementResidualDb = D(tw, "refinement_residual_db"),
                PhaseErrorDeg = D(tw, "phase_error_deg"),
                BeamAskedDeg = tw.TryGetProperty("beam_asked_deg", out _) ? D(tw, "beam_asked_deg") : double.NaN,
                BeamResidualDeg = tw.TryGetProperty("beam_residual_deg", out _) ? D(tw, "beam_residual_deg") : double.NaN,
                PointingCorrection = tw.TryGetProperty("pointing_correction", out var pc) ? pc.GetString() ?? "none" : "none",
                SpacingM = tw.TryGetProperty("spacing_m", out _) ? D(tw, "spacing_m") : double.NaN,
                LoadAuto = tw.TryGetProperty("load_auto", out var la) && la.GetBoolean(),
            }
            : null;
    }

    private static string Str(JsonElement e, string key) => e.GetProperty(key).GetString()
        ?? throw new JsonException($"design.json: '{key}' is null, expected a string");

    private static double D(JsonElement e, string key) => Value(e.GetProperty(key));

    private static double Value(JsonElement v) => v.ValueKind == JsonValueKind.Null ? double.NaN : v.GetDouble();

    private static double? OptD(JsonElement e, string key) => e.TryGetProperty(key, out var v) ? Value(v) : null;

    private static PointingReport ReadPointing(JsonElement e) => new()
    {
        LowC = D(e, "low_temperature_c"),
        HighC = D(e, "high_temperature_c"),
        FrequencyToleranceHz = D(e, "frequency_tolerance_hz"),
        ExpansionPerKelvin = D(e, "expansion_per_k"),
        ExpansionSource = Str(e, "expansion_source"),
        NominalBeamDeg = D(e, "nominal_beam_deg"),
        DegPerKelvin = D(e, "deg_per_k"),
        DegPerMhz = D(e, "deg_per_mhz"),
        WorstErrorDeg = D(e, "worst_error_deg"),
        Rows = [.. e.GetProperty("cases").EnumerateArray().Select(c => new PointingRow
        {
            TemperatureC = D(c, "temperature_c"),
            FrequencyHz = D(c, "frequency_hz"),
            EquivalentFrequencyHz = D(c, "equivalent_frequency_hz"),
            BeamDeg = D(c, "beam_deg"),
            ErrorDeg = D(c, "error_deg"),
            FromSweep = c.GetProperty("from_sweep").GetBoolean(),
        })],
    };

    private static FlareReport ReadFlare(JsonElement e) => new()
    {
        ThroatM = D(e, "throat_m"),
        ApertureM = D(e, "aperture_m"),
        LengthM = D(e, "length_m"),
        Chosen = StringList(e, "chosen"),
        VerticalHpbwDeg = D(e, "vertical_hpbw_deg"),
        RequiredVerticalHpbwDeg = OptD(e, "required_vertical_hpbw_deg"),
        FirstSidelobeDb = D(e, "first_sidelobe_db"),
        PhaseErrorDeg = D(e, "phase_error_deg"),
        PhaseErrorLossDb = D(e, "phase_error_loss_db"),
        ThroatLossDb = D(e, "throat_loss_db"),
        CutoffPlaneM = D(e, "cutoff_plane_m"),
        TotalDirectivityDbi = D(e, "total_directivity_dbi"),
        TotalGainDbi = D(e, "total_gain_dbi"),
        CutElevationDeg = Doubles(e.GetProperty("cut_elevation_deg")),
        CutLevelDb = Doubles(e.GetProperty("cut_level_db")),
    };

    private static FilterReport ReadFilter(JsonElement e) => new()
    {
        SpacingM = D(e, "spacing_m"),
        DepthM = D(e, "depth_m"),
        ThicknessM = D(e, "thickness_m"),
        Chosen = StringList(e, "chosen"),
        CutoffTe1Hz = D(e, "cutoff_te1_hz"),
        AttenuationDbPerMmAtDesign = D(e, "attenuation_db_per_mm_at_design"),
        AttenuationAtDesignDb = D(e, "attenuation_at_design_db"),
        SmallestAttenuationDb = D(e, "smallest_attenuation_db"),
        WantedLossDb = D(e, "wanted_loss_db"),
        MarginDb = D(e, "margin_db"),
        BareWorstDb = D(e, "bare_worst_db"),
        BareWorstFrequencyHz = D(e, "bare_worst_frequency_hz"),
        FilteredWorstDb = D(e, "filtered_worst_db"),
        FilteredWorstFrequencyHz = D(e, "filtered_worst_frequency_hz"),
        RequirementDb = OptD(e, "requirement_db"),
        BareCrossCutLevelDb = Doubles(e.GetProperty("bare_cross_level_db")),
    };

    private static double[] Doubles(JsonElement array) => [.. array.EnumerateArray().Select(Value)];

    private static string[] StringList(JsonElement e, string key) =>
        [.. e.GetProperty(key).EnumerateArray().Select(v => v.GetString() ?? "")];

    private static void WriteCoupledFigures(Utf8JsonWriter w, string name, CoupledDesignFigures f)
    {
        w.WriteStartObject(name);
        Num(w, "s11_db_at_design", f.S11DbAtDesign);
        Num(w, "best_match_hz", f.BestMatchHz);
        Num(w, "s11_db_at_best_match", f.BestMatchS11Db);
        Num(w, "peak_sidelobe_db", f.PeakSidelobeDb);
        w.WriteEndObject();
    }
}
