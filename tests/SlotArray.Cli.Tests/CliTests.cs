using System.Text.Json;
using SlotArray.Cli;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>The command line in-process, with captured writers: guides, check, help, version and the exit codes.</summary>
public class CliTests
{
    private static (int Code, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = CommandLine.Run(args, o, e);
        return (code, o.ToString(), e.ToString());
    }

    /// <summary>TE10 guide wavelength λg = λ/√(1 − (c/(2af))²) of an air-filled guide (Pozar, Microwave Engineering, 4th ed., Sec. 3.3).</summary>
    private static double GuideWavelengthMm(double aMeters, double f)
    {
        const double c = 299_792_458.0;   // exact, SI definition of the metre
        double lambda = c / f, fc = c / (2 * aMeters);
        return 1e3 * lambda / Math.Sqrt(1 - (fc / f) * (fc / f));
    }

    [Fact]
    public void Guides_json_lists_WR90_with_its_inside_dimensions()
    {
        var (code, output, _) = Run("guides", "--json");
        Assert.Equal(ExitCodes.Ok, code);
        var wr90 = JsonDocument.Parse(output).RootElement.EnumerateArray().Single(g => g.GetProperty("designation").GetString() == "WR-90");
        // WR-90 inside 0.900 × 0.400 in (EIA RS-261-B) = 22.86 × 10.16 mm
        Check.Absolute(22.86, wr90.GetProperty("a_mm").GetDouble(), 1e-9, "EIA RS-261-B, 0.900 in × 25.4");
        Check.Absolute(10.16, wr90.GetProperty("b_mm").GetDouble(), 1e-9, "EIA RS-261-B, 0.400 in × 25.4");
    }

    [Fact]
    public void Check_of_each_example_exits_0_and_prints_the_guide_wavelength()
    {
        // (path, inside a, design frequency) as written in each example
        foreach (var (path, a, f) in new[] { (RepoFiles.Demo, 0.02286, 9.41e9), (RepoFiles.Tube, 0.040, 5.8e9) })
        {
            var (code, output, err) = Run("check", path);
            Assert.True(code == ExitCodes.Ok, err);
            string expected = GuideWavelengthMm(a, f).ToString("F3", System.Globalization.CultureInfo.InvariantCulture);
            Assert.Contains($"λg               {expected} mm", output);
            Assert.Equal("", err);   // the examples raise no warning
        }
    }

    [Fact]
    public void Check_json_prints_one_object_with_unit_suffixed_keys()
    {
        var (code, output, _) = Run("check", RepoFiles.Demo, "--json");
        Assert.Equal(ExitCodes.Ok, code);
        var doc = JsonDocument.Parse(output).RootElement;
        Assert.Equal("harbour-surveillance-16", doc.GetProperty("name").GetString());
        Check.Relative(9.41e9, doc.GetProperty("frequency_hz").GetDouble(), 1e-12, "as written in the spec");
        Check.Relative(GuideWavelengthMm(0.02286, 9.41e9), doc.GetProperty("guide_wavelength_mm").GetDouble(), 1e-7, "Pozar Sec. 3.3 closed form; output rounded to 1e-6 mm");
        // TE10 cutoff of WR-90, c/(2a) = 6.557140 GHz (Pozar 2012, Sec. 3.3 check value)
        Check.Relative(6.557140e9, doc.GetProperty("cutoff_te10_hz").GetDouble(), 1e-6, "Pozar 2012, Sec. 3.3, 7 significant figures");
        Check.Relative(13.11428e9, doc.GetProperty("single_mode_band_hz")[1].GetDouble(), 1e-6, "TE20 cutoff c/a, Pozar Sec. 3.3, computed here");
        var guide = doc.GetProperty("guide");
        Assert.Equal("WR-90", guide.GetProperty("designation").GetString());
        Check.Absolute(1.27, guide.GetProperty("wall_mm").GetDouble(), 1e-9, "as written");
        Assert.Equal(16, doc.GetProperty("slots").GetProperty("count").GetInt32());
        Assert.Equal("standing-wave", doc.GetProperty("feed").GetProperty("type").GetString());
        Assert.Equal("taylor", doc.GetProperty("taper").GetProperty("type").GetString());
        Assert.Equal(0, doc.GetProperty("warnings").GetArrayLength());
    }

    [Fact]
    public void Check_of_a_wall_in_gigahertz_exits_2_and_names_the_line_and_column()
    {
        string[] lines = File.ReadAllLines(RepoFiles.Demo);
        int i = Array.IndexOf(lines, "  wall: 1.27 mm");
        Assert.True(i >= 0, "the demo spec has a '  wall: 1.27 mm' line");
        lines[i] = "  wall: 1.27 GHz";
        string dir = Directory.CreateTempSubdirectory("slotarray-cli-").FullName;
        string path = Path.Combine(dir, "harbour.yaml");
        try
        {
            File.WriteAllLines(path, lines);
            var (code, output, err) = Run("check", path);
            Assert.Equal(ExitCodes.BadInput, code);
            Assert.Equal("", output);
            Assert.Contains($"{path}:{i + 1}:9: 'wall' needs a length such as '1.27 mm'", err);
        }
        finally
        {
            Directory.Delete(dir, true);
        }
    }

    [Fact]
    public void Check_of_a_missing_file_exits_2_with_one_line()
    {
        var (code, _, err) = Run("check", Path.Combine(RepoFiles.Root, "arrays", "no-such-spec.yaml"));
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Single(err.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("not found", err);
    }

    [Fact]
    public void Help_exits_0_and_lists_the_commands()
    {
        var (code, output, _) = Run("--help");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Contains("check", output);
        Assert.Contains("guides", output);
        Assert.Equal(ExitCodes.Ok, Run("check", "--help").Code);
    }

    [Fact]
    public void Version_exits_0() => Assert.Equal(ExitCodes.Ok, Run("--version").Code);

    [Fact]
    public void Unknown_option_exits_2()
    {
        Assert.Equal(ExitCodes.BadInput, Run("guides", "--bogus").Code);
        Assert.Equal(ExitCodes.BadInput, Run("check", RepoFiles.Demo, "--bogus").Code);
    }

    [Fact]
    public void Check_without_a_spec_exits_2() => Assert.Equal(ExitCodes.BadInput, Run("check").Code);
}
