using System.Globalization;
using System.Text;
using SlotArray.Core.Prototype;

namespace SlotArray.Reports.Compare;

/// <summary>
/// Writes measurements in the formats <c>compare</c> reads: Touchstone 1.1 (1 or 2 ports, Hz, RI) and pattern-cut CSV
/// with <c>#</c> header lines. Used for synthetic prototypes, whose files say so in their first header line.
/// </summary>
internal static class MeasurementFiles
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>A Touchstone 1.1 file of the network (S21 only in magnitude when it was generated so).</summary>
    /// <param name="network">The data.</param>
    /// <param name="provenance">Header comment lines (without the leading '!').</param>
    public static string Touchstone(MeasuredNetwork network, IEnumerable<string> provenance)
    {
        ArgumentNullException.ThrowIfNull(network);
        var s = new StringBuilder();
        foreach (var line in provenance) s.Append("! ").Append(line).Append('\n');
        s.Append("# Hz S RI R 50\n");
        for (int i = 0; i < network.Frequencies.Count; i++)
        {
            s.Append(network.Frequencies[i].ToString("R", Inv)).Append(' ').Append(network.S11[i].Real.ToString("R", Inv)).Append(' ').Append(network.S11[i].Imaginary.ToString("R", Inv));
            if (network.S21 is { } s21)
            {
                // N11 N21 N12 N22 (reciprocal: S12 = S21; S22 not generated: written as 0).
                string re = s21[i].Real.ToString("R", Inv), im = s21[i].Imaginary.ToString("R", Inv);
                s.Append(' ').Append(re).Append(' ').Append(im).Append(' ').Append(re).Append(' ').Append(im).Append(" 0 0");
            }
            s.Append('\n');
        }
        return s.ToString();
    }

    /// <summary>A cut as CSV with its frequency, plane and polarisation in the header.</summary>
    /// <param name="cut">The cut.</param>
    /// <param name="provenance">Header comment lines (without the leading '#').</param>
    public static string Cut(MeasuredCut cut, IEnumerable<string> provenance)
    {
        ArgumentNullException.ThrowIfNull(cut);
        var s = new StringBuilder();
        foreach (var line in provenance) s.Append("# ").Append(line).Append('\n');
        s.Append("# frequency: ").Append((cut.Frequency.Hertz * 1e-9).ToString("0.######", Inv)).Append(" GHz\n");
        s.Append("# plane: guide-axis\n# polarisation: co\n");
        s.Append(cut.HasPhase ? "angle_deg,level_db,phase_deg\n" : "angle_deg,level_db\n");
        for (int i = 0; i < cut.Angles.Count; i++)
        {
            s.Append((cut.Angles[i] * 180 / Math.PI).ToString("0.###", Inv)).Append(',').Append(cut.LevelsDb[i].ToString("0.####", Inv));
            if (cut.PhasesRad is { } p) s.Append(',').Append((p[i] * 180 / Math.PI).ToString("0.###", Inv));
            s.Append('\n');
        }
        return s.ToString();
    }
}
