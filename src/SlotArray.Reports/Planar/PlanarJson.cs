using System.Text;
using System.Text.Json;
using SlotArray.Core.Planar;
using SlotArray.Core.Stick;

namespace SlotArray.Reports.Planar;

/// <summary>
/// design.json of a planar array: SI with unit-suffixed keys; every radiating slot with its branch, aperture x_m/y_m
/// (origin at the aperture centre, x along the branches), dimensions and achieved complex excitation; the coupling
/// slots; the feed guide; the figures. Deterministic (fixed key order, round-trip numbers).
/// </summary>
internal static class PlanarJson
{
    /// <summary>The JSON text.</summary>
    public static string ToText(PlanarResult r)
    {
        ArgumentNullException.ThrowIfNull(r);
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            w.WriteString("name", r.Design.Name);
            w.WriteString("array_type", "planar");
            w.WriteNumber("frequency_hz", r.Design.DesignFrequency.Hertz);
            w.WriteString("normalisation", "admittances y = Y/G0 and impedances to the TE10 wave impedance of their own guide");
            Geometry(w, r);
            Slots(w, r);
            Coupling(w, r);
            Figures(w, r);
            w.WriteStartArray("sweep");
            foreach (var p in r.Sweep)
            {
                w.WriteStartObject();
                w.WriteNumber("frequency_hz", p.Frequency.Hertz);
                w.WriteNumber("s11_re", p.S11.Real);
                w.WriteNumber("s11_im", p.S11.Imaginary);
                w.WriteNumber("s11_db", 20 * Math.Log10(Math.Max(p.S11.Magnitude, 1e-15)));
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteStartArray("warnings");
            foreach (var x in r.Design.Warnings) w.WriteStringValue(x.Message);
            w.WriteEndArray();
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(ms.ToArray()) + "\n";
    }

    private static void Geometry(Utf8JsonWriter w, PlanarResult r)
    {
        var d = r.Design;
        var l = d.Layout;
        w.WriteStartObject("aperture");
        w.WriteNumber("branches", l.Branches);
        w.WriteNumber("fed_branches", d.Branches.Count);
        w.WriteNumber("slots_per_branch_bounding", l.Columns);
        w.WriteNumber("slots", l.Count);
        w.WriteString("outline", l.Outline.ToString().ToLowerInvariant());
        w.WriteNumber("spacing_m", l.Spacing.Meters);
        w.WriteNumber("pitch_m", l.Pitch.Meters);
        w.WriteBoolean("pitch_auto", r.PitchAuto);
        w.WriteNumber("area_m2", l.Area);
        w.WriteString("taper", d.TaperMethod);
        w.WriteString("axes", "x along the branches, y across, origin at the aperture centre; slot y includes its offset from the branch centre line");
        w.WriteEndObject();
        w.WriteStartObject("branch_guide");
        GuideKeys(w, d.BranchGuide);
        w.WriteEndObject();
        w.WriteStartObject("feed_guide");
        GuideKeys(w, d.FeedGuide);
        w.WriteBoolean("broad_wall_solved", r.FeedWidthSolved);
        w.WriteString("feed_position", d.FeedPosition == FeedPosition.Centre ? "centre" : "end");
        w.WriteNumber("guide_wavelength_m", d.FeedGuide.GuideWavelength(d.DesignFrequency).Meters);
        w.WriteNumber("short_distance_m", d.FeedShortDistance.Meters);
        w.WriteNumber("input_distance_m", d.FeedInputDistance.Meters);
        w.WriteEndObject();
    }

    private static void GuideKeys(Utf8JsonWriter w, Core.Waveguides.RectangularWaveguide g)
    {
        w.WriteString("designation", g.Designation);
        w.WriteNumber("a_m", g.BroadWall.Meters);
        w.WriteNumber("b_m", g.NarrowWall.Meters);
        w.WriteNumber("wall_m", g.WallThickness.Meters);
    }

    private static void Slots(Utf8JsonWriter w, PlanarResult r)
    {
        var d = r.Design;
        var e = r.AtDesign.Excitations;
        double norm = e.Max(c => c.Magnitude);
        w.WriteStartArray("slots");
        for (int i = 0; i < d.Layout.Count; i++)
        {
            var (b, s) = d.SlotAt(i);
            var ex = e[i] / norm;
            w.WriteStartObject();
            w.WriteNumber("index", i + 1);
            w.WriteNumber("branch", b.Number);
            w.WriteNumber("slot_in_branch", s.Index);
            w.WriteNumber("x_m", r.Positions[i].X);
            w.WriteNumber("y_m", r.Positions[i].Y);
            w.WriteNumber("branch_y_m", b.Y);
            w.WriteNumber("offset_m", s.Coupling);
            w.WriteNumber("length_m", s.Length.Meters);
            w.WriteNumber("width_m", s.Width.Meters);
            w.WriteNumber("position_from_branch_datum_m", s.Position.Meters);
            w.WriteNumber("target_amplitude", d.Amplitudes[i]);
            w.WriteNumber("active_conductance", s.Conductance);
            w.WriteNumber("excitation_re", ex.Real);
            w.WriteNumber("excitation_im", ex.Imaginary);
            w.WriteNumber("excitation_db", 20 * Math.Log10(ex.Magnitude));
            w.WriteNumber("excitation_deg", ex.Phase * 180 / Math.PI);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    private static void Coupling(Utf8JsonWriter w, PlanarResult r)
    {
        w.WriteStartArray("coupling_slots");
        foreach (var b in r.Design.Branches)
        {
            var c = b.Coupling;
            w.WriteStartObject();
            w.WriteNumber("branch", c.Branch);
            w.WriteNumber("x_m", 0);
            w.WriteNumber("y_m", c.Y);
            w.WriteNumber("tilt_deg", c.Tilt.Degrees);
            w.WriteNumber("length_m", c.Length.Meters);
            w.WriteNumber("width_m", c.Width.Meters);
            w.WriteNumber("feed_resistance", c.Resistance);
            w.WriteNumber("ratio_squared", c.RatioSquared);
            w.WriteNumber("branch_power_w_per_w", r.AtDesign.BranchPowers[r.Design.Branches.ToList().IndexOf(b)]);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    private static void Figures(Utf8JsonWriter w, PlanarResult r)
    {
        var f = r.Figures;
        w.WriteStartObject("figures");
        Num(w, "s11_db_at_design", 20 * Math.Log10(Math.Max(r.AtDesign.S11.Magnitude, 1e-15)));
        Num(w, "h_plane_peak_sidelobe_db", f.HPlane.PeakSidelobeDb ?? double.NaN);
        Num(w, "e_plane_peak_sidelobe_db", f.EPlane.PeakSidelobeDb ?? double.NaN);
        Num(w, "h_plane_array_factor_peak_sidelobe_db", f.HPlaneArrayFactorPeakSidelobeDb ?? double.NaN);
        Num(w, "e_plane_array_factor_peak_sidelobe_db", f.EPlaneArrayFactorPeakSidelobeDb ?? double.NaN);
        Num(w, "diagonal_peak_sidelobe_db", f.Diagonal.PeakSidelobeDb ?? double.NaN);
        Num(w, "visible_peak_sidelobe_db", f.PeakSidelobe?.LevelDb ?? double.NaN);
        Num(w, "visible_peak_sidelobe_u", f.PeakSidelobe?.U ?? double.NaN);
        Num(w, "visible_peak_sidelobe_v", f.PeakSidelobe?.V ?? double.NaN);
        Num(w, "h_plane_hpbw_deg", f.HPlane.HalfPowerBeamwidth.Degrees);
        Num(w, "e_plane_hpbw_deg", f.EPlane.HalfPowerBeamwidth.Degrees);
        Num(w, "beam_u", f.Beam.U);
        Num(w, "beam_v", f.Beam.V);
        Num(w, "directivity_dbi", f.DirectivityDbi);
        Num(w, "aperture_directivity_dbi", f.ApertureDirectivityDbi);
        Num(w, "taper_efficiency", f.TaperEfficiency);
        Num(w, "radiation_efficiency", f.RadiationEfficiency);
        Num(w, "gain_dbi", f.GainDbi);
        Num(w, "coupled_iterations", r.Design.Iterations.Count);
        w.WriteEndObject();
    }

    private static void Num(Utf8JsonWriter w, string key, double? value)
    {
        if (value is { } v && double.IsFinite(v)) w.WriteNumber(key, v);
        else w.WriteNull(key);
    }
}
