using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// <c>design</c> with <c>coupling: mutual</c> on the demo spec: Elliott's procedure converges, the iterations are
/// printed, and the coupled and isolated-slot figures stand side by side (project issue 8, "done when").
/// </summary>
public class DesignMutualCouplingTests
{
    [Fact]
    public void Mutual_coupling_on_the_demo_converges_prints_the_iterations_and_both_designs()
    {
        string yaml = File.ReadAllText(RepoFiles.Demo).Replace("coupling: none", "coupling: mutual");
        Assert.Contains("coupling: mutual", yaml);
        var (output, summary, outDir) = Design("mutual", yaml);
        Assert.Contains("Mutual coupling (Elliott's design procedure)", summary);
        using var json = System.Text.Json.JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, "design.json")));
        var mc = json.RootElement.GetProperty("mutual_coupling");
        Assert.True(mc.GetProperty("coupled_design").GetProperty("s11_db_at_design").GetDouble() < -30);
        Assert.True(mc.GetProperty("iterations").GetArrayLength() >= 1);
        // The coupled design is matched under the coupled analysis; the isolated-slot design is not
        // (self-consistency, issue 8: S11 below −30 dB at the design frequency).
        var line = output.Split('\n').First(l => l.TrimStart().StartsWith("S11 at design", StringComparison.Ordinal));
        var numbers = line.Split(' ', StringSplitOptions.RemoveEmptyEntries).Where(t => double.TryParse(t, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out _))
            .Select(t => double.Parse(t, System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        Assert.True(numbers[0] < -30, line);
        Assert.True(numbers[1] > numbers[0], line);
    }

    [Fact]
    public void Mutual_coupling_with_a_travelling_wave_feed_prints_the_iterations_and_both_designs()
    {
        // The demo's 16 longitudinal slots fed as a travelling wave (0.45 guide-wavelength spacing, 20 % to the load):
        // design runs the coupled travelling-wave designer (issue 8 item 4) and writes its section of the summary.
        string yaml = File.ReadAllText(RepoFiles.Demo).Replace("coupling: none", "coupling: mutual")
            .Replace("  type: standing-wave\n  spacing: 0.5 guide-wavelength\n  position: end\n  short: 0.25 guide-wavelength",
                "  type: travelling-wave\n  spacing: 0.45 guide-wavelength\n  load: 20 %");
        Assert.Contains("load: 20 %", yaml);
        // Fed this way the demo misses its -24 dB sidelobe requirement at the top of the band (about -23.1 dB at
        // 9.47 GHz): the design is still written, the verdict FAILs and the exit code is 4.
        var (output, summary, _) = Design("mutual-tw", yaml, ExitCodes.RequirementsNotMet);
        Assert.Contains("FAIL  peak sidelobe, worst over the analysis band", output);
        Assert.Contains("travelling-wave design with mutual coupling", output);
        Assert.Contains("Mutual coupling (travelling-wave design on the coupled network)", summary);
    }

    /// <summary>Runs design on the spec text; checks its exit code and that it printed iterations and both designs; returns the console output, summary.md and the output folder.</summary>
    private static (string Output, string Summary, string OutDir) Design(string name, string yaml, int expectedCode = ExitCodes.Ok)
    {
        string spec = DesignRuns.Spec(name, yaml);
        string outDir = Path.Combine(DesignRuns.TempFolder(name + "-out"), "out");
        var (code, output, err) = DesignRuns.Run("design", spec, "-o", outDir, "--cache-dir", DesignRuns.TempFolder(name + "-cache"));
        Assert.True(code == expectedCode, err);
        Assert.Contains("iteration  1:", output);
        Assert.Contains("isolated-slot design", output);
        return (output, File.ReadAllText(Path.Combine(outDir, "summary.md")), outDir);
    }
}
