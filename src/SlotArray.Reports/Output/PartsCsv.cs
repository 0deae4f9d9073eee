using System.Text;
using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>parts.csv</c>: the flare's and the filter's plates for the shop (RFC 4180, mm and degrees, positions from datum A
/// as in <c>cutlist.csv</c>); written only when the spec has a flare or a filter.
/// </summary>
internal static class PartsCsv
{
    /// <summary>The file's text.</summary>
    /// <param name="report">The report (its <see cref="DesignReport.Parts"/>).</param>
    public static string ToText(DesignReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var sb = new StringBuilder();
        sb.Append("# ").Append(report.Name).Append(": flare and polarisation-filter plates; mm and deg; positions along the guide from datum A (see cutlist.csv); every dimension at 20 degC\r\n");
        sb.Append("# flare plates: along_guide_mm is their length, width_mm their slant width from the slotted face's edge to the aperture, angle_deg the half-flare angle from the face normal\r\n");
        sb.Append("# filter plates: along_guide_mm is their thickness, width_mm their depth out from the slotted face, height_mm their height at the outer edge, first_from_A_mm the first plate's centre, pitch_mm centre to centre\r\n");
        sb.Append("part,quantity,along_guide_mm,width_mm,height_mm,first_from_A_mm,pitch_mm,angle_deg\r\n");
        foreach (var p in report.Parts)
            sb.Append('"').Append(p.Name.Replace("\"", "\"\"", StringComparison.Ordinal)).Append("\",")
              .Append(Invariant.Int(p.Quantity)).Append(',')
              .Append(Invariant.Fixed(p.AlongGuideMm, 3)).Append(',')
              .Append(Invariant.Fixed(p.WidthMm, 3)).Append(',')
              .Append(Invariant.Fixed(p.HeightMm, 3)).Append(',')
              .Append(Invariant.Fixed(p.FirstFromAMm, 3)).Append(',')
              .Append(Invariant.Fixed(p.PitchMm, 3)).Append(',')
              .Append(Invariant.Fixed(p.AngleDeg, 3)).Append("\r\n");
        return sb.ToString();
    }
}
