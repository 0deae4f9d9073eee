using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.TravellingWave;

/// <summary>
/// Travelling-wave design with the calibrated edge-slot model, whose small-tilt cuts carry a susceptance: the designer
/// balances the powers with the complex admittances and moves the slots to put their far fields back in phase.
/// </summary>
public sealed class CalibratedEdgeSlotDesignTests
{
    private static readonly RectangularWaveguide Wr90 = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);

    private static ArrayRequest Request(int n, double load) =>
        new("edge-tw", F0, Frequency.FromGigahertz(9.3), Frequency.FromGigahertz(9.45), Wr90,
            new SlotRequest(SlotType.Edge, n, Length.FromMillimeters(1.6), null, SlotModelKind.MomentMethod),
            new FeedRequest(FeedType.TravellingWave, GuideDistance.InGuideWavelengths(0.45), FeedPosition.End, load, GuideDistance.InGuideWavelengths(0.25)),
            new TaperRequest(TaperType.Taylor, -25, 3, -20, 2, null), CouplingMode.None, null, Requirements.None, null);

    [Fact]
    public void The_load_takes_the_asked_power_and_the_slots_add_in_phase_at_the_beam()
    {
        var slot = CalibratedEdgeSlot.Create(Wr90, Length.FromMillimeters(1.6));
        var tw = TravellingWaveDesigner.Design(StickRequest.Of(Request(16, 0.5), slot, TaylorLineSource.Weights(16, -25, 3)));
        var sol = ArrayNetwork.Solve(tw.Design, slot, F0);
        // The power balance of the line with the slots' complex admittances (Pozar 2012, section 4.3, a lossless shunt
        // network conserves power): the load gets what was asked.
        Check.Absolute(0.5, sol.LoadPower, 1e-3, "feed.load, power balance of the designed network");
        Assert.Contains(tw.Design.Slots, s => !slot.DesignCut(Math.Abs(s.Coupling), F0).Resonant);
        // The far-field phases arg E_n + k z_n sin θ_b (array factor, Patterns.ArrayFactor: θ > 0 toward +z, the feed end)
        // agree within 1° at the beam the network's pattern shows (reported positive toward the load end, z = 0).
        var fig = ArrayFigures.At(tw.Design, sol);
        double s0 = -Math.Sin(fig.Metrics.BeamDirection.Radians), k = F0.FreeSpaceWavenumber;
        var u = tw.Design.Slots.Select((s, i) => Complex.FromPolarCoordinates(1, sol.Excitations[i].Phase + k * s0 * s.Position.Meters)).ToArray();
        var mean = u.Aggregate(Complex.Zero, (a, b) => a + b);
        Assert.All(u, x => Assert.InRange(Math.Abs((x / mean).Phase) * 180 / Math.PI, 0, 1.0));
    }
}
