namespace SlotArray.Core.Quantities;

/// <summary>A frequency in hertz. Built only through the named factories.</summary>
/// <param name="Hertz">The frequency in hertz.</param>
public readonly record struct Frequency(double Hertz) : IComparable<Frequency>
{
    /// <summary>A frequency from hertz.</summary>
    public static Frequency FromHertz(double hertz) => new(hertz);
    /// <summary>A frequency from megahertz.</summary>
    public static Frequency FromMegahertz(double megahertz) => new(megahertz * 1e6);
    /// <summary>A frequency from gigahertz.</summary>
    public static Frequency FromGigahertz(double gigahertz) => new(gigahertz * 1e9);
    /// <summary>The frequency in gigahertz.</summary>
    public double Gigahertz => Hertz * 1e-9;
    /// <summary>The frequency in megahertz.</summary>
    public double Megahertz => Hertz * 1e-6;
    /// <summary>Angular frequency ω = 2πf, rad/s.</summary>
    public double AngularFrequency => 2 * Math.PI * Hertz;
    /// <summary>Free-space wavelength λ = c/f.</summary>
    public Length FreeSpaceWavelength => Length.FromMeters(PhysicalConstants.SpeedOfLight / Hertz);
    /// <summary>Free-space wavenumber k = 2πf/c, rad/m.</summary>
    public double FreeSpaceWavenumber => 2 * Math.PI * Hertz / PhysicalConstants.SpeedOfLight;
    /// <inheritdoc />
    public int CompareTo(Frequency other) => Hertz.CompareTo(other.Hertz);
    /// <summary>Whether x is below y.</summary>
    public static bool operator <(Frequency x, Frequency y) => x.Hertz < y.Hertz;
    /// <summary>Whether x is above y.</summary>
    public static bool operator >(Frequency x, Frequency y) => x.Hertz > y.Hertz;
    /// <summary>Whether x is not above y.</summary>
    public static bool operator <=(Frequency x, Frequency y) => x.Hertz <= y.Hertz;
    /// <summary>Whether x is not below y.</summary>
    public static bool operator >=(Frequency x, Frequency y) => x.Hertz >= y.Hertz;
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{Gigahertz:0.######} GHz");
}
