using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Tolerance;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;
using static SlotArray.Core.Tests.ToleranceTests.ToleranceTestArrays;

namespace SlotArray.Core.Tests.ToleranceTests;

/// <summary>The Monte Carlo engine: exactness at zero tolerance, determinism, thread independence, and the random-error floor.</summary>
public class ToleranceMonteCarloTests(Xunit.Abstractions.ITestOutputHelper output)
{
    private static readonly ToleranceOptions Fast = new(PatternPoints: 1024, EnvelopePoints: 128);

    [Fact]
    public void Zero_tolerances_give_the_nominal_design_exactly_on_every_trial()
    {
        var (design, slot) = Designed(Tapered(16));
        var model = ArrayTrialModel.Build(design, slot, Factory, Request(trials: 40), Fast);

        // The model's nominal network is the network analysis of the design, bit for bit.
        var direct = ArrayNetwork.Solve(design, slot, F0);
        Assert.Equal(direct.S11, model.Nominal.S11);
        Assert.Equal(direct.Excitations, model.Nominal.Excitations);
        Assert.Equal(direct.RadiatedPower, model.Nominal.RadiatedPower);
        for (int i = 0; i < 40; i++)
        {
            var r = new TrialRandom(7, i);
            var t = model.Trial(ref r);
            Assert.Equal(model.Nominal.Excitations, t.Excitations);
            Assert.Equal(model.Nominal.Positions, t.Positions);
            Assert.Equal(model.Nominal.S11, t.S11);
        }

        var mc = ToleranceMonteCarlo.Run(model, 40, 7, -20, Fast);
        Assert.All(mc.PeakSidelobeSamples, p => Assert.Equal(mc.Nominal.PeakSidelobeDb, p));
        Assert.Equal(0.0, mc.GainLossDb.Maximum);
        Assert.Equal(0.0, mc.GainLossDb.Minimum);
        Assert.Equal(0.0, mc.PointingErrorDeg.Maximum);
        Assert.Equal(mc.Nominal.S11Db, mc.S11Db.P95);
        // The excitation-error statistics divide by a least-squares common factor, which is 1 only to rounding.
        Assert.True(mc.AmplitudeErrorRms < 1e-12 && mc.PhaseErrorRms < 1e-12, $"{mc.AmplitudeErrorRms}, {mc.PhaseErrorRms}");
        // The pattern of the nominal matches the design-stage analysis (ArrayFigures on its own grid) to the grid's resolution.
        var figures = ArrayFigures.At(design, direct);
        Check.Absolute(figures.Metrics.PeakSidelobeDb!.Value, mc.Nominal.PeakSidelobeDb, 0.05, "ArrayFigures.At on the 1801-point default grid");
        Check.Relative(figures.Gain, mc.Nominal.Gain, 1e-9, "ArrayFigures.At: D × P_rad, the same Gauss–Legendre rule");
    }

    [Fact]
    public void Same_seed_gives_identical_results_and_another_seed_differs()
    {
        var (design, slot) = Designed(Tapered(16));
        var tol = Typical();
        var model = ArrayTrialModel.Build(design, slot, Factory, tol, Fast);
        var a = ToleranceMonteCarlo.Run(model, 100, 7, -20, Fast);
        var b = ToleranceMonteCarlo.Run(ArrayTrialModel.Build(design, slot, Factory, tol, Fast), 100, 7, -20, Fast);
        var c = ToleranceMonteCarlo.Run(model, 100, 8, -20, Fast);
        AssertSame(a, b);
        Assert.NotEqual(a.PeakSidelobeSamples, c.PeakSidelobeSamples);
        Assert.True(a.PeakSidelobeDb.Mean > a.Nominal.PeakSidelobeDb - 1, "random errors do not lower the sidelobes on average");
    }

