using SlotArray.Core.Patterns;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// Runs Monte Carlo trials of a <see cref="IToleranceTrialModel"/> and reduces them to statistics. Trial i draws from
/// <see cref="TrialRandom"/>(seed, i) and is evaluated on its own (its vector lanes are angles of its own cut, never other
/// trials, and every thread reuses only scratch arrays that each trial overwrites); the trials run in parallel in fixed
/// chunks of 64, their outcomes and envelope rows go to slot i of two arrays, and every reduction (sums in trial order,
/// order statistics by selection) runs over those arrays afterwards, so the result is identical for any thread count.
/// </summary>
/// <remarks>
/// Analytic floor: for independent random relative errors of excitation with variances σ_a² (amplitude) and σ_φ²
/// (phase), the expected error-pattern power relative to the peak is (σ_a² + σ_φ²) Σ|a_n|²/|Σ a_n|² =
/// (σ_a² + σ_φ²)/(η_t N), flat in u, η_t taken toward the nominal beam (<see cref="TrialEvaluator.TaperEfficiency"/>) (J. Ruze, "Antenna tolerance theory — a review", Proc. IEEE 54(4), 633–640, 1966;
/// R. C. Hansen, <i>Phased Array Antennas</i>, Wiley 1998, Ch. 7, random errors; both from memory). Position errors add
/// the mean-square pattern phase k²σ_z² ⟨u²⟩ = k²σ_z²/3 over the visible u (same derivation, from memory). The σ's are
/// the ones the trials actually produced (<see cref="TrialOutcome"/>), so the comparison tests the error model, not the
/// inputs; errors that are correlated from slot to slot (a guide-width error, a systematic error) break the
/// independence the formula assumes and make the two differ.
/// </remarks>
internal static class ToleranceMonteCarlo
{
    private const int Chunk = 64;

    /// <summary>Runs <paramref name="trials"/> trials.</summary>
    /// <param name="model">The trial model.</param>
    /// <param name="trials">Number of trials, ≥ 1.</param>
    /// <param name="seed">The seed.</param>
    /// <param name="targetDb">Sidelobe target, dB.</param>
    /// <param name="options">Grids and threads.</param>
    /// <param name="progress">Called with the number of trials done so far (from worker threads; may be null).</param>
    public static MonteCarloResult Run(IToleranceTrialModel model, int trials, int seed, double targetDb, ToleranceOptions? options = null,
        Action<int>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (trials < 1) throw new ArgumentOutOfRangeException(nameof(trials), trials, "at least one trial is needed");
        options ??= ToleranceOptions.Default;
        options.Validate();
        var evaluator = new TrialEvaluator(model.Nominal, model.Frequency.FreeSpaceWavenumber, options);
        int m = evaluator.EnvelopeAngles.Length;
        var nominalEnvelope = new float[m];
        var nominal = evaluator.Evaluate(model.Nominal, evaluator.NewWorkspace(), nominalEnvelope);
        var outcomes = new TrialOutcome[trials];
        // The envelope's bounded sample: the first `kept` trials, stored angle-major (column j holds angle j of every kept
        // trial), so that memory stays at most EnvelopeTrials × angles whatever the number of trials.
        int kept = m == 0 ? 0 : Math.Min(trials, options.EnvelopeTrials);
        var envelopes = new float[(long)kept * m];
        int done = 0;
        int chunks = (trials + Chunk - 1) / Chunk;
        Parallel.For(0, chunks, new ParallelOptions { MaxDegreeOfParallelism = options.Threads, CancellationToken = options.Cancellation },
            () => (Workspace: evaluator.NewWorkspace(), Rows: new float[Chunk * m]), (c, _, local) =>
        {
            int start = c * Chunk, end = Math.Min(trials, start + Chunk);
            for (int i = start; i < end; i++)
            {
                var random = new TrialRandom(seed, i);
                var row = i < kept ? local.Rows.AsSpan((i - start) * m, m) : default;
                outcomes[i] = evaluator.Evaluate(model.Trial(ref random), local.Workspace, row);
            }
            // This chunk's kept rows into the angle-major store: one contiguous run of trials per angle.
            int rows = Math.Min(end, kept) - start;
            for (int j = 0; j < m && rows > 0; j++)
                for (int r = 0; r < rows; r++) envelopes[(long)j * kept + start + r] = local.Rows[r * m + j];
            int now = Interlocked.Add(ref done, end - start);
            progress?.Invoke(now);
            return local;
        }, _ => { });
        return Reduce(model, seed, targetDb, evaluator, nominal, outcomes, m == 0 ? null : (nominalEnvelope, envelopes, kept), options.Threads);
    }

