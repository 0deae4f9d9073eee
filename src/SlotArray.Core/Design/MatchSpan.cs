using SlotArray.Core.Network;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Design;

/// <summary>
/// The frequency span of the input-match sweep (<see cref="ArrayResult.MatchSweep"/>: <c>sweep.png</c>,
/// <c>input.s1p</c>, the <c>sweep</c> command). By default it is wide enough to show where the VSWR leaves its limits:
/// the analysis band joined with the VSWR ≤ 2 band (else the VSWR ≤ 1.5 band) widened by a quarter of its width on
/// each side, inside the VSWR search range and the guide's single-mode band.
/// </summary>
internal static class MatchSpan
{
    /// <summary>Default number of frequencies of the match sweep, 401.</summary>
    public const int DefaultPoints = 401;

    /// <summary>The default span (see the class summary). Without any matched band, the analysis band widened by half its width on each side.</summary>
    /// <param name="request">The request (analysis band, guide).</param>
    /// <param name="vswr15">The VSWR ≤ 1.5 band around the design frequency, or null.</param>
    /// <param name="vswr2">The VSWR ≤ 2 band around the design frequency, or null.</param>
    /// <param name="searchFraction">The VSWR search range either side of the design frequency, as a fraction of it; 0: no band search, no limit.</param>
    public static (Frequency Low, Frequency High) Default(ArrayRequest request, MatchBand? vswr15, MatchBand? vswr2, double searchFraction)
    {
        ArgumentNullException.ThrowIfNull(request);
        double lo = request.BandLow.Hertz, hi = request.BandHigh.Hertz, f0 = request.DesignFrequency.Hertz;
        if ((vswr2 ?? vswr15) is { } band)
        {
            double pad = 0.25 * band.Width.Hertz;
            lo = Math.Min(lo, band.Low.Hertz - pad);
            hi = Math.Max(hi, band.High.Hertz + pad);
        }
        else
        {
            double pad = 0.5 * (hi - lo);
            lo -= pad;
            hi += pad;
        }
        var (modeLow, modeHigh) = request.Guide.SingleModeBand;
        if (searchFraction > 0)
        {
            lo = Math.Max(lo, f0 * (1 - searchFraction));
            hi = Math.Min(hi, f0 * (1 + searchFraction));
        }
        lo = Math.Max(lo, modeLow.Hertz * 1.001);
        hi = Math.Min(hi, modeHigh.Hertz * 0.999);
        return (Frequency.FromHertz(lo), Frequency.FromHertz(hi));
    }

    /// <summary>
    /// The default span slid by less than a step so that one of its <paramref name="points"/> equally spaced
    /// frequencies is the design frequency itself: a reader of <c>input.s1p</c> then finds |S11| at f0 without
    /// interpolating across a deep null. The slide goes to the nearer sample, else the other way, whichever keeps the
    /// span inside the guide's single-mode band (as <see cref="Default"/> keeps it); a span that does not contain f0,
    /// fewer than 2 points, or a span that cannot slide inside that band (a coarse sweep of very few points) is returned as it is.
    /// </summary>
    private static (Frequency Low, Frequency High) ThroughDesignFrequency(ArrayRequest request, Frequency low, Frequency high, Frequency f0, int points)
    {
        double lo = low.Hertz, hi = high.Hertz, f = f0.Hertz;
        if (points < 2 || !(f > lo && f < hi)) return (low, high);
        double step = (hi - lo) / (points - 1);
        var (modeLow, modeHigh) = request.Guide.SingleModeBand;
        double x = (f - lo) / step;
        foreach (double k in new[] { Math.Round(x), Math.Round(x) == Math.Floor(x) ? Math.Ceiling(x) : Math.Floor(x) })
        {
            double shifted = f - k * step, top = shifted + (points - 1) * step;
            if (shifted > modeLow.Hertz && top < modeHigh.Hertz) return (Frequency.FromHertz(shifted), Frequency.FromHertz(top));
        }
        return (low, high);
    }

    /// <summary>The span the options ask for, each missing edge taken from <see cref="Default"/>.</summary>
    /// <param name="request">The request.</param>
    /// <param name="options">The analysis options (<see cref="AnalysisOptions.MatchLow"/>, <see cref="AnalysisOptions.MatchHigh"/>).</param>
    /// <param name="vswr15">The VSWR ≤ 1.5 band, or null.</param>
    /// <param name="vswr2">The VSWR ≤ 2 band, or null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The span is empty, or reaches outside the guide's single-mode band.</exception>
    public static (Frequency Low, Frequency High) Resolve(ArrayRequest request, AnalysisOptions options, MatchBand? vswr15, MatchBand? vswr2)
    {
        ArgumentNullException.ThrowIfNull(options);
        var (lo, hi) = Default(request, vswr15, vswr2, options.BandSearchFraction);
        if (options.MatchLow is null && options.MatchHigh is null)
            (lo, hi) = ThroughDesignFrequency(request, lo, hi, request.DesignFrequency, options.MatchPoints);
        lo = options.MatchLow ?? lo;
        hi = options.MatchHigh ?? hi;
        if (!(hi > lo))
            throw new ArgumentOutOfRangeException(nameof(options), $"{lo} to {hi}", $"the match sweep needs its upper frequency above its lower one; got {lo} to {hi}");
        var (modeLow, modeHigh) = request.Guide.SingleModeBand;
        if (lo <= modeLow || hi >= modeHigh)
            throw new ArgumentOutOfRangeException(nameof(options), $"{lo} to {hi}",
                $"the match sweep {lo} to {hi} leaves the guide's single-mode band {modeLow} to {modeHigh}: choose frequencies inside it");
        return (lo, hi);
    }
}