    [Fact]
    public void Results_do_not_depend_on_the_thread_count()
    {
        var (design, slot) = Designed(Tapered(16));
        var tol = Typical();
        var one = ToleranceMonteCarlo.Run(ArrayTrialModel.Build(design, slot, Factory, tol, Fast with { MaxThreads = 1 }), 150, 3, -20, Fast with { MaxThreads = 1 });
        var two = ToleranceMonteCarlo.Run(ArrayTrialModel.Build(design, slot, Factory, tol, Fast with { MaxThreads = 2 }), 150, 3, -20, Fast with { MaxThreads = 2 });
        AssertSame(one, two);
        var s1 = ToleranceSensitivities.Compute(ArrayTrialModel.Build(design, slot, Factory, tol, Fast), Fast with { MaxThreads = 1 });
        var s2 = ToleranceSensitivities.Compute(ArrayTrialModel.Build(design, slot, Factory, tol, Fast), Fast with { MaxThreads = 2 });
        Assert.Equal(s1, s2);
    }

    [Fact]
    public void The_envelope_keeps_a_bounded_sample_the_first_trials_and_the_statistics_use_every_trial()
    {
        // Memory bound (issue 12): with EnvelopeTrials = 100 a run of 300 trials keeps the envelope of its first 100 trials
        // only, so its bands are those of a 100-trial run (same seed: the same first trials), while the sidelobe statistics
        // cover all 300; and both are the same on 1 and 2 threads.
        var (design, slot) = Designed(Tapered(16));
        var tol = Typical();
        var options = Fast with { EnvelopeTrials = 100 };
        var model = ArrayTrialModel.Build(design, slot, Factory, tol, options);
        var hundred = ToleranceMonteCarlo.Run(model, 100, 5, -20, options);
        var long1 = ToleranceMonteCarlo.Run(model, 300, 5, -20, options with { MaxThreads = 1 });
        var long2 = ToleranceMonteCarlo.Run(model, 300, 5, -20, options with { MaxThreads = 2 });
        Assert.Equal(hundred.Envelope!.P5Db, long1.Envelope!.P5Db);
        Assert.Equal(hundred.Envelope.P50Db, long1.Envelope.P50Db);
        Assert.Equal(hundred.Envelope.P95Db, long1.Envelope.P95Db);
        Assert.Equal(hundred.Envelope.MaximumDb, long1.Envelope.MaximumDb);
        AssertSame(long1, long2);
        Assert.Equal(300, long1.PeakSidelobeSamples.Count);
        Assert.Equal(hundred.PeakSidelobeSamples, long1.PeakSidelobeSamples.Take(100));
        Assert.NotEqual(hundred.PeakSidelobeDb, long1.PeakSidelobeDb);
        Assert.Throws<ArgumentOutOfRangeException>(() => ToleranceMonteCarlo.Run(model, 10, 5, -20, Fast with { EnvelopeTrials = 99 }));
    }

    private static void AssertSame(MonteCarloResult a, MonteCarloResult b)
    {
        Assert.Equal(a.PeakSidelobeSamples, b.PeakSidelobeSamples);
        Assert.Equal(a.PeakSidelobeDb, b.PeakSidelobeDb);
        Assert.Equal(a.GainLossDb, b.GainLossDb);
        Assert.Equal(a.PointingErrorDeg, b.PointingErrorDeg);
        Assert.Equal(a.S11Db, b.S11Db);
        Assert.Equal(a.ProbabilityMeetsTarget, b.ProbabilityMeetsTarget);
        Assert.Equal(a.AnalyticFloorDb, b.AnalyticFloorDb);
        Assert.Equal(a.MonteCarloFloorDb, b.MonteCarloFloorDb);
        Assert.Equal(a.Envelope!.P95Db, b.Envelope!.P95Db);
    }

