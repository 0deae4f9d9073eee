using SlotArray.Cli;

namespace SlotArray.Cli.Tests;

/// <summary>
/// Issue 11: a spec the check accepts either designs or exits 1 with the reason, never 3. These specs once ended in
/// "internal error … this is a bug".
/// </summary>
public class DesignabilityExitCodeTests
{
    private const string Spec = """
        spec: 1
        name: no-resonance
        frequency: 12.9 GHz
        band: [12.8 GHz, 13.0 GHz]
        guide:
          size: WR-90
          wall: 0.001 mm
          metal: aluminium
        slots:
          type: longitudinal
          count: 4
          width: 1.6 mm
          model: moment-method
        feed:
          type: standing-wave
        taper:
          type: uniform
        """;

    [Fact]
    public void No_slot_resonance_at_12_9_GHz_with_a_0_001_mm_wall_exits_1_with_what_to_change()
    {
        string path = DesignRuns.Spec("no-resonance", Spec);
        string outDir = Path.Combine(Path.GetDirectoryName(path)!, "out");
        var (check, _, _) = DesignRuns.Run("check", path);
        Assert.Equal(ExitCodes.Ok, check);   // nothing predicts it: the check accepts the spec
        var (code, _, err) = DesignRuns.Run("design", path, "-o", outDir, "--no-cache");
        Assert.Equal(ExitCodes.Infeasible, code);
        Assert.Contains("not converged: no resonance", err, StringComparison.Ordinal);
        Assert.Contains("move the frequency", err, StringComparison.Ordinal);
        Assert.DoesNotContain("internal error", err, StringComparison.Ordinal);
        Assert.False(Directory.Exists(outDir));
    }
}
