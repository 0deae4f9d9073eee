using System.Numerics;
using System.Text.Json;
using SlotArray.Cli;

namespace SlotArray.Cli.Tests;

/// <summary>
/// <c>design</c> and <c>check</c> of a planar spec end to end: the files, design.json's slots against a pattern computed here
/// from them alone, the match, and the spec errors that refuse planar keys where they do not apply.
/// </summary>
public class PlanarDesignCommandTests
{
    private static string Planar(string tag, string slots = "6", string array = "{type: planar, branches: 4, pitch: auto, common_wall: 1 mm}",
        string taper = "{type: taylor, sidelobes: -20 dB, nbar: 3}", string extra = "taper_across: {type: taylor, sidelobes: -20 dB, nbar: 3}\n") =>
        DesignRuns.Spec(tag, $"""
            spec: 1
            name: {tag}
            frequency: 9.375 GHz
            band: [9.32 GHz, 9.43 GHz]
            guide: {"{"}size: WR-90, wall: 1.27 mm, metal: aluminium{"}"}
            slots: {"{"}type: longitudinal, count: {slots}, width: 1.6 mm, model: stevenson{"}"}
            feed: {"{"}type: standing-wave, position: centre{"}"}
            array: {array}
            taper: {taper}
            {extra}coupling: mutual
            """);