    private static MonteCarloResult Reduce(IToleranceTrialModel model, int seed, double targetDb, TrialEvaluator evaluator,
        TrialOutcome nominal, TrialOutcome[] outcomes, (float[] Nominal, float[] Trials, int Kept)? envelopes, int threads)
    {
        int trials = outcomes.Length, n = model.Nominal.Excitations.Length;
        var psl = new double[trials];
        var loss = new double[trials];
        var point = new double[trials];
        var s11 = new double[trials];
        double amp = 0, phase = 0, pos = 0, floor = 0;
        int meets = 0;
        for (int i = 0; i < trials; i++)
        {
            var o = outcomes[i];
            psl[i] = o.PeakSidelobeDb;
            if (o.PeakSidelobeDb <= targetDb) meets++;
            loss[i] = 10 * Math.Log10(nominal.Gain / o.Gain);
            point[i] = Math.Abs(o.BeamDirection - nominal.BeamDirection) * 180 / Math.PI;
            s11[i] = o.S11Db;
            amp += o.AmplitudeErrorSquares;
            phase += o.PhaseErrorSquares;
            pos += o.PositionPhaseSquares;
            floor += o.FloorPower;
        }
        double count = (double)trials * n;
        double sa2 = amp / count, sp2 = phase / count, sz2 = pos / count;
        double eta = evaluator.TaperEfficiency;
        double analytic = 10 * Math.Log10((sa2 + sp2 + sz2) / (eta * n));
        double mcFloor = 10 * Math.Log10(floor / trials);
        var figures = new NominalFigures(nominal.PeakSidelobeDb, nominal.BeamDirection * 180 / Math.PI, nominal.S11Db, nominal.Gain);
        return new MonteCarloResult(trials, seed, targetDb, figures, SampleSummary.Of(psl), (double)meets / trials,
            SampleSummary.Of(loss), SampleSummary.Of(point), SampleSummary.Of(s11), Math.Sqrt(sa2), Math.Sqrt(sp2), Math.Sqrt(sz2), eta,
            analytic, mcFloor, Array.AsReadOnly(psl), envelopes is { } e ? Envelope(evaluator, e.Nominal, e.Trials, e.Kept, threads) : null);
    }

    /// <summary>
    /// The percentile bands of the kept trials' envelopes (angle-major: column j holds angle j of <paramref name="kept"/>
    /// trials): per angle, the order statistics that <see cref="SampleSummary.Percentile"/> reads, found by selection (the
    /// same values as a full sort of that sample).
    /// </summary>
    private static PatternEnvelope Envelope(TrialEvaluator evaluator, float[] nominal, float[] envelopes, int kept, int threads)
    {
        int m = nominal.Length;
        var p5 = new double[m];
        var p50 = new double[m];
        var p95 = new double[m];
        var max = new double[m];
        Parallel.For(0, m, new ParallelOptions { MaxDegreeOfParallelism = threads }, () => new double[kept], (j, _, column) =>
        {
            var run = envelopes.AsSpan((int)((long)j * kept), kept);
            for (int i = 0; i < kept; i++) column[i] = run[i];
            var select = new OrderStatistics(column);
            p5[j] = select.Percentile(0.05);
            p50[j] = select.Percentile(0.50);
            p95[j] = select.Percentile(0.95);
            max[j] = select.Percentile(1.0);
            return column;
        }, _ => { });
        return new PatternEnvelope(evaluator.EnvelopeAngles.Select(t => t * 180 / Math.PI).ToArray(),
            nominal.Select(v => (double)v).ToArray(), p5, p50, p95, max);
    }
}
