using SlotArray.Core.Design;
using SlotArray.Core.Tolerance;
using SlotArray.Reports.Model;
using SlotArray.Spec;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// Issue 11, "one set of figures": with <c>coupling: mutual</c>, <c>design</c>'s tolerance section, the
/// <c>tolerance</c> command and the key figures perturb and report the same delivered design on the same coupled
/// network (before: S11 −19.5, −55.0 and −52.3 dB for the three). The reference is the pipeline's own key figure
/// (the coupled network at the design frequency); the tolerance nominal must reproduce it.
/// </summary>
public class CoupledToleranceConsistencyTests
{
    [Theory]
    [InlineData("standing-wave")]
    [InlineData("travelling-wave")]
    public void Design_tolerance_section_tolerance_command_and_key_figures_share_the_nominal(string feed)
    {
        string yaml = File.ReadAllText(RepoFiles.Demo).Replace("coupling: none", "coupling: mutual");
        if (feed == "travelling-wave")
            yaml = yaml.Replace("  type: standing-wave\n  spacing: 0.5 guide-wavelength\n  position: end\n  short: 0.25 guide-wavelength",
                "  type: travelling-wave\n  spacing: 0.45 guide-wavelength\n  load: 20 %");
        Assert.Contains(feed, yaml);
        var loaded = SpecLoader.Parse(yaml, "mutual.yaml");
        Assert.True(loaded.IsValid, string.Join("\n", loaded.Errors));
        var request = loaded.Request!;
        var tol = request.Tolerance! with { Trials = 40 };

        var result = ArrayPipeline.Run(request);
        double keyS11 = DesignReportBuilder.Build(result).Match.S11DbAtDesign;
        var inDesign = ToleranceAnalysis.Run(result, tol).MonteCarlo;                       // design's tolerance section
        var (design, slot) = ToleranceAnalysis.Design(request);                              // the tolerance command's design
        var command = ToleranceAnalysis.Run(request, design, slot, tol).MonteCarlo;

        Assert.Equal(result.Design.Slots, design.Slots);                                    // the delivered (coupled) design
        Assert.Equal(inDesign.Nominal, command.Nominal);
        Assert.Equal(inDesign.PeakSidelobeDb, command.PeakSidelobeDb);
        Assert.True(Math.Abs(command.Nominal.S11Db - keyS11) < 0.01,
            $"{feed}: tolerance nominal S11 {command.Nominal.S11Db:0.000} dB, key figure {keyS11:0.000} dB");
    }
}
