using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.DesignTests;

/// <summary>
/// Issue 11, the causes only the design can find: each once surfaced as an internal error (exit 3) and now either designs
/// or throws the exception a user can act on (<see cref="InfeasibleDesignException"/>, <see cref="ConvergenceException"/>).
/// </summary>
public class PipelineDesignabilityTests
{
    private static ArrayRequest MomentMethod(ArrayRequest r) => r with { Slots = r.Slots with { Model = SlotModelKind.MomentMethod } };

    [Fact]
    public void No_slot_resonance_at_12_9_GHz_with_a_0_001_mm_wall_is_a_convergence_failure_not_a_parallel_aggregate()
    {
        // Close to the TE20 cutoff of WR-90 (c/a = 13.114 GHz) the moment-method admittance has no Im y = 0 crossing in the
        // searched lengths; the search runs in parallel over offsets, whose AggregateException used to reach the CLI as exit 3.
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(0.001), Metal.Aluminium);
        var request = MomentMethod(Request(4, guide: guide)) with
        {
            DesignFrequency = Frequency.FromGigahertz(12.9), BandLow = Frequency.FromGigahertz(12.8), BandHigh = Frequency.FromGigahertz(13.0),
        };
        var e = Assert.Throws<ConvergenceException>(() => ArrayPipeline.Run(request, new AnalysisOptions(SweepPoints: 3)));
        Assert.Contains("no resonance", e.Message, StringComparison.Ordinal);
        Assert.Contains("move the frequency toward the middle of the single-mode band", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_design_frequency_just_above_cutoff_designs_and_its_band_search_stays_above_cutoff()
    {
        // WR-90 TE10 cutoff c/(2a) = 6.557 GHz; 6.6 GHz with the band 6.56–6.64 GHz. The default band search reaches 15 %
        // below the design frequency (5.61 GHz), where no mode propagates; it must stop at the band's low edge.
        var request = MomentMethod(Request(4)) with
        {
            DesignFrequency = Frequency.FromGigahertz(6.6), BandLow = Frequency.FromGigahertz(6.56), BandHigh = Frequency.FromGigahertz(6.64),
        };
        var r = ArrayPipeline.Run(request, new AnalysisOptions(SweepPoints: 5));
        foreach (var band in new[] { r.BandVswr15, r.BandVswr2 })
            if (band is not null) Assert.True(band.Low.Hertz >= 6.56e9 * (1 - 1e-12), $"band search went down to {band.Low}");
        Assert.True(r.Sweep.Points.All(p => p.Frequency.Hertz >= 6.56e9 * (1 - 1e-12)));
    }

    [Fact]
    public void A_longitudinal_slot_too_wide_for_the_narrow_slot_model_is_infeasible_not_an_argument_error()
    {
        // The moment method needs L > 2w; a 9 mm slot in WR-90 at 9.375 GHz (λ = 31.98 mm) cannot be 0.36 λ = 11.5 mm
        // long and more than 18 mm: the resonance search refuses before calling the solver.
        var request = MomentMethod(Request(4)) with { Slots = Request(4).Slots with { Width = Length.FromMillimeters(9), Model = SlotModelKind.MomentMethod } };
        var e = Assert.ThrowsAny<Exception>(() => ArrayPipeline.Run(request, new AnalysisOptions(SweepPoints: 3)));
        Assert.True(e is InfeasibleDesignException or ConvergenceException, $"{e.GetType().Name}: {e.Message}");
    }

    [Fact]
    public void Bayliss_and_Villeneuve_limits_of_the_check_are_the_syntheses_own()
    {
        // TaperSynthesis.LevelRange and MaximumNbar are what the spec check enforces: at each limit the synthesis works,
        // one step beyond it throws.
        foreach (var type in new[] { TaperType.Chebyshev, TaperType.Taylor, TaperType.Villeneuve, TaperType.TaylorOneParameter, TaperType.Bayliss })
        {
            var (highest, lowest) = TaperSynthesis.LevelRange(type)!.Value;
            var t = new TaperRequest(type, highest, 2, -20, 2, null);
            Assert.NotEmpty(TaperSynthesis.Synthesize(t, 9).Weights);
            Assert.NotEmpty(TaperSynthesis.Synthesize(t with { SidelobeLevelDb = lowest }, 9).Weights);
            Assert.ThrowsAny<ArgumentException>(() => TaperSynthesis.Synthesize(t with { SidelobeLevelDb = highest + 0.01 }, 9));
            Assert.ThrowsAny<ArgumentException>(() => TaperSynthesis.Synthesize(t with { SidelobeLevelDb = lowest - 0.01 }, 9));
        }
        for (int n = 5; n <= 12; n++)
        {
            int most = TaperSynthesis.MaximumNbar(TaperType.Villeneuve, n);
            var v = new TaperRequest(TaperType.Villeneuve, -30, most, -20, 2, null);
            Assert.NotEmpty(TaperSynthesis.Synthesize(v, n).Weights);
            Assert.ThrowsAny<ArgumentException>(() => TaperSynthesis.Synthesize(v with { Nbar = most + 1 }, n));
        }
    }

    [Fact]
    public void Design_warnings_cite_published_sources_or_plain_words_never_an_internal_document()
    {
        // A grating-lobe spacing (0.9 λg standing wave), a travelling-wave spacing with no beam, a spiking Chebyshev taper
        // and a Taylor n̄ far above 4A²: every warning they raise is read by the user.
        var slot = new StevensonTestSlot(Wr90, Width);
        var warnings = new List<DesignWarning>();
        warnings.AddRange(StandingWaveDesigner.Design(StickRequest.Of(Request(8, spacing: 0.9), slot, Uniform(8))).Design.Warnings);
        warnings.AddRange(TaperSynthesis.Synthesize(new TaperRequest(TaperType.Chebyshev, -20, 4, -20, 2, null), 60).Warnings);
        warnings.AddRange(TaperSynthesis.Synthesize(new TaperRequest(TaperType.Taylor, -20, 12, -20, 2, null), 40).Warnings);
        Assert.Contains(warnings, w => w.Code == "grating-lobe");
        Assert.Contains(warnings, w => w.Code == "chebyshev-edge-spike");
        Assert.Contains(warnings, w => w.Code == "nbar-edge-rise" || w.Message.Contains("dips and rises", StringComparison.Ordinal));
        Assert.All(warnings, w => Assert.DoesNotContain("§", w.Message, StringComparison.Ordinal));
        Assert.All(warnings, w => Assert.DoesNotContain("§", w.Message, StringComparison.Ordinal));
    }
}
