namespace SlotArray.Core.Tolerance;

/// <summary>The figures of the unperturbed array on the Monte Carlo's grids.</summary>
/// <param name="PeakSidelobeDb">Peak sidelobe, dB.</param>
/// <param name="BeamDirectionDeg">Beam direction, degrees from broadside.</param>
/// <param name="S11Db">20 log10 |S11| at the design frequency, dB.</param>
/// <param name="Gain">Realised gain, dimensionless.</param>
public sealed record NominalFigures(double PeakSidelobeDb, double BeamDirectionDeg, double S11Db, double Gain);

/// <summary>
/// Percentile bands of the perturbed patterns at a subsample of the cut's angles (each cut relative to its own peak): the
/// exact per-angle percentiles of the first <see cref="ToleranceOptions.EnvelopeTrials"/> trials (20,000 by default; every
/// trial when there are fewer), a bounded sample that keeps the memory fixed for any number of trials.
/// </summary>
/// <param name="AnglesDeg">θ, degrees from broadside.</param>
/// <param name="NominalDb">The nominal cut, dB.</param>
/// <param name="P5Db">5th percentile over the trials, dB.</param>
/// <param name="P50Db">Median, dB.</param>
/// <param name="P95Db">95th percentile, dB.</param>
/// <param name="MaximumDb">Highest level any trial reached, dB.</param>
public sealed record PatternEnvelope(IReadOnlyList<double> AnglesDeg, IReadOnlyList<double> NominalDb, IReadOnlyList<double> P5Db,
    IReadOnlyList<double> P50Db, IReadOnlyList<double> P95Db, IReadOnlyList<double> MaximumDb);

/// <summary>Statistics of a Monte Carlo run.</summary>
/// <param name="Trials">Number of trials.</param>
/// <param name="Seed">The seed.</param>
/// <param name="TargetDb">The sidelobe target the probability refers to, dB.</param>
/// <param name="Nominal">The unperturbed figures.</param>
/// <param name="PeakSidelobeDb">Peak sidelobe over the trials, dB.</param>
/// <param name="ProbabilityMeetsTarget">Fraction of trials whose peak sidelobe is at or below the target.</param>
/// <param name="GainLossDb">10 log10(G_nominal/G_trial), dB (positive: the build has less gain).</param>
/// <param name="PointingErrorDeg">|θ_beam − θ_beam,nominal|, degrees.</param>
/// <param name="S11Db">20 log10 |S11| at the design frequency, dB.</param>
/// <param name="AmplitudeErrorRms">σ_a: RMS of ln|r_n| over all slots and trials (relative amplitude error, nepers ≈ fraction).</param>
/// <param name="PhaseErrorRms">σ_φ: RMS of arg r_n, rad.</param>
/// <param name="PositionPhaseRms">RMS of the position errors' pattern phase k δz u over the visible u, rad.</param>
/// <param name="TaperEfficiency">η_t of the nominal excitations.</param>
/// <param name="AnalyticFloorDb">10 log10((σ_a² + σ_φ² + σ_z-phase²)/(η_t N)): the random-error floor (see remarks of <see cref="ToleranceMonteCarlo"/>).</param>
/// <param name="MonteCarloFloorDb">The mean error-pattern floor the trials produced, dB relative to the beam peak.</param>
/// <param name="PeakSidelobeSamples">Peak sidelobe of each trial in trial order, dB (for the histogram).</param>
/// <param name="Envelope">Percentile bands of the patterns, or null when none were kept.</param>
public sealed record MonteCarloResult(
    int Trials,
    int Seed,
    double TargetDb,
    NominalFigures Nominal,
    SampleSummary PeakSidelobeDb,
    double ProbabilityMeetsTarget,
    SampleSummary GainLossDb,
    SampleSummary PointingErrorDeg,
    SampleSummary S11Db,
    double AmplitudeErrorRms,
    double PhaseErrorRms,
    double PositionPhaseRms,
    double TaperEfficiency,
    double AnalyticFloorDb,
    double MonteCarloFloorDb,
    IReadOnlyList<double> PeakSidelobeSamples,
    PatternEnvelope? Envelope);
