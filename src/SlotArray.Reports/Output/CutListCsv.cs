using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>cutlist.csv</c> for the machinist (RFC 4180). Line ends are CRLF, the record separator RFC 4180 §2.1
/// prescribes, so strict CSV readers accept the file and spreadsheets open it on any system. A field is quoted
/// when it contains a comma, a double quote, CR or LF (quotes doubled inside). Every record has the same number of
/// fields: the header block is a run of comment records whose first field starts with <c>#</c>, padded with empty
/// fields. Units: mm with 3 decimals, degrees with 2. The datum and dimensioning follow physics-reference §9.3
/// (baseline dimensioning from one datum, ASME Y14.5 principle); lengths are overall tip to tip (§9.1).
/// </summary>
public static class CutListCsv
{
    /// <summary>Columns for broad-wall (longitudinal) slots.</summary>
    public static readonly IReadOnlyList<string> OffsetColumns =
        ["slot", "position_mm", "offset_mm", "side", "from_datum_wall_mm", "length_mm", "width_mm", "end", "tolerance_mm"];

    /// <summary>Columns for edge (narrow-wall) slots: tilt and depth of cut replace offset and side.</summary>
    public static readonly IReadOnlyList<string> TiltColumns =
        ["slot", "position_mm", "tilt_deg", "cut_depth_mm", "length_mm", "width_mm", "end", "tolerance_mm"];

    /// <summary>Column added when the design comes from a user's slot table: "in table" or "outside" (extrapolated).</summary>
    public const string SlotTableColumn = "slot_table";

    /// <summary>Writes the cut list of <paramref name="report"/>.</summary>
    /// <exception cref="ArgumentException">Some slots carry an offset and others a tilt, or a slot carries neither.</exception>
    public static void Write(DesignReport report, TextWriter writer)
    {
        bool tilt = UsesTilt(report);
        var columns = tilt ? TiltColumns : OffsetColumns;
        if (report.SlotData is not null) columns = [.. columns, SlotTableColumn];
        var g = report.Guide;
        string tol = Invariant.Mm(report.Inputs.CutTolerance);
        var comments = new List<string>
        {
            $"# SlotArray cut list: {report.Name}",
            $"# datum A: {report.Inputs.DatumDescription}; every position_mm is the slot centre measured from datum A (baseline dimensioning from this one datum; do not chain)",
            "# units: lengths in mm, angles in deg; tolerance_mm is +/- on position, offset, length and width",
            $"# guide: {g.Designation}; inside a = {Invariant.Mm(g.A)} mm, b = {Invariant.Mm(g.B)} mm",
            $"# wall: {Invariant.Mm(g.Wall)} mm; metal: {g.Metal}",
            $"# slots: {report.Inputs.SlotType}; {Invariant.Int(report.Slots.Count)} slots",
        };
        if (report.Termination.FeedPosition is { } feed)
            comments.Add($"# ends: datum A is position 0 (slot 1 is the slot nearest it); feed reference plane at {Invariant.Mm(feed)} mm"
                + (report.Termination.FarShortPosition is { } far ? $"; second end short (inner face) at {Invariant.Mm(far)} mm: centre feed" : ": the feed guide continues beyond the last slot"));
        if (tilt)
        {
            comments.Add("# tilt_deg: signed tilt of the slot from the transverse direction; cut_depth_mm: depth of cut into each broad wall measured from the outer narrow-wall face");
        }
        else
        {
            comments.Add("# offset_mm: signed offset of the slot centre from the broad-wall centreline; side +x or -x gives its sign");
            comments.Add($"# from_datum_wall_mm: slot centre from the OUTSIDE face of the -x side wall (datum B) = wall + a/2 + offset = {Invariant.Mm(g.Wall + g.A / 2)} + offset_mm");
        }
        comments.Add("# length_mm: overall length tip to tip (round ends: end radius = width/2, width = cutter diameter)");
        comments.Add($"# normalisation: {Invariant.Normalisation}");
        if (report.SlotData is { } sd)
        {
            comments.Add($"# slot data: {sd.File} (SHA-256 {sd.Sha256}); {sd.Range}; {SlotTableColumn}: \"outside\" marks a slot extrapolated beyond the table");
            comments.AddRange(sd.Provenance.Select(p => $"# slot data provenance: {p}"));
        }

        foreach (string c in comments) Record(writer, [c, .. Enumerable.Repeat("", columns.Count - 1)]);
        Record(writer, columns);
        foreach (var s in report.Slots)
        {
            string[] common = [Invariant.Int(s.Index), Invariant.Mm(s.Position)];
            string[] tail = [Invariant.Mm(s.OverallLength), Invariant.Mm(s.Width), s.EndForm == SlotEndForm.Round ? "round" : "square", tol];
            string[] middle = tilt
                ? [Invariant.Fixed(s.TiltDeg!.Value, 2), Invariant.Mm(s.CutDepth ?? double.NaN)]
                : [Invariant.Mm(s.Offset!.Value), Side(s.Offset.Value), Invariant.Mm(g.Wall + g.A / 2 + s.Offset.Value)];
            string[] flag = report.SlotData is null ? [] : [s.OutsideSlotTable ? "outside" : "in table"];
            Record(writer, [.. common, .. middle, .. tail, .. flag]);
        }
    }

    /// <summary>The cut list as text (as <see cref="Write"/> writes it).</summary>
    public static string ToText(DesignReport report)
    {
        using var w = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        Write(report, w);
        return w.ToString();
    }

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
