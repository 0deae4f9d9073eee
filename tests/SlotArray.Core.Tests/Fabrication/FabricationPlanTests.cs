using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Fabrication;

/// <summary>
/// The fabrication plan (issue 13): a probeable datum A on the tube's end face, every feature and the tube length from
/// it, each dimension's own tolerance with its source, and the thermal length change. Expected values by hand
/// arithmetic from the stated layout rules (closed forms).
/// </summary>
public class FabricationPlanTests
{
    private static readonly CutListGuide Wr90 = new(Length.FromMillimeters(22.86), Length.FromMillimeters(10.16), Length.FromMillimeters(1.27));
    private static readonly Length LambdaG = Length.FromMillimeters(44.74288);   // WR-90 at 9.375 GHz, λg = λ/√(1 − (λ/2a)²) (Pozar, Microwave Engineering, 4th ed., 2012, Sec. 3.3)
    private static Length Mm(double v) => Length.FromMillimeters(v);

    private static CutList FourSlots(Angle? tilt = null) => CutList.Build(Wr90, [.. Enumerable.Range(1, 4).Select(i =>
        new SlotCutInput(i, 0.25 * LambdaG + (i - 1) * 0.5 * LambdaG, tilt is null ? Mm(i % 2 == 0 ? -1.5 : 1.5) : null,
            tilt is { } t ? Angle.FromRadians(i % 2 == 0 ? -t.Radians : t.Radians) : null, Mm(14.8), Mm(1.6), Mm(1.6), Mm(0.025)))]);

    [Fact]
    public void End_fed_standing_wave_tube_is_dimensioned_from_its_end_face()
    {
        var cut = FourSlots();
        var feedPlane = cut.Rows[^1].Position;
        var plan = FabricationPlan.Layout(cut, FeatureTolerances.From(null), false, feedPlane, null, LambdaG, "aluminium");
        // end-short plate as thick as the wall, flush in the bore: its inner face (design z = 0) lies 1.27 mm from A
        Check.Absolute(1.27, plan.DesignOrigin.Millimeters, 1e-12, "layout rule: plate = wall");
        Assert.Equal(["tube-end", "end-short", "feed-flange"], plan.Features.Select(f => f.Key));
        Check.Absolute(0, plan.Features[0].Position.Millimeters, 0, "datum A");
        for (int i = 0; i < 4; i++)
            Check.Absolute(cut.Rows[i].Position.Millimeters + 1.27, plan.Slots[i].Position.Millimeters, 1e-9, "slot z from A = z + plate");
        // last slot centre 1.27 + 11.18572 + 3 × 22.37144 = 79.57004; its end + 7.4 + 0.3434 (equal-area), + 10 mm clearance
        // = 97.31 < feed plane + λg/2 = 79.57004 + 22.37144 = 101.94148: one half wavelength suffices
        Check.Absolute(1.27 + 0.25 * 44.74288 + 2.0 * 44.74288, plan.TubeLength.Millimeters, 1e-9, "feed plane + λg/2");
        Check.Absolute(plan.TubeLength.Millimeters, plan.Features[^1].Position.Millimeters, 0, "the feed flange face is the tube end");
        // ISO 2768-1 class f, 30–120 mm: ±0.15 mm (from memory)
        Check.Absolute(0.15, plan.TubeLengthTolerance.Value * 1e3, 1e-12, "ISO 2768-1 class f, 30 to 120 mm");
        Assert.Contains("ISO 2768-1", plan.TubeLengthTolerance.Source);
    }

    [Fact]
    public void The_flange_moves_out_by_whole_half_wavelengths_to_clear_the_last_slot()
    {
        var cut = FourSlots();
        // feed plane 5 mm beyond the last slot centre: λg/2 would leave 22.37 − 5 … the flange must clear the slot end by 10 mm
        var feedPlane = cut.Rows[^1].Position - Mm(15);
        var plan = FabricationPlan.Layout(cut, FeatureTolerances.From(null), false, feedPlane, null, LambdaG, "aluminium");
        var lastEnd = plan.Slots[^1].Position + 0.5 * plan.Slots[^1].Row.OverallLength;
        double n = (plan.TubeLength - (plan.DesignOrigin + feedPlane)) / (0.5 * LambdaG);
        Check.Absolute(Math.Round(n), n, 1e-9, "whole number of half guide wavelengths (a λg/2 line repeats its impedance)");
        Assert.True(plan.TubeLength - lastEnd >= FabricationPlan.FlangeClearance, "10 mm clear of the last slot");
        Assert.True(plan.TubeLength - lastEnd < FabricationPlan.FlangeClearance + 0.5 * LambdaG, "the smallest such n");
    }

    [Fact]
    public void Centre_fed_tube_has_two_plates_a_junction_and_no_flange()
    {
        var cut = FourSlots();
        var junction = 0.5 * (cut.Rows[1].Position + cut.Rows[2].Position);
        var farShort = cut.Rows[^1].Position + 0.25 * LambdaG;
        var plan = FabricationPlan.Layout(cut, FeatureTolerances.From(null), false, junction, farShort, LambdaG, "copper");
        Assert.Equal(["tube-end", "end-short", "feed-junction", "second-short", "far-tube-end"], plan.Features.Select(f => f.Key));
        Check.Absolute(junction.Millimeters + 1.27, plan.Features[2].Position.Millimeters, 1e-9, "junction from A");
        Check.Absolute(farShort.Millimeters + 2 * 1.27, plan.TubeLength.Millimeters, 1e-9, "two plates");
        // copper α = 16.5e-6 /K (CRC Handbook, from memory): ΔL/K = α L
        Check.Relative(16.5e-6 * plan.TubeLength.Meters, plan.ChangePerKelvin!.Value.Meters, 1e-12, "linear expansion α L");
    }

