using SlotArray.Core.Design;
using SlotArray.Core.Tests.DesignTests;
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
        var c = Assert.IsType<ElliottComparison>(r.Coupling);
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
    public void Mutual_coupling_with_no_coupled_designer_for_the_feed_is_infeasible()
    {
        var request = Request(8) with { Coupling = CouplingMode.Mutual, Feed = Request(8).Feed with { Type = FeedType.TravellingWave } };
        var e = Assert.Throws<InfeasibleDesignException>(() => ArrayPipeline.Run(request, new AnalysisOptions(SweepPoints: 11)));
        Assert.Contains("coupling: none", e.Message);
    }
}
