using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.Core.Tests.DesignTests;
using SlotArray.Core.Tests.TravellingWave;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.ElliottTests;

/// <summary>The pipeline with <c>coupling: mutual</c>: the coupled design, its coupled analysis and the side-by-side figures.</summary>
public class ElliottPipelineTests
{
    [Fact]
    public void Mutual_coupling_runs_Elliotts_design_and_compares_it_with_the_isolated_slot_design()
    {
        var request = Request(8) with { Coupling = CouplingMode.Mutual };
        var r = ArrayPipeline.Run(request, new AnalysisOptions(SweepPoints: 11));
        var c = Assert.IsType<ElliottProcedure>(r.Procedure).Comparison;
        Assert.Same(c.Elliott.Design, r.Design);
        // Issue 8 acceptance: the coupled design is matched under the coupled analysis (below −30 dB; aluminium line loss
        // is not compensated), the isolated-slot design is not as well matched.
        Assert.True(c.Coupled.S11Db < -30, $"coupled S11 {c.Coupled.S11Db:0.0} dB");
        Assert.True(c.Uncoupled.S11Db > c.Coupled.S11Db + 10, $"uncoupled S11 {c.Uncoupled.S11Db:0.0} dB");
        Assert.Equal(r.AtDesign.Network.S11, c.Coupled.AtDesign.S11);
        Assert.NotNull(c.Coupled.PeakSidelobeDb);
        Assert.InRange(c.Coupled.BestMatch.Frequency.Hertz, request.BandLow.Hertz, request.BandHigh.Hertz);
    }

    [Fact]
    public void Mutual_coupling_with_edge_slots_is_infeasible()
    {
        // Edge slots have no equivalent-dipole coupling model (CoupledArrayNetwork): the pipeline says what to change.
        var request = TravellingWaveDesignerTests.Travelling(8, 0.2, type: SlotType.Edge) with { Coupling = CouplingMode.Mutual };
        var e = Assert.Throws<InfeasibleDesignException>(() => ArrayPipeline.Run(request, new AnalysisOptions(SweepPoints: 11)));
        Assert.Contains("coupling: none", e.Message);
    }

    [Fact]
    public void Mutual_coupling_with_a_travelling_wave_feed_runs_the_coupled_travelling_wave_design()
    {
        var request = TravellingWaveDesignerTests.Travelling(16, 0.2) with { Coupling = CouplingMode.Mutual };
        var r = ArrayPipeline.Run(request, new AnalysisOptions(SweepPoints: 11));
        var c = Assert.IsType<CoupledTravellingWaveProcedure>(r.Procedure).Comparison;
        Assert.Same(c.Result.Design, r.Design);
        Assert.Equal(r.AtDesign.Network.S11, c.Coupled.AtDesign.S11);
        // Issue 8 item 4: the load receives the requested 20 % within 0.5 % absolute under the coupled analysis
        // (the pipeline's Stevenson model, frequency-interpolated for the analysis).
        Assert.InRange(r.AtDesign.Network.LoadPower, 0.195, 0.205);
        Assert.NotNull(c.Uncoupled.PeakSidelobeDb);
    }
}
