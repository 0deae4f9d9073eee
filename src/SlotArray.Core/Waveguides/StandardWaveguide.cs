using SlotArray.Core.Quantities;

namespace SlotArray.Core.Waveguides;

/// <summary>A standard rectangular waveguide size: designation, inside dimensions and recommended band.</summary>
/// <param name="Designation">EIA designation, e.g. "WR-90".</param>
/// <param name="Iec">IEC 60153-2 designation, e.g. "R100".</param>
/// <param name="BroadWallInches">Inside broad dimension a, inches (the standard's unit).</param>
/// <param name="NarrowWallInches">Inside narrow dimension b, inches.</param>
/// <param name="BandLowGigahertz">Lower edge of the recommended TE10 band, GHz.</param>
/// <param name="BandHighGigahertz">Upper edge of the recommended TE10 band, GHz.</param>
public sealed record StandardWaveguide(string Designation, string Iec, double BroadWallInches, double NarrowWallInches,
    double BandLowGigahertz, double BandHighGigahertz)
{
    /// <summary>Inside broad dimension a (exactly inches × 25.4 mm).</summary>
    public Length BroadWall => Length.FromInches(BroadWallInches);
    /// <summary>Inside narrow dimension b.</summary>
    public Length NarrowWall => Length.FromInches(NarrowWallInches);
    /// <summary>Lower edge of the recommended band.</summary>
    public Frequency BandLow => Frequency.FromGigahertz(BandLowGigahertz);
    /// <summary>Upper edge of the recommended band.</summary>
    public Frequency BandHigh => Frequency.FromGigahertz(BandHighGigahertz);
    /// <summary>TE10 cutoff of the air-filled guide, c/(2a).</summary>
    public Frequency CutoffTe10 => Frequency.FromHertz(PhysicalConstants.SpeedOfLight / (2 * BroadWall.Meters));
}
