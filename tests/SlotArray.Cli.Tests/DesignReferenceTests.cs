using System.Numerics;
using System.Text.Json;
using SlotArray.Cli;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary><c>design</c> against the idealised bandwidth of an end-fed resonant array (Elliott 1981, Ch. 8; the WR-90 10-slot geometry is checked through the report builder in SlotArray.Reports.Tests).</summary>
public class DesignReferenceTests
{
    private static JsonElement Design(string tag, string yaml)
    {
        string spec = DesignRuns.Spec(tag, yaml);
        string outDir = Path.Combine(Path.GetDirectoryName(spec)!, "out");
        var (code, _, err) = DesignRuns.Run("design", spec, "-o", outDir, "--no-cache");
        Assert.True(code == ExitCodes.Ok, err);
        return JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, "design.json"))).RootElement;
    }

    /// <summary>
    /// The 32-slot uniform end-fed array's VSWR ≤ 2 bandwidth with real (moment-method, aluminium WR-90) slots, against the
    /// idealised line model of Elliott 1981, Ch. 8 (frequency-independent g = 1/N, WR-90 dispersion): 1.05 % at N = 32
    /// (≈ 33.7 %/N). Finding: the real slots WIDEN the band, to about 1.25 % (the network helper found 1.248 %), instead of
    /// narrowing it as the real-slot remark expects. Why: a radiating slot's susceptance falls through zero as the frequency rises
    /// (Im y goes from capacitive to inductive as the slot grows electrically longer, Elliott 1981, Ch. 8), a slope
    /// opposite in sign to the Foster-positive slope of the λg/2 line sections and the λg/4 short, whose mismatch sets the
    /// idealised band. Each slot thus partly cancels the susceptance the line adds off resonance. The test asserts the
    /// widening and its premise (d Im y/df &lt; 0 at resonance) separately, so either failing points at the cause.
    /// </summary>
    [Fact]
    public void Thirty_two_slot_bandwidth_is_wider_than_the_idealised_line_model_because_slot_susceptance_falls_with_frequency()
    {
        var json = Design("n32", """
            spec: 1
            name: uniform-32
            frequency: 9.375 GHz
            band: [9.37 GHz, 9.38 GHz]
            guide: {size: WR-90, wall: 1.27 mm, metal: aluminium}
            feed: {type: standing-wave}
            slots: {type: longitudinal, count: 32, width: 1.6 mm}
            taper: {type: uniform}
            """);
        double f0 = json.GetProperty("frequency_hz").GetDouble();
        double bw = json.GetProperty("match").GetProperty("bandwidth_vswr2_hz").GetDouble() / f0 * 100;
        const double ideal = 1.05;   // Elliott 1981, Ch. 8 bandwidth check [N], N = 32, VSWR ≤ 2
        Assert.True(bw > 1.10 * ideal, $"real-slot VSWR-2 bandwidth {bw:0.000} % is not wider than the idealised {ideal} %");
        Assert.True(bw < 1.5 * ideal, $"real-slot VSWR-2 bandwidth {bw:0.000} % is implausibly wide against the idealised {ideal} %");

        // The premise: at the slot's own resonance Im y falls with frequency.
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        var model = new MomentMethodSlotModel(guide, Length.FromMillimeters(1.6));
        var fr = Frequency.FromHertz(f0);
        var r = model.ForConductance(1.0 / 32, fr);
        Complex lo = model.Admittance(r.Coupling, r.ResonantLength, Frequency.FromHertz(f0 * 0.995));
        Complex hi = model.Admittance(r.Coupling, r.ResonantLength, Frequency.FromHertz(f0 * 1.005));
        Assert.True(hi.Imaginary < lo.Imaginary, $"Im y rises with frequency ({lo.Imaginary:E3} → {hi.Imaginary:E3}): the explanation does not hold");
    }

    [Fact]
    public void Centre_fed_tube_example_designs_matched_with_both_shorts_placed()
    {
        // arrays/sector-5g8-tube.yaml: 12 slots in a 40 × 20 mm tube, centre feed. Each half is a resonant array with its
        // own Σ g = 1 (Elliott 1981, Ch. 8 match rule, per half), so Σ g = 2; shorts λg/4 beyond slots 1 and 12.
        string outDir = Path.Combine(DesignRuns.TempFolder("tube"), "out");
        var (code, _, err) = DesignRuns.Run("design", RepoFiles.Tube, "-o", outDir, "--no-cache");
        Assert.True(code == ExitCodes.Ok, err);
        var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, "design.json"))).RootElement;
        var slots = json.GetProperty("slots").EnumerateArray().ToList();
        Check.Absolute(2.0, slots.Sum(s => s.GetProperty("conductance").GetDouble()), 1e-12, "Elliott 1981, Ch. 8, Σ g = 1 per half");
        Assert.True(json.GetProperty("match").GetProperty("s11_db_at_design").GetDouble() < -25, "matched at the design frequency");
        double lg = json.GetProperty("guide").GetProperty("guide_wavelength_m").GetDouble();
        var t = json.GetProperty("termination");
        Check.Absolute(lg / 4, t.GetProperty("distance_m").GetDouble(), 1e-12, "Elliott 1981, Ch. 8: short λg/4 beyond slot 1");
        Check.Absolute(slots[^1].GetProperty("position_m").GetDouble() + lg / 4, t.GetProperty("far_short_position_m").GetDouble(), 1e-12, "Elliott 1981, Ch. 8: short λg/4 beyond slot 12");
        Check.Absolute((slots[5].GetProperty("position_m").GetDouble() + slots[6].GetProperty("position_m").GetDouble()) / 2,
            t.GetProperty("feed_position_m").GetDouble(), 1e-12, "series junction midway between slots 6 and 7 (StandingWaveDesigner remarks)");
    }
}
