using System.Text.Json;
using SlotArray.Cli;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>The tolerance command in-process on the README demo (moment-method slots), with few trials to stay fast.</summary>
public class ToleranceCommandTests
{
    private static (int Code, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = CommandLine.Run(args, o, e);
        return (code, o.ToString(), e.ToString());
    }

    private static string TempDir() => Path.Combine(Path.GetTempPath(), "slotarray-tol-" + Guid.NewGuid().ToString("N")[..8]);

    [Fact]
    public void Demo_writes_the_json_plot_and_csv_and_the_same_seed_gives_identical_files()
    {
        string d1 = TempDir(), d2 = TempDir();
        try
        {
            var (code, output, err) = Run("tolerance", RepoFiles.Demo, "-o", d1, "--trials", "120", "--seed", "5", "--json");
            Assert.True(code == ExitCodes.Ok, err);
            var doc = JsonDocument.Parse(output).RootElement;
            Assert.Equal(120, doc.GetProperty("trials").GetInt32());
            Assert.Equal(5, doc.GetProperty("seed").GetInt32());
            var psl = doc.GetProperty("peak_sidelobe_db");
            double p50 = psl.GetProperty("p50").GetDouble(), p90 = psl.GetProperty("p90").GetDouble(), p95 = psl.GetProperty("p95").GetDouble(), p99 = psl.GetProperty("p99").GetDouble();
            Assert.True(p50 <= p90 && p90 <= p95 && p95 <= p99, "percentiles are ordered");
            _ = psl.GetProperty("mean").GetDouble();
            double prob = doc.GetProperty("probability_meets_target").GetDouble();
            Assert.InRange(prob, 0, 1);
            _ = doc.GetProperty("gain_loss_db").GetProperty("mean").GetDouble();
            _ = doc.GetProperty("gain_loss_db").GetProperty("p95").GetDouble();
            Assert.True(doc.GetProperty("pointing_error_deg").GetProperty("p95").GetDouble() >= 0);
            Assert.True(doc.GetProperty("s11_db_at_design").GetProperty("p50").GetDouble() <= doc.GetProperty("s11_db_at_design").GetProperty("p95").GetDouble());
            Assert.True(doc.GetProperty("analytic_floor_db").GetDouble() < -20, "the random-error floor lies far below the beam");
            var sens = doc.GetProperty("sensitivities").EnumerateArray().ToList();
            Assert.Equal(16 * 4, sens.Count);                 // 16 slots × offset, length, position, width
            var first = sens[0];
            _ = first.GetProperty("slot").GetInt32();
            Assert.Contains(first.GetProperty("quantity").GetString(), new[] { "offset", "length", "position", "width" });
            Assert.True(Math.Abs(first.GetProperty("dsll_db_per_mm").GetDouble()) >= Math.Abs(sens[^1].GetProperty("dsll_db_per_mm").GetDouble()), "ranked");
            _ = first.GetProperty("ds11_db_per_mm").GetDouble();

            foreach (var f in new[] { "tolerance.json", "tolerance.png", "sensitivity.csv" }) Assert.True(File.Exists(Path.Combine(d1, f)), f);
            Assert.Equal(output, File.ReadAllText(Path.Combine(d1, "tolerance.json")));
            byte[] png = File.ReadAllBytes(Path.Combine(d1, "tolerance.png"));
            Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, png[..4]);   // PNG signature (ISO/IEC 15948)
            Assert.StartsWith("rank,slot,quantity,dsll_db_per_mm,ds11_db_per_mm\r\n", File.ReadAllText(Path.Combine(d1, "sensitivity.csv")));

            var (code2, text, err2) = Run("tolerance", RepoFiles.Demo, "-o", d2, "--trials", "120", "--seed", "5");
            Assert.True(code2 == ExitCodes.Ok, err2);
            Assert.Contains("% of builds meet -24.0 dB", text);   // requirements.sidelobes of the demo
            Assert.Equal(File.ReadAllBytes(Path.Combine(d1, "tolerance.json")), File.ReadAllBytes(Path.Combine(d2, "tolerance.json")));
            Assert.Equal(File.ReadAllBytes(Path.Combine(d1, "sensitivity.csv")), File.ReadAllBytes(Path.Combine(d2, "sensitivity.csv")));
        }
        finally
        {
            foreach (var d in new[] { d1, d2 }) if (Directory.Exists(d)) Directory.Delete(d, true);
        }
    }

    [Fact]
    public void A_spec_without_a_tolerance_block_is_bad_input()
    {
        var (code, _, err) = Run("tolerance", RepoFiles.Tube, "-o", TempDir());
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("no tolerance: block", err);
    }

    [Fact]
    public void Trials_out_of_range_is_a_parse_error()
    {
        var (code, _, err) = Run("tolerance", RepoFiles.Demo, "--trials", "0");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("--trials must be 1 to 1000000", err);
    }
}
