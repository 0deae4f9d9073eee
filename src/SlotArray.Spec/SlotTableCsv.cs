using System.Globalization;
using System.Numerics;
using System.Security.Cryptography;
using System.Text;
using SlotArray.Core.Slots.Tables;

namespace SlotArray.Spec;

/// <summary>
/// The slot-table CSV of <c>slots.data</c> (README, "Your own slot table"), both ways: <see cref="Parse"/> reads a file's
/// bytes into a <see cref="SlotTable"/> (SI units, its SHA-256 and its <c>#</c> provenance lines); <see cref="Format"/>
/// writes rows in the same format. Units come from the column names (<c>offset_mm</c>, <c>frequency_ghz</c>), parsed by
/// <see cref="QuantityParser"/>. Errors are <see cref="SlotTableException"/>s with the line and column.
/// </summary>
internal static class SlotTableCsv
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    private static readonly (string Name, QuantityKind? Kind)[] Known =
    [
        ("offset", QuantityKind.Length), ("tilt", QuantityKind.Angle), ("length", QuantityKind.Length), ("cut_depth", QuantityKind.Length),
        ("frequency", QuantityKind.Frequency), ("ref_plane", QuantityKind.Length),
        ("g", null), ("b", null), ("r", null), ("x", null), ("s11_re", null), ("s11_im", null), ("s21_re", null), ("s21_im", null),
    ];

    /// <summary>Lower-case hex SHA-256 of the bytes.</summary>
    public static string Sha256(byte[] bytes) => Convert.ToHexStringLower(SHA256.HashData(bytes));

    /// <summary>
    /// Reads a slot table for slots of the given kind. Throws <see cref="SlotTableException"/> (line, column, what to
    /// write instead) on an unknown or unit-less column, columns of another slot type, mixed responses, a missing or
    /// non-numeric cell.
    /// </summary>
    /// <param name="bytes">The file's bytes (UTF-8, a BOM is skipped).</param>
    /// <param name="source">The file name as the spec gives it.</param>
    /// <param name="geometry">The slot type of the spec.</param>
    public static SlotTable Parse(byte[] bytes, string source, SlotTableGeometry geometry)
    {
        ArgumentNullException.ThrowIfNull(bytes);
        string text = new UTF8Encoding(false).GetString(bytes).TrimStart('\uFEFF');
        var lines = text.Split('\n');
        var provenance = new List<string>();
        Dictionary<string, (int Index, double Factor, int Column)>? columns = null;
        var rows = new List<SlotTableRow>();
        SlotTableResponse response = default;
        for (int n = 0; n < lines.Length; n++)
        {
            string line = lines[n].TrimEnd('\r');
            int lineNo = n + 1;
            if (line.TrimStart().StartsWith('#')) { provenance.Add(line.TrimStart()[1..].Trim()); continue; }
            if (line.Trim().Length == 0) continue;
            var cells = Cells(line);
            if (columns is null)
            {
                columns = Header(cells, lineNo);
                response = CheckColumns(columns, geometry, lineNo);
                continue;
            }
            if (cells.Count != columns.Count)
                throw new SlotTableException($"{cells.Count} cells, but the header has {columns.Count} columns", lineNo, 1);
            rows.Add(Row(cells, columns, geometry, response, lineNo));
        }
        if (columns is null) throw new SlotTableException("no header row: the first line that is not a # comment names the columns, e.g. offset_mm,length_mm,frequency_ghz,g,b");
        if (rows.Count == 0) throw new SlotTableException("the table has a header but no rows");
        return new SlotTable(source, Sha256(bytes), provenance, geometry, response, rows);
    }

    /// <summary>
    /// The CSV text of a table of normalised admittances: the provenance lines as <c># </c> comments, the header for the
    /// slot type (longitudinal: <c>offset_mm,length_mm</c>; edge: <c>tilt_deg,cut_depth_mm,length_mm</c>; inclined
    /// series: <c>tilt_deg,length_mm</c>), then <c>frequency_ghz,g,b</c>; numbers in invariant culture, enough digits to
    /// read back the same slot to 1 nm and y to 1e-9.
    /// </summary>
    /// <param name="geometry">Slot type.</param>
    /// <param name="provenance">Comment lines (without the #).</param>
    /// <param name="rows">(coupling m or rad, cut depth m or NaN, length m, frequency Hz, y) per row.</param>
    public static string Format(SlotTableGeometry geometry, IEnumerable<string> provenance,
        IEnumerable<(double Coupling, double CutDepth, double Length, double Frequency, Complex Y)> rows)
    {
        ArgumentNullException.ThrowIfNull(provenance);
        ArgumentNullException.ThrowIfNull(rows);
        var sb = new StringBuilder();
        foreach (string p in provenance) sb.Append("# ").Append(p).Append('\n');
        sb.Append(geometry switch
        {
            SlotTableGeometry.Longitudinal => "offset_mm,length_mm",
            SlotTableGeometry.Edge => "tilt_deg,cut_depth_mm,length_mm",
            _ => "tilt_deg,length_mm",
        }).Append(",frequency_ghz,g,b\n");
        foreach (var r in rows)
        {
            sb.Append(geometry == SlotTableGeometry.Longitudinal
                ? (r.Coupling * 1e3).ToString("0.######", Inv)
                : (r.Coupling * 180 / Math.PI).ToString("0.######", Inv));
            if (geometry == SlotTableGeometry.Edge) sb.Append(',').Append((r.CutDepth * 1e3).ToString("0.######", Inv));
            sb.Append(',').Append((r.Length * 1e3).ToString("0.######", Inv))
              .Append(',').Append((r.Frequency / 1e9).ToString("0.#########", Inv))
              .Append(',').Append(r.Y.Real.ToString("0.##########", Inv))
              .Append(',').Append(r.Y.Imaginary.ToString("0.##########", Inv)).Append('\n');
        }
        return sb.ToString();
    }

    private static List<(string Text, int Column)> Cells(string line)
    {
        var cells = new List<(string, int)>();
        int start = 0;
        for (int i = 0; i <= line.Length; i++)
            if (i == line.Length || line[i] == ',')
            {
                cells.Add((line[start..i].Trim(), start + 1));
                start = i + 1;
            }
        return cells;
    }

    private static Dictionary<string, (int Index, double Factor, int Column)> Header(List<(string Text, int Column)> cells, int lineNo)
    {
        var map = new Dictionary<string, (int, double, int)>(StringComparer.Ordinal);
        for (int i = 0; i < cells.Count; i++)
        {
            var (raw, col) = cells[i];
            string name = raw.ToLowerInvariant();
            var hit = Known.Where(k => name == k.Name || (k.Kind is not null && name.StartsWith(k.Name + "_", StringComparison.Ordinal)))
                .OrderByDescending(k => k.Name.Length).Select(k => ((string Name, QuantityKind? Kind)?)k).FirstOrDefault();
            if (hit is not { } k)
                throw new SlotTableException($"unknown column '{raw}': the columns are offset_mm or tilt_deg, length_mm and/or cut_depth_mm, frequency_ghz, and g,b or r,x or s11_re,s11_im (optional s21_re,s21_im, ref_plane_mm)", lineNo, col);
            double factor = 1;
            if (k.Kind is { } kind)
            {
                if (name == k.Name)
                    throw new SlotTableException($"column '{raw}' needs its unit in the name, e.g. {k.Name}_{(kind == QuantityKind.Frequency ? "ghz" : kind == QuantityKind.Angle ? "deg" : "mm")}", lineNo, col);
                string unit = name[(k.Name.Length + 1)..];
                if (!TryUnit(unit, kind, out factor))
                    throw new SlotTableException($"column '{raw}': '{unit}' is not a {QuantityParser.Describe(kind)} unit", lineNo, col);
            }
            if (!map.TryAdd(k.Name, (i, factor, col)))
                throw new SlotTableException($"column '{k.Name}' appears twice", lineNo, col);
        }
        return map;
    }

    /// <summary>The SI factor of a unit suffix: the spec's own unit table ("1 ghz" in SI; case is folded where unambiguous).</summary>
    private static bool TryUnit(string unit, QuantityKind kind, out double factor) => QuantityParser.TryParse("1 " + unit, kind, out factor, out _);

    private static SlotTableResponse CheckColumns(Dictionary<string, (int Index, double Factor, int Column)> c, SlotTableGeometry geometry, int lineNo)
    {
        bool Has(string n) => c.ContainsKey(n);
        string type = geometry switch { SlotTableGeometry.Longitudinal => "longitudinal", SlotTableGeometry.Edge => "edge", _ => "inclined-series" };
        if (geometry == SlotTableGeometry.Longitudinal && !Has("offset"))
            throw new SlotTableException($"the spec's slots are {type}: the table needs an offset column (e.g. offset_mm){(Has("tilt") ? ", not tilt" : "")}", lineNo, 1);
        if (geometry != SlotTableGeometry.Longitudinal && !Has("tilt"))
            throw new SlotTableException($"the spec's slots are {type}: the table needs a tilt column (e.g. tilt_deg){(Has("offset") ? ", not offset" : "")}", lineNo, 1);
        if (Has("offset") && Has("tilt")) throw new SlotTableException("give offset (longitudinal slots) or tilt (edge, inclined-series), not both", lineNo, c["tilt"].Column);
        if (geometry == SlotTableGeometry.Edge ? !Has("length") && !Has("cut_depth") : !Has("length"))
            throw new SlotTableException(geometry == SlotTableGeometry.Edge ? "an edge-slot table needs cut_depth_mm (or length_mm, the developed length)" : "the table needs a length column (e.g. length_mm)", lineNo, 1);
        if (geometry != SlotTableGeometry.Edge && Has("cut_depth"))
            throw new SlotTableException($"cut_depth belongs to edge slots; the spec's slots are {type}", lineNo, c["cut_depth"].Column);
        if (!Has("frequency")) throw new SlotTableException("the table needs a frequency column (e.g. frequency_ghz)", lineNo, 1);
        var kinds = new List<SlotTableResponse>();
        if (Has("g") || Has("b")) kinds.Add(SlotTableResponse.Admittance);
        if (Has("r") || Has("x")) kinds.Add(SlotTableResponse.Impedance);
        if (Has("s11_re") || Has("s11_im")) kinds.Add(SlotTableResponse.Scattering);
        if (kinds.Count != 1)
            throw new SlotTableException(kinds.Count == 0 ? "the table needs a response: g,b (admittance) or r,x (impedance) or s11_re,s11_im (two-port)" : "give one response only: g,b or r,x or s11_re,s11_im", lineNo, 1);
        var (a, b) = kinds[0] switch { SlotTableResponse.Admittance => ("g", "b"), SlotTableResponse.Impedance => ("r", "x"), _ => ("s11_re", "s11_im") };
        if (!Has(a) || !Has(b)) throw new SlotTableException($"the response needs both {a} and {b}", lineNo, 1);
        if (kinds[0] != SlotTableResponse.Scattering && (Has("s21_re") || Has("s21_im") || Has("ref_plane")))
            throw new SlotTableException("s21_re, s21_im and ref_plane go with s11_re, s11_im only", lineNo, 1);
        if (Has("s21_re") != Has("s21_im")) throw new SlotTableException("give both s21_re and s21_im, or neither", lineNo, 1);
        return kinds[0];
    }

    private static SlotTableRow Row(List<(string Text, int Column)> cells, Dictionary<string, (int Index, double Factor, int Column)> c,
        SlotTableGeometry geometry, SlotTableResponse response, int lineNo)
    {
        double Get(string name)
        {
            if (!c.TryGetValue(name, out var col)) return double.NaN;
            var (text, column) = cells[col.Index];
            if (!double.TryParse(text, NumberStyles.Float, Inv, out double v) || !double.IsFinite(v))
                throw new SlotTableException($"{name}: '{text}' is not a number (use a dot as the decimal point)", lineNo, column);
            return v * col.Factor;
        }
        var (a, b) = response switch { SlotTableResponse.Admittance => ("g", "b"), SlotTableResponse.Impedance => ("r", "x"), _ => ("s11_re", "s11_im") };
        Complex? s21 = c.ContainsKey("s21_re") ? new Complex(Get("s21_re"), Get("s21_im")) : null;
        double refPlane = c.ContainsKey("ref_plane") ? Get("ref_plane") : 0;
        return new SlotTableRow(lineNo, Get(geometry == SlotTableGeometry.Longitudinal ? "offset" : "tilt"), Get("length"), Get("cut_depth"),
            Get("frequency"), new Complex(Get(a), Get(b)), s21, refPlane);
    }
}
