using SlotArray.Core.Tolerance;
using SlotArray.Cli.Tests;
using SlotArray.Tests.Shared;

namespace SlotArray.Library.Tests;

/// <summary>
/// The facade against the command line it stands beside: the same spec gives byte-identical output folders, the
/// bundled examples load from any folder, and errors carry what the user needs to act on.
/// </summary>
public class SlotArrayDesignerTests
{
    /// <summary>The Cli tests' small 8-slot spec with a short tolerance block; its path.</summary>
    private static string SmallSpec(string tag) => DesignRuns.SmallSpec(tag, "tolerance: {offset: 0.02 mm, length: 0.02 mm, trials: 60, seed: 3}\n");

    [Fact]
    public void Design_tolerance_and_write_give_the_same_folder_as_slotarray_design_byte_for_byte()
    {
        string spec = SmallSpec("facade-small");
        string dir = Path.GetDirectoryName(spec)!;

        string cliOut = Path.Combine(dir, "cli");
        var (code, _, err) = DesignRuns.Run("design", spec, "-o", cliOut, "--no-cache");
        Assert.True(code == 0, err);

        var design = SlotArrayDesigner.Design(SlotArrayDesigner.LoadSpec(spec));
        var tolerance = SlotArrayDesigner.Tolerance(design);
        string libOut = Path.Combine(dir, "lib");
        var written = SlotArrayDesigner.WriteOutputs(design, libOut, tolerance);

        var cliFiles = Directory.GetFiles(cliOut).Select(p => Path.GetFileName(p)).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(cliFiles, written.Order(StringComparer.Ordinal).ToList());
        foreach (string name in cliFiles)
            Assert.True(File.ReadAllBytes(Path.Combine(cliOut, name)).SequenceEqual(File.ReadAllBytes(Path.Combine(libOut, name))),
                $"{name} differs between slotarray design and SlotArrayDesigner.WriteOutputs");
        Assert.Equal(8, design.Slots.Count);
        Assert.True(design.PeakSidelobeDb < 0);
    }

    [Fact]
    public void The_bundled_examples_load_from_any_folder_with_the_repository_files_text()
    {
        var names = Directory.GetFiles(Path.Combine(RepoFiles.Root, "arrays"), "*.yaml").Select(p => "arrays/" + Path.GetFileName(p))
            .Order(StringComparer.Ordinal).ToList();
        Assert.Equal(names, SlotArrayDesigner.BundledExamples);
        Assert.False(File.Exists(Path.Combine(Environment.CurrentDirectory, "arrays", "harbour-surveillance-16.yaml")));   // the test runs in its bin folder
        var spec = SlotArrayDesigner.LoadSpec("arrays/harbour-surveillance-16.yaml");
        Assert.Equal(File.ReadAllText(RepoFiles.Demo), spec.Text);
        Assert.Equal("harbour-surveillance-16", spec.Name);
        Assert.Equal(16, spec.Request.Slots.Count);
    }

    [Fact]
    public void A_missing_file_and_a_spec_with_errors_throw_with_what_to_change()
    {
        var missing = Assert.Throws<InvalidSpecException>(() => SlotArrayDesigner.LoadSpec("no/such/spec.yaml"));
        Assert.Contains("spec file not found: no/such/spec.yaml", missing.Message, StringComparison.Ordinal);

        var bad = Assert.Throws<InvalidSpecException>(() => SlotArrayDesigner.ParseSpec(File.ReadAllText(SmallSpec("facade-typo")).Replace("taper:", "tapr:", StringComparison.Ordinal), "typo.yaml"));
        var e = Assert.Single(bad.Errors, x => x.Message.Contains("tapr", StringComparison.Ordinal));
        Assert.Equal("typo.yaml", e.File);
        Assert.Equal(8, e.Line);
        Assert.Contains("typo.yaml:8:", bad.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Tolerance_needs_a_tolerance_block_and_takes_trials_and_seed()
    {
        var plain = SlotArrayDesigner.Design(SlotArrayDesigner.ParseSpec(File.ReadAllText(SmallSpec("facade-plain")).Replace("tolerance:", "# tolerance:", StringComparison.Ordinal)));
        var ex = Assert.Throws<ArgumentException>(() => SlotArrayDesigner.Tolerance(plain));
        Assert.Contains("tolerance:", ex.Message, StringComparison.Ordinal);

        var design = SlotArrayDesigner.Design(SlotArrayDesigner.LoadSpec(SmallSpec("facade-seed")));
        ToleranceResult a = SlotArrayDesigner.Tolerance(design, trials: 20, seed: 11);
        ToleranceResult b = SlotArrayDesigner.Tolerance(design, trials: 20, seed: 11);
        Assert.Equal(20, a.Tolerance.Trials);
        Assert.Equal(11, a.Tolerance.Seed);
        Assert.Equal(a.MonteCarlo.PeakSidelobeDb.Mean, b.MonteCarlo.PeakSidelobeDb.Mean);   // same seed, same numbers
    }
}
