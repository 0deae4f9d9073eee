using System.Diagnostics;
using System.Globalization;
using System.Text.RegularExpressions;

namespace SlotArray.FullWave.Engine;

/// <summary>The engine is not installed (or not where it was said to be); the message says how to install it.</summary>
internal sealed class EngineNotFoundException(string message) : Exception(message);

/// <summary>The engine ran but failed; the message names the run folder and the last lines of its log.</summary>
internal sealed class EngineRunException(string message) : Exception(message);

/// <summary>What one finished engine run reports about itself.</summary>
/// <param name="Cells">FDTD cells.</param>
/// <param name="Timesteps">Time steps taken.</param>
/// <param name="Seconds">Wall-clock seconds of the engine process.</param>
internal sealed record EngineRunStats(long Cells, long Timesteps, double Seconds)
{
    /// <summary>Throughput, cell updates per second.</summary>
    public double CellsPerSecond => Seconds > 0 ? Cells * (double)Timesteps / Seconds : 0;
}

/// <summary>
/// The openEMS FDTD engine as an external process: <c>openEMS FILE.xml --numThreads=1</c> run in the file's
/// folder, which then holds the probe files. Found on PATH, or at the path the user gives.
/// </summary>
internal sealed class OpenEmsEngine
{
    /// <summary>The executable's file name on PATH.</summary>
    public const string ExecutableName = "openEMS";

    /// <summary>How to install the engine, printed when it is missing.</summary>
    public const string InstallHint =
        "the full-wave engine openEMS was not found on PATH: install it (Debian/Ubuntu: `sudo apt-get install openems`; " +
        "other systems: see the openEMS project's install guide) or give its path with --engine PATH. " +
        "The main job (design, check, sweep, tolerance) never needs it.";

    private OpenEmsEngine(string path) => ExecutablePath = path;

    /// <summary>Full path of the engine executable.</summary>
    public string ExecutablePath { get; }

    /// <summary>Finds the engine: <paramref name="explicitPath"/> when given (must exist), else the first <c>openEMS</c> on PATH.</summary>
    /// <exception cref="EngineNotFoundException">Not found; the message says how to install it.</exception>
    public static OpenEmsEngine Locate(string? explicitPath)
    {
        if (explicitPath is not null)
        {
            if (File.Exists(explicitPath)) return new OpenEmsEngine(Path.GetFullPath(explicitPath));
            throw new EngineNotFoundException($"--engine {explicitPath}: no such file. " + InstallHint);
        }
        foreach (string dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries))
        {
            string candidate = Path.Combine(dir, ExecutableName);
            if (File.Exists(candidate)) return new OpenEmsEngine(candidate);
        }
        throw new EngineNotFoundException(InstallHint);
    }

    /// <summary>
    /// Runs the engine on <paramref name="xmlFile"/> in its folder with <paramref name="threads"/> threads, writing its
    /// console output to <c>engine.log</c> there. Cancelling kills the process.
    /// </summary>
    /// <exception cref="EngineRunException">The engine exited with an error.</exception>
    public async Task<EngineRunStats> RunAsync(string xmlFile, CancellationToken cancel, int threads = 1)
    {
        string folder = Path.GetDirectoryName(Path.GetFullPath(xmlFile))!;
        var psi = new ProcessStartInfo(ExecutablePath)
        {
            WorkingDirectory = folder,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        psi.ArgumentList.Add(Path.GetFileName(xmlFile));
        psi.ArgumentList.Add(FormattableString.Invariant($"--numThreads={Math.Max(1, threads)}"));
        var clock = Stopwatch.StartNew();
        using var process = Process.Start(psi) ?? throw new EngineRunException($"could not start {ExecutablePath}");
        var stdout = process.StandardOutput.ReadToEndAsync(cancel);
        var stderr = process.StandardError.ReadToEndAsync(cancel);
        try
        {
            await process.WaitForExitAsync(cancel);
        }
        catch (OperationCanceledException)
        {
            try { process.Kill(entireProcessTree: true); } catch (InvalidOperationException) { }
            throw;
        }
        string log = await stdout + await stderr;
        await File.WriteAllTextAsync(Path.Combine(folder, "engine.log"), log, CancellationToken.None);
        if (process.ExitCode != 0)
        {
            string tail = string.Join(" | ", log.Split('\n', StringSplitOptions.RemoveEmptyEntries).TakeLast(4));
            throw new EngineRunException($"openEMS failed (exit {process.ExitCode}) in {folder}: {tail}");
        }
        return ParseStats(log, clock.Elapsed.TotalSeconds);
    }

    /// <summary>Reads "Time for N iterations with C cells" from the engine's log; the wall time is ours.</summary>
    internal static EngineRunStats ParseStats(string log, double seconds)
    {
        var m = Regex.Match(log, @"Time for (\d+) iterations with ([\d.]+) cells");
        return m.Success
            ? new EngineRunStats((long)double.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture), long.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture), seconds)
            : new EngineRunStats(0, 0, seconds);
    }
}
