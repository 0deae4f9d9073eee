using SlotArray.FullWave.Engine;
using SlotArray.FullWave.Runs;

namespace SlotArray.Cli.Commands;

/// <summary>
/// What every full-wave command does the same way: find the engine (a missing engine is the user's to install), and run a
/// batch of engine runs with progress, stopping on Ctrl-C or SIGTERM with the finished runs kept for the next call.
/// </summary>
internal static class EngineRuns
{
    /// <summary>The openEMS engine at <paramref name="explicitPath"/>, or on PATH; a missing engine is a user error.</summary>
    public static OpenEmsEngine Locate(string? explicitPath)
    {
        try { return OpenEmsEngine.Locate(explicitPath); }
        catch (EngineNotFoundException e) { throw new UserInputException(e.Message); }
    }

    /// <summary>
    /// Runs <paramref name="runs"/> (finished ones come from <paramref name="store"/>), <paramref name="jobs"/> at a time,
    /// with progress on <paramref name="error"/>. Null when a stop signal ended the batch (the message is printed; the
    /// command then exits with <see cref="StopSignal.ExitCode"/>).
    /// </summary>
    public static IReadOnlyList<RunOutcome>? RunOrStop(OpenEmsEngine engine, RunStore store, IReadOnlyList<RunRequest> runs, int jobs, TextWriter error)
    {
        using var stop = new StopSignal();
        try
        {
            return RunQueue.RunAllAsync(engine, store, runs, jobs, new RunProgressPrinter(error, RunProgressPrinter.StderrIsTerminal(error)), stop.Token)
                .GetAwaiter().GetResult();
        }
        catch (OperationCanceledException)
        {
            error.WriteLine($"stopped: the finished runs are kept in {store.Root}; run the same command again to resume");
            return null;
        }
    }
}
