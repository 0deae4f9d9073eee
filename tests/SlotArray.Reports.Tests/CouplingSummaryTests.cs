using SlotArray.Core.Design;
using SlotArray.Reports.Model;

namespace SlotArray.Reports.Tests;

/// <summary>The summary.md section of a coupled design: both columns and the iteration table.</summary>
public class CouplingSummaryTests
{
    [Fact]
    public void Shows_the_coupled_and_isolated_slot_figures_side_by_side_and_every_iteration()
    {
        var report = new CouplingReport
        {
            Coupled = new CoupledDesignFigures { S11DbAtDesign = -52.28, BestMatchHz = 9.4105e9, BestMatchS11Db = -53.4, PeakSidelobeDb = -26.24 },
            Uncoupled = new CoupledDesignFigures { S11DbAtDesign = -19.69, BestMatchHz = 9.3766e9, BestMatchS11Db = -23.7, PeakSidelobeDb = -26.64 },
            Iterations = [new ElliottIteration(1, 1.1e-4, 1.8e-4, 8, 0.198), new ElliottIteration(2, 5e-8, 1e-8, 3, 2e-6)],
            Tolerance = 1e-7,
            SurrogateError = 0.0025,
        };
        var lines = new List<string>();
        CouplingSummary.Write(report, lines.Add);
        Assert.Contains("| S11 at the design frequency | -52.28 | -19.69 | dB |", lines);
        Assert.Contains("| frequency of best match | 9.4105 | 9.3766 | GHz |", lines);
        Assert.Contains("| peak sidelobe at the design frequency | -26.24 | -26.64 | dB |", lines);
        Assert.Contains("| 1 | 0.11000 | 0.18000 | 8 | 0.198000 |", lines);
        Assert.Contains("| 2 | 0.00005 | 0.00001 | 3 | 0.000002 |", lines);
    }
}
