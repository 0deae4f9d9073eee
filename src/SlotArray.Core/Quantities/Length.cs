namespace SlotArray.Core.Quantities;

/// <summary>A length in metres. Built only through the named factories, never from a bare number.</summary>
/// <param name="Meters">The length in metres.</param>
public readonly record struct Length(double Meters) : IComparable<Length>
{
    /// <summary>Metres per inch, exact by the 1959 international yard and pound agreement.</summary>
    public const double MetersPerInch = 0.0254;

    /// <summary>A length from metres.</summary>
    public static Length FromMeters(double meters) => new(meters);
    /// <summary>A length from millimetres.</summary>
    public static Length FromMillimeters(double millimeters) => new(millimeters * 1e-3);
    /// <summary>A length from inches (exactly 25.4 mm).</summary>
    public static Length FromInches(double inches) => new(inches * MetersPerInch);
    /// <summary>The length in millimetres.</summary>
    public double Millimeters => Meters * 1e3;
    /// <summary>The length in inches.</summary>
    public double Inches => Meters / MetersPerInch;
    /// <summary>Zero length.</summary>
    public static Length Zero => new(0);
    /// <inheritdoc />
    public int CompareTo(Length other) => Meters.CompareTo(other.Meters);
    /// <summary>Sum of two lengths.</summary>
    public static Length operator +(Length x, Length y) => new(x.Meters + y.Meters);
    /// <summary>Difference of two lengths.</summary>
    public static Length operator -(Length x, Length y) => new(x.Meters - y.Meters);
    /// <summary>A length scaled by a number.</summary>
    public static Length operator *(double k, Length x) => new(k * x.Meters);
    /// <summary>Ratio of two lengths.</summary>
    public static double operator /(Length x, Length y) => x.Meters / y.Meters;
    /// <summary>Whether x is shorter than y.</summary>
    public static bool operator <(Length x, Length y) => x.Meters < y.Meters;
    /// <summary>Whether x is longer than y.</summary>
    public static bool operator >(Length x, Length y) => x.Meters > y.Meters;
    /// <summary>Whether x is not longer than y.</summary>
    public static bool operator <=(Length x, Length y) => x.Meters <= y.Meters;
    /// <summary>Whether x is not shorter than y.</summary>
    public static bool operator >=(Length x, Length y) => x.Meters >= y.Meters;
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{Millimeters:0.####} mm");
}
