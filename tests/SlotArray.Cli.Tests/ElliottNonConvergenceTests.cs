using System.Text.Json;
using SlotArray.Cli.Commands;
using SlotArray.Core.Design;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// Issue 11: Elliott's iteration not converging is a user-actionable failure, exit 1 with the slot and what to change,
/// never exit 3. A real spec (the demo with <c>coupling: mutual</c>) is driven into non-convergence through the
/// command's composition-root seam (<see cref="DesignCommand.ElliottLimits"/>: a tiny iteration limit), since no bundled
/// scenario fails to converge with the default limits.
/// </summary>
public class ElliottNonConvergenceTests
{
    private static string MutualDemo() => DesignRuns.Spec("elliott-limit",
        File.ReadAllText(RepoFiles.Demo).Replace("coupling: none", "coupling: mutual"));

    private static (int Code, string Out, string Err) DesignWith(ElliottOptions limits, params string[] extra)
    {
        DesignCommand.ElliottLimits.Value = limits;
        try
        {
            return DesignRuns.Run(["design", MutualDemo(), "-o", DesignRuns.TempFolder("elliott-limit-out"), .. extra]);
        }
        finally
        {
            DesignCommand.ElliottLimits.Value = null;
        }
    }

    [Fact]
    public void Newton_on_Elliotts_equations_not_converging_is_exit_1_naming_the_slot_and_what_to_change()
    {
        var (code, _, err) = DesignWith(ElliottOptions.Default with { NewtonIterations = 1 });
        Assert.True(code == ExitCodes.Infeasible, $"exit {code}: {err}");
        Assert.Matches(@"not converged: slot \d+: Newton on Elliott's equations stopped with residual", err);
        Assert.Contains("use a gentler taper, more slots or coupling: none", err);
        Assert.DoesNotContain("internal error", err);
    }

    [Fact]
    public void Elliotts_outer_iteration_not_converging_is_exit_1_naming_the_slot_and_what_to_change_also_as_json()
    {
        var (code, output, err) = DesignWith(ElliottOptions.Default with { MaximumIterations = 1 }, "--json");
        Assert.True(code == ExitCodes.Infeasible, $"exit {code}: {err}");
        Assert.Matches(@"Elliott's iteration did not converge in 1 iterations: slot \d+ still moved by", err);
        Assert.Contains("use a gentler taper, more slots or coupling: none", err);
        using var doc = JsonDocument.Parse(output);
        var e = doc.RootElement.GetProperty("error");
        Assert.Equal(ExitCodes.Infeasible, e.GetProperty("exit_code").GetInt32());
        Assert.Contains("still moved by", e.GetProperty("message").GetString());
    }
}
