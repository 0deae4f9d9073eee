using SlotArray.Core.Quantities;

namespace SlotArray.Core.Stick;

/// <summary>Feed arrangement.</summary>
public enum FeedType
{
    /// <summary>Resonant array: λg/2 spacing, short-circuit termination.</summary>
    StandingWave,
    /// <summary>Non-resonant array: spacing ≠ λg/2, matched load.</summary>
    TravellingWave,
}

/// <summary>Where a standing-wave array is fed.</summary>
public enum FeedPosition
{
    /// <summary>At one end; the other end is shorted.</summary>
    End,
    /// <summary>At the centre; both ends are shorted (two halves).</summary>
    Centre,
}

/// <summary>
/// A distance along the guide given either as a fraction of the guide wavelength at the design frequency
/// or as a fixed length. Exactly one of the two is set.
/// </summary>
/// <param name="GuideWavelengths">Fraction of λg at the design frequency, or null.</param>
/// <param name="Fixed">Fixed length, or null.</param>
public sealed record GuideDistance(double? GuideWavelengths, Length? Fixed)
{
    /// <summary>A distance in guide wavelengths.</summary>
    public static GuideDistance InGuideWavelengths(double n) => new(n, null);
    /// <summary>A fixed distance.</summary>
    public static GuideDistance OfLength(Length l) => new(null, l);
    /// <summary>Resolves the distance for a guide wavelength λg.</summary>
    public Length Resolve(Length guideWavelength) => Fixed ?? GuideWavelengths!.Value * guideWavelength;
}

/// <summary>Feed of the array.</summary>
/// <param name="Type">Standing-wave or travelling-wave.</param>
/// <param name="Spacing">Slot spacing (default 0.5 guide-wavelength for standing-wave).</param>
/// <param name="Position">End- or centre-fed (standing-wave only).</param>
/// <param name="LoadFraction">Travelling-wave: fraction of input power left for the load, 0 &lt; P_L &lt; 1.</param>
/// <param name="ShortDistance">Standing-wave: last slot centre to the short's inner face (default 0.25 guide-wavelength).</param>
public sealed record FeedRequest(FeedType Type, GuideDistance Spacing, FeedPosition Position, double LoadFraction, GuideDistance ShortDistance)
{
    /// <summary>Travelling-wave, <c>feed.load: auto</c>: the smallest load fraction the slots can deliver is chosen (<see cref="Design.TravellingWaveLoad"/>); <see cref="LoadFraction"/> is then only the starting value.</summary>
    public bool AutoLoad { get; init; }

    /// <summary>Travelling-wave, <c>feed.beam</c>: the direction asked for, from which <see cref="Spacing"/> was solved (<see cref="Design.TravellingWaveBeam.SpacingFor"/>); null when the spacing was given.</summary>
    public Quantities.Angle? Beam { get; init; }
}
