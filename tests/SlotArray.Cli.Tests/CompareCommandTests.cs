using System.Globalization;
using Xunit;

namespace SlotArray.Cli.Tests;

/// <summary>
/// compare end to end: a design, synthetic measurements of it with a known error (synthesise), and the diagnosis. The
/// reference is the injected error itself (closed loop); the refusals follow from the design (one port, its band).
/// </summary>
public class CompareCommandTests(CompareCommandTests.DesignedPlate plate) : IClassFixture<CompareCommandTests.DesignedPlate>
{
    /// <summary>One design folder shared by the tests (designing it is the slow part).</summary>
    public sealed class DesignedPlate
    {
        public DesignedPlate() => (Design, Root) = Designed();

        public string Design { get; }

        public string Root { get; }
    }

    private const string Yaml = """
        spec: 1
        name: compare-test-8
        frequency: 9.375 GHz
        band: [9.30 GHz, 9.45 GHz]
        guide: {size: WR-90, wall: 1.27 mm, metal: aluminium}
        slots: {type: longitudinal, count: 8, width: 1.6 mm, model: stevenson}
        feed: {type: standing-wave}
        taper: {type: uniform}
        """;

    private static (string Design, string Root) Designed()
    {
        string spec = DesignRuns.Spec("compare", Yaml);
        string root = Path.GetDirectoryName(spec)!;
        string design = Path.Combine(root, "design");
        var (code, _, err) = DesignRuns.Run("design", spec, "-o", design, "--no-cache");
        Assert.True(code == 0, err);
        Assert.True(File.Exists(Path.Combine(design, "spec.yaml")), "design writes spec.yaml for compare");
        return (design, root);
    }

    [Fact]
    public void A_synthetic_prototype_with_a_length_error_is_diagnosed_and_fixed()
    {
        var (design, root) = (plate.Design, plate.Root);
        string meas = Path.Combine(root, "meas");
        var (c1, o1, e1) = DesignRuns.Run("synthesise", design, "-o", meas, "--length-error", "0.5%", "--no-cache", "--seed", "2");
        Assert.True(c1 == 0, e1);
        Assert.Contains("SYNTHETIC", File.ReadAllText(Path.Combine(meas, "measured.s1p")), StringComparison.Ordinal);
        string outDir = Path.Combine(root, "cmp");
        var (code, output, err) = DesignRuns.Run("compare", design, Path.Combine(meas, "measured.s1p"), Path.Combine(meas, "cut-1.csv"), "-o", outDir, "--no-cache");
        Assert.True(code == 0, err);
        Assert.Contains("reference resistance 50", output, StringComparison.Ordinal);
        // "Uniform length error +0.5xx % ± ..." within ±0.1 % of the injected 0.5 % (the issue's criterion for the frequency offset).
        var m = System.Text.RegularExpressions.Regex.Match(output, @"Uniform length error ([+-][0-9.]+) %");
        Assert.True(m.Success, output);
        double found = double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
        Assert.InRange(found, 0.4, 0.6);
        foreach (string f in new[] { "comparison.md", "trim.csv", "return-loss.png", "vswr.png", "cut-1.png", "next-plate/cutlist.csv", "next-plate/layout.svg" })
            Assert.True(File.Exists(Path.Combine(outDir, f)), f);
        Assert.Equal(9, File.ReadAllLines(Path.Combine(outDir, "trim.csv")).Count(l => !l.StartsWith('#')));   // header + 8 slots
        NextPlateIsTheNextRevisionWithItsChangesFlagged(design, Path.Combine(outDir, "next-plate"));
    }

    /// <summary>
    /// Issue 13: the next plate's cut list is revision B of the cut plate's drawing (A), and its <c>changed</c> column
    /// flags exactly the rows whose printed dimensions differ from the cut plate's cut list (compared here value by value).
    /// </summary>
    private static void NextPlateIsTheNextRevisionWithItsChangesFlagged(string design, string nextPlate)
    {
        string[] before = File.ReadAllLines(Path.Combine(design, "cutlist.csv")), after = File.ReadAllLines(Path.Combine(nextPlate, "cutlist.csv"));
        Assert.Contains("; revision A;", before[1], StringComparison.Ordinal);
        Assert.Contains("; revision B;", after[1], StringComparison.Ordinal);
        using (var doc = System.Text.Json.JsonDocument.Parse(File.ReadAllText(Path.Combine(nextPlate, "design.json"))))
            Assert.Equal("B", doc.RootElement.GetProperty("fabrication").GetProperty("revision").GetString());
        static Dictionary<string, string[]> Rows(string[] lines)
        {
            var data = lines.Where(l => !l.StartsWith('#') && !l.StartsWith("\"#", StringComparison.Ordinal)).ToList();
            return data.Skip(1).Select(l => l.Split(',')).Where(f => f[0] == "slot").ToDictionary(f => f[1], f => f);
        }
        var header = after.First(l => l.StartsWith("feature,", StringComparison.Ordinal)).Split(',');
        int changed = Array.IndexOf(header, "changed");
        var old = Rows(before);
        var now = Rows(after);
        int flagged = 0;
        foreach (var (slot, row) in now)
        {
            bool differs = !row.Take(changed).SequenceEqual(old[slot].Take(changed));
            bool yes = row[changed] == "yes";
            if (yes) flagged++;
            // A printed difference must be flagged; a flagged row may differ below the printed micrometre (threshold 0.5 µm).
            Assert.True(!differs || yes, $"slot {slot} moved but is not flagged: {string.Join(",", old[slot])} -> {string.Join(",", row)}");
        }
        Assert.True(flagged > 0, "the corrected model moves at least one slot");
        var count = System.Text.RegularExpressions.Regex.Match(after.First(l => l.StartsWith("# changed:", StringComparison.Ordinal)), @"\((\d+) changed\)");
        Assert.True(count.Success && int.Parse(count.Groups[1].Value, CultureInfo.InvariantCulture) >= flagged, "the header counts the changed rows");
    }

    [Fact]
    public void A_malformed_file_exits_2_with_file_and_line_and_another_design_is_refused()
    {
        var (design, root) = (plate.Design, plate.Root);
        string bad = Path.Combine(root, "bad.s1p");
        File.WriteAllLines(bad, ["# GHz S MA R 50", "9.3 0.1 10", "9.4 0.1 oops"]);
        var (code, _, err) = DesignRuns.Run("compare", design, bad, "--no-cache");
        Assert.Equal(2, code);
        Assert.Contains("bad.s1p:3: 'oops' is not a number", err, StringComparison.Ordinal);
        string other = Path.Combine(root, "other.s1p");
        File.WriteAllLines(other, ["# GHz S MA R 50", "10.0 0.1 10", "10.1 0.1 10", "10.2 0.1 10", "10.3 0.1 10", "10.4 0.1 10"]);
        (code, _, err) = DesignRuns.Run("compare", design, other, "--no-cache");
        Assert.Equal(2, code);
        Assert.Contains("refused", err, StringComparison.Ordinal);
        Assert.Contains("does not contain the design frequency", err, StringComparison.Ordinal);
    }
}
