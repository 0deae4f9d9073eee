using System.Globalization;
using System.Text;

namespace SlotArray.FullWave.Slots;

/// <summary>
/// Writes characterisation results in the slot-table import format of <c>slots.data</c> (README, "Your own slot
/// table"): '#' provenance lines, a header with units in the column names, one row per geometry and frequency,
/// response g, b (y = Y/G0 at the slot's centre plane). Longitudinal: offset_mm, length_mm; edge: tilt_deg,
/// cut_depth_mm, length_mm (developed length).
/// </summary>
internal static class SlotTableCsv
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The table text; rows sorted by coupling, length, frequency.</summary>
    public static string ToText(IReadOnlyList<SlotSampleResult> results, IEnumerable<string> provenance, bool edge)
    {
        var sb = new StringBuilder();
        foreach (string p in provenance) sb.Append("# ").Append(p.Replace('\n', ' ')).Append('\n');
        sb.Append(edge ? "tilt_deg,cut_depth_mm,length_mm,frequency_ghz,g,b\n" : "offset_mm,length_mm,frequency_ghz,g,b\n");
        foreach (var r in results.OrderBy(r => r.Sample.Coupling).ThenBy(r => r.Sample.LengthMm).ThenBy(r => r.FrequencyHz))
        {
            string geom = edge
                ? string.Format(Inv, "{0:0.####},{1:0.####},{2:0.####}", r.Sample.Coupling, r.Sample.CutDepthMm, r.Sample.LengthMm)
                : string.Format(Inv, "{0:0.####},{1:0.####}", r.Sample.Coupling, r.Sample.LengthMm);
            sb.Append(geom).Append(string.Format(Inv, ",{0:0.######},{1:0.######},{2:0.######}\n", r.FrequencyHz * 1e-9, r.Admittance.Real, r.Admittance.Imaginary));
        }
        return sb.ToString();
    }
}

/// <summary>Where b crosses zero against length at one coupling and frequency, by linear interpolation between the bracketing samples.</summary>
/// <param name="Coupling">Offset (mm) or tilt (deg).</param>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="ResonantLengthMm">Length at b = 0, mm, or null when no sample pair brackets it.</param>
/// <param name="ResonantConductance">g at that length, or the largest g seen when not bracketed.</param>
/// <param name="PeakConductanceLengthMm">Length of the largest g among the samples, mm.</param>
/// <param name="CutDepthMm">Edge slots: the cut depth at resonance (or at the peak when not bracketed), mm.</param>
internal sealed record SampledResonance(double Coupling, double FrequencyHz, double? ResonantLengthMm, double ResonantConductance, double PeakConductanceLengthMm,
    double? CutDepthMm)
{
    /// <summary>The resonance of every coupling at <paramref name="frequencyHz"/>.</summary>
    public static IReadOnlyList<SampledResonance> Find(IReadOnlyList<SlotSampleResult> results, double frequencyHz)
    {
        var list = new List<SampledResonance>();
        foreach (var grp in results.Where(r => Math.Abs(r.FrequencyHz - frequencyHz) < 1).GroupBy(r => r.Sample.Coupling).OrderBy(g => g.Key))
        {
            var pts = grp.OrderBy(r => r.Sample.LengthMm).ToList();
            var peak = pts.MaxBy(p => p.Admittance.Real)!;
            double? lr = null, depth = null;
            double gr = peak.Admittance.Real;
            for (int i = 0; i + 1 < pts.Count; i++)
            {
                double b0 = pts[i].Admittance.Imaginary, b1 = pts[i + 1].Admittance.Imaginary;
                if (b0 > 0 && b1 <= 0)
                {
                    double t = b0 / (b0 - b1);
                    lr = pts[i].Sample.LengthMm + t * (pts[i + 1].Sample.LengthMm - pts[i].Sample.LengthMm);
                    gr = pts[i].Admittance.Real + t * (pts[i + 1].Admittance.Real - pts[i].Admittance.Real);
                    if (pts[i].Sample.CutDepthMm is double d0 && pts[i + 1].Sample.CutDepthMm is double d1) depth = d0 + t * (d1 - d0);
                    break;
                }
            }
            list.Add(new SampledResonance(grp.Key, frequencyHz, lr, gr, peak.Sample.LengthMm, depth ?? peak.Sample.CutDepthMm));
        }
        return list;
    }
}
