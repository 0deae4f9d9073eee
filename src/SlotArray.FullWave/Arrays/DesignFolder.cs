using System.Globalization;
using System.Text.Json;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.FullWave.Slots;

namespace SlotArray.FullWave.Arrays;

/// <summary>One slot as the cut list gives it, mm.</summary>
/// <param name="Index">Slot number.</param>
/// <param name="PositionMm">Centre from datum A (the end short's inner face), mm.</param>
/// <param name="OffsetMm">Signed offset from the broad-wall centre line, mm.</param>
/// <param name="LengthMm">Overall length tip to tip, mm.</param>
/// <param name="WidthMm">Width, mm.</param>
/// <param name="RoundEnds">Round ends (radius = width/2), else square.</param>
internal sealed record CutListSlot(int Index, double PositionMm, double OffsetMm, double LengthMm, double WidthMm, bool RoundEnds);

/// <summary>The tool's own prediction at one frequency, from design.json's sweep.</summary>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="S11Db">|S11|, dB.</param>
internal sealed record PredictedPoint(double FrequencyHz, double S11Db);

/// <summary>
/// What <c>verify</c> reads from a design folder: the slots from <c>cutlist.csv</c> (exactly as the machinist
/// gets them, mm to 0.001), the guide, termination and the tool's predictions from <c>design.json</c>.
/// </summary>
/// <param name="Name">Design name.</param>
/// <param name="Guide">Cross-section, mm.</param>
/// <param name="DesignFrequencyHz">Design frequency, Hz.</param>
/// <param name="BandLowHz">Analysis band low edge, Hz.</param>
/// <param name="BandHighHz">Analysis band high edge, Hz.</param>
/// <param name="SlotType">design.json's slot type (longitudinal, edge, inclined-series).</param>
/// <param name="Termination">short or load.</param>
/// <param name="FeedPositionMm">Feed reference plane from datum A, mm.</param>
/// <param name="Slots">Slots from the cut list.</param>
/// <param name="Predicted">Predicted |S11| across the band.</param>
/// <param name="PredictedPatternDeg">Predicted pattern cut angles, deg.</param>
/// <param name="PredictedPatternDb">Predicted pattern cut levels, dB.</param>
/// <param name="PredictedBeamDeg">Predicted beam direction, deg.</param>
/// <param name="PredictedHpbwDeg">Predicted HPBW, deg.</param>
/// <param name="PredictedPeakSidelobeDb">Predicted peak sidelobe, dB.</param>
internal sealed record DesignFolder(string Name, GuideSection Guide, double DesignFrequencyHz, double BandLowHz, double BandHighHz, string SlotType,
    string Termination, double FeedPositionMm, IReadOnlyList<CutListSlot> Slots, IReadOnlyList<PredictedPoint> Predicted,
    IReadOnlyList<double> PredictedPatternDeg, IReadOnlyList<double> PredictedPatternDb, double PredictedBeamDeg, double PredictedHpbwDeg,
    double? PredictedPeakSidelobeDb)
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Reads <c>design.json</c> and <c>cutlist.csv</c> of a folder <c>design</c> wrote.</summary>
    /// <exception cref="InvalidDataException">A file is missing or not what <c>design</c> writes; the message names it.</exception>
    public static DesignFolder Read(string folder)
    {
        string jsonPath = Path.Combine(folder, "design.json"), csvPath = Path.Combine(folder, "cutlist.csv");
        if (!File.Exists(jsonPath) || !File.Exists(csvPath))
            throw new InvalidDataException($"{folder}: needs design.json and cutlist.csv (the output folder of `slotarray design`)");
        using var doc = JsonDocument.Parse(File.ReadAllText(jsonPath));
        var root = doc.RootElement;
        try
        {
            var g = root.GetProperty("guide");
            var guide = new GuideSection(g.GetProperty("a_m").GetDouble() * 1e3, g.GetProperty("b_m").GetDouble() * 1e3, g.GetProperty("wall_m").GetDouble() * 1e3);
            var band = root.GetProperty("band");
            var term = root.GetProperty("termination");
            string type = term.GetProperty("type").GetString() ?? "";
            double feed = term.TryGetProperty("feed_position_m", out var fp) ? fp.GetDouble() * 1e3 : double.NaN;
            var predicted = root.GetProperty("sweep").EnumerateArray().Select(p =>
            {
                double re = p.GetProperty("s11_re").GetDouble(), im = p.GetProperty("s11_im").GetDouble();
                return new PredictedPoint(p.GetProperty("frequency_hz").GetDouble(), 10 * Math.Log10(Math.Max(re * re + im * im, 1e-30)));
            }).ToList();
            var pat = root.GetProperty("pattern");
            var cut = pat.GetProperty("cut");
            double? psl = pat.TryGetProperty("peak_sidelobe_db", out var ps) && ps.ValueKind == JsonValueKind.Number ? ps.GetDouble() : null;
            return new DesignFolder(root.GetProperty("name").GetString() ?? "design", guide, root.GetProperty("frequency_hz").GetDouble(),
                band.GetProperty("low_hz").GetDouble(), band.GetProperty("high_hz").GetDouble(), root.GetProperty("inputs").GetProperty("slot_type").GetString() ?? "",
                type, feed, ReadCutList(csvPath), predicted, cut.GetProperty("angle_deg").EnumerateArray().Select(e => e.GetDouble()).ToList(),
                cut.GetProperty("level_db").EnumerateArray().Select(e => e.GetDouble()).ToList(), pat.GetProperty("beam_deg").GetDouble(),
                pat.GetProperty("hpbw_deg").GetDouble(), psl);
        }
        catch (KeyNotFoundException e)
        {
            throw new InvalidDataException($"{jsonPath}: not a design.json this version writes ({e.Message})");
        }
    }

    /// <summary>
    /// Reads the slot rows of a cut list (comment rows start with '#'; the header names the columns). Positions come
    /// back from the design's z = 0 (the end short's inner face): the cut list gives them from datum A, the tube's end
    /// face, so the end short's own z (its "end short" row) is taken off; a cut list without that row has z = 0 at A.
    /// </summary>
    public static IReadOnlyList<CutListSlot> ReadCutList(string path)
    {
        var rows = File.ReadAllLines(path).Where(l => l.Length > 0 && !l.TrimStart('"').StartsWith('#')).ToList();
        if (rows.Count < 2) throw new InvalidDataException($"{path}: no slot rows");
        var head = rows[0].Split(',').ToList();
        int Col(string name) => head.IndexOf(name) is int i and >= 0 ? i : throw new InvalidDataException($"{path}: no column '{name}' (is this a longitudinal-slot cut list?)");
        int cSlot = Col("slot"), cPos = Col("z_from_A_mm"), cOff = Col("offset_mm"), cLen = Col("length_mm"), cW = Col("width_mm"), cEnd = Col("end");
        double origin = 0;
        string? shortRow = rows.FirstOrDefault(r => r.StartsWith("\"end short", StringComparison.Ordinal));
        if (shortRow is not null)
        {
            var rest = shortRow[(shortRow.IndexOf("\",", StringComparison.Ordinal) + 2)..].Split(',');   // after the quoted feature name: slot, z, ...
            origin = double.Parse(rest[cPos - 1], NumberStyles.Float, Inv);
        }
        var list = new List<CutListSlot>();
        foreach (var (row, n) in rows.Skip(1).Select((r, n) => (r, n + 2)).Where(x => x.r.StartsWith("slot,", StringComparison.Ordinal)))
        {
            var v = row.Split(',');
            double D(int c) => double.TryParse(v[c], NumberStyles.Float, Inv, out double x) ? x : throw new InvalidDataException($"{path}: row {n}: '{v[c]}' in {head[c]} is not a number");
            list.Add(new CutListSlot(int.Parse(v[cSlot], Inv), D(cPos) - origin, D(cOff), D(cLen), D(cW), v[cEnd].Trim() == "round"));
        }
        return list;
    }
}
