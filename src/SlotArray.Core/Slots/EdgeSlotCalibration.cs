using System.Globalization;
using System.Numerics;

namespace SlotArray.Core.Slots;

/// <summary>
/// One family of full-wave edge-slot runs (one guide, wall, kerf, cutter form and surroundings): the de-embedded
/// y = Y/G0 on a grid of tilts × cut depths × frequencies. Read from the repository's calibration table
/// (data/fullwave/edge-slot-calibration.csv, compiled in as <see cref="EdgeSlotCalibrationData.Csv"/>).
/// </summary>
/// <param name="Guide">Standard name of the guide, e.g. WR-90.</param>
/// <param name="BroadWallMm">Inside a, mm.</param>
/// <param name="NarrowWallMm">Inside b, mm.</param>
/// <param name="WallMm">Wall thickness t, mm.</param>
/// <param name="WidthMm">Kerf, mm.</param>
/// <param name="Form">Cutter form: <c>saw</c> or <c>end-mill</c>.</param>
/// <param name="Surround">Surroundings.</param>
/// <param name="FlareLengthMm">Flare: length, mm (else 0).</param>
/// <param name="FlareApertureMm">Flare: aperture, mm (else 0).</param>
/// <param name="Tilts">The runs of each tilt, tilts ascending.</param>
/// <param name="FrequenciesHz">Frequency nodes, Hz, ascending (the same for every run).</param>
internal sealed record EdgeSlotCalibrationFamily(string Guide, double BroadWallMm, double NarrowWallMm, double WallMm, double WidthMm, string Form,
    EdgeSlotSurround Surround, double FlareLengthMm, double FlareApertureMm, IReadOnlyList<EdgeSlotTiltRuns> Tilts, IReadOnlyList<double> FrequenciesHz)
{
    /// <summary>Lowest and highest frequency of the family, Hz.</summary>
    public (double Low, double High) Band => (FrequenciesHz[0], FrequenciesHz[^1]);

    /// <summary>Tilt nodes, degrees, ascending.</summary>
    public IReadOnlyList<double> TiltsDeg => [.. Tilts.Select(t => t.TiltDeg)];
}

/// <summary>The runs of one tilt: its cut depths and y[depth, frequency].</summary>
/// <param name="TiltDeg">Tilt, degrees.</param>
/// <param name="DepthsMm">Cut depths from the outer narrow-wall face, mm, ascending.</param>
/// <param name="Y">y[depth, frequency] = Y/G0.</param>
internal sealed record EdgeSlotTiltRuns(double TiltDeg, IReadOnlyList<double> DepthsMm, Complex[,] Y);

/// <summary>Reads the calibration table's text into families (pure: the text is compiled into the assembly).</summary>
internal static class EdgeSlotCalibration
{
    private static readonly Lazy<IReadOnlyList<EdgeSlotCalibrationFamily>> BuiltIn = new(() => Parse(EdgeSlotCalibrationData.Csv));

    /// <summary>The families of the repository's calibration table.</summary>
    public static IReadOnlyList<EdgeSlotCalibrationFamily> Families => BuiltIn.Value;

    /// <summary>
    /// Parses the table: '#' lines are provenance, the first other line the header (columns by name: guide, a_mm, b_mm,
    /// wall_mm, width_mm, form, surround, flare_length_mm, flare_aperture_mm, tilt_deg, cut_depth_mm, frequency_ghz, g, b);
    /// rows group into families by their geometry columns, and within a family by tilt; each tilt's depths must all be
    /// given at the family's every frequency (tilts may have different depths).
    /// </summary>
    /// <exception cref="FormatException">A malformed row or an incomplete grid.</exception>
    public static IReadOnlyList<EdgeSlotCalibrationFamily> Parse(string text)
    {
        var lines = text.Split('\n').Select(l => l.Trim()).Where(l => l.Length > 0 && !l.StartsWith('#')).ToList();
        if (lines.Count < 2) throw new FormatException("the edge-slot calibration table has no rows");
        var col = lines[0].Split(',').Select((n, i) => (n, i)).ToDictionary(p => p.n, p => p.i);
        var rows = lines.Skip(1).Select(l => l.Split(',')).ToList();
        double Num(string[] r, string name) => double.Parse(r[col[name]], NumberStyles.Float, CultureInfo.InvariantCulture);
        var families = new List<EdgeSlotCalibrationFamily>();
        foreach (var grp in rows.GroupBy(r => string.Join(",", new[] { "guide", "a_mm", "b_mm", "wall_mm", "width_mm", "form", "surround", "flare_length_mm", "flare_aperture_mm" }.Select(c => r[col[c]]))))
        {
            var first = grp.First();
            var freqs = grp.Select(r => Math.Round(Num(r, "frequency_ghz") * 1e9)).Distinct().Order().ToArray();
            var tilts = new List<EdgeSlotTiltRuns>();
            foreach (var byTilt in grp.GroupBy(r => Num(r, "tilt_deg")).OrderBy(t => t.Key))
            {
                var depths = byTilt.Select(r => Num(r, "cut_depth_mm")).Distinct().Order().ToArray();
                var y = new Complex[depths.Length, freqs.Length];
                var filled = new bool[depths.Length, freqs.Length];
                foreach (var r in byTilt)
                {
                    int j = Array.IndexOf(depths, Num(r, "cut_depth_mm")), k = Array.IndexOf(freqs, Math.Round(Num(r, "frequency_ghz") * 1e9));
                    y[j, k] = new Complex(Num(r, "g"), Num(r, "b"));
                    filled[j, k] = true;
                }
                if (filled.Cast<bool>().Any(f => !f))
                    throw new FormatException($"the edge-slot calibration family {grp.Key} at tilt {byTilt.Key} deg does not give every depth at every frequency");
                tilts.Add(new EdgeSlotTiltRuns(byTilt.Key, depths, y));
            }
            var surround = first[col["surround"]] switch
            {
                "tube" => EdgeSlotSurround.Tube,
                "ground-plane" => EdgeSlotSurround.GroundPlane,
                "flare" => EdgeSlotSurround.Flare,
                var s => throw new FormatException($"unknown surroundings '{s}' in the edge-slot calibration table"),
            };
            families.Add(new EdgeSlotCalibrationFamily(first[col["guide"]], Num(first, "a_mm"), Num(first, "b_mm"), Num(first, "wall_mm"), Num(first, "width_mm"),
                first[col["form"]], surround, Num(first, "flare_length_mm"), Num(first, "flare_aperture_mm"), tilts, freqs));
        }
        return families;
    }
}
