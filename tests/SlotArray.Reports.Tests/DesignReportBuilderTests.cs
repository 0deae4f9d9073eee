using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Safety;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;
using SlotArray.Reports.Model;

namespace SlotArray.Reports.Tests;

/// <summary>
/// The adapter from the pipeline's result to the report, on the uniform 10-slot WR-90 array at 9.375 GHz with the
/// Stevenson model (Elliott 1981, Ch. 8). The analysis runs at three frequencies with direct solves
/// (the Stevenson model needs the moment-method resonant lengths at every frequency), without the band searches.
/// </summary>
public class DesignReportBuilderTests
{
    private const string Ref51 = "Elliott 1981, Ch. 8 [N]";
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private static readonly Length Width = Length.FromMillimeters(1.5875);

    private static readonly RectangularWaveguide Wr90 =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);

    private static ArrayRequest Request(TransmitterRequest? transmitter = null, Requirements? requirements = null) =>
        new("uniform-10", F0, Frequency.FromGigahertz(9.374), Frequency.FromGigahertz(9.376), Wr90,
            new SlotRequest(SlotType.Longitudinal, 10, Width, Width, SlotModelKind.Stevenson),
            new FeedRequest(FeedType.StandingWave, GuideDistance.InGuideWavelengths(0.5), FeedPosition.End, 0, GuideDistance.InGuideWavelengths(0.25)),
            TaperRequest.Uniform, CouplingMode.None, null, requirements ?? Requirements.None, transmitter);

    private static readonly Lazy<ArrayResult> Base = new(() => Result(Request()));

    private static ArrayResult Result(ArrayRequest request)
    {
        var options = new AnalysisOptions(SweepPoints: 2, AdmittanceStep: 0);
        var taper = TaperSynthesis.Synthesize(request.Taper, request.Slots.Count);
        var slot = ArrayPipeline.SlotModelFor(request);
        var design = ArrayPipeline.Synthesise(request, slot, taper);
        var (sweep, atDesign, points) = ArrayPipeline.Analyse(request, design, slot, options);
        // The band sweep doubles as the match sweep here (the pipeline's own spans the VSWR bands).
        return new ArrayResult(request, taper, slot, design, new StandingWaveProcedure(), sweep, atDesign, points, sweep.Band(1.5), sweep.Band(2),
            sweep, AntennaAddOns.None, design.Warnings);
    }

    [Fact]
    public void Uniform_ten_slot_Stevenson_report_has_the_reference_geometry_and_round_end_lengths()
    {
        var r = DesignReportBuilder.Build(Base.Value);
        Assert.Equal(10, r.Slots.Count);
        for (int i = 0; i < 10; i++)
        {
            var s = r.Slots[i];
            Check.Absolute(0.1, s.Conductance, 1e-12, Ref51 + ": g_n = 1/N");
            Check.Absolute(2.0978e-3, Math.Abs(s.Offset!.Value), 0.5e-7, Ref51 + ": |x_n| = 2.0978 mm");
            Assert.Equal(i % 2 == 0 ? 1 : -1, Math.Sign(s.Offset.Value));   // alternation (Elliott 1981, Ch. 8)
            Check.Absolute(11.1857e-3 + i * 22.3714e-3, s.Position, 0.5e-7 * (i + 1), Ref51 + ": λg/4 + (n − 1) λg/2 from the short's inner face");
            // w = 1.5875 mm, cutter = width: L_o − L_eq = 0.3407 mm (equal-area rule [C])
            Check.Absolute(0.3407e-3, s.OverallLength - s.Length, 0.5e-7, "equal-area rule, common practice");
            Assert.Equal(SlotEndForm.Round, s.EndForm);
            Check.Absolute(1.0, s.TargetAmplitude, 1e-15, "uniform taper, normalised to a peak of 1");
        }
        Check.Absolute(11.1857e-3, r.Termination.Distance, 0.5e-7, Ref51 + ": short λg/4");
        Assert.Equal("short", r.Termination.Type);
        Check.Absolute(44.74288e-3, r.Guide.GuideWavelength, 0.5e-8, "Pozar 2012, Sec. 3.3 [N]: λg of WR-90 at 9.375 GHz");
        Check.Absolute(527.115, r.Guide.WaveImpedanceOhm, 0.0005, "Pozar 2012, Sec. 3.3 [N]: Z_TE of WR-90 at 9.375 GHz");
        Assert.Equal(1.0, r.Slots.Max(s => s.AchievedAmplitude));   // normalised so the peak is 1
    }

    [Fact]
    public void Without_a_transmitter_only_the_standard_caution_and_with_one_the_network_peak_field()
    {
        var plain = DesignReportBuilder.Build(Base.Value);
        Assert.Equal([SafetyCautions.Standard.Message], plain.Cautions);
        Assert.Contains(DesignReportBuilder.NoMutualCouplingNote, plain.Warnings);

        var result = Base.Value with { Request = Request(new TransmitterRequest(25e3, 20)) };
        var r = DesignReportBuilder.Build(result);
        Assert.Equal(SafetyCautions.Standard.Message, r.Cautions[0]);
        var (k, _) = ArraySafety.StandingWavePeak(result);
        // The factor is the largest |V| on the line over the analysed frequencies, or 1 + |S11| on the feed line.
        double expected = new[] { result.AtDesign.Network }.Concat(result.SweepFigures.Select(p => p.Network))
            .Max(n => Math.Max(n.PeakModeVoltage, 1 + n.S11.Magnitude));
        Check.Absolute(Math.Max(1, expected), k, 0, "definition in ArraySafety.StandingWavePeak");
        Assert.True(k < 2, $"a matched resonant array at resonance has a peak field well below the blanket factor 2 (got {k})");
        var power = PowerHandling.Assess(Wr90, F0, 1.0, Math.Min(k, 2), peakPower: 25e3);
        Assert.Contains(r.Cautions, c => c.Contains($"{power.MarginDecibels:0.0} dB", StringComparison.Ordinal) && c.StartsWith("Peak power 25 kW", StringComparison.Ordinal));
        Assert.Contains(r.Cautions, c => c.Contains("ICNIRP 2020", StringComparison.Ordinal));
        Assert.Contains(r.Cautions, c => c.Contains("no separate VSWR factor", StringComparison.Ordinal));
    }

    [Fact]
    public void Requirements_check_the_sidelobes_at_the_design_frequency_and_over_the_band_and_the_vswr_over_the_band()
    {
        var result = Base.Value with { Request = Request(requirements: new Requirements(-13.0, -30, 1.2)) };
        var q = DesignReportBuilder.Build(result).Requirements;
        Assert.Equal(["peak sidelobe at the design frequency", "peak sidelobe, worst over the analysis band", "VSWR over the whole analysis band"],
            q.Select(x => x.Description));
        double psl = result.AtDesign.Metrics.PeakSidelobeDb!.Value;
        Assert.Equal(psl <= -13.0, q[0].Passed);
        double worst = result.SweepFigures.Max(p => p.Metrics.PeakSidelobeDb!.Value);
        Assert.Equal(worst <= -13.0, q[1].Passed);
        Assert.Equal(result.SweepFigures.Max(p => p.Network.Vswr) <= 1.2, q[2].Passed);
        Assert.Contains(DesignReportBuilder.Build(result).Warnings, w => w.StartsWith("requirements.cross_polar", StringComparison.Ordinal));

        // Without a sidelobe requirement a uniform taper is held to its own level: the first sidelobe of the 10-element
        // array factor |sin(5ψ)/(10 sin(ψ/2))|, -12.97 dB (Balanis, Antenna Theory, 3rd ed., 2005, eq. 6-10c, computed
        // here), not the line source's -13.26 dB; marked as such.
        var byTaper = DesignReportBuilder.Build(Base.Value).Requirements;
        Assert.All(byTaper, x => Assert.Contains("the taper's own level", x.Required));
        Assert.StartsWith("≤ -12.97 dB", byTaper[0].Required);
    }
}