    [Fact]
    public void Monte_Carlo_floor_of_64_elements_with_random_excitation_errors_matches_the_random_error_formula()
    {
        // Ruze 1966 / Hansen 1998 (from memory): mean error power relative to the peak = (σ_a² + σ_φ²)/(η_t N).
        const int n = 64;
        const double sa = 0.05, sp = 0.05;
        var a = Tapered(n);
        var model = new ExcitationErrorModel(a, sa, sp, F0);
        var mc = ToleranceMonteCarlo.Run(model, 400, 11, -20, Fast);
        double eta = Core.Patterns.PatternMetrics.TaperEfficiency(a);
        double expected = 10 * Math.Log10((sa * sa + sp * sp) / (eta * n));
        output.WriteLine($"floor: formula with the input σ {expected:F2} dB, with the produced σ {mc.AnalyticFloorDb:F2} dB, Monte Carlo {mc.MonteCarloFloorDb:F2} dB");
        Check.Absolute(expected, mc.MonteCarloFloorDb, 1.0, "Ruze 1966 / Hansen 1998 random-error floor with the input σ's");
        Check.Absolute(mc.AnalyticFloorDb, mc.MonteCarloFloorDb, 1.0, "the same formula with the σ's the trials produced");
        Check.Relative(sa, mc.AmplitudeErrorRms, 0.05, "the input σ_a (ln(1 + x) ≈ x; 25 600 draws: ±0.5 % sampling)");
        Check.Relative(sp, mc.PhaseErrorRms, 0.05, "the input σ_φ");
        Assert.Equal(0.0, mc.PositionPhaseRms);
    }

    [Fact]
    public void Percentiles_follow_Hyndman_and_Fan_definition_7()
    {
        // numpy.percentile([1, 2, 3, 4, 10], q) with linear interpolation (numpy's default, = Hyndman & Fan type 7):
        // q = 50 → 3, q = 90 → 7.6, q = 95 → 8.8, q = 99 → 9.76 (h = 4p: 3.6 → 4 + 0.6·6; 3.8 → 4 + 0.8·6; 3.96 → 4 + 0.96·6).
        var s = SampleSummary.Of([10, 2, 4, 1, 3]);
        Check.Absolute(3, s.P50, 1e-12, "Hyndman & Fan 1996 type 7, worked by hand");
        Check.Absolute(7.6, s.P90, 1e-12, "Hyndman & Fan 1996 type 7, worked by hand");
        Check.Absolute(8.8, s.P95, 1e-12, "Hyndman & Fan 1996 type 7, worked by hand");
        Check.Absolute(9.76, s.P99, 1e-12, "Hyndman & Fan 1996 type 7, worked by hand");
        Check.Absolute(4, s.Mean, 1e-12, "arithmetic mean");
    }

    [Fact]
    public void Uniform_draws_stay_inside_the_tolerance_and_normal_draws_have_the_given_sigma()
    {
        var u = Uniform(0.02);
        var g = Normal(0.05);
        double max = 0, sum2 = 0;
        const int count = 20000;
        for (int i = 0; i < count; i++)
        {
            var r = new TrialRandom(1, i);
            max = Math.Max(max, Math.Abs(r.Draw(u)));
            double x = r.Draw(g);
            sum2 += x * x;
        }
        Assert.True(max <= 0.02e-3, $"uniform draw {max} beyond ±0.02 mm");
        Assert.True(max > 0.0199e-3, "uniform draws should reach the edge of ±0.02 mm");
        // Sampling error of an RMS from 20 000 normal draws: ≈ 1/√(2·20000) = 0.5 %.
        Check.Relative(0.05e-3, Math.Sqrt(sum2 / count), 0.02, "σ of the normal law (Box–Muller 1958)");
    }

    [Fact]
    public void A_systematic_length_error_lowers_the_gain_and_spoils_the_match()
    {
        // Every slot 0.3 mm long moves all resonances together: the array is no longer matched (S11 rises) and the
        // radiated power falls. Direction from the slot physics: derived here (length moves the resonance).
        var (design, slot) = Designed(Tapered(16));
        var model = ArrayTrialModel.Build(design, slot, Factory, Request(systematicLength: 0.3, trials: 8), Fast);
        var mc = ToleranceMonteCarlo.Run(model, 8, 1, -20, Fast);
        Assert.True(mc.S11Db.P50 > mc.Nominal.S11Db + 10, $"S11 {mc.S11Db.P50} dB vs nominal {mc.Nominal.S11Db} dB");
        Assert.True(mc.GainLossDb.P50 > 0.01, $"gain loss {mc.GainLossDb.P50} dB");
    }
}
