using SlotArray.Core.Fabrication;
using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>cutlist.csv</c> for the machinist (RFC 4180): one record per tube feature and per slot, in order of distance
/// from datum A (the tube's machined end face), every dimension with its own ± tolerance. Line ends are CRLF (RFC 4180
/// §2.1). A field is quoted when it contains a comma, a double quote, CR or LF (quotes doubled inside). Every record
/// has the same number of fields: the header block is a run of comment records whose first field starts with
/// <c>#</c>, padded with empty fields; units are in the column names (mm, deg). Only formats the
/// <see cref="FabricationPlan"/> of the report (geometry and tolerances are computed in Core/Fabrication).
/// </summary>
internal static class CutListCsv
{
    /// <summary>Columns for broad-wall (longitudinal) slots.</summary>
    public static readonly IReadOnlyList<string> OffsetColumns =
        ["feature", "slot", "z_from_A_mm", "z_tol_mm", "offset_mm", "offset_tol_mm", "side", "from_B_at_nominal_wall_mm",
         "length_mm", "length_tol_mm", "width_mm", "width_tol_mm", "end", "end_radius_mm", "changed"];

    /// <summary>Columns for edge (narrow-wall) slots: tilt and the depth of cut into each broad wall replace offset and side.</summary>
    public static readonly IReadOnlyList<string> TiltColumns =
        ["feature", "slot", "z_from_A_mm", "z_tol_mm", "tilt_deg", "tilt_tol_deg", "cut_depth_upper_broad_wall_mm",
         "cut_depth_lower_broad_wall_mm", "cut_depth_tol_mm", "length_mm", "length_tol_mm", "width_mm", "width_tol_mm",
         "end", "end_radius_mm", "changed"];

    /// <summary>The sign rule of tilt_deg, as the cut list and the drawing state it.</summary>
    public const string TiltSignRule =
        "tilt_deg is measured from the direction across the narrow face (square to the tube axis); + when the slot's end in the upper broad wall lies farther from datum A than its end in the lower broad wall (narrow face seen from outside, datum A on the left, upper broad wall at the top: + turns clockwise)";

    /// <summary>Column added when the design comes from a user's slot table: "in table" or "outside" (extrapolated).</summary>
    public const string SlotTableColumn = "slot_table";

