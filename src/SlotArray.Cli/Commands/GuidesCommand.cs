using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using SlotArray.Core.Waveguides;

namespace SlotArray.Cli.Commands;

/// <summary><c>slotarray guides [--json]</c>: the catalogue of standard waveguides with their TE10 band.</summary>
internal static class GuidesCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var json = new Option<bool>("--json") { Description = "Print one JSON array on stdout" };
        var cmd = new Command("guides", "List the standard rectangular waveguides (EIA WR / IEC R) with inside dimensions and TE10 band") { json };
        cmd.SetAction(pr =>
        {
            if (pr.GetValue(json)) WriteJson(output); else WriteTable(output);
            return ExitCodes.Ok;
        });
        return cmd;
    }

    private static void WriteTable(TextWriter o)
    {
        var ci = CultureInfo.InvariantCulture;
        o.WriteLine("designation  IEC    a (mm)    b (mm)   TE10 cutoff (GHz)  recommended band (GHz)");
        foreach (var g in WaveguideCatalogue.All)
            o.WriteLine(string.Format(ci, "{0,-11}  {1,-5} {2,8:F3}  {3,8:F3}  {4,18:F3}  {5,8:F2} - {6:F2}",
                g.Designation, g.Iec, g.BroadWall.Millimeters, g.NarrowWall.Millimeters, g.CutoffTe10.Gigahertz,
                g.BandLowGigahertz, g.BandHighGigahertz));
        o.WriteLine("Inside dimensions per EIA RS-261-B (inches x 25.4, exact); IEC 60153-2 names.");
    }

    private static void WriteJson(TextWriter o)
    {
        var items = WaveguideCatalogue.All.Select(g => new Dictionary<string, object>
        {
            ["designation"] = g.Designation,
            ["iec"] = g.Iec,
            ["a_mm"] = Math.Round(g.BroadWall.Millimeters, 6),
            ["b_mm"] = Math.Round(g.NarrowWall.Millimeters, 6),
            ["cutoff_te10_hz"] = Math.Round(g.CutoffTe10.Hertz, 1),
            ["band_low_hz"] = g.BandLow.Hertz,
            ["band_high_hz"] = g.BandHigh.Hertz,
        });
        o.WriteLine(JsonSerializer.Serialize(items, new JsonSerializerOptions { WriteIndented = true }));
    }
}