    [Fact]
    public void Travelling_wave_datum_is_the_load_flange_face()
    {
        var cut = FourSlots(Angle.FromDegrees(12));
        var plan = FabricationPlan.Layout(cut, FeatureTolerances.From(null), true, cut.Rows[^1].Position + 0.5 * LambdaG, null, LambdaG, "aluminium");
        Assert.Equal("load-flange", plan.Features[0].Key);
        Check.Absolute(0, plan.DesignOrigin.Meters, 0, "the load's plane is datum A");
        Assert.Equal(0, plan.EndPlateThickness.Meters);
        // tilt tolerance: δx at the slot's end, δθ = δx/(L/2) = 0.025/7.4 rad; depth ±δL/2
        Check.Relative(0.025 / 7.4, plan.Slots[0].TiltTolerance!.Value, 1e-12, "δθ = δx/(L/2)");
        Check.Relative(0.0125e-3, plan.Slots[0].CutDepthTolerance!.Value, 1e-12, "path b/cos θ + 2(d − t): δd = δL/2");
        Assert.Null(plan.Slots[0].OffsetTolerance);
    }

    [Fact]
    public void Tolerances_come_from_the_spec_with_their_source_else_the_stated_default()
    {
        var spec = new ToleranceRequest(new MachiningTolerance(Mm(0.02), ErrorDistribution.Uniform), new MachiningTolerance(Mm(0.015), ErrorDistribution.Normal),
            MachiningTolerance.None, new MachiningTolerance(Mm(0.01), ErrorDistribution.Uniform), MachiningTolerance.None, MachiningTolerance.None, Length.Zero, Length.Zero, 10, 1);
        var t = FeatureTolerances.From(spec);
        Check.Absolute(0.02, t.Offset.Value * 1e3, 1e-12, "tolerance.offset, uniform ±");
        Assert.Equal("spec tolerance.offset (uniform ±)", t.Offset.Source);
        Check.Absolute(0.03, t.Length.Value * 1e3, 1e-12, "±2σ of a normal σ = 0.015 mm (95 %)");
        Assert.StartsWith("spec tolerance.length: ±2σ", t.Length.Source);
        Check.Absolute(0.025, t.Position.Value * 1e3, 1e-12, "no position tolerance: the default");
        Assert.Contains("common practice, no source", t.Position.Source);
        Check.Absolute(0.015, t.CutDepth.Value * 1e3, 1e-12, "no tolerance.depth: half the length tolerance (cut path b/cos θ + 2(D − t))");
        Assert.Null(t.Tilt);
        // No tolerance.tilt: the default ±0.025 mm at the end of a 16 mm slot, δθ = δx/(L/2) (common practice, no source).
        Check.Absolute(0.025 / 8, t.TiltFor(Mm(16)).Value, 1e-15, "default milling tolerance at the slot's end");
        Assert.Contains("common practice, no source", t.TiltFor(Mm(16)).Source);

        var edge = FeatureTolerances.From(spec with
        {
            Tilt = new AngleTolerance(Angle.FromDegrees(0.1), ErrorDistribution.Uniform),
            Depth = new MachiningTolerance(Mm(0.01), ErrorDistribution.Normal),
        });
        Check.Absolute(0.1, edge.TiltFor(Mm(16)).Value * 180 / Math.PI, 1e-12, "tolerance.tilt, uniform ±, the same for every slot");
        Assert.Equal("spec tolerance.tilt (uniform ±)", edge.TiltFor(Mm(16)).Source);
        Check.Absolute(0.02, edge.CutDepth.Value * 1e3, 1e-12, "tolerance.depth: ±2σ of σ = 0.01 mm");
        Assert.StartsWith("spec tolerance.depth: ±2σ", edge.CutDepth.Source);
    }

    [Fact]
    public void Expansion_coefficients_are_known_for_every_spec_metal()
    {
        foreach (var m in SlotArray.Core.Waveguides.Metal.All) Assert.NotNull(ThermalExpansion.For(m.Name));
        // aluminium 23.1e-6 /K (CRC Handbook, from memory): a 1 m tube grows 0.0231 mm per K
        Check.Relative(0.0231, ThermalExpansion.For("aluminum")!.ChangePerKelvin(Length.FromMeters(1)).Millimeters, 1e-12, "α L");
        Assert.Null(ThermalExpansion.For("unobtainium"));
        Assert.Equal(20, ThermalExpansion.ReferenceTemperatureCelsius);   // ISO 1:2016
    }

    [Fact]
    public void A_revision_flags_exactly_the_rows_that_moved()
    {
        var cut = FourSlots();
        var first = FabricationPlan.Layout(cut, FeatureTolerances.From(null), false, cut.Rows[^1].Position, null, LambdaG, "aluminium");
        Assert.Empty(first.Changed);
        var moved = CutList.Build(Wr90, [.. cut.Rows.Select(r => new SlotCutInput(r.Slot, r.Position, r.Slot == 3 ? r.Offset!.Value + Mm(0.002) : r.Offset,
            null, r.EquivalentLength, r.Width, Mm(1.6), r.Tolerance))]);
        var second = FabricationPlan.Layout(moved, FeatureTolerances.From(null), false, cut.Rows[^1].Position, null, LambdaG, "aluminium").WithChangesFrom(first);
        Assert.Equal(["slot-3"], second.Changed.Order(StringComparer.Ordinal));
        Assert.Empty(first.WithChangesFrom(first).Changed);
    }
}
