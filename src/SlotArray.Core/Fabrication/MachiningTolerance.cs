using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>Statistical law of one machining error.</summary>
public enum ErrorDistribution
{
    /// <summary>Uniform in ±value.</summary>
    Uniform,
    /// <summary>Normal with standard deviation value.</summary>
    Normal,
}

/// <summary>One machining tolerance.</summary>
/// <param name="Value">Half-width (uniform ±) or standard deviation (normal).</param>
/// <param name="Distribution">Uniform or normal.</param>
public sealed record MachiningTolerance(Length Value, ErrorDistribution Distribution)
{
    /// <summary>No error.</summary>
    public static MachiningTolerance None { get; } = new(Length.Zero, ErrorDistribution.Uniform);
}

/// <summary>Machining tolerances for the Monte Carlo analysis.</summary>
/// <param name="Offset">Slot offset from the centreline (broad-wall slots; edge slots have none: their errors are <see cref="Tilt"/> and <see cref="Depth"/>).</param>
/// <param name="Length">Slot length.</param>
/// <param name="Position">Slot centre along the guide.</param>
/// <param name="Width">Slot width.</param>
/// <param name="GuideWidth">Inside broad dimension a of the tube.</param>
/// <param name="Wall">Wall thickness.</param>
/// <param name="SystematicLength">The same length error on every slot (added to the random one).</param>
/// <param name="SystematicOffset">The same offset error on every slot.</param>
/// <param name="Trials">Number of Monte Carlo trials, ≥ 1.</param>
/// <param name="Seed">Random seed; the same seed gives identical results.</param>
public sealed record ToleranceRequest(MachiningTolerance Offset, MachiningTolerance Length, MachiningTolerance Position, MachiningTolerance Width,
    MachiningTolerance GuideWidth, MachiningTolerance Wall, Length SystematicLength, Length SystematicOffset, int Trials, int Seed)
{
    /// <summary>Edge slots: tilt of each slot (none for broad-wall slots).</summary>
    public AngleTolerance Tilt { get; init; } = AngleTolerance.None;

    /// <summary>Edge slots: depth of cut into each broad wall (none for broad-wall slots); a slot that wraps lengthens by twice it.</summary>
    public MachiningTolerance Depth { get; init; } = MachiningTolerance.None;
}
