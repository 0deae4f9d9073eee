using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.TravellingWave;

/// <summary>Cross-polarised lobes of alternately tilted edge slots (edge-slot formula (Stevenson 1948; Silver 1949) [D]).</summary>
public class EdgeSlotCrossPolarTests
{
    private static ArrayRequest StandingEdge(int n) => Request(n, guide: Wr90Lossless) with
    {
        Slots = new SlotRequest(SlotType.Edge, n, Width, null, SlotModelKind.Stevenson),
    };

    [Theory]
    [InlineData(20)]
    [InlineData(41)]
    public void Uniform_standing_wave_array_has_cross_polar_lobes_at_lambda_over_2d_at_tan_theta(int n)
    {
        // edge-slot formula (Stevenson 1948; Silver 1949): lobes at sin ψ = ±λ/(2d), d = λg/2 → sin ψ = λ/λg (WR-90, 9.375 GHz: ±45.6°), level tan θ
        // relative to the co-polar beam before element weighting. Uniform taper: every slot g = 1/N, the same |θ|.
        var slot = EdgeSlot.Create(Wr90Lossless, Width);
        var design = StandingWaveDesigner.Design(StickRequest.Of(StandingEdge(n), slot, Uniform(n))).Design;
        var sol = ArrayNetwork.Solve(design, slot, F0);
        var fig = ArrayFigures.At(design, sol);
        var positions = design.Slots.Select(s => -s.Position.Meters).ToArray();
        var tilts = design.Slots.Select(s => s.Coupling).ToArray();
        var bare = CrossPolarPattern.Compute(positions, sol.Excitations, tilts, F0.FreeSpaceWavenumber, fig.Pattern, ElementPatterns.Isotropic);
        double theta = Math.Abs(tilts[0]);
        Check.Absolute(20 * Math.Log10(Math.Tan(theta)), bare.PeakLevelDb, 0.01,
            "edge-slot formula (Stevenson 1948; Silver 1949) [D]: peak tan θ before element weighting (grid peak refined to ~1e-3 dB)");
        double lam = F0.FreeSpaceWavelength.Meters;
        Check.Absolute(lam / (2 * design.Spacing.Meters), Math.Abs(Math.Sin(bare.PeakDirection.Radians)), 2e-4,
            "edge-slot formula (Stevenson 1948; Silver 1949) [D]: sin ψ = λ/(2d)");
        Check.Absolute(45.6, Math.Abs(bare.PeakDirection.Degrees), 0.05, "edge-slot formula (Stevenson 1948; Silver 1949) [N]: ψ = ±45.6° for d = λg/2 in WR-90 at 9.375 GHz");
        // With the cos ψ element of the axial (cross-polar) component the peak falls by 20 log10 cos ψ.
        var cross = fig.CrossPolar!;
        Check.Absolute(bare.PeakLevelDb + 20 * Math.Log10(Math.Cos(bare.PeakDirection.Radians)), cross.PeakLevelDb, 0.02,
            "element pattern cos ψ of the axial magnetic-current component (CrossPolarPattern remarks)");
        Check.Absolute(0, fig.Metrics.BeamDirection.Degrees, 1e-6, "standing wave: broadside co-polar beam (Elliott 1981, Ch. 8)");
    }

    [Fact]
    public void Cross_polar_level_scales_as_tan_theta()
    {
        // edge-slot formula (Stevenson 1948; Silver 1949): θ = 15° → −11.4 dB. Ten equal slots of g(15°) = 0.10395 (numpy [N]) on a lossless line.
        var slot = EdgeSlot.Create(Wr90Lossless, Width);
        var tilt = EdgeSlotConductance.TiltForConductance(Wr90Lossless, 0.10395, F0, EdgeSlot.MaximumTilt);
        Check.Absolute(15, tilt.Degrees, 2e-3, "edge-slot formula (Stevenson 1948; Silver 1949) table [N]: g(15°) = 0.10395");
        var design = StandingWaveDesigner.Design(StickRequest.Of(StandingEdge(10), slot, Uniform(10))).Design;
        // g = 0.1 per slot, not 0.10395: compare with tan of the designed tilt and, separately, the reference at 15°.
        var sol = ArrayNetwork.Solve(design, slot, F0);
        var fig = ArrayFigures.At(design, sol);
        var bare = CrossPolarPattern.Compute(design.Slots.Select(s => -s.Position.Meters).ToArray(), sol.Excitations,
            design.Slots.Select(s => s.Coupling).ToArray(), F0.FreeSpaceWavenumber, fig.Pattern, ElementPatterns.Isotropic);
        Check.Absolute(20 * Math.Log10(Math.Tan(Math.Abs(design.Slots[0].Coupling))), bare.PeakLevelDb, 0.01, "edge-slot formula (Stevenson 1948; Silver 1949) [D]");
        Check.Absolute(-11.4, EdgeSlotCrossPolarization.LobeLevelDecibels(Angle.FromDegrees(15)), 0.05, "edge-slot formula (Stevenson 1948; Silver 1949): θ = 15° → −11.4 dB");
    }

    [Fact]
    public void Travelling_wave_cross_polar_lobe_sits_half_a_lobe_spacing_from_the_squinted_beam()
    {
        // The cross-polar sources lack the π alternation (CrossPolarPattern remarks), so they add in phase at
        // sin ψ = sin θ_b ± λ/(2d) (edge-slot formula (Stevenson 1948; Silver 1949) combined, derived here). Isotropic element: pure array factor.
        var slot = EdgeSlot.Create(Wr90Lossless, Width);
        var request = TravellingWaveDesignerTests.Travelling(40, 0.30, spacing: 0.46, guide: Wr90Lossless, type: SlotType.Edge,
            taper: TaperRequest.Uniform);
        var tw = TravellingWaveDesigner.Design(StickRequest.Of(request, slot, Uniform(40)));
        var sol = ArrayNetwork.Solve(tw.Design, slot, F0);
        var fig = ArrayFigures.At(tw.Design, sol);
        var bare = CrossPolarPattern.Compute(tw.Design.Slots.Select(s => -s.Position.Meters).ToArray(), sol.Excitations,
            tw.Design.Slots.Select(s => s.Coupling).ToArray(), F0.FreeSpaceWavenumber, fig.Pattern, ElementPatterns.Isotropic);
        double lam = F0.FreeSpaceWavelength.Meters, d = tw.Design.Spacing.Meters;
        double sb = Math.Sin(tw.Squint!.Value.Radians), sx = Math.Sin(bare.PeakDirection.Radians);
        double nearest = Math.Min(Math.Abs(sx - (sb + lam / (2 * d))), Math.Abs(sx - (sb - lam / (2 * d))));
        Check.Absolute(0, nearest, 2e-3, "sin ψ = sin θ_b ± λ/(2d) (a 40-slot lobe is 2.6e-2 wide in sin ψ)");
    }
}
