using SlotArray.Core.Design;
using SlotArray.Core.Prototype;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Tests.DesignTests;
using SlotArray.Tests.Shared;
using Xunit;
using Xunit.Abstractions;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.PrototypeTests;

/// <summary>
/// The diagnosis recovers errors injected into the design's own coupled network model. Source of the check: the injected
/// values themselves (a closed loop, the standard test of an estimator: the truth must lie inside the estimator's own
/// reported 95 % intervals; W. H. Press et al., Numerical Recipes, 3rd ed., 2007, Sec. 15.6, from memory).
/// </summary>
public class PrototypeFitTests(ITestOutputHelper output)
{
    private static (PrototypeModel Real, ArrayDesign Design) Plate(int count = 16)
    {
        var slot = new StevensonTestSlot(Wr90, Width);
        var design = StandingWaveDesigner.Design(StickRequest.Of(Request(count), slot, Taylor25Like(count))).Design;
        return (new PrototypeModel(design, slot), design);
    }

    private static double[] Taylor25Like(int n) => Enumerable.Range(0, n).Select(i => 0.4 + 0.6 * Math.Sin(Math.PI * (i + 0.5) / n)).ToArray();

    [Fact]
    public void Injected_length_conductance_and_two_slot_errors_are_recovered_within_the_reported_intervals()
    {
        var (real, design) = Plate();
        var dl = new double[16];
        dl[4] = 0.1e-3; dl[11] = 0.1e-3;   // two slots 0.1 mm long
        var truth = PrototypeErrors.None(16) with { LengthScale = 0.006, ConductanceScale = 1.1, SlotLengthErrors = dl };
        var data = SyntheticMeasurements.Generate(real, truth, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), 201,
            [F0, Frequency.FromGigahertz(9.30)], 0.5, 0.05, 0.5, seed: 3);
        var fitModel = new PrototypeModel(design, PrototypeFit.FitSlotModel(design, real.Slot));
        var d = PrototypeFit.Run(fitModel, data);
        foreach (var s in d.Stages) output.WriteLine($"{s.Name}: rms {s.ResidualRms:0.###}, cond {s.ConditionNumber:0.#}, adopted {s.Adopted} {string.Join(" ", s.Values.Take(3).Select(v => $"{v.Value:0.#####}±{v.Interval95:0.#####}"))} {string.Join("; ", s.Notes)}");
        foreach (var s in d.Slots) output.WriteLine($"slot {s.Slot}: dL {s.Length.Value:0.####} ± {s.Length.Interval95:0.####} mm, dx {s.Coupling.Value:0.####} ± {s.Coupling.Interval95:0.####} mm, res {s.Resolution:0.##}");
        Assert.NotNull(d.LengthScale);
        Assert.NotNull(d.ConductanceScale);
        Assert.True(d.LengthScale!.Contains(0.006), $"length scale {d.LengthScale.Value} ± {d.LengthScale.Interval95} should contain the injected 0.006");
        Assert.True(d.ConductanceScale!.Contains(1.1), $"conductance scale {d.ConductanceScale.Value} ± {d.ConductanceScale.Interval95} should contain the injected 1.1");
        for (int i = 0; i < 16; i++)
            Assert.True(d.Slots[i].Length.Contains(dl[i] * 1e3), $"slot {i + 1}: length error {d.Slots[i].Length.Value} ± {d.Slots[i].Length.Interval95} mm should contain the injected {dl[i] * 1e3} mm");
        Assert.True(d.Slots[4].Length.Value > 0.05 && d.Slots[11].Length.Value > 0.05, "the two long slots stand out");
    }

    [Fact]
    public void A_travelling_wave_plate_measured_as_a_two_port_is_diagnosed_within_the_reported_intervals()
    {
        // The two-port path: S11 and |S21| to the load of a 24-slot travelling-wave array (10 % to the load) with a uniform
        // length error of +0.6 % and conductance × 1.1, ±0.05 dB / ±0.5° noise; the S21 rows carry the power that reaches the
        // load. Source: the injected values (closed loop; Press et al., Numerical Recipes, 3rd ed., 2007, Sec. 15.6, from memory).
        // Per-slot errors are left out on purpose: a travelling-wave array's S11 is the sum of its slots' own small
        // reflections, which the uniform stages cannot explain (see the README's prototype-loop limits).
        var slot = new StevensonTestSlot(Wr90, Width);
        var request = TravellingWave.TravellingWaveDesignerTests.Travelling(24, 0.10);
        var design = TravellingWaveDesigner.Design(StickRequest.Of(request, slot, Taylor25Like(24))).Design;
        var real = new PrototypeModel(design, slot);
        var truth = PrototypeErrors.None(24) with { LengthScale = 0.006, ConductanceScale = 1.1 };
        var data = SyntheticMeasurements.Generate(real, truth, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), 201,
            [], 0.5, 0.05, 0.5, seed: 7, twoPort: true);
        Assert.Equal(2, data.Network!.PortCount);
        MeasurementCheck.Check(design, true, data);
        var d = PrototypeFit.Run(new PrototypeModel(design, PrototypeFit.FitSlotModel(design, slot)), data);
        foreach (var s in d.Stages) output.WriteLine($"{s.Name}: rms {s.ResidualRms:0.###}, adopted {s.Adopted} {string.Join(" ", s.Values.Take(3).Select(v => $"{v.Value:0.#####}±{v.Interval95:0.#####}"))} {string.Join("; ", s.Notes)}");
        Assert.NotNull(d.LengthScale);
        Assert.NotNull(d.ConductanceScale);
        Assert.True(d.LengthScale!.Contains(0.006), $"length scale {d.LengthScale.Value} ± {d.LengthScale.Interval95} should contain the injected 0.006");
        Assert.True(d.ConductanceScale!.Contains(1.1), $"conductance scale {d.ConductanceScale.Value} ± {d.ConductanceScale.Interval95} should contain the injected 1.1");
        Assert.True(d.Stages[^1].ResidualRms < 1.5, $"the fitted model explains S11 and S21 to the noise (rms {d.Stages[^1].ResidualRms:0.###})");
    }

    [Theory]
    [InlineData(1.0)]
    [InlineData(4.0)]
    public void The_coupling_change_per_conductance_change_through_the_slot_port_is_Stevensons_for_a_Stevenson_slot(double offsetMm)
    {
        // Stevenson's g ∝ sin²(πx/a) (A. F. Stevenson, "Theory of slots in rectangular wave-guides", J. Appl. Phys. 19, 1948)
        // gives δx = (a/2π) tan(πx/a) δg/g; the diagnosis derives it from the slot model's own admittance instead, which for
        // a slot whose only offset dependence is Stevenson's must give the same.
        var slot = new StevensonTestSlot(Wr90, Width);
        double x = offsetMm * 1e-3, a = Wr90.BroadWall.Meters;
        double viaPort = PrototypeFit.CouplingPerConductance(slot, x, Length.FromMillimeters(15.5), F0);
        Check.Relative(a / (2 * Math.PI) * Math.Tan(Math.PI * x / a), viaPort, 1e-5, "Stevenson 1948, g ∝ sin²(πx/a)");
    }

    [Fact]
    public void A_sweep_too_narrow_to_separate_the_parameters_is_reported_and_the_inseparable_stage_not_adopted()
    {
        // Five points within ±0.01 % of f0 carry one complex number: the stage with a third parameter (and maybe the second)
        // cannot be separated. Source of the expectation: a Jacobian of rank 2 for 3 parameters (Press et al., Numerical
        // Recipes, 3rd ed., 2007, Sec. 15.4, from memory) gives correlations of ±1.
        var (real, design) = Plate(8);
        var truth = PrototypeErrors.None(8) with { LengthScale = 0.004 };
        var data = SyntheticMeasurements.Generate(real, truth, Frequency.FromHertz(F0.Hertz * 0.9999), Frequency.FromHertz(F0.Hertz * 1.0001), 5,
            [], 0.5, 0.05, 0.5, seed: 5);
        var d = PrototypeFit.Run(new PrototypeModel(design, PrototypeFit.FitSlotModel(design, real.Slot)), data);
        Assert.Contains(d.Stages, s => !s.Adopted && s.Notes.Any(n => n.Contains("cannot separate", StringComparison.Ordinal)));
        Assert.Null(d.GuideWavelengthScale);
    }

    [Fact]
    public void A_measurement_of_another_design_is_refused_with_the_reason()
    {
        // The refusals follow from the design itself: a standing-wave array has one port; a sweep that misses f0 is of
        // another band (architecture.md, "Measurements come in at the edge too").
        var (_, design) = Plate(8);
        var s = new System.Numerics.Complex[] { 0.1, 0.1, 0.1, 0.1, 0.1 };
        double[] off = [10.0e9, 10.1e9, 10.2e9, 10.3e9, 10.4e9];
        var wrongBand = new PrototypeMeasurements(new MeasuredNetwork("other.s1p", off, s, null, 1), []);
        var e1 = Assert.Throws<MeasurementMismatchException>(() => MeasurementCheck.Check(design, false, wrongBand));
        Assert.Contains("does not contain the design frequency", e1.Message, StringComparison.Ordinal);
        double[] on = [9.3e9, 9.35e9, 9.4e9, 9.45e9, 9.5e9];
        var twoPort = new PrototypeMeasurements(new MeasuredNetwork("tw.s2p", on, s, s, 2), []);
        var e2 = Assert.Throws<MeasurementMismatchException>(() => MeasurementCheck.Check(design, false, twoPort));
        Assert.Contains("two-port file", e2.Message, StringComparison.Ordinal);
        var farCut = new PrototypeMeasurements(null, [new MeasuredCut("far.csv", Frequency.FromGigahertz(12), Enumerable.Range(0, 40).Select(i => -1.0 + i * 0.05).ToArray(), new double[40], null)]);
        Assert.Throws<MeasurementMismatchException>(() => MeasurementCheck.Check(design, false, farCut));
    }
}
