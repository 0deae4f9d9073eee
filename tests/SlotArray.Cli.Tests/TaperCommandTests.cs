using System.Text.Json;
using SlotArray.Cli;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary><c>slotarray taper</c> run in-process.</summary>
public class TaperCommandTests
{
    private static (int Code, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = CommandLine.Run(args, o, e);
        return (code, o.ToString(), e.ToString());
    }

    /// <summary>scipy 1.10.1: scipy.signal.windows.taylor(16, 4, 30, norm=False) / max (computed for this test).</summary>
    private static readonly double[] Scipy16 =
        [0.2538818382676843, 0.324244411374622, 0.4463443880694455, 0.5924332184988346, 0.736783576349914, 0.8608073088571035, 0.9517025248152619, 1.0];

    [Fact]
    public void Taylor_16_nbar_4_minus_30_dB_json_gives_the_classical_sampled_weights()
    {
        var (code, output, err) = Run("taper", "--type", "taylor", "--count", "16", "--sidelobes", "-30", "--nbar", "4", "--json");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Equal("", err);
        using var doc = JsonDocument.Parse(output);
        var r = doc.RootElement;
        Assert.Equal("taylor", r.GetProperty("type").GetString());
        Assert.Equal(16, r.GetProperty("count").GetInt32());
        Assert.Equal(0.5, r.GetProperty("spacing_wavelengths").GetDouble());
        var w = r.GetProperty("weights").EnumerateArray().Select(x => x.GetDouble()).ToArray();
        Assert.Equal(16, w.Length);
        for (int i = 0; i < 8; i++)
        {
            Check.Absolute(Scipy16[i], w[i], 1e-9, "scipy.signal.windows.taylor(16, 4, 30, norm=False)/max");
            Check.Absolute(Scipy16[i], w[15 - i], 1e-9, "scipy (symmetric)");
        }
        Check.Absolute(-30.05, r.GetProperty("peak_sidelobe_db").GetDouble(), 0.006, "Taylor 1955 sampled, numpy [N]: −30.05 dB");
        Check.Relative(0.85339, r.GetProperty("taper_efficiency").GetDouble(), 6e-6, "Taylor 1955 sampled, numpy [N]");
        Assert.True(r.GetProperty("first_sidelobe_db").GetDouble() < 0);
        Assert.True(r.GetProperty("hpbw_deg").GetDouble() > 0);
        Assert.True(r.GetProperty("null_to_null_deg").GetDouble() > r.GetProperty("hpbw_deg").GetDouble());
        // Isotropic directivity of a λ/2 array is N·η_t exactly (the sinc cross terms vanish; IEEE Std 145-2013 directivity).
        Check.Absolute(10 * Math.Log10(16 * 0.853385875), r.GetProperty("directivity_dbi").GetDouble(), 1e-6, "D = N η_t at λ/2");
        Assert.Equal(0, r.GetProperty("warnings").GetArrayLength());
    }

    [Theory]
    [InlineData("uniform")]
    [InlineData("chebyshev")]
    [InlineData("taylor")]
    [InlineData("villeneuve")]
    [InlineData("taylor-one-parameter")]
    [InlineData("cosine-pedestal")]
    [InlineData("bayliss")]
    public void Every_type_runs_with_text_and_json(string type)
    {
        var (code, text, _) = Run("taper", "--type", type, "--count", "24", "--sidelobes", "-30dB", "--nbar", "5");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Contains("directivity", text);
        (code, var json, _) = Run("taper", "--type", type, "--count", "24", "--sidelobes", "-30", "--nbar", "5", "--spacing", "0.7", "--json");
        Assert.Equal(ExitCodes.Ok, code);
        using var doc = JsonDocument.Parse(json);
        var r = doc.RootElement;
        Assert.Equal(type, r.GetProperty("type").GetString());
        Assert.Equal(0.7, r.GetProperty("spacing_wavelengths").GetDouble());
        Assert.True(r.GetProperty("peak_sidelobe_db").GetDouble() < 0);
        foreach (var key in new[] { "first_sidelobe_db", "hpbw_deg", "null_to_null_deg", "taper_efficiency", "directivity_dbi", "warnings" })
            Assert.True(r.TryGetProperty(key, out _), key);
        if (type == "bayliss")
        {
            Assert.True(r.GetProperty("null_depth_db").GetDouble() < -200);
            Assert.True(r.GetProperty("difference_peak_sidelobe_db").GetDouble() < -25);
        }
    }

    [Fact]
    public void Given_weights_run()
    {
        var (code, json, _) = Run("taper", "--type", "given", "--count", "4", "--weights", "1,2,2,1", "--json");
        Assert.Equal(ExitCodes.Ok, code);
        using var doc = JsonDocument.Parse(json);
        Assert.Equal([0.5, 1, 1, 0.5], doc.RootElement.GetProperty("weights").EnumerateArray().Select(x => x.GetDouble()).ToArray());
    }

    [Theory]
    [InlineData("--type", "hamming", "--count", "16")]
    [InlineData("--type", "taylor", "--count", "16", "--nbar", "1")]
    [InlineData("--type", "taylor", "--count", "16", "--sidelobes", "30")]
    [InlineData("--type", "taylor", "--count", "1")]
    [InlineData("--type", "taylor", "--count", "16", "--sidelobes", "abc")]
    [InlineData("--type", "given", "--count", "3", "--weights", "1,2")]
    [InlineData("--type", "taylor", "--count", "16", "--spacing", "-1")]
    [InlineData("--type", "taylor", "--count", "16", "--plot", "x.gif")]
    [InlineData("--type", "taylor")]
    public void Invalid_input_exits_2_with_one_line(params string[] args)
    {
        var (code, _, err) = Run(["taper", .. args]);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.False(string.IsNullOrWhiteSpace(err));
        Assert.DoesNotContain("   at ", err);
    }

    [Fact]
    public void Plot_writes_the_pattern_and_the_taper_as_svg()
    {
        string dir = Directory.CreateTempSubdirectory("slotarray-taper-").FullName;
        try
        {
            string path = Path.Combine(dir, "pattern.svg");
            var (code, _, _) = Run("taper", "--type", "chebyshev", "--count", "12", "--sidelobes", "-25", "--plot", path);
            Assert.Equal(ExitCodes.Ok, code);
            string svg = File.ReadAllText(path);
            Assert.Contains("font-family=\"DejaVu Sans\"", svg);
            Assert.True(File.Exists(Path.Combine(dir, "pattern-taper.svg")));
        }
        finally { Directory.Delete(dir, true); }
    }
}
