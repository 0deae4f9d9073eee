using System.Globalization;
using System.Text;
using SlotArray.Core.Prototype;
using SlotArray.Core.Slots;

namespace SlotArray.Reports.Compare;

/// <summary>The text of <c>compare</c>: the table, the diagnosis stage by stage, the trims and the next plate (Markdown; the console prints the same).</summary>
internal static class ComparisonMarkdown
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The whole text.</summary>
    public static string Text(ComparisonReport r)
    {
        ArgumentNullException.ThrowIfNull(r);
        var s = new StringBuilder();
        s.Append("# ").Append(r.Name).Append(": prototype measured against the design\n\n");
        s.Append("## What was read\n");
        foreach (var line in r.Inputs) s.Append("- ").Append(line).Append('\n');
        s.Append("\n## Measured and predicted\n| quantity | measured | predicted | difference |\n| --- | ---: | ---: | ---: |\n");
        foreach (var row in r.Table)
            s.Append(string.Format(Inv, "| {0} | {1:0.0000} | {2:0.0000} | {3:+0.0000;-0.0000;0.0000} |\n", row.Quantity, row.Measured, row.Predicted, row.Difference));
        s.Append("\n## Diagnosis (the design's own network model fitted, stage by stage)\n");
        foreach (var st in r.Diagnosis.Stages)
        {
            s.Append(string.Format(Inv, "- **{0}**: residual RMS {1:0.###} (in units of the noise estimated from the data), condition number {2:0.#}{3}\n",
                st.Name, st.ResidualRms, st.ConditionNumber, st.Adopted ? "" : "; not adopted"));
            if (st.Values.Count <= 3)
                foreach (var v in st.Values) s.Append(string.Format(Inv, "  - {0}: {1:0.#####} ± {2:0.#####} (95 %)\n", v.Name, v.Value, v.Interval95));
            foreach (var note in st.Notes) s.Append("  - ").Append(note).Append('\n');
        }
        var d = r.Diagnosis;
        if (d.LengthScale is { } ls)
            s.Append(string.Format(Inv, "\nUniform length error {0:+0.###;-0.###} % ± {1:0.###} % (the slots behave {2} than cut: a resonance about {0:+0.###;-0.###} % {3} in frequency).\n",
                ls.Value * 100, ls.Interval95 * 100, ls.Value >= 0 ? "longer" : "shorter", ls.Value >= 0 ? "low" : "high"));
        if (d.ConductanceScale is { } cs) s.Append(string.Format(Inv, "Conductance scale {0:0.####} ± {1:0.####}.\n", cs.Value, cs.Interval95));
        if (d.GuideWavelengthScale is { } gs) s.Append(string.Format(Inv, "Guide-wavelength error {0:+0.####;-0.####} % ± {1:0.####} %.\n", gs.Value * 100, gs.Interval95 * 100));
        if (d.Slots.Count > 0)
        {
            bool tilt = d.Model.AsCut.CouplingKind == SlotCouplingKind.Tilt;
            s.Append($"\n### Per slot (from the cuts)\n| slot | length error (mm) | {(tilt ? "tilt error (deg)" : "offset error (mm)")} | resolution | seen |\n| ---: | ---: | ---: | ---: | --- |\n");
            foreach (var g in d.Slots)
                s.Append(string.Format(Inv, "| {0} | {1:+0.0000;-0.0000} ± {2:0.0000} | {3:+0.0000;-0.0000} ± {4:0.0000} | {5:0.00} | {6} |\n",
                    g.Slot, g.Length.Value, g.Length.Interval95, g.Coupling.Value, g.Coupling.Interval95, g.Resolution, g.Resolution >= SlotExcitationError.SeenThreshold ? "yes" : "no"));
        }
        s.Append("\n## Fix 1: trim this plate (slots can only get longer)\n").Append(r.Trim.Verdict).Append(".\n\n");
        s.Append("| slot | equivalent length as cut (mm) | lengthen by (mm) | each end (mm) |\n| ---: | ---: | ---: | ---: |\n");
        foreach (var t in r.Trim.Slots)
            s.Append(string.Format(Inv, "| {0} | {1:0.000} | {2} | {3} |\n", t.Slot, t.CutLength * 1e3,
                t.TooLong ? string.Format(Inv, "cannot ({0:0.000} too long)", -t.Trim * 1e3) : string.Format(Inv, "{0:0.000}", Math.Max(0, t.Trim) * 1e3),
                t.TooLong ? "-" : string.Format(Inv, "{0:0.000}", Math.Max(0, t.Trim) * 0.5e3)));
        s.Append("\n## Fix 2: the next plate\n");
        if (r.NextPlate is { } n)
        {
            var m = n.AtDesign;
            s.Append(string.Format(Inv, "Designed again on the slot model corrected by this fit{0}: predicted |S11| at the design frequency {1:0.0} dB, beam {2:0.00} deg, HPBW {3:0.00} deg, peak sidelobe {4:0.0} dB. Cut list, drawing and every output in next-plate/.\n",
                n.Request.Coupling == Core.Design.CouplingMode.Mutual ? " with mutual coupling in the design" : "",
                20 * Math.Log10(Math.Max(m.Network.S11.Magnitude, 1e-15)), m.Metrics.BeamDirection.Degrees, m.Metrics.HalfPowerBeamwidth.Degrees, m.Metrics.PeakSidelobeDb ?? double.NaN));
        }
        else s.Append(r.NextPlateProblem ?? "not designed").Append('\n');
        s.Append("\n## Notes\n");
        foreach (var note in r.Notes) s.Append("- ").Append(note).Append('\n');
        return s.ToString();
    }

    /// <summary>The trim list as CSV for the shop (RFC 4180).</summary>
    public static string TrimCsv(ComparisonReport r)
    {
        ArgumentNullException.ThrowIfNull(r);
        var s = new StringBuilder();
        s.Append("# SlotArray trim list: ").Append(r.Name).Append(" (lengthen each slot by trim_mm, half at each end; a slot marked too_long cannot be fixed by trimming)\n");
        s.Append("slot,cut_length_mm,trim_mm,new_length_mm,too_long\n");
        foreach (var t in r.Trim.Slots)
            s.Append(string.Format(Inv, "{0},{1:0.000},{2:0.000},{3:0.000},{4}\n", t.Slot, t.CutLength * 1e3, Math.Max(0, t.Trim) * 1e3,
                (t.CutLength + Math.Max(0, t.Trim)) * 1e3, t.TooLong ? "yes" : "no"));
        return s.ToString();
    }
}
