using System.Text.Json;
using SlotArray.Cli;
using SlotArray.Reports;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// Issue 11, output folders: every problem with the folder a command writes into is bad input (exit 2), found before
/// any computation (no "designing" progress line), and the hidden temporaries of killed runs are cleared.
/// </summary>
public class OutputFolderTests
{
    // A small uniform 8-slot array: designs in about a second with Stevenson slots.
    private const string Small = """
        spec: 1
        name: small
        frequency: 9.375 GHz
        band: [9.35 GHz, 9.40 GHz]
        guide: {size: WR-90, wall: 1.27 mm, metal: aluminium}
        slots: {type: longitudinal, count: 8, width: 1.6 mm, model: stevenson}
        feed: {type: standing-wave}
        taper: {type: uniform}
        tolerance: {offset: 0.02 mm, trials: 5, seed: 1}
        """;

    private static (string Spec, string Dir) Fresh(string tag)
    {
        string spec = DesignRuns.Spec(tag, Small);
        return (spec, Path.GetDirectoryName(spec)!);
    }

    private static void AssertRefusedBeforeComputing((int Code, string Out, string Err) run, string expected)
    {
        Assert.True(run.Code == ExitCodes.BadInput, run.Err);
        Assert.Contains(expected, run.Err);
        Assert.DoesNotContain("designing", run.Err);   // the check comes before the pipeline runs
    }

    [Fact]
    public void Issue11_output_folder_naming_a_file_is_bad_input_before_the_design_runs()
    {
        var (spec, dir) = Fresh("o-file");
        string file = Path.Combine(dir, "result.txt");
        File.WriteAllText(file, "mine");
        AssertRefusedBeforeComputing(DesignRuns.Run("design", spec, "-o", file, "--no-cache"), "-o names a file");
        AssertRefusedBeforeComputing(DesignRuns.Run("sweep", spec, "-o", file, "--no-cache"), "-o names a file");
        AssertRefusedBeforeComputing(DesignRuns.Run("tolerance", spec, "-o", file), "-o names a file");
        AssertRefusedBeforeComputing(DesignRuns.Run("design", spec, "-o", Path.Combine(file, "sub"), "--no-cache"), "is a file");
        Assert.Equal("mine", File.ReadAllText(file));
    }

    [Fact]
    public void Issue11_output_folder_at_the_root_is_bad_input()
    {
        var (spec, _) = Fresh("o-root");
        AssertRefusedBeforeComputing(DesignRuns.Run("design", spec, "-o", "/", "--no-cache"), "root folder");
    }

    [Fact]
    public void Issue11_output_folder_holding_foreign_files_is_bad_input_and_untouched()
    {
        var (spec, dir) = Fresh("o-foreign");
        string outDir = Path.Combine(dir, "out");
        Directory.CreateDirectory(outDir);
        File.WriteAllText(Path.Combine(outDir, "notes.txt"), "keep me");
        AssertRefusedBeforeComputing(DesignRuns.Run("design", spec, "-o", outDir, "--no-cache"), "notes.txt");
        Assert.Equal(["notes.txt"], Directory.GetFileSystemEntries(outDir).Select(Path.GetFileName));
    }

