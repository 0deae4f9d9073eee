namespace SlotArray.Cli.Tests;

/// <summary>
/// The full-wave commands' behaviour without running the engine: a missing engine is a clear, actionable error
/// (exit 2 with how to install it), and verify reads back a folder that design wrote. The engine runs themselves
/// are checked in SlotArray.FullWave.Tests.
/// </summary>
public class FullWaveCommandTests
{
    private const string Uniform6 = """
        spec: 1
        name: fw-uniform-6
        frequency: 9.375 GHz
        band: [9.2 GHz, 9.55 GHz]
        guide: {size: WR-90, wall: 1.27 mm, metal: aluminium}
        slots: {type: longitudinal, count: 6, width: 1.5875 mm}
        feed: {type: standing-wave}
        taper: {type: uniform}
        """;

    [Fact]
    public void Characterise_without_the_engine_says_how_to_install_it()
    {
        string spec = DesignRuns.Spec("fw-char", Uniform6);
        var (code, _, err) = DesignRuns.Run("characterise", spec, "-o", DesignRuns.TempFolder("fw-char-out"), "--engine", "/nonexistent/openEMS");
        Assert.Equal(2, code);
        Assert.Contains("apt-get install openems", err);
        Assert.Contains("--engine", err);
    }

    [Fact]
    public void Verify_of_a_folder_without_a_design_names_the_files_it_needs()
    {
        var (code, _, err) = DesignRuns.Run("verify", DesignRuns.TempFolder("fw-empty"));
        Assert.Equal(2, code);
        Assert.Contains("design.json and cutlist.csv", err);
    }

    [Fact]
    public void Verify_reads_a_designed_folder_and_estimates_before_it_needs_the_engine()
    {
        string spec = DesignRuns.Spec("fw-ver", Uniform6);
        string dir = DesignRuns.TempFolder("fw-ver-out");
        Assert.Equal(0, DesignRuns.Run("design", spec, "-o", dir, "--no-cache").Code);
        var (code, _, err) = DesignRuns.Run("verify", dir, "--engine", "/nonexistent/openEMS");
        Assert.Equal(2, code);
        Assert.Contains("apt-get install openems", err);
        var folder = FullWave.Arrays.DesignFolder.Read(dir);
        Assert.Equal(6, folder.Slots.Count);
        Assert.Equal("short", folder.Termination);
        var plan = FullWave.Arrays.ArrayVerification.Plan(folder, FullWave.Model.MeshDensity.Coarse);
        // Every slot is cut where the cut list puts it: one slot aperture per row, plus the four walls and the end plate.
        Assert.Equal(6, plan.Layout.Slots.Count);
        Assert.Equal(6, plan.Run.Model.Probes.Count);
    }
}