    /// <summary>
    /// A 4 × 6 coupled separable design: exit 0, every file written, S11 at f0 ≤ −20 dB, and the peak sidelobe of each principal
    /// cut recomputed here from design.json's slots (x_m, y_m, excitation; array factor times the half-wave slot's element
    /// pattern, Balanis 2005 [M]; and the array factor alone) equal to the tool's figures within 0.05 dB.
    /// </summary>
    [Fact]
    public void Planar_design_writes_its_files_and_its_slots_reproduce_its_pattern()
    {
        string spec = Planar("planar-cli");
        string dir = Path.Combine(DesignRuns.TempFolder("planar"), "out");
        var (code, output, err) = DesignRuns.Run("design", spec, "-o", dir);
        Assert.True(code == ExitCodes.Ok, err);
        Assert.Contains("planar, 24 slots on 4 branches", output, StringComparison.Ordinal);
        foreach (string f in new[] { "design.json", "summary.md", "input.s1p", "cutlist-branch-01.csv", "cutlist-branch-04.csv", "cutlist-feed.csv", "plate.svg", "plate.dxf", "feed-wall.dxf", "pattern-uv.png", "pattern-cuts.png", "sweep.png" })
            Assert.True(File.Exists(Path.Combine(dir, f)), f);
        var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(dir, "design.json"))).RootElement;
        var slots = json.GetProperty("slots").EnumerateArray().ToList();
        Assert.Equal(24, slots.Count);
        Assert.Equal(4, json.GetProperty("coupling_slots").GetArrayLength());
        var fig = json.GetProperty("figures");
        Assert.True(fig.GetProperty("s11_db_at_design").GetDouble() <= -20);
        double k = 2 * Math.PI * json.GetProperty("frequency_hz").GetDouble() / 299792458.0;
        var x = slots.Select(s => s.GetProperty("x_m").GetDouble()).ToArray();
        var y = slots.Select(s => s.GetProperty("y_m").GetDouble()).ToArray();
        var e = slots.Select(s => new Complex(s.GetProperty("excitation_re").GetDouble(), s.GetProperty("excitation_im").GetDouble())).ToArray();
        Assert.All(slots, s => Assert.InRange(s.GetProperty("branch").GetInt32(), 1, 4));
        Assert.Equal(fig.GetProperty("h_plane_peak_sidelobe_db").GetDouble(), PeakSidelobe(x, y, e, k, 0), 0.05);
        Assert.Equal(fig.GetProperty("e_plane_peak_sidelobe_db").GetDouble(), PeakSidelobe(x, y, e, k, Math.PI / 2), 0.05);
        Assert.Equal(fig.GetProperty("h_plane_array_factor_peak_sidelobe_db").GetDouble(), PeakSidelobe(x, y, e, k, 0, element: false), 0.05);
        Assert.Equal(fig.GetProperty("e_plane_array_factor_peak_sidelobe_db").GetDouble(), PeakSidelobe(x, y, e, k, Math.PI / 2, element: false), 0.05);
        // A second run into the same folder replaces it (the folder holds only this tool's files) and writes the same design.json.
        string first = File.ReadAllText(Path.Combine(dir, "design.json"));
        var again = DesignRuns.Run("design", spec, "-o", dir);
        Assert.True(again.Code == ExitCodes.Ok, again.Err);
        Assert.Equal(first, File.ReadAllText(Path.Combine(dir, "design.json")));
    }

    /// <summary>The blocks a planar design does not evaluate yet are named on stderr rather than passed over in silence; the design still exits 0.</summary>
    [Fact]
    public void Blocks_not_yet_evaluated_for_planar_arrays_are_named()
    {
        string spec = Planar("planar-unused", extra: "taper_across: {type: taylor, sidelobes: -20 dB, nbar: 3}\nrequirements: {sidelobes: -19 dB}\ntolerance: {offset: 0.02 mm}\n");
        string dir = Path.Combine(DesignRuns.TempFolder("planar-unused"), "out");
        var (code, _, err) = DesignRuns.Run("design", spec, "-o", dir);
        Assert.True(code == ExitCodes.Ok, err);
        Assert.Contains("not evaluated for planar arrays yet: tolerance (Monte Carlo), requirements (pass/fail verdicts)", err, StringComparison.Ordinal);
    }

    /// <summary>
    /// 8 branches × 10 slots, separable Taylor −25/−25 dB n̄ 5: at a 28 mm pitch (λ = 31.98 mm at 9.375 GHz) the across-branch
    /// grating lobe's skirt reaches visible space (for equal weights the limit would be λ(1 − 1/8) = 27.98 mm, Balanis 2016,
    /// Sec. 6.3, from memory; the taper widens the lobe, so the limit is lower), so <c>check</c> and <c>design</c> warn, naming
    /// the plane, the pitch and a smaller one, and <c>design</c> names the y-z sidelobe above the asked level; at the default
    /// (auto) pitch neither warns. Both designs exit 0 (no requirements, so no verdict).
    /// </summary>
    [Fact]
    public void A_pitch_that_lets_a_grating_lobe_skirt_into_real_space_is_named()
    {
        const string taylor = "{type: taylor, sidelobes: -25 dB, nbar: 5}";
        string wide = Planar("planar-skirt", "10", "{type: planar, branches: 8, pitch: 28 mm, common_wall: 1 mm}", taylor, $"taper_across: {taylor}\n");
        string fine = Planar("planar-noskirt", "10", "{type: planar, branches: 8, pitch: auto, common_wall: 1 mm}", taylor, $"taper_across: {taylor}\n");
        static (string Check, string Err) CheckAndDesign(string spec, string tag)
        {
            var (checkCode, checkOut, _) = DesignRuns.Run("check", spec);
            Assert.Equal(ExitCodes.Ok, checkCode);
            Assert.Contains("grating skirts", checkOut, StringComparison.Ordinal);
            var (code, _, err) = DesignRuns.Run("design", spec, "-o", Path.Combine(DesignRuns.TempFolder(tag), "out"));
            Assert.True(code == ExitCodes.Ok, err);
            return (checkOut, err);
        }
        const string named = "y-z plane (across the branches): with the branch pitch 28 mm a grating lobe's main lobe reaches visible space";
        var (checkOut, err) = CheckAndDesign(wide, "planar-skirt");
        Assert.Contains(named, checkOut, StringComparison.Ordinal);
        Assert.Contains(named, err, StringComparison.Ordinal);
        Assert.Matches(@"y-z plane \(across the branches\): peak sidelobe -1\d\.\d+ dB over visible space is more than 1.5 dB above the asked -25 dB", err);
        Assert.DoesNotContain("x-z plane (along the branches)", err, StringComparison.Ordinal);
        var (fineOut, fineErr) = CheckAndDesign(fine, "planar-noskirt");
        Assert.DoesNotContain("main lobe reaches visible space", fineOut + fineErr, StringComparison.Ordinal);
        Assert.DoesNotContain("over visible space is more than", fineErr, StringComparison.Ordinal);
    }

    /// <summary>Highest lobe outside the main beam (walked down to its first minima) of the cut at azimuth φ, dB; with the slot's element pattern or the array factor alone.</summary>
    private static double PeakSidelobe(double[] x, double[] y, Complex[] e, double k, double phi, bool element = true)
    {
        int n = 18001;
        var p = new double[n];
        for (int i = 0; i < n; i++)
        {
            double th = -Math.PI / 2 + Math.PI * i / (n - 1), u = Math.Sin(th) * Math.Cos(phi), v = Math.Sin(th) * Math.Sin(phi);
            Complex af = 0;
            for (int m = 0; m < x.Length; m++) af += e[m] * Complex.Exp(new Complex(0, k * (x[m] * u + y[m] * v)));
            double el = !element ? 1 : 1 - u * u < 1e-12 ? 0 : Math.Cos(Math.PI / 2 * u) / Math.Sqrt(1 - u * u);
            p[i] = 20 * Math.Log10(Math.Max(af.Magnitude * el, 1e-300));
        }
        int peak = Array.IndexOf(p, p.Max()), l = peak, r = peak;
        while (l > 0 && p[l - 1] < p[l]) l--;
        while (r < n - 1 && p[r + 1] < p[r]) r++;
        return Math.Max(p[..(l + 1)].Max(), p[r..].Max()) - p[peak];
    }

    /// <summary>check reports the pitch the feed guide needs against the branch guide and the grating-lobe-free scan in both planes.</summary>
    [Fact]
    public void Check_reports_the_pitch_and_the_grating_lobe_region()
    {
        var (code, output, err) = DesignRuns.Run("check", Planar("planar-check"));
        Assert.True(code == ExitCodes.Ok, err);
        Assert.Contains("the feed guide's λg/2 requires 23.860 mm; branch guide outer width 25.400 mm", output, StringComparison.Ordinal);
        Assert.Contains("grating lobes", output, StringComparison.Ordinal);
    }

    /// <summary>Planar keys where they do not apply, and an odd slot count, are refused at their line and column (exit 2).</summary>
    [Theory]
    [InlineData("7", "{type: planar, branches: 4}", "{type: taylor, sidelobes: -20 dB}", "", "must be even")]
    [InlineData("6", "{type: linear}", "{type: taylor, sidelobes: -20 dB}", "taper_across: {type: uniform}\n", "'taper_across' applies to planar arrays only")]
    [InlineData("6", "{type: linear, branches: 4}", "{type: taylor, sidelobes: -20 dB}", "", "'branches' applies to planar arrays only")]
    [InlineData("6", "{type: planar, branches: 4}", "{type: circular-taylor, sidelobes: -30 dB}", "", "needs 'array.outline: circle'")]
    public void Planar_keys_where_they_do_not_apply_are_refused(string slots, string array, string taper, string extra, string message)
    {
        var (code, _, err) = DesignRuns.Run("check", Planar("planar-bad", slots, array, taper, extra));
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(message, err, StringComparison.Ordinal);
        Assert.Matches(@"planar-bad[^:]*\.yaml:\d+:\d+:", err);
    }
}