    [Fact]
    [System.Runtime.Versioning.UnsupportedOSPlatform("windows")]   // Unix file modes; CI runs on Linux
    public void Issue11_read_only_output_folder_is_bad_input()
    {
        var (spec, dir) = Fresh("o-readonly");
        string ro = Path.Combine(dir, "ro");
        Directory.CreateDirectory(ro);
        File.SetUnixFileMode(ro, UnixFileMode.UserRead | UnixFileMode.UserExecute);
        // chmod does not stop the superuser: then take sysfs, which refuses new files even to root (Linux).
        string target = CanCreateIn(ro) ? "/sys/fs" : ro;
        try
        {
            AssertRefusedBeforeComputing(DesignRuns.Run("design", spec, "-o", target, "--no-cache"), "read-only");
            AssertRefusedBeforeComputing(DesignRuns.Run("design", spec, "-o", Path.Combine(target, "new"), "--no-cache"), "read-only");
            AssertRefusedBeforeComputing(DesignRuns.Run("tolerance", spec, "-o", target), "read-only");
        }
        finally
        {
            File.SetUnixFileMode(ro, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        }
    }

    private static bool CanCreateIn(string folder)
    {
        try
        {
            string p = Path.Combine(folder, "probe");
            File.WriteAllText(p, "");
            File.Delete(p);
            return true;
        }
        catch (UnauthorizedAccessException) { return false; }
    }

    [Fact]
    public void Issue11_design_into_a_tolerance_folder_works_and_keeps_the_tolerance_files_and_the_reverse()
    {
        var (spec, dir) = Fresh("o-shared");
        string outDir = Path.Combine(dir, "out");
        var tol = DesignRuns.Run("tolerance", spec, "-o", outDir);
        Assert.True(tol.Code == ExitCodes.Ok, tol.Err);
        byte[] json = File.ReadAllBytes(Path.Combine(outDir, "tolerance.json"));

        var design = DesignRuns.Run("design", spec, "-o", outDir, "--no-cache");
        Assert.True(design.Code == ExitCodes.Ok, design.Err);
        var names = Directory.GetFileSystemEntries(outDir).Select(Path.GetFileName).ToHashSet();
        // vertical.png, parts.csv and parts.svg are written only with a flare or a filter (issue 18), slot-table.csv only with
        // a slot table (slots.data); this spec has none of them.
        string[] conditional = ["vertical.png", "parts.csv", "parts.svg", "slot-table.csv"];
        Assert.Superset(new HashSet<string?>(OutputFolder.Files.Select(f => f.Name).Except(conditional).Concat(OutputFolderCheck.ToleranceFiles)), names);
        Assert.DoesNotContain(names, n => conditional.Contains(n));
        Assert.Equal(OutputFolder.Files.Count - conditional.Length + OutputFolderCheck.ToleranceFiles.Count, names.Count);
        Assert.Equal(json, File.ReadAllBytes(Path.Combine(outDir, "tolerance.json")));

        byte[] cut = File.ReadAllBytes(Path.Combine(outDir, "cutlist.csv"));
        var again = DesignRuns.Run("tolerance", spec, "-o", outDir);
        Assert.True(again.Code == ExitCodes.Ok, again.Err);
        Assert.Equal(cut, File.ReadAllBytes(Path.Combine(outDir, "cutlist.csv")));
        Assert.Equal([], Directory.GetFileSystemEntries(dir).Select(Path.GetFileName).Where(n => n!.StartsWith('.')));
    }

    [Fact]
    public void Issue11_stale_hidden_temporaries_of_killed_runs_are_removed_and_an_orphaned_older_output_restored()
    {
        var (spec, dir) = Fresh("o-stale");
        // Process id 2147483646 runs nowhere (Linux pid_max is at most 2^22): these are a killed run's leftovers.
        string tmp = Path.Combine(dir, ".out.tmp-2147483646-0123abcd");
        string old = Path.Combine(dir, ".out.old-2147483646-0123abce");
        Directory.CreateDirectory(tmp);
        File.WriteAllText(Path.Combine(tmp, "design.json"), "{}");
        Directory.CreateDirectory(old);
        File.WriteAllText(Path.Combine(old, "summary.md"), "older output");
        // A live process's temporary (this test host's own id) is left alone.
        string live = Path.Combine(dir, $".out.tmp-{Environment.ProcessId}-0123abcf");
        Directory.CreateDirectory(live);

        string outDir = Path.Combine(dir, "out");
        var run = DesignRuns.Run("design", spec, "-o", outDir, "--no-cache");
        Assert.True(run.Code == ExitCodes.Ok, run.Err);
        Assert.False(Directory.Exists(tmp));
        Assert.False(Directory.Exists(old));   // put back as out/ first, then replaced by this run's output
        Assert.True(Directory.Exists(live));
        Assert.Contains("small", File.ReadAllText(Path.Combine(outDir, "summary.md")));

        string atomic = Path.Combine(outDir, ".tolerance.json.2147483646.tmp");
        File.WriteAllText(atomic, "half");
        Assert.True(DesignRuns.Run("tolerance", spec, "-o", outDir).Code == ExitCodes.Ok);
        Assert.False(File.Exists(atomic));
        Directory.Delete(live);
    }

    [Fact]
    public void Issue11_an_orphaned_older_output_is_moved_back_when_the_output_folder_is_missing()
    {
        var (_, dir) = Fresh("o-orphan");
        string old = Path.Combine(dir, ".out.old-2147483646-0123abce");
        Directory.CreateDirectory(old);
        File.WriteAllText(Path.Combine(old, "summary.md"), "older output");
        string target = OutputFolderCheck.Prepare(Path.Combine(dir, "out"), replacesWhole: true);
        Assert.Equal("older output", File.ReadAllText(Path.Combine(target, "summary.md")));
        Assert.False(Directory.Exists(old));
    }
}

/// <summary>Issue 11: every <c>--json</c> command prints one JSON error object on stdout when it fails, and a readable message on stderr.</summary>
public class JsonErrorTests
{
    private static JsonElement ErrorOf((int Code, string Out, string Err) run, int expectedCode, string kind)
    {
        Assert.Equal(expectedCode, run.Code);
        Assert.False(string.IsNullOrWhiteSpace(run.Err), "the readable message still goes to stderr");
        var e = JsonDocument.Parse(run.Out).RootElement.GetProperty("error");   // stdout holds one JSON document and nothing else
        Assert.Equal(expectedCode, e.GetProperty("exit_code").GetInt32());
        Assert.Equal(kind, e.GetProperty("kind").GetString());
        Assert.False(string.IsNullOrWhiteSpace(e.GetProperty("message").GetString()));
        return e;
    }

