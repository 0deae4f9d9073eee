using SlotArray.Core.Design;
using SlotArray.Core.Tapers;

namespace SlotArray.Core.Verdicts;

/// <summary>Where a sidelobe target comes from.</summary>
internal enum SidelobeTargetOrigin
{
    /// <summary>The spec's <c>requirements.sidelobes</c>.</summary>
    Requirement,
    /// <summary>The level the taper was synthesised for (Chebyshev, Taylor, Villeneuve, Taylor one-parameter, Bayliss).</summary>
    TaperDesignLevel,
    /// <summary>
    /// The peak sidelobe of the taper's own weights (uniform, cosine-pedestal, given): the families that are not
    /// synthesised for a level.
    /// </summary>
    TaperOwnLevel,
}

/// <summary>
/// The one sidelobe-target rule, used by the requirement verdicts and by the tolerance analysis alike: the spec's
/// <c>requirements.sidelobes</c>; else the level the taper was synthesised for; else (uniform, cosine-pedestal and given
/// weights, which are not synthesised for a level) the peak sidelobe of the taper's own N weights.
/// </summary>
/// <remarks>
/// The own level is that of the N-element array factor over a whole period of its phase variable
/// (<see cref="TaperSynthesis.MeasuredPeakSidelobeDb"/>), not the continuous line-source figure. For a uniform taper
/// the two differ: the first sidelobe of |sin(Nψ/2)/(N sin(ψ/2))| is above the −13.26 dB of |sin x/x| (the peak at
/// x = 4.4934) for every finite N, by 0.11 dB at N = 16 and 1.96 dB at N = 4 (−11.30 dB) (the array factor of a uniform
/// array, C. A. Balanis, <i>Antenna Theory</i>, 3rd ed., Wiley 2005, eq. 6-10c; the numbers computed here). Holding an
/// N-slot uniform array to the line-source −13.26 dB failed it against its own taper.
/// </remarks>
/// <param name="LevelDb">The target, dB relative to the beam peak (negative).</param>
/// <param name="Origin">Where it comes from.</param>
internal sealed record SidelobeTarget(double LevelDb, SidelobeTargetOrigin Origin)
{
    /// <summary>The target of a request whose taper is already synthesised; null when there is none (a taper without sidelobes, e.g. two elements).</summary>
    /// <param name="request">The request (requirements and taper family).</param>
    /// <param name="taper">The synthesised taper of that request.</param>
    public static SidelobeTarget? Of(ArrayRequest request, TaperResult taper)
    {
        ArgumentNullException.ThrowIfNull(request);
        if (request.Requirements.SidelobesDb is { } stated) return new SidelobeTarget(stated, SidelobeTargetOrigin.Requirement);
        return OfTaper(request.Taper, taper);
    }

    /// <summary>The target of a request, synthesising its taper (<see cref="TaperSynthesis.Synthesize"/>).</summary>
    /// <param name="request">The request.</param>
    public static SidelobeTarget? Of(ArrayRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        return request.Requirements.SidelobesDb is { } stated
            ? new SidelobeTarget(stated, SidelobeTargetOrigin.Requirement)
            : OfTaper(request.Taper, TaperSynthesis.Synthesize(request.Taper, request.Slots.Count));
    }

    /// <summary>The taper's own level (no requirement): its design level, or the peak sidelobe of its weights; null without sidelobes.</summary>
    /// <param name="request">The taper request.</param>
    /// <param name="taper">The synthesised taper.</param>
    public static SidelobeTarget? OfTaper(TaperRequest request, TaperResult taper)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(taper);
        if (request.Type is TaperType.Chebyshev or TaperType.Taylor or TaperType.Villeneuve or TaperType.TaylorOneParameter or TaperType.Bayliss)
            return new SidelobeTarget(request.SidelobeLevelDb, SidelobeTargetOrigin.TaperDesignLevel);
        double own = TaperSynthesis.MeasuredPeakSidelobeDb(taper.Weights, taper.IsDifference);
        return double.IsFinite(own) ? new SidelobeTarget(own, SidelobeTargetOrigin.TaperOwnLevel) : null;
    }
}
