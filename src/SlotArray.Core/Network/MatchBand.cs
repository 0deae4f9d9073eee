using SlotArray.Core.Quantities;

namespace SlotArray.Core.Network;

/// <summary>
/// A contiguous band around the design frequency in which VSWR ≤ <see cref="VswrLimit"/>.
/// An edge marked limited is where the search or the sweep ended, not where the VSWR crosses the limit: the true band
/// is at least that wide.
/// </summary>
/// <param name="VswrLimit">The VSWR limit (e.g. 1.5 or 2).</param>
/// <param name="Low">Lower edge.</param>
/// <param name="High">Upper edge.</param>
/// <param name="LowLimited">The lower edge is the search or sweep edge.</param>
/// <param name="HighLimited">The upper edge is the search or sweep edge.</param>
/// <param name="Centre">The design frequency the band contains.</param>
internal sealed record MatchBand(double VswrLimit, Frequency Low, Frequency High, bool LowLimited, bool HighLimited, Frequency Centre)
{
    /// <summary>Bandwidth High − Low.</summary>
    public Frequency Width => Frequency.FromHertz(High.Hertz - Low.Hertz);

    /// <summary>Bandwidth as a fraction of the design frequency (× 100 for per cent).</summary>
    public double FractionalWidth => Width.Hertz / Centre.Hertz;
}