    [Fact]
    public void Issue11_check_json_of_a_bad_spec_prints_the_positioned_errors_as_json()
    {
        string spec = DesignRuns.Spec("json-bad", "spec: 1\nname: x\nfrequency: 9.375 GHz\nguide: {size: WR-90, wall: 1.27 GHz}\nslots: {type: longitudinal, count: 8, width: 1.6 mm}\nfeed: {type: standing-wave}\n");
        foreach (string cmd in new[] { "check", "design", "tolerance" })
        {
            var e = ErrorOf(DesignRuns.Run(cmd, spec, "--json"), ExitCodes.BadInput, "bad-input");
            var first = e.GetProperty("errors")[0];
            Assert.Equal(4, first.GetProperty("line").GetInt32());
            Assert.True(first.GetProperty("column").GetInt32() > 1);
            Assert.Contains("wall", first.GetProperty("message").GetString());
        }
    }

    [Fact]
    public void Issue11_design_json_of_an_infeasible_spec_prints_an_infeasible_error_object()
    {
        // weights 0.2, 1, 0.2 ask g = 0.926 of the middle slot, beyond any longitudinal slot in WR-90 (DesignCommandFailureTests)
        string spec = DesignRuns.Spec("json-infeasible", "spec: 1\nname: x\nfrequency: 9.375 GHz\nband: [9.35 GHz, 9.40 GHz]\nguide: {size: WR-90, wall: 1.27 mm, metal: aluminium}\nfeed: {type: standing-wave}\nslots: {type: longitudinal, count: 3, width: 1.6 mm}\ntaper: {type: given, weights: [0.2, 1, 0.2]}\n");
        var e = ErrorOf(DesignRuns.Run("design", spec, "--json", "--no-cache", "-o", Path.Combine(Path.GetDirectoryName(spec)!, "out")), ExitCodes.Infeasible, "infeasible");
        Assert.Contains("slot 2", e.GetProperty("message").GetString());
    }

    [Fact]
    public void Issue11_every_json_command_prints_an_error_object_on_bad_options()
    {
        ErrorOf(DesignRuns.Run("guides", "--json", "--bogus"), ExitCodes.BadInput, "bad-input");
        ErrorOf(DesignRuns.Run("taper", "--type", "nope", "--count", "8", "--json"), ExitCodes.BadInput, "bad-input");
        ErrorOf(DesignRuns.Run("taper", "--type", "uniform", "--count", "abc", "--json"), ExitCodes.BadInput, "bad-input");   // a parse error: no help text on stdout
        ErrorOf(DesignRuns.Run("slot", "--guide", "WR-90", "--frequency", "5GHz", "--offset", "1mm", "--json"), ExitCodes.BadInput, "bad-input");
        ErrorOf(DesignRuns.Run("check", "no-such-spec.yaml", "--json"), ExitCodes.BadInput, "bad-input");
        ErrorOf(DesignRuns.Run("tolerance", RepoFiles.Tube, "--json", "-o", DesignRuns.TempFolder("json-tol")), ExitCodes.BadInput, "bad-input");
        string file = Path.Combine(DesignRuns.TempFolder("json-ofile"), "f");
        File.WriteAllText(file, "");
        ErrorOf(DesignRuns.Run("design", RepoFiles.Tube, "--json", "-o", file), ExitCodes.BadInput, "bad-input");
    }

    [Fact]
    public void Without_json_a_failure_prints_nothing_on_stdout()
    {
        var run = DesignRuns.Run("taper", "--type", "nope", "--count", "8");
        Assert.Equal(ExitCodes.BadInput, run.Code);
        Assert.Equal("", run.Out);
    }
}