    /// <summary>Writes the cut list of <paramref name="report"/>.</summary>
    /// <exception cref="ArgumentException">The report has no fabrication plan, or its slots mix offsets and tilts.</exception>
    public static void Write(DesignReport report, TextWriter writer)
    {
        bool tilt = UsesTilt(report);
        var plan = PlanOf(report);
        var columns = tilt ? TiltColumns : OffsetColumns;
        if (report.SlotData is not null) columns = [.. columns.Take(columns.Count - 1), SlotTableColumn, columns[^1]];   // "changed" stays last
        var g = report.Guide;
        var d = report.Document;
        var t = plan.Tolerances;
        var comments = new List<string>
        {
            $"# SlotArray cut list: {report.Name}",
            $"# drawing {d.DrawingNumber ?? report.Name}; revision {d.Revision}; date {d.Date ?? "not dated"}; tool SlotArray {d.ToolVersion}; spec SHA-256 {d.SpecSha256 ?? "not from a file"}",
            $"# datum A: {plan.Datum}; every z_from_A_mm is measured from datum A (baseline dimensioning from this one face; do not chain)",
            $"# tube: overall length {Invariant.Mm(plan.TubeLength.Meters)} mm +/- {Invariant.Mm(plan.TubeLengthTolerance.Value)} mm ({plan.TubeLengthTolerance.Source}); guide {g.Designation}, inside a = {Invariant.Mm(g.A)} mm, b = {Invariant.Mm(g.B)} mm, wall {Invariant.Mm(g.Wall)} mm; metal {g.Metal}",
            "# " + Thermal(plan),
            "# units: lengths in mm, angles in deg; every *_tol_* column is +/- on the value to its left",
            $"# tolerances: z of slots, end shorts and feed junction +/- {Invariant.Mm(t.Position.Value)} mm ({t.Position.Source}); length +/- {Invariant.Mm(t.Length.Value)} mm ({t.Length.Source}); width +/- {Invariant.Mm(t.Width.Value)} mm ({t.Width.Source})",
        };
        if (tilt)
        {
            comments.Add((t.Tilt is { } tt
                ? $"# tolerances: tilt +/- {Invariant.Fixed(tt.Value * 180 / Math.PI, 3)} deg ({tt.Source})"
                : $"# tolerances: tilt_tol_deg per slot: +/- {Invariant.Mm(FeatureTolerances.Default.Value)} mm at the slot's end, delta-tilt = dx/(L/2) (default: routine precision CNC milling, common practice, no source)")
                + $"; cut depth +/- {Invariant.Mm(t.CutDepth.Value)} mm ({t.CutDepth.Source})");
            comments.Add("# " + TiltSignRule);
            comments.Add($"# cut_depth_*_broad_wall_mm: depth of cut into that broad wall measured from the outer narrow-wall face (>= wall {Invariant.Mm(g.Wall)} mm when the cut wraps)");
            comments.Add($"# length_mm (edge slots): the one definition: path length of the cut on the inner surfaces = b/cos(tilt) + 2 x (cut depth - wall), b = {Invariant.Mm(g.B)} mm; for reference: cut to tilt and depth");
        }
        else
        {
            comments.Add($"# tolerances: offset +/- {Invariant.Mm(t.Offset.Value)} mm ({t.Offset.Source})");
            comments.Add("# offset_mm: signed offset of the slot centre from the broad-wall centreline; side +x or -x gives its sign");
            comments.Add($"# from_B_at_nominal_wall_mm: slot centre from the OUTSIDE face of the -x side wall (datum B) = wall + a/2 + offset = {Invariant.Mm(g.Wall + g.A / 2)} + offset_mm; assumes the NOMINAL wall {Invariant.Mm(g.Wall)} mm: measure the actual side wall and add (actual - nominal)");
            comments.Add("# length_mm: overall length tip to tip; round ends have end_radius_mm = cutter radius (equal-area rule from the equivalent rectangular length)");
        }
        comments.Add($"# changed: yes where the row differs from the previous revision ({(plan.Changed.Count == 0 ? "none: first issue or no change" : Invariant.Int(plan.Changed.Count) + " changed")})");
        comments.Add($"# normalisation: {Invariant.Normalisation}");
        if (report.SlotData is { } sd)
        {
            comments.Add($"# slot data: {sd.File} (SHA-256 {sd.Sha256}); {sd.Range}; {SlotTableColumn}: \"outside\" marks a slot extrapolated beyond the table");
            comments.AddRange(sd.Provenance.Select(p => $"# slot data provenance: {p}"));
        }

        foreach (string c in comments) Record(writer, [c, .. Enumerable.Repeat("", columns.Count - 1)]);
        Record(writer, columns);
        var rows = plan.Features.Select(f => (f.Position.Meters, 0, FeatureRecord(f, plan, columns.Count)))
            .Concat(plan.Slots.Select(s => (s.Position.Meters, 1, SlotRecord(s, plan, report, tilt))))
            .OrderBy(r => r.Item1).ThenBy(r => r.Item2);
        foreach (var (_, _, record) in rows) Record(writer, record);
    }

    private static string[] FeatureRecord(TubeFeature f, FabricationPlan plan, int count)
    {
        var record = Enumerable.Repeat("", count).ToArray();
        record[0] = f.Name;
        record[2] = Invariant.Mm(f.Position.Meters);
        record[3] = Invariant.Mm(f.Tolerance.Value);
        record[^1] = plan.Changed.Contains(f.Key) ? "yes" : "no";
        return record;
    }

