using System.Diagnostics;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// The real process with its streams redirected, as in a pipe or a CI log: no progress bar, so no carriage return and
/// no escape sequence anywhere; and SIGINT (what Ctrl-C sends) ends a long run with exit 130 and no output folder
/// (130 = 128 + SIGINT 2, the shell convention; POSIX.1-2017, Shell Command Language, 2.8.2 "Exit Status for Commands").
/// </summary>
/// <remarks>Runs alone (<see cref="SignalTimingCollection"/>): with the other CLI tests in the same host, thread-pool
/// starvation delayed this test's own continuations past its one-minute limit while the run itself had stopped within
/// 0.1 s of SIGINT (measured by hand from a separate process at load average 27-30).</remarks>
[Collection(SignalTimingCollection.Name)]
public class ProgressTests
{
    private static Process Start(params string[] args)
    {
        var info = new ProcessStartInfo("dotnet")
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        info.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "slotarray.dll"));
        foreach (string a in args) info.ArgumentList.Add(a);
        info.Environment["XDG_CACHE_HOME"] = DesignRuns.TempFolder("progress-cache");
        return Process.Start(info)!;
    }

    [Fact]
    public async Task Redirected_stderr_gets_no_carriage_return_and_no_escape_sequence()
    {
        string dir = DesignRuns.TempFolder("progress-redirected");
        using var p = Start("tolerance", RepoFiles.Demo, "--trials", "3000", "-o", dir);
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        await p.WaitForExitAsync();
        string err = await stderr;
        string all = await stdout + err;
        Assert.True(p.ExitCode == 0, err);
        Assert.DoesNotContain('\r', all);
        Assert.DoesNotContain('\u001b', all);
        Assert.True(File.Exists(Path.Combine(dir, "tolerance.json")));
    }

    [Fact]
    public async Task Interrupt_ends_a_long_run_with_exit_130_and_writes_nothing()
    {
        string dir = Path.Combine(DesignRuns.TempFolder("progress-interrupt"), "out");
        using var p = Start("tolerance", RepoFiles.Demo, "--trials", "1000000", "-o", dir);
        _ = p.StandardOutput.ReadToEndAsync();
        var seen = new System.Text.StringBuilder();
        for (string? line; (line = await p.StandardError.ReadLineAsync()) is not null;)   // wait until the Monte Carlo has started
        {
            seen.AppendLine(line);
            if (line.Contains("Monte Carlo trials", StringComparison.Ordinal)) break;
        }
        var stderr = p.StandardError.ReadToEndAsync();
        await Task.Delay(1000);   // into the trials (a million take minutes)
        using (var kill = Process.Start("kill", ["-INT", p.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)])) await kill.WaitForExitAsync();
        using var limit = new CancellationTokenSource(TimeSpan.FromMinutes(1));
        await p.WaitForExitAsync(limit.Token);   // throws if the run did not stop within a minute of SIGINT
        string err = await stderr;
        Assert.True(p.ExitCode == 130, $"exit {p.ExitCode}: {seen}{err}");
        Assert.Contains("interrupted: nothing written", err);
        Assert.False(Directory.Exists(dir), "an interrupted run wrote its output folder");
    }
}

/// <summary>Tests that time a process's response to a signal: run after the parallel ones, not beside them.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class SignalTimingCollection
{
    /// <summary>The collection's name.</summary>
    public const string Name = "signal timing";
}
