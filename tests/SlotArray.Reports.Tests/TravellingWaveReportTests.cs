using System.Text.Json;
using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;
using SlotArray.Reports.Model;
using SlotArray.Reports.Plots;

namespace SlotArray.Reports.Tests;

/// <summary>
/// Report of a travelling-wave edge-slot array (issue 6): load, squint, cross-polar requirement, sweep entries, datum,
/// scan table and plot. One small array (20 edge slots, 0.45 λg, Taylor −25 dB, 40 % to the load: real edge slots top out
/// near g = 0.095, issue 20), 21 sweep points.
/// </summary>
public class TravellingWaveReportTests
{
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.41);

    private static ArrayRequest Request(double? crossPolarDb) =>
        new("tw-edge-20", F0, Frequency.FromGigahertz(9.3), Frequency.FromGigahertz(9.5),
            RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium),
            new SlotRequest(SlotType.Edge, 20, Length.FromMillimeters(1.6), Length.FromMillimeters(1.6), SlotModelKind.Stevenson),
            new FeedRequest(FeedType.TravellingWave, GuideDistance.InGuideWavelengths(0.45), FeedPosition.End, 0.40, GuideDistance.InGuideWavelengths(0.25)),
            new TaperRequest(TaperType.Taylor, -25, 4, -20, 2, null), CouplingMode.None, null, new Requirements(null, crossPolarDb, null), null);

    private static readonly Lazy<(ArrayResult Result, DesignReport Report)> Run = new(() =>
    {
        var r = ArrayPipeline.Run(Request(-25), new AnalysisOptions(SweepPoints: 21));
        return (r, DesignReportBuilder.Build(r));
    });

    [Fact]
    public void Load_and_travelling_wave_figures_come_from_the_network_and_the_phase_condition()
    {
        var (result, report) = Run.Value;
        Assert.NotNull(report.Load);
        Check.Absolute(0.40, report.Load!.Fraction, 0, "feed.load of the request");
        Check.Absolute(0.40, report.Load.PowerWPerWIn, 1e-3, "the designer leaves P_L for the load (refinement to 1e-4 dB)");
        var tw = report.TravellingWave!;
        var d = result.Design.Spacing.Meters;
        double lam = F0.FreeSpaceWavelength.Meters, lg = result.Design.GuideWavelength.Meters;
        Check.Absolute(Math.Asin(lam / lg - lam / (2 * d)) * 180 / Math.PI, tw.SquintDeg, 1e-9, "Elliott 1981, Ch. 8: sin θ = λ/λg − λ/(2d)");
        Check.Absolute(tw.SquintDeg, report.Pattern.BeamDeg, 0.1, "the network pattern's beam agrees with the phase condition");
        Assert.InRange(tw.Efficiency, 0.5, 0.6);   // 40 % to the load plus ~1 % wall loss (definition: radiated / accepted)
        Assert.Equal("matched-load", report.Termination.Type);
        Assert.Equal("inner face of the load-end flange (matched load)", report.Inputs.DatumDescription);
    }

    [Fact]
    public void Design_json_carries_load_tilts_cut_depths_and_cross_polar_sweep_entries_and_reads_back()
    {
        var report = Run.Value.Report;
        string json = DesignJson.ToText(report);
        using var doc = JsonDocument.Parse(json);
        var root = doc.RootElement;
        Assert.Equal(0.40, root.GetProperty("load").GetProperty("fraction").GetDouble());
        Assert.True(root.GetProperty("load").TryGetProperty("power_w_per_w_in", out _));
        foreach (var s in root.GetProperty("slots").EnumerateArray())
        {
            Assert.True(s.TryGetProperty("tilt_deg", out _));
            Assert.True(s.GetProperty("cut_depth_m").GetDouble() > 1.27e-3, "the cut opens the guide (deeper than the wall)");
            Assert.False(s.TryGetProperty("offset_m", out _));
        }
        foreach (var q in root.GetProperty("sweep").EnumerateArray())
        {
            Assert.True(q.GetProperty("cross_polar_db").GetDouble() < 0);
            Assert.True(q.GetProperty("hpbw_deg").GetDouble() > 0);
        }
        using var ms = new MemoryStream(System.Text.Encoding.UTF8.GetBytes(json));
        var back = DesignJson.Read(ms);
        Assert.Equal(report.Load, back.Load);
        Assert.Equal(report.TravellingWave, back.TravellingWave);
        Assert.Equal(report.Pattern.CrossPolarDb, back.Pattern.CrossPolarDb);
        // the fabrication section is written from Core's plan and not read back
        Assert.Equal(DesignJson.ToText(report with { Fabrication = null }), DesignJson.ToText(back));
    }

    [Fact]
    public void Cross_polar_requirement_is_checked_against_the_worst_level_over_the_band()
    {
        var report = Run.Value.Report;
        var req = Assert.Single(report.Requirements, q => q.Description.Contains("cross-polar"));
        double worst = report.Sweep.Max(s => s.CrossPolarDb!.Value);
        Assert.Equal(worst <= -25, req.Passed);
        var lenient = DesignReportBuilder.Build(ArrayPipeline.Run(Request(-3), new AnalysisOptions(SweepPoints: 3)));
        Assert.True(Assert.Single(lenient.Requirements, q => q.Description.Contains("cross-polar")).Passed);
        Assert.DoesNotContain(report.Warnings, w => w.Contains("cross_polar"));
    }

    [Fact]
    public void Summary_has_the_scan_table_and_the_load_and_the_scan_plot_has_its_series()
    {
        var report = Run.Value.Report;
        var w = new StringWriter();
        SummaryMarkdown.Write(report, w);
        string md = w.ToString();
        Assert.Contains("## Frequency scan", md);
        int rows = md.Split('\n').SkipWhile(l => !l.StartsWith("| frequency (GHz)")).Skip(2).TakeWhile(l => l.StartsWith('|')).Count();
        Assert.Equal(SummaryMarkdown.ScanRows, rows);
        Assert.Contains("power into the matched load", md);
        Assert.Contains("Squint per 100 MHz", md);
        var plot = ScanPlot.Build(report);
        Assert.Equal(5, plot.Series.Count);   // beam, HPBW, peak sidelobe, gain, cross-polar
    }
}
