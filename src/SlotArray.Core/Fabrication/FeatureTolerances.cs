using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>A ± tolerance and where it comes from.</summary>
/// <param name="Value">The half-width ±, SI (m, or rad for an angle); ≥ 0.</param>
/// <param name="Source">The spec key it was taken from, or the default's provenance.</param>
public sealed record StatedTolerance(double Value, string Source);

/// <summary>
/// The ± tolerance of each kind of slot dimension, from the spec's <c>tolerance</c> block where it gives one and from
/// stated defaults elsewhere. A uniform tolerance ±v is printed as ±v; a normal one of standard deviation σ as ±2σ
/// (about 95 % of parts inside). Tilt and cut depth have no spec keys: they follow from the offset and length
/// tolerances (see <see cref="TiltFor"/> and <see cref="CutDepth"/>).
/// </summary>
/// <param name="Position">Slot centre along the guide (and the end shorts and feed junction, which set the electrical lengths).</param>
/// <param name="Offset">Slot offset from the broad-wall centreline.</param>
/// <param name="Length">Slot length.</param>
/// <param name="Width">Slot width.</param>
/// <param name="CutDepth">Edge slots: depth of cut into each broad wall, half the length tolerance (the cut path
/// b/cos θ + 2 (d − t) changes by twice the depth).</param>
public sealed record FeatureTolerances(StatedTolerance Position, StatedTolerance Offset, StatedTolerance Length,
    StatedTolerance Width, StatedTolerance CutDepth)
{
    /// <summary>The default slot tolerance, ±0.025 mm: routine precision CNC milling of slots.</summary>
    public static StatedTolerance Default { get; } = new(GeneralTolerances.PrecisionMilling.Meters,
        "default: routine precision CNC milling of slots (common practice, no source)");

    /// <summary>Tolerances from the spec's tolerance block (null: every one the default).</summary>
    /// <param name="spec">The spec's tolerance block, or null.</param>
    public static FeatureTolerances From(ToleranceRequest? spec)
    {
        var length = Of(spec?.Length, "tolerance.length");
        return new FeatureTolerances(Of(spec?.Position, "tolerance.position"), Of(spec?.Offset, "tolerance.offset"), length,
            Of(spec?.Width, "tolerance.width"),
            new StatedTolerance(length.Value / 2, "half the length tolerance (" + length.Source + "): the cut path b/cos θ + 2 (depth − wall) changes by twice the depth"));
    }

    /// <summary>
    /// The tilt tolerance of an edge slot of length L: the offset tolerance δx taken as the error at the slot's end,
    /// δθ = δx/(L/2) rad (the convention of the tolerance study, <c>Tolerance/ArrayTrialModel</c>).
    /// </summary>
    /// <param name="slotLength">The slot's length L, &gt; 0.</param>
    public StatedTolerance TiltFor(Length slotLength)
    {
        if (!(slotLength.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(slotLength), slotLength.ToString(), "the slot length must be positive");
        return new StatedTolerance(Offset.Value / (slotLength.Meters / 2),
            "the offset tolerance (" + Offset.Source + ") at the slot's end: δθ = δx/(L/2)");
    }

    private static StatedTolerance Of(MachiningTolerance? t, string key)
    {
        if (t is null || !(t.Value.Meters > 0)) return Default;
        return t.Distribution == ErrorDistribution.Normal
            ? new StatedTolerance(2 * t.Value.Meters, $"spec {key}: ±2σ of the normal law σ = {Fmt(t.Value)} mm (about 95 % inside)")
            : new StatedTolerance(t.Value.Meters, $"spec {key} (uniform ±)");
    }

    private static string Fmt(Length l) => l.Millimeters.ToString("0.0###", System.Globalization.CultureInfo.InvariantCulture);
}
