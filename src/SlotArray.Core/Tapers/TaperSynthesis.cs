using System.Collections.Immutable;
using System.Globalization;
using SlotArray.Core.Patterns;

namespace SlotArray.Core.Tapers;

/// <summary>
/// Facade over the taper methods: one call from a <see cref="TaperRequest"/> to normalised weights with the
/// validity warnings of each method (cited in its own type) as data. Invalid parameters throw
/// <see cref="ArgumentException"/> with a message that says what to change.
/// </summary>
internal static class TaperSynthesis
{
    /// <summary>Largest N for which the achieved sidelobe level is measured (the check costs O(N²)).</summary>
    public const int MeasuredSidelobeCheckLimit = 2000;

    /// <summary>
    /// The design sidelobe levels a family synthesises, dB, from the highest (least negative) to the lowest; null for
    /// families without a level (uniform, cosine-pedestal, given). The limits are the ones each method checks: Taylor,
    /// Villeneuve and Taylor one-parameter below the uniform line source's −13.26 dB (rounded to −13.3), Bayliss −15 to −60 dB
    /// (the range of Bayliss's 1968 parameter table), Dolph-Chebyshev −1 to −300 dB.
    /// </summary>
    /// <param name="type">The taper family.</param>
    public static (double Highest, double Lowest)? LevelRange(TaperType type) => type switch
    {
        TaperType.Chebyshev => (-1, -300),
        TaperType.Taylor or TaperType.Villeneuve => (-13.3, -100),
        TaperType.TaylorOneParameter => (-13.3, -150),
        TaperType.Bayliss => (-15, -60),
        _ => null,
    };

    /// <summary>
    /// Largest n̄ a family accepts for <paramref name="count"/> elements: (N − 1)/2 for Villeneuve (its n̄ − 1 moved zeros
    /// need that many distinct array zeros), 100 for Taylor and Bayliss; 0 for families without n̄. The smallest is 2.
    /// </summary>
    /// <param name="type">The taper family.</param>
    /// <param name="count">Number of elements.</param>
    public static int MaximumNbar(TaperType type, int count) => type switch
    {
        TaperType.Villeneuve => (count - 1) / 2,
        TaperType.Taylor or TaperType.Bayliss => 100,
        _ => 0,
    };

