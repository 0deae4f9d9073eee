namespace SlotArray.FullWave.Runs;

/// <summary>Progress of a batch of runs.</summary>
/// <param name="Done">Runs finished (cached ones included).</param>
/// <param name="Total">Runs in the batch.</param>
/// <param name="SecondsLeft">Estimated seconds left (null until one run has finished in this invocation).</param>
/// <param name="Last">The run that just finished, or null at the start.</param>
internal sealed record RunProgress(int Done, int Total, double? SecondsLeft, RunOutcome? Last);

/// <summary>
/// Runs a batch of engine runs, <c>jobs</c> at a time (one engine thread each), skipping those already finished in
/// the store. Killing the process loses only the runs in flight: a rerun resumes from the store.
/// </summary>
internal static class RunQueue
{
    /// <summary>Runs every request not yet in the store; the outcomes come back in request order.</summary>
    public static async Task<IReadOnlyList<RunOutcome>> RunAllAsync(Engine.OpenEmsEngine engine, RunStore store, IReadOnlyList<RunRequest> requests,
        int jobs, IProgress<RunProgress>? progress, CancellationToken cancel)
    {
        var outcomes = new RunOutcome?[requests.Count];
        var todo = new List<int>();
        for (int i = 0; i < requests.Count; i++)
        {
            outcomes[i] = store.TryLoad(requests[i]);
            if (outcomes[i] is null) todo.Add(i);
        }
        int done = requests.Count - todo.Count;
        progress?.Report(new RunProgress(done, requests.Count, null, null));
        var clock = System.Diagnostics.Stopwatch.StartNew();
        int finishedHere = 0;
        var gate = new object();
        await Parallel.ForEachAsync(todo, new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, jobs), CancellationToken = cancel }, async (i, ct) =>
        {
            var o = await store.RunAsync(engine, requests[i], ct);
            lock (gate)
            {
                outcomes[i] = o;
                done++;
                finishedHere++;
                int left = requests.Count - done;
                double perRun = clock.Elapsed.TotalSeconds / finishedHere;
                progress?.Report(new RunProgress(done, requests.Count, left * perRun, o));
            }
        });
        return outcomes.Select(o => o!).ToList();
    }
}
