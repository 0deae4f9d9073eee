using SlotArray.Core.Quantities;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Design;

/// <summary>The outline of a planar aperture: slots whose centres fall outside it are left out.</summary>
internal enum PlanarOutline
{
    /// <summary>The bounding rectangle: every slot kept.</summary>
    Rectangle,
    /// <summary>A circle of diameter the smaller side of the bounding rectangle.</summary>
    Circle,
    /// <summary>The ellipse inscribed in the bounding rectangle.</summary>
    Ellipse,
}

/// <summary>
/// The planar part of a request (spec <c>array: {type: planar, …}</c>, <c>taper_across</c>, <c>feed.guide</c>): the
/// branches, their pitch and outline, the taper across them (or the circular Taylor for the whole aperture) and the
/// feed guide. The request's <c>slots.count</c> is the slots per branch of the bounding rectangle, its <c>taper</c> the
/// taper along the branches, its <c>feed.position</c> where the feed guide is fed.
/// </summary>
/// <param name="Branches">Branch count of the bounding rectangle.</param>
/// <param name="Pitch">Branch pitch; null for auto (the branch guide's a plus the common wall, or λg/2 of a given feed guide).</param>
/// <param name="CommonWall">Thickness of the wall two neighbouring branch guides share.</param>
/// <param name="Outline">Rectangle, circle or ellipse.</param>
/// <param name="Across">The taper across the branches (separable); null with the circular Taylor.</param>
/// <param name="CircularSidelobesDb">Circular Taylor (Hansen 1960) design level, negative dB; null for separable.</param>
/// <param name="CircularNbar">Circular Taylor n̄.</param>
/// <param name="FeedGuide">The feed guide as given; null: the branch guide's section with the broad wall solved for the pitch.</param>
internal sealed record PlanarArrayRequest(int Branches, Length? Pitch, Length CommonWall, PlanarOutline Outline, TaperRequest? Across,
    double? CircularSidelobesDb, int CircularNbar, RectangularWaveguide? FeedGuide);