    /// <summary>Synthesises the taper of <paramref name="count"/> elements.</summary>
    /// <param name="request">Taper family and parameters (level negative dB, n̄, edge level, exponent, given weights).</param>
    /// <param name="count">Number of elements, 2 … 100,000.</param>
    public static TaperResult Synthesize(TaperRequest request, int count)
    {
        ArgumentNullException.ThrowIfNull(request);
        TaperMath.CheckCount(count);
        var warnings = new List<DesignWarning>();
        double sll = request.SidelobeLevelDb;
        int nbar = request.Nbar;
        (string method, double[] w, bool diff) = request.Type switch
        {
            TaperType.Uniform => ("uniform", UniformTaper.Weights(count), false),
            TaperType.Chebyshev => ("Dolph-Chebyshev (Dolph 1946)", DolphChebyshev.Weights(count, sll), false),
            TaperType.Taylor => ("Taylor n-bar line source, sampled (Taylor 1955)", TaylorLineSource.Weights(count, sll, nbar), false),
            TaperType.Villeneuve => ("Villeneuve n-bar (Villeneuve 1984)", Villeneuve.Weights(count, sll, nbar), false),
            TaperType.TaylorOneParameter => ("Taylor one-parameter (Taylor 1953)", TaylorOneParameter.Weights(count, sll), false),
            TaperType.CosinePedestal => ("cosine^q on a pedestal", CosinePedestal.Weights(count, request.EdgeLevelDb, request.Exponent), false),
            TaperType.Bayliss => ("Bayliss difference (Bayliss 1968)", Bayliss.Weights(count, sll, nbar), true),
            TaperType.Given => ("given weights", GivenWeights.Weights(request.Weights, count), request.Weights!.Any(x => x < 0) && IsOdd(request.Weights!)),
            _ => throw new ArgumentOutOfRangeException(nameof(request), request.Type, "Unknown taper type."),
        };

        bool nbarTooSmall = false;
        switch (request.Type)
        {
            case TaperType.Chebyshev when count >= 3 && Math.Abs(w[0]) > Math.Abs(w[1]):
                warnings.Add(new DesignWarning("chebyshev-edge-spike", Invariant(
                    $"The Dolph-Chebyshev edge elements ({w[0]:0.####}) exceed their neighbours ({w[1]:0.####}) at N = {count} and {sll} dB: equal sidelobes out to the last one need strong edge elements in long arrays (a property of Dolph's 1946 weights); use a Taylor or Villeneuve taper.")));
                break;
            case TaperType.Taylor:
                var design = TaylorLineSource.Parameters(sll, nbar);
                double reached = TaylorLineSource.ContinuousPeakSidelobeDb(design);
                if (reached > sll + 0.1)
                {
                    nbarTooSmall = true;
                    warnings.Add(new DesignWarning("nbar-too-small", Invariant(
                        $"With n̄ = {nbar} the Taylor pattern only reaches {reached:0.00} dB, not {sll} dB: raise n̄ (about 2A² + 1/2 = {2 * design.A * design.A + 0.5:0.0} or more).")));
                }
                if (!TaylorLineSource.IsMonotonic(design))
                    warnings.Add(EdgeRise(nbar, design.A));
                break;
            case TaperType.Villeneuve:
                if (!FallsFromCentre(w))
                    warnings.Add(EdgeRise(nbar, TaylorLineSource.A(sll)));
                break;
            case TaperType.Bayliss when sll < Bayliss.FitLimitDb:
                warnings.Add(new DesignWarning("bayliss-fit-range", Invariant(
                    $"Bayliss's polynomial fits for A and ξ1…ξ4 lose accuracy below {Bayliss.FitLimitDb} dB (asked {sll} dB): check the achieved sidelobes.")));
                break;
        }

        bool hasLevel = request.Type is TaperType.Chebyshev or TaperType.Taylor or TaperType.Villeneuve or TaperType.TaylorOneParameter or TaperType.Bayliss;
        if (hasLevel && !nbarTooSmall && count <= MeasuredSidelobeCheckLimit)
        {
            double achieved = MeasuredPeakSidelobeDb(w, diff);
            if (achieved > sll + 0.5)
                warnings.Add(new DesignWarning(request.Type is TaperType.Taylor or TaperType.Villeneuve or TaperType.Bayliss ? "nbar-too-small" : "sidelobes-not-reached", Invariant(
                    $"The {count}-element taper reaches only {achieved:0.00} dB peak sidelobe, not {sll} dB: {(request.Type == TaperType.Taylor ? "sampling the line source at small N loses accuracy; use the Villeneuve taper, more elements or a larger n̄." : "raise n̄ or use more elements.")}")));
        }
        return new TaperResult(method, ImmutableArray.Create(w), diff, warnings);
    }

    /// <summary>
    /// Peak sidelobe of the taper's array factor over a full period of ψ (isotropic elements at λ/2), dB; for a
    /// difference taper the difference-pattern peak sidelobe.
    /// </summary>
    /// <param name="weights">Element weights.</param>
    /// <param name="difference">True for a difference (odd) taper.</param>
    public static double MeasuredPeakSidelobeDb(IReadOnlyList<double> weights, bool difference)
    {
        ArgumentNullException.ThrowIfNull(weights);
        var z = ArrayGeometry.Uniform(weights.Count, 0.5);
        var grid = AngleGrid.VisibleInSine(Math.Max(2049, 16 * weights.Count + 1));
        var p = ArrayFactor.Compute(z, weights, 2 * Math.PI, grid);
        double? psl = difference ? DifferencePatternMetrics.Measure(p).PeakSidelobeDb : PatternMetrics.Measure(p).PeakSidelobeDb;
        return psl ?? double.NegativeInfinity;
    }

    private static DesignWarning EdgeRise(int nbar, double a) => new("nbar-edge-rise", Invariant(
        $"With n̄ = {nbar} the distribution dips and rises again toward the ends (n̄ above about 4A² = {4 * a * a:0.0}, where Taylor's A sets the design sidelobe level: computed limit of a monotonic distribution): lower n̄ to avoid strong edge slots."));

    private static bool FallsFromCentre(double[] w)
    {
        int n = w.Length;
        for (int i = (n - 1) / 2; i > 0; i--)          // centre → −z end (the weights are symmetric)
            if (Math.Abs(w[i - 1]) > Math.Abs(w[i]) + 1e-12) return false;
        return true;
    }

    private static bool IsOdd(IReadOnlyList<double> w)
    {
        for (int i = 0; i < w.Count; i++)
            if (Math.Abs(w[i] + w[w.Count - 1 - i]) > 1e-12 * (Math.Abs(w[i]) + 1)) return false;
        return true;
    }

    private static string Invariant(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
