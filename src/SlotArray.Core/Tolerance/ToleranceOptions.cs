namespace SlotArray.Core.Tolerance;

/// <summary>How the tolerance analysis samples and evaluates.</summary>
/// <param name="PatternPoints">Angles of each trial's pattern cut, uniform in θ over the half-space; ≥ 256, default 2048 (an even count is raised by one so that broadside is a sample).</param>
/// <param name="SurrogateNodes">Chebyshev nodes per variable of each slot's (coupling, length) surrogate; odd, ≥ 3, default 5.</param>
/// <param name="MaxThreads">Worker threads; 0 (default) uses every core. Results do not depend on it.</param>
/// <param name="EnvelopePoints">Angles kept per trial for the percentile envelope (a subsample of the cut); 0 keeps none; default 256.</param>
/// <param name="FloorPoints">Points in u = sin θ over which the error-pattern floor is averaged; ≥ 16, default 256.</param>
/// <param name="NormalRange">Half-width of a normal error's surrogate range in σ; beyond it the slot model is solved directly; default 4.</param>
/// <param name="EnvelopeTrials">Trials whose envelope samples are kept for the percentile bands: the first this many (a
/// bounded sample, so that memory stays at most EnvelopeTrials × EnvelopePoints × 4 bytes, 20 MB by default, whatever the
/// number of trials; the trials are independent and identically distributed, so the first ones are a random sample of
/// them); the bands are the exact per-angle percentiles of that sample; ≥ 100, default 20,000.</param>
internal sealed record ToleranceOptions(int PatternPoints = 2048, int SurrogateNodes = 5, int MaxThreads = 0, int EnvelopePoints = 256,
    int FloorPoints = 256, double NormalRange = 4, int EnvelopeTrials = 20_000)
{
    /// <summary>The defaults.</summary>
    public static ToleranceOptions Default { get; } = new();

    /// <summary>The thread count to use.</summary>
    public int Threads => MaxThreads > 0 ? MaxThreads : Environment.ProcessorCount;

    /// <summary>Stops the Monte Carlo between chunks of trials with an <see cref="OperationCanceledException"/>.</summary>
    public CancellationToken Cancellation { get; init; }

    internal void Validate()
    {
        if (PatternPoints < 256) throw new ArgumentOutOfRangeException(nameof(PatternPoints), PatternPoints, "a trial pattern needs at least 256 angles");
        if (SurrogateNodes < 3 || SurrogateNodes % 2 == 0) throw new ArgumentOutOfRangeException(nameof(SurrogateNodes), SurrogateNodes, "the surrogate node count must be odd and at least 3");
        if (MaxThreads < 0) throw new ArgumentOutOfRangeException(nameof(MaxThreads), MaxThreads, "the thread count must be 0 (all cores) or positive");
        if (EnvelopePoints < 0 || EnvelopePoints > PatternPoints) throw new ArgumentOutOfRangeException(nameof(EnvelopePoints), EnvelopePoints, "the envelope keeps 0 to PatternPoints angles");
        if (FloorPoints < 16) throw new ArgumentOutOfRangeException(nameof(FloorPoints), FloorPoints, "the floor average needs at least 16 points");
        if (EnvelopeTrials < 100) throw new ArgumentOutOfRangeException(nameof(EnvelopeTrials), EnvelopeTrials, "the envelope needs a sample of at least 100 trials");
        if (!(NormalRange >= 2)) throw new ArgumentOutOfRangeException(nameof(NormalRange), NormalRange, "the normal range must be at least 2σ");
    }
}
