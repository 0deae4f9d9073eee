using SlotArray.Core.Tolerance;
using SlotArray.Tests.Shared;
using Xunit.Abstractions;
using static SlotArray.Core.Tests.DesignTests.TestArrays;
using static SlotArray.Core.Tests.ToleranceTests.ToleranceTestArrays;

namespace SlotArray.Core.Tests.ToleranceTests;

/// <summary>Per-slot sensitivities of a uniform 16-slot array (Stevenson test double, lossless guide), reasoned from the array factor.</summary>
public class ToleranceSensitivitiesTests(ITestOutputHelper output)
{
    private const int N = 16;

    [Fact]
    public void Centre_slot_offset_moves_the_first_sidelobe_more_than_the_edge_slot_and_in_the_opposite_sense()
    {
        // A uniform array's first sidelobes sit at ψ1 with N ψ1/2 ≈ 4.4934 (the peak of sin x/x) and have the sign opposite
        // to the main beam: AF(ψ1) ≈ −0.2172 N (−13.26 dB). Widening slot n's offset raises its amplitude by
        // δa/a = ½ d(ln g)/dx δx = (π/a) cot(πx/a) δx (Stevenson, derived here). With the slots at ±(m − ½)d from the
        // centre, the change of PSL (dB) is (20/ln 10)(δa/a)/N · [−cos(ψ1 m′)/0.2172 − 1], m′ = n − (N + 1)/2 in element units
        // (first term: the sidelobe, second: the peak). Centre slot: cos ≈ 0.96 → about −5.4 (δa/a)/N·8.69;
        // edge slot: cos(7.5 ψ1) = cos(4.21) ≈ −0.48 → +1.2 (δa/a)/N·8.69 (derived here, array factor of Balanis 2005, Ch. 6).
        var (design, slot) = Designed(Enumerable.Repeat(1.0, N).ToArray(), Wr90Lossless);
        var model = ArrayTrialModel.Build(design, slot, Factory, Request(), new ToleranceOptions(PatternPoints: 4096, EnvelopePoints: 0));
        var s = ToleranceSensitivities.Compute(model, new ToleranceOptions(PatternPoints: 4096, EnvelopePoints: 0));
        foreach (var r in s.Take(8)) output.WriteLine($"slot {r.Slot} {r.Quantity}: dSLL {r.DsllDbPerUnit:F4} dB/mm, dS11 {r.Ds11DbPerUnit:F3} dB/mm");
        double Dsll(int slotNumber) => s.Single(r => r.Slot == slotNumber && r.Quantity == ToleranceQuantity.Offset).DsllDbPerUnit;

        double a = Wr90.BroadWall.Meters, x = Math.Abs(design.Slots[0].Coupling);
        double rel = Math.PI / a / Math.Tan(Math.PI * x / a) * 1e-3;          // δa/a per mm
        double psi1 = 2 * 4.4934 / N;
        double Expected(int n) => 20 / Math.Log(10) * rel / N * (-Math.Cos(psi1 * (n - (N + 1) / 2.0)) / 0.2172 - 1);
        output.WriteLine($"expected centre {Expected(8):F4}, edge {Expected(1):F4} dB/mm; measured {Dsll(8):F4}, {Dsll(1):F4}");
        // Measured here: −1.735 vs −1.754 (centre), 0.381 vs 0.390 (edge). The derivation uses the continuous line source's
        // ψ1 and −13.26 dB and ignores the slot element pattern, small-N effects of a few per cent: 5 % allowed.
        Check.Relative(Expected(8), Dsll(8), 0.05, "array-factor perturbation, derived in the test comment");
        Check.Relative(Expected(1), Dsll(1), 0.05, "array-factor perturbation, derived in the test comment");
        Check.Relative(Dsll(1), Dsll(16), 1e-3, "mirror symmetry of a uniform array");
        // Ranked: the largest |dSLL| first.
        Assert.True(Math.Abs(s[0].DsllDbPerUnit) >= Math.Abs(s[^1].DsllDbPerUnit));
        Assert.Equal(4 * N, s.Count);
    }
}
