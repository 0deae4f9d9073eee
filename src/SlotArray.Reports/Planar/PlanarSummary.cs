using System.Text;
using SlotArray.Core.Planar;

namespace SlotArray.Reports.Planar;

/// <summary>summary.md of a planar design: inputs, geometry, the figures, the coupled iteration, what the model leaves out.</summary>
internal static class PlanarSummary
{
    /// <summary>The Markdown text.</summary>
    public static string Markdown(PlanarResult r, double? designDb)
    {
        var d = r.Design;
        var f = r.Figures;
        var l = d.Layout;
        var sb = new StringBuilder();
        string F(double v, int n = 2) => Invariant.Fixed(v, n);
        string Db(double? v) => v is { } x && double.IsFinite(x) ? F(x) + " dB" : "none";
        sb.Append("# ").Append(d.Name).Append(" (planar array)\n\n");
        sb.Append("| | |\n|---|---|\n");
        sb.Append("| design frequency | ").Append(Invariant.Ghz(d.DesignFrequency.Hertz, 4)).Append(" GHz |\n");
        sb.Append("| aperture | ").Append(Invariant.Int(l.Count)).Append(" slots on ").Append(Invariant.Int(d.Branches.Count)).Append(" branches (bounding grid ")
            .Append(Invariant.Int(l.Branches)).Append(" x ").Append(Invariant.Int(l.Columns)).Append(", ").Append(l.Outline.ToString().ToLowerInvariant()).Append(" outline) |\n");
        sb.Append("| slot spacing, branch pitch | ").Append(Invariant.Mm(l.Spacing.Meters)).Append(" mm (λg/2), ").Append(Invariant.Mm(l.Pitch.Meters))
            .Append(r.PitchAuto ? " mm (auto)" : " mm").Append(" |\n");
        sb.Append("| taper | ").Append(d.TaperMethod).Append(" |\n");
        sb.Append("| branch guide | a = ").Append(Invariant.Mm(d.BranchGuide.BroadWall.Meters)).Append(" mm, b = ").Append(Invariant.Mm(d.BranchGuide.NarrowWall.Meters)).Append(" mm |\n");
        sb.Append("| feed guide | a = ").Append(Invariant.Mm(d.FeedGuide.BroadWall.Meters)).Append(r.FeedWidthSolved ? " mm (solved: its λg/2 is the pitch)" : " mm")
            .Append(", fed at its ").Append(d.FeedPosition == Core.Stick.FeedPosition.Centre ? "centre (series tee)" : "end").Append(" |\n");
        sb.Append("| mutual coupling | ").Append(d.Coupled ? $"designed in (Elliott's planar procedure, {d.Iterations.Count} sweeps, all {l.Count} slots)" : "not designed in (isolated slots)").Append(" |\n\n");
        sb.Append("## Figures at the design frequency\n\n| figure | value |\n|---|---|\n");
        sb.Append("| S11 at f0 | ").Append(F(20 * Math.Log10(Math.Max(r.AtDesign.S11.Magnitude, 1e-15)))).Append(" dB |\n");
        sb.Append("| worst S11 over the band | ").Append(F(r.Sweep.Max(p => 20 * Math.Log10(Math.Max(p.S11.Magnitude, 1e-15))))).Append(" dB |\n");
        sb.Append("| peak sidelobe x-z (along branches) | ").Append(Db(f.HPlane.PeakSidelobeDb)).Append(designDb is { } dd ? $" (design {F(dd, 1)} dB)" : "").Append(" |\n");
        sb.Append("| peak sidelobe y-z (across) | ").Append(Db(f.EPlane.PeakSidelobeDb)).Append(" |\n");
        sb.Append("| peak sidelobe of the array factor alone (isotropic elements) x-z, y-z | ").Append(Db(f.HPlaneArrayFactorPeakSidelobeDb)).Append(", ").Append(Db(f.EPlaneArrayFactorPeakSidelobeDb)).Append(" |\n");
        sb.Append("| peak sidelobe 45° cut | ").Append(Db(f.Diagonal.PeakSidelobeDb)).Append(" |\n");
        sb.Append("| peak sidelobe, whole visible region | ").Append(Db(f.PeakSidelobe?.LevelDb));
        if (f.PeakSidelobe is { } ps) sb.Append(" at u = ").Append(F(ps.U, 3)).Append(", v = ").Append(F(ps.V, 3));
        sb.Append(" |\n");
        sb.Append("| half-power beamwidth x-z, y-z | ").Append(F(f.HPlane.HalfPowerBeamwidth.Degrees)).Append(" deg, ").Append(F(f.EPlane.HalfPowerBeamwidth.Degrees)).Append(" deg |\n");
        sb.Append("| beam direction | u = ").Append(F(f.Beam.U, 4)).Append(", v = ").Append(F(f.Beam.V, 4)).Append(" |\n");
        sb.Append("| directivity (integrated) | ").Append(F(f.DirectivityDbi)).Append(" dBi (4πA/λ² η_t: ").Append(F(f.ApertureDirectivityDbi)).Append(" dBi, η_t = ").Append(F(f.TaperEfficiency, 3)).Append(") |\n");
        sb.Append("| gain (wall losses, no mismatch) | ").Append(F(f.GainDbi)).Append(" dBi |\n\n");
        sb.Append("## What this model leaves out\n\n");
        sb.Append("- Internal coupling through the guides' higher-order modes (between slots of one branch and through the common walls) is not modelled; the exterior coupling of every pair of slots is (half-cosine currents, induced EMF).\n");
        sb.Append("- The coupling slots are Stevenson's resonant centred series slots acting as ideal transformers at every frequency (their reactance off resonance is ignored, so the band of the feed is optimistic) with the closed form's λ/2 length: verify the coupling slots by measurement or full-wave analysis before cutting the feed guide.\n");
        sb.Append("- The alternating slot offsets put the slots of each branch at y ± δ; the figures above include them (the slots' true centres).\n");
        sb.Append("- Not yet for planar arrays: tolerance Monte Carlo, the linear report's requirement verdicts and safety screening.\n");
        if (d.Warnings.Count > 0)
        {
            sb.Append("\n## Warnings\n\n");
            foreach (var w in d.Warnings) sb.Append("- ").Append(w.Message).Append('\n');
        }
        sb.Append("\nCaution: high-power RF can be hazardous; observe local regulations and licensed practice for exposure and power handling.\n");
        return sb.ToString();
    }
}