    private static string[] SlotRecord(SlotCut s, FabricationPlan plan, DesignReport report, bool tilt)
    {
        var r = s.Row;
        var g = report.Guide;
        string[] head = ["slot", Invariant.Int(r.Slot), Invariant.Mm(s.Position.Meters), Invariant.Mm(s.PositionTolerance.Value)];
        string[] tail =
        [
            Invariant.Mm(r.OverallLength.Meters), Invariant.Mm(s.LengthTolerance.Value), Invariant.Mm(r.Width.Meters), Invariant.Mm(s.WidthTolerance.Value),
            r.End.Form == Core.Fabrication.SlotEndForm.Round ? "round" : "square", r.EndRadius is { } er ? Invariant.Mm(er.Meters) : "",
        ];
        string[] flag = report.SlotData is null ? [] : [report.Slots.FirstOrDefault(x => x.Index == r.Slot)?.OutsideSlotTable == true ? "outside" : "in table"];
        string[] changed = [plan.Changed.Contains(s.Key) ? "yes" : "no"];
        string depth = Invariant.Mm(r.DepthOfCut?.Meters ?? 0);
        string[] middle = tilt
            ? [Invariant.Fixed(r.Tilt!.Value.Degrees, 3), Invariant.Fixed(s.TiltTolerance!.Value * 180 / Math.PI, 3), depth, depth, Invariant.Mm(s.CutDepthTolerance!.Value)]
            : [Invariant.Mm(r.Offset!.Value.Meters), Invariant.Mm(s.OffsetTolerance!.Value), Side(r.Offset.Value.Meters), Invariant.Mm(g.Wall + g.A / 2 + r.Offset.Value.Meters)];
        return [.. head, .. middle, .. tail, .. flag, .. changed];
    }

    private static string Thermal(FabricationPlan plan) =>
        plan.Thermal is { } th
            ? $"reference temperature {Invariant.Fixed(ThermalExpansion.ReferenceTemperatureCelsius, 0)} degC (ISO 1:2016): every dimension holds at 20 degC; {th.Metal} expands {Invariant.Fixed(th.Coefficient * 1e6, 1)}e-6 per K ({th.Source}): the tube grows {Invariant.Fixed(plan.ChangePerKelvin!.Value.Millimeters, 4)} mm per K over its {Invariant.Mm(plan.TubeLength.Meters)} mm"
            : $"reference temperature {Invariant.Fixed(ThermalExpansion.ReferenceTemperatureCelsius, 0)} degC (ISO 1:2016): every dimension holds at 20 degC; the metal's expansion coefficient is not known to this tool (name the metal with guide.metal)";

    /// <summary>The cut list as text (as <see cref="Write"/> writes it).</summary>
    public static string ToText(DesignReport report)
    {
        using var w = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        Write(report, w);
        return w.ToString();
    }

    /// <summary>The report's fabrication plan; throws when it has none.</summary>
    internal static FabricationPlan PlanOf(DesignReport report) => report.Fabrication
        ?? throw new ArgumentException("the report has no fabrication plan (build it with DesignReportBuilder.Build)", nameof(report));

    /// <summary>True when the slots are edge slots (tilt), false for offset slots.</summary>
    internal static bool UsesTilt(DesignReport report)
    {
        foreach (var s in report.Slots)
        {
            if ((s.Offset is null) == (s.TiltDeg is null))
                throw new ArgumentException($"slot {s.Index}: exactly one of offset and tilt must be given", nameof(report));
        }
        bool tilt = report.Slots.Count > 0 && report.Slots[0].TiltDeg is not null;
        if (report.Slots.Any(s => (s.TiltDeg is not null) != tilt))
            throw new ArgumentException("the slots mix offsets and tilts; one array has one slot type", nameof(report));
        return tilt;
    }

    /// <summary>The side of a signed offset in ASCII: "+x", "-x", or "centre" for zero.</summary>
    internal static string Side(double offset) => offset > 0 ? "+x" : offset < 0 ? "-x" : "centre";

    private static void Record(TextWriter w, IReadOnlyList<string> fields)
    {
        for (int i = 0; i < fields.Count; i++)
        {
            if (i > 0) w.Write(',');
            w.Write(Quote(fields[i]));
        }
        w.Write("\r\n");
    }

    /// <summary>RFC 4180 §2.6–2.7: quote a field containing a comma, quote, CR or LF; double the quotes inside.</summary>
    internal static string Quote(string field) =>
        field.AsSpan().IndexOfAny(",\"\r\n") >= 0 ? "\"" + field.Replace("\"", "\"\"") + "\"" : field;
}
