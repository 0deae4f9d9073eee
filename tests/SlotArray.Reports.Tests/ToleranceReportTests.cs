using System.Text.Json;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Tolerance;
using SlotArray.Reports.Plots;

namespace SlotArray.Reports.Tests;

/// <summary>
/// The tolerance writers on an invented result (the numbers are made up: the writers only print them): the JSON keys of
/// issue 7, RFC 4180 records of sensitivity.csv, the plain-words summary and the plot.
/// </summary>
public class ToleranceReportTests
{
    private static MachiningTolerance U(double mm) => new(Length.FromMillimeters(mm), ErrorDistribution.Uniform);

    private static ToleranceResult Invented()
    {
        var tol = new ToleranceRequest(U(0.02), U(0.02), U(0), U(0), U(0), new MachiningTolerance(Length.FromMillimeters(0.05), ErrorDistribution.Normal),
            Length.Zero, Length.Zero, 4, 7);
        var s = new SampleSummary(-25.5, -25.6, -25.0, -24.8, -24.5, -26.2, -24.1);
        var env = new PatternEnvelope([-90, 0, 90], [-40, 0, -40], [-45, 0, -45], [-41, 0, -41], [-38, 0, -38], [-35, 0, -35]);
        var mc = new MonteCarloResult(4, 7, -26, new NominalFigures(-26.3, 0, -40, 40), s, 0.87, s with { Mean = 0.01, P95 = 0.02 },
            s with { P95 = 0.05 }, s with { P50 = -35, P95 = -28 }, 0.01, 0.02, 0, 0.9, -44.1, -44.6, [-25.1, -26.0, -25.7, -24.1], env);
        SlotSensitivity[] sens = [new(8, ToleranceQuantity.Offset, -6.5, 200), new(1, ToleranceQuantity.Length, 1.25, -3)];
        return new ToleranceResult(tol, mc, sens, 50);
    }

    [Fact]
    public void Json_carries_every_key_of_issue_7()
    {
        var doc = JsonDocument.Parse(ToleranceJson.ToText("demo", 9.41e9, Invented())).RootElement;
        foreach (var k in new[] { "trials", "seed", "probability_meets_target", "analytic_floor_db" }) Assert.True(doc.TryGetProperty(k, out _), k);
        foreach (var k in new[] { "mean", "p50", "p90", "p95", "p99" }) Assert.True(doc.GetProperty("peak_sidelobe_db").TryGetProperty(k, out _), k);
        Assert.Equal(0.02, doc.GetProperty("gain_loss_db").GetProperty("p95").GetDouble());
        Assert.True(doc.GetProperty("gain_loss_db").TryGetProperty("mean", out _));
        Assert.Equal(0.05, doc.GetProperty("pointing_error_deg").GetProperty("p95").GetDouble());
        Assert.Equal(-35, doc.GetProperty("s11_db_at_design").GetProperty("p50").GetDouble());
        var first = doc.GetProperty("sensitivities")[0];
        Assert.Equal(8, first.GetProperty("slot").GetInt32());
        Assert.Equal("offset", first.GetProperty("quantity").GetString());
        Assert.Equal(-6.5, first.GetProperty("dsll_db_per_mm").GetDouble());
        Assert.Equal(200, first.GetProperty("ds11_db_per_mm").GetDouble());
    }

    [Fact]
    public void Sensitivity_csv_is_RFC_4180_with_one_ranked_record_per_sensitivity()
    {
        var w = new StringWriter();
        ToleranceSensitivityCsv.Write(Invented().Sensitivities, w);
        var rows = StrictCsv.Parse(w.ToString());
        Assert.Equal(["rank", "slot", "quantity", "dsll_db_per_mm", "ds11_db_per_mm"], rows[0]);
        Assert.Equal(["1", "8", "offset", "-6.5000", "200.0000"], rows[1]);
        Assert.Equal(["2", "1", "length", "1.2500", "-3.0000"], rows[2]);
    }

    [Fact]
    public void Summary_says_in_plain_words_how_many_builds_meet_the_target()
    {
        var lines = ToleranceSummary.Lines(Invented());
        Assert.Equal("With ±0.02 mm on offsets and lengths and σ 0.05 mm on the wall, 87.0 % of builds meet -26.0 dB (4 trials, seed 7).", lines[0]);
        Assert.Contains("slot 8 offset", lines[^1]);
    }

    [Fact]
    public void Plot_exports_with_the_house_font()
    {
        using var ms = new MemoryStream();
        PlotExport.Write(TolerancePlot.Build("demo", Invented().MonteCarlo), ms, "svg");
        string svg = System.Text.Encoding.UTF8.GetString(ms.ToArray());
        Assert.Contains("DejaVu Sans", svg);     // dotnet-recipe: the Skia SVG names the font, so missing fonts show
        Assert.Contains("Peak sidelobe (dB)", svg);
        Assert.Contains("Angle from broadside (deg)", svg);
    }
}
