using SlotArray.Core.Design;

namespace SlotArray.Reports.Model;

/// <summary>
/// <c>coupling: mutual</c>: Elliott's iterated design beside the isolated-slot design, both under the coupled analysis
/// (SI units: Hz, m; levels in dB where the name says so).
/// </summary>
public sealed record CouplingReport
{
    /// <summary>Figures of the coupled (Elliott) design under the coupled analysis.</summary>
    public required CoupledDesignFigures Coupled { get; init; }

    /// <summary>Figures of the isolated-slot design under the same coupled analysis.</summary>
    public required CoupledDesignFigures Uncoupled { get; init; }

    /// <summary>
    /// Travelling-wave feed: the coupled designer's residual after each coupled solution, power dB (largest
    /// |10 log10(P̃_n/T_n)|), first to last; null for Elliott's standing-wave design.
    /// </summary>
    public IReadOnlyList<double>? TravellingWaveResidualsDb { get; init; }

    /// <summary>The iteration history, in order (Elliott's standing-wave design; empty for a travelling-wave feed).</summary>
    public required IReadOnlyList<ElliottIteration> Iterations { get; init; }

    /// <summary>The tolerance on offsets and lengths the iteration met, m.</summary>
    public required double Tolerance { get; init; }

    /// <summary>Largest relative error of the slot surrogate against direct solves at the final slots.</summary>
    public required double SurrogateError { get; init; }

    /// <summary>What the coupled model leaves out, in one sentence.</summary>
    public const string NeglectedNote =
        "external coupling through the equivalent dipoles on an infinite flat ground plane (half-cosine slot voltages, centre-referred); " +
        "coupling through the guide's higher-order modes and the finite ground plane are neglected";

    /// <summary>The report of a pipeline run, or null when it was designed without mutual coupling.</summary>
    internal static CouplingReport? Of(ArrayResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.Procedure switch
        {
            CoupledTravellingWaveProcedure { Comparison: var t } => new CouplingReport
            {
                Coupled = CoupledDesignFigures.Of(t.Coupled),
                Uncoupled = CoupledDesignFigures.Of(t.Uncoupled),
                Iterations = [],
                Tolerance = 0,
                SurrogateError = double.NaN,
                TravellingWaveResidualsDb = t.Result.History,
            },
            ElliottProcedure { Comparison: var c } => new CouplingReport
            {
                Coupled = CoupledDesignFigures.Of(c.Coupled),
                Uncoupled = CoupledDesignFigures.Of(c.Uncoupled),
                Iterations = c.Elliott.Iterations,
                Tolerance = c.Elliott.Tolerance,
                SurrogateError = c.Elliott.SurrogateError,
            },
            _ => null,
        };
    }
}

/// <summary>One design under the coupled analysis.</summary>
public sealed record CoupledDesignFigures
{
    /// <summary>20 log10 |S11| at the design frequency, dB.</summary>
    public required double S11DbAtDesign { get; init; }

    /// <summary>Frequency of the smallest |S11| in the band, Hz.</summary>
    public required double BestMatchHz { get; init; }

    /// <summary>20 log10 |S11| there, dB.</summary>
    public required double BestMatchS11Db { get; init; }

    /// <summary>Peak sidelobe at the design frequency, dB (NaN when the pattern has no sidelobe region).</summary>
    public required double PeakSidelobeDb { get; init; }

    /// <summary>From the Core figures.</summary>
    internal static CoupledDesignFigures Of(CoupledFigures f)
    {
        ArgumentNullException.ThrowIfNull(f);
        return new CoupledDesignFigures
        {
            S11DbAtDesign = f.S11Db,
            BestMatchHz = f.BestMatch.Frequency.Hertz,
            BestMatchS11Db = 20 * Math.Log10(f.BestMatch.S11.Magnitude),
            PeakSidelobeDb = f.PeakSidelobeDb ?? double.NaN,
        };
    }
}
