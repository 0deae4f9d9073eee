namespace SlotArray.Core.Quantities;

/// <summary>A plane angle in radians. Built only through the named factories.</summary>
/// <param name="Radians">The angle in radians.</param>
public readonly record struct Angle(double Radians)
{
    /// <summary>An angle from radians.</summary>
    public static Angle FromRadians(double radians) => new(radians);
    /// <summary>An angle from degrees.</summary>
    public static Angle FromDegrees(double degrees) => new(degrees * Math.PI / 180.0);
    /// <summary>The angle in degrees.</summary>
    public double Degrees => Radians * 180.0 / Math.PI;
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{Degrees:0.####} deg");
}
