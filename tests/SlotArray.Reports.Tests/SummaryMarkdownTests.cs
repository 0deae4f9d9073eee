using System.Globalization;

namespace SlotArray.Reports.Tests;

public class SummaryMarkdownTests
{
    private static string Text(Model.DesignReport r)
    {
        var w = new StringWriter(CultureInfo.InvariantCulture);
        SummaryMarkdown.Write(r, w);
        return w.ToString();
    }

    [Fact]
    public void Summary_prints_the_standard_caution_when_the_model_has_none()
    {
        string md = Text(ReportFixture.Eight());
        Assert.Contains("## Cautions", md);
        Assert.Contains("RF exposure and high transmitter power can hurt; local regulations and licensed practice govern", md);
    }

    [Fact]
    public void Summary_prints_the_models_cautions_instead_when_given()
    {
        var r = ReportFixture.Eight() with { Cautions = ["Power density on the beam axis falls to 10 W/m² at 12 m.", "Keep clear of the aperture."] };
        string md = Text(r);
        Assert.Contains("Power density on the beam axis falls to 10 W/m² at 12 m.", md);
        Assert.Contains("Keep clear of the aperture.", md);
        Assert.DoesNotContain(SummaryMarkdown.StandardCaution, md);
    }

    // Issue 13: the verdict and any safety exceedance come first, before the inputs.
    [Fact]
    public void Summary_opens_with_the_verdict_then_the_unmet_requirements_and_safety_exceedances()
    {
        var r = ReportFixture.Eight() with { SafetyExceedances = ["Peak power 250 kW against a derated waveguide handling of 99 kW: exceeds it by 4.0 dB."] };
        var lines = Text(r).Split('\n');
        Assert.Equal("**Requirements: FAIL** (1 of 2 met).", lines[2]);
        Assert.Equal("- not met: VSWR over the band: required ≤ 1.5, achieved 1.71 at 9.450 GHz", lines[3]);
        Assert.StartsWith("- **SAFETY LIMIT EXCEEDED**: Peak power 250 kW", lines[4]);
        Assert.True(Array.IndexOf(lines, "## Inputs") > 4);
        var passing = ReportFixture.Eight() with { Requirements = [ReportFixture.Eight().Requirements[0]] };
        Assert.Equal("**Requirements: PASS** (1 of 1 met).", Text(passing).Split('\n')[2]);
        Assert.Equal("**Requirements: none given** (no pass/fail verdict).", Text(ReportFixture.Eight() with { Requirements = [] }).Split('\n')[2]);
    }

    [Fact]
    public void Summary_gives_the_eirp_where_a_transmitter_is_given()
    {
        // EIRP = P G (IEEE Std 145-2013 definition, from memory): 25 kW and 15.3 dBi → 10 log10(25000) + 15.3 = 59.279 dBW.
        var r = ReportFixture.Eight() with { Eirp = new Model.EirpReport { PeakW = 25e3 * Math.Pow(10, 1.53), AverageW = 20 * Math.Pow(10, 1.53) } };
        string md = Text(r);
        Assert.Contains($"| EIRP on the beam axis at the peak transmitter power (P G) | {(10 * Math.Log10(25e3) + 15.3).ToString("0.00", CultureInfo.InvariantCulture)} | dBW (847.110 kW) |", md);
        Assert.Contains($"| EIRP on the beam axis at the average transmitter power (P G) | {(10 * Math.Log10(20) + 15.3).ToString("0.00", CultureInfo.InvariantCulture)} | dBW (677.688 W) |", md);
        Assert.DoesNotContain("EIRP", Text(ReportFixture.Eight()));
    }

    [Fact]
    public void Summary_names_datum_A_and_the_tube_length_of_the_fabrication_plan()
    {
        var r = ReportFixture.Eight();
        string md = Text(r);
        Assert.Contains($"| datum A | {r.Fabrication!.Datum} |", md);
        Assert.Contains($"| tube length, datum A (the tube's machined end face) to its far end | {(r.Fabrication.TubeLength.Meters * 1e3).ToString("0.000", CultureInfo.InvariantCulture)} | mm |", md);
        Assert.Contains("| datum A to z = 0 (cutlist.csv, layout and DXF positions are z + this) | 1.270 | mm |", md);   // the end-short plate, as thick as the 1.27 mm wall
    }

    [Fact]
    public void Summary_has_one_pass_fail_line_per_requirement()
    {
        var r = ReportFixture.Eight();
        string md = Text(r);
        Assert.Contains("- **PASS**: peak sidelobe at the design frequency: required ≤ -24.0 dB, achieved -24.8 dB", md);
        Assert.Contains("- **FAIL**: VSWR over the band: required ≤ 1.5, achieved 1.71 at 9.450 GHz", md);
        Assert.Equal(2, md.Split('\n').Count(l => l.StartsWith("- **PASS**") || l.StartsWith("- **FAIL**")));
    }

    [Fact]
    public void Summary_lists_inputs_figures_slots_and_warnings_with_units()
    {
        var r = ReportFixture.Eight();
        string md = Text(r);
        Assert.Contains("| guide | WR-90, custom anodised: a = 22.860 mm, b = 10.160 mm |", md);
        Assert.Contains("| band | 9.3000 to 9.4500 GHz |", md);
        Assert.Contains("| taper | Dolph-Chebyshev, -25 dB |", md);
        Assert.Contains("| half-power beamwidth | 8.10 | deg |", md);
        Assert.Contains("| bandwidth with VSWR ≤ 2 | 183.0 | MHz |", md);
        Assert.Contains("- mutual coupling is not in this model yet", md);
        Assert.Contains("G0", md);
        // one table row per slot: rows starting "| n |"
        for (int i = 1; i <= 8; i++) Assert.Contains($"\n| {i} | ", md);
        Assert.DoesNotContain('\r', md);
    }

    [Fact]
    public void Tolerance_section_appears_only_with_lines()
    {
        Assert.DoesNotContain("## Tolerance", Text(ReportFixture.Eight()));
        string md = Text(ReportFixture.Eight() with { Tolerance = ["peak sidelobe 95th percentile -22.9 dB (2000 trials)"] });
        Assert.Contains("## Tolerance", md);
        Assert.Contains("- peak sidelobe 95th percentile -22.9 dB (2000 trials)", md);
    }
}
