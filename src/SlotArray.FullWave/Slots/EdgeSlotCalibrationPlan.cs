using System.Globalization;
using System.Text;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Runs;

namespace SlotArray.FullWave.Slots;

/// <summary>The de-embedded admittance of one edge-slot calibration run at one frequency.</summary>
/// <param name="TiltDeg">Tilt, degrees.</param>
/// <param name="CutDepthMm">Cut depth D from the outer narrow-wall face, mm.</param>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="G">g = Re y.</param>
/// <param name="B">b = Im y.</param>
/// <param name="ShuntResidual">|1 + S11 − S21| at the slot plane.</param>
internal sealed record EdgeCalibrationRow(double TiltDeg, double CutDepthMm, double FrequencyHz, double G, double B, double ShuntResidual);

/// <summary>
/// A family of edge-slot runs for the calibration of the edge-slot model: one guide, cut form and surroundings; for each
/// tilt a few cut depths and one plain-tube calibration, all on one mesh per tilt (every depth's x line in every run of
/// the tilt), so one calibration serves the tilt. Each run is a pulse: it gives the whole band at once.
/// </summary>
/// <param name="Designation">The guide's standard name (for the table).</param>
/// <param name="Guide">Cross-section, mm.</param>
/// <param name="WidthMm">Kerf (or cutter diameter), mm.</param>
/// <param name="Form">Cutter form.</param>
/// <param name="Surround">What the slot radiates into.</param>
/// <param name="TiltsDeg">Tilts, degrees.</param>
/// <param name="DepthsMm">Cut depths run at every tilt, mm.</param>
/// <param name="CentreHz">Pulse centre (the design frequency), Hz.</param>
/// <param name="FrequenciesHz">Frequencies of the table, Hz.</param>
/// <param name="Density">Mesh density.</param>
internal sealed record EdgeSlotCalibrationPlan(string Designation, GuideSection Guide, double WidthMm, EdgeCutterForm Form, SlotSurround Surround,
    IReadOnlyList<double> TiltsDeg, IReadOnlyList<double> DepthsMm, double CentreHz, IReadOnlyList<double> FrequenciesHz, MeshDensity Density)
{
    /// <summary>Port planes at ±this from the slot centre, mm (see <see cref="SlotCharacterisation.PortClearanceMm"/>).</summary>
    public double PortZMm => Math.Ceiling((Guide.BMm + 2 * Guide.WallMm) / 2 + SlotCharacterisation.PortClearanceMm);

    /// <summary>The layout of one run: a cut at a tilt and depth, or (depth null) the tilt's plain-tube calibration.</summary>
    public TubeLayout Layout(double tiltDeg, double? depthMm)
    {
        double lo = FrequenciesHz.Min(), hi = FrequenciesHz.Max();
        var (f0, fc) = TubeModel.Pulse(Guide, CentreHz, lo, hi);
        var s = MeshSettings.Of(Density);
        double xo = Guide.AMm / 2 + Guide.WallMm, hs = WidthMm / (s.CellsAcrossSlot + 1);
        var extra = DepthsMm.Select(d => (xo - d, hs)).ToList();
        if (Form == EdgeCutterForm.EndMill) extra.AddRange(DepthsMm.Select(d => (xo - d + WidthMm / 2, hs)));
        var cut = new EdgeCut(tiltDeg, depthMm ?? DepthsMm[0], WidthMm, Form);
        return new TubeLayout(Guide, [new PlacedSlot(cut, 0)], CutSlots: depthMm is not null, ShortZMm: null, Port1ZMm: -PortZMm, Port2ZMm: PortZMm,
            f0, fc, Density, SlotVoltageProbes: false) { Surround = Surround, ExtraXAnchors = extra };
    }

    /// <summary>The runs: per tilt its calibration, then its depths.</summary>
    public IReadOnlyList<RunRequest> Runs()
    {
        var list = new List<RunRequest>();
        foreach (double t in TiltsDeg)
        {
            list.Add(new RunRequest(Label(t, null), TubeModel.Build(Layout(t, null), $"plain-tube calibration, edge-slot family {Label(t, null)}"), Guide.AMm * 1e-3, FrequenciesHz));
            foreach (double d in DepthsMm)
                list.Add(new RunRequest(Label(t, d), TubeModel.Build(Layout(t, d), $"edge slot {Label(t, d)}"), Guide.AMm * 1e-3, FrequenciesHz));
        }
        return list;
    }

    /// <summary>Run label: <c>WR-90-tube-saw-t20-d3.3000</c> (or <c>-cal</c>).</summary>
    public string Label(double tiltDeg, double? depthMm) => FormattableString.Invariant(
        $"{Designation}-{Surround.Label}-{(Form == EdgeCutterForm.FlatSaw ? "saw" : "mill")}-t{tiltDeg:0.##}-{(depthMm is double d ? $"d{d:0.0000}" : "cal")}");

    /// <summary>De-embeds the outcomes of <see cref="Runs"/> (same order).</summary>
    public IReadOnlyList<EdgeCalibrationRow> Reduce(IReadOnlyList<RunOutcome> outcomes)
    {
        var rows = new List<EdgeCalibrationRow>();
        int i = 0;
        foreach (double t in TiltsDeg)
        {
            var cal = outcomes[i++].Response.Points;
            foreach (double d in DepthsMm)
            {
                var meas = outcomes[i++].Response.Points;
                for (int k = 0; k < FrequenciesHz.Count; k++)
                {
                    var (s11, s21) = SlotPlaneDeembedding.ToSlotPlane(meas[k].S11, meas[k].S21, cal[k].S11, cal[k].S21);
                    var y = SlotPlaneDeembedding.ShuntAdmittance(s11);
                    rows.Add(new EdgeCalibrationRow(t, d, FrequenciesHz[k], y.Real, y.Imaginary, SlotPlaneDeembedding.ShuntResidual(s11, s21)));
                }
            }
        }
        return rows;
    }

    /// <summary>The table's column header (the edge-slot model reads these names).</summary>
    public const string Header = "guide,a_mm,b_mm,wall_mm,width_mm,form,surround,flare_length_mm,flare_aperture_mm,tilt_deg,cut_depth_mm,frequency_ghz,g,b,shunt_residual";

    /// <summary>The calibration table: '#' provenance lines, then (with <paramref name="header"/>) <see cref="Header"/>, one row per run and frequency.</summary>
    public string ToCsv(IReadOnlyList<EdgeCalibrationRow> rows, IEnumerable<string> provenance, bool header)
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        foreach (string p in provenance) sb.Append("# ").Append(p.Replace('\n', ' ')).Append('\n');
        if (header) sb.Append(Header).Append('\n');
        string form = Form == EdgeCutterForm.FlatSaw ? "saw" : "end-mill";
        string surround = Surround.Kind switch { SurroundKind.Tube => "tube", SurroundKind.GroundPlane => "ground-plane", _ => "flare" };
        string geometry = string.Format(inv, "{0},{1:0.####},{2:0.####},{3:0.####},{4:0.####},{5},{6},{7:0.###},{8:0.###}", Designation, Guide.AMm, Guide.BMm, Guide.WallMm,
            WidthMm, form, surround, Surround.FlareLengthMm, Surround.FlareApertureMm);
        foreach (var r in rows)
            sb.Append(geometry).Append(string.Format(inv, ",{0:0.###},{1:0.####},{2:0.####},{3:0.######},{4:0.######},{5:0.####}\n",
                r.TiltDeg, r.CutDepthMm, r.FrequencyHz * 1e-9, r.G, r.B, r.ShuntResidual));
        return sb.ToString();
    }
}
