using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Fabrication;

/// <summary>
/// The first plate's slots cut short on purpose (<c>fabrication.prototype_margin</c>), so that after measurement they can
/// be trimmed up: a slot can only be made longer. Common practice, no source.
/// </summary>
internal static class PrototypeMargin
{
    /// <summary>Largest margin accepted either way: ±5 %.</summary>
    public const double Limit = 0.05;

    /// <summary>
    /// The design as cut: every slot length × (1 + <paramref name="margin"/>), with a warning that says what it means;
    /// <paramref name="design"/> itself when the margin is 0.
    /// </summary>
    public static ArrayDesign Apply(ArrayDesign design, double margin)
    {
        ArgumentNullException.ThrowIfNull(design);
        if (margin == 0) return design;
        if (!(Math.Abs(margin) <= Limit)) throw new ArgumentOutOfRangeException(nameof(margin), margin, $"the prototype margin must lie within ±{Limit * 100:0} %");
        var slots = design.Slots.Select(s => s with { Length = (1 + margin) * s.Length }).ToArray();
        var warning = new DesignWarning("prototype-margin", FormattableString.Invariant(
            $"prototype plate: every slot is cut {Math.Abs(margin) * 100:0.###} % {(margin < 0 ? "short" : "long")} of its designed length on purpose (fabrication.prototype_margin), so the predicted match is that of the plate as cut; measure it, run 'slotarray compare' and trim"));
        return design with { Slots = Array.AsReadOnly(slots), Warnings = [.. design.Warnings, warning] };
    }

    /// <summary>The designed (margin-free) length of a slot cut with <paramref name="margin"/>.</summary>
    public static Length Designed(Length asCut, double margin) => (1 / (1 + margin)) * asCut;
}
