using SlotArray.Spec.Schema;

namespace SlotArray.Cli.Tests;

/// <summary>
/// <c>slotarray init</c>: each kind's starter spec designs with exit 0 exactly as written, lists every key of the
/// spec, and an existing file is never overwritten without <c>--force</c>.
/// </summary>
public class InitCommandTests
{
    [Theory]
    [InlineData("standing-wave")]
    [InlineData("travelling-wave")]
    [InlineData("edge")]
    public void Each_kind_designs_with_exit_0_as_written(string kind)
    {
        string dir = DesignRuns.TempFolder("init-" + kind);
        string spec = Path.Combine(dir, "start.yaml");
        var (code, _, err) = DesignRuns.Run("init", "--kind", kind, spec);
        Assert.True(code == ExitCodes.Ok, err);
        Assert.True(File.Exists(Path.Combine(dir, SpecJsonSchema.FileName)), "the schema its modeline names is written beside it");
        var design = DesignRuns.Run("design", spec, "-o", Path.Combine(dir, "out"), "--cache-dir", Path.Combine(dir, "cache"));
        Assert.True(design.Code == ExitCodes.Ok, design.Err);
        Assert.True(File.Exists(Path.Combine(dir, "out", "design.json")));
    }

    [Fact]
    public void Starter_lists_every_key_and_prints_to_stdout_without_a_file()
    {
        var (code, output, _) = DesignRuns.Run("init", "--kind", "edge");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.StartsWith("# yaml-language-server: $schema=" + SpecJsonSchema.FileName + "\n", output);
        string[] lines = output.Split('\n');
        foreach (var section in SpecKeys.All.Where(s => s != SpecKeys.Sigma && s != SpecKeys.SigmaAngle))   // sigma is written inline: {sigma: 0.05 mm}
            foreach (var key in section.Keys)
                Assert.Contains(lines, l => l.TrimStart(' ', '#').StartsWith(key.Name + ":", StringComparison.Ordinal));
    }

    [Fact]
    public void Existing_file_is_left_untouched_with_exit_2_unless_force()
    {
        string path = Path.Combine(DesignRuns.TempFolder("init-keep"), "mine.yaml");
        File.WriteAllText(path, "my own notes\n");
        var (code, _, err) = DesignRuns.Run("init", path);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("--force", err);
        Assert.Equal("my own notes\n", File.ReadAllText(path));

        var forced = DesignRuns.Run("init", "--force", "--kind", "standing-wave", path);
        Assert.Equal(ExitCodes.Ok, forced.Code);
        Assert.Equal(StarterSpec.Text(StarterKind.StandingWave), File.ReadAllText(path));
    }

    [Fact]
    public void Unknown_kind_is_bad_input()
        => Assert.Equal(ExitCodes.BadInput, DesignRuns.Run("init", "--kind", "planar-circular").Code);
}
