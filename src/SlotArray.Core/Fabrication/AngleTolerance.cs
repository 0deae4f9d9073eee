using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>One angular machining tolerance: the tilt of an edge slot.</summary>
/// <param name="Value">Half-width (uniform ±) or standard deviation (normal), ≥ 0.</param>
/// <param name="Distribution">Uniform or normal.</param>
public sealed record AngleTolerance(Angle Value, ErrorDistribution Distribution)
{
    /// <summary>No error.</summary>
    public static AngleTolerance None { get; } = new(Angle.FromRadians(0), ErrorDistribution.Uniform);

    /// <summary>Half-width of the range the Monte Carlo surrogates must cover, rad: the value (uniform) or <paramref name="normalRange"/> σ (normal).</summary>
    /// <param name="normalRange">Half-width of a normal error's range in σ.</param>
    public double Range(double normalRange) => Distribution == ErrorDistribution.Normal ? normalRange * Value.Radians : Value.Radians;
}
