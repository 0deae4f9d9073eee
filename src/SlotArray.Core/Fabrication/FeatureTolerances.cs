using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>A ± tolerance and where it comes from.</summary>
/// <param name="Value">The half-width ±, SI (m, or rad for an angle); ≥ 0.</param>
/// <param name="Source">The spec key it was taken from, or the default's provenance.</param>
public sealed record StatedTolerance(double Value, string Source);

/// <summary>
/// The ± tolerance of each kind of slot dimension, from the spec's <c>tolerance</c> block where it gives one and from
/// stated defaults elsewhere. A uniform tolerance ±v is printed as ±v; a normal one of standard deviation σ as ±2σ
/// (about 95 % of parts inside). Edge slots: the tilt from <c>tolerance.tilt</c>, else the default milling tolerance
/// taken at the slot's end (<see cref="TiltFor"/>); the depth of cut from <c>tolerance.depth</c>, else half the length tolerance.
/// </summary>
/// <param name="Position">Slot centre along the guide (and the end shorts and feed junction, which set the electrical lengths).</param>
/// <param name="Offset">Slot offset from the broad-wall centreline.</param>
/// <param name="Length">Slot length.</param>
/// <param name="Width">Slot width.</param>
/// <param name="CutDepth">Edge slots: depth of cut into each broad wall: <c>tolerance.depth</c>, else half the length
/// tolerance (the cut path b/cos θ + 2 (d − t) changes by twice the depth, so the stated length tolerance holds).</param>
public sealed record FeatureTolerances(StatedTolerance Position, StatedTolerance Offset, StatedTolerance Length,
    StatedTolerance Width, StatedTolerance CutDepth)
{
    /// <summary>Edge slots: the tilt tolerance of <c>tolerance.tilt</c> (rad), or null for the default of <see cref="TiltFor"/>.</summary>
    public StatedTolerance? Tilt { get; init; }

    /// <summary>The default slot tolerance, ±0.025 mm: routine precision CNC milling of slots.</summary>
    public static StatedTolerance Default { get; } = new(GeneralTolerances.PrecisionMilling.Meters,
        "default: routine precision CNC milling of slots (common practice, no source)");

    /// <summary>Tolerances from the spec's tolerance block (null: every one the default).</summary>
    /// <param name="spec">The spec's tolerance block, or null.</param>
    public static FeatureTolerances From(ToleranceRequest? spec)
    {
        var tilt = spec?.Tilt is { } t && t.Value.Radians > 0
            ? t.Distribution == ErrorDistribution.Normal
                ? new StatedTolerance(2 * t.Value.Radians, $"spec tolerance.tilt: ±2σ of the normal law σ = {t.Value.Degrees.ToString("0.0###", System.Globalization.CultureInfo.InvariantCulture)} deg (about 95 % inside)")
                : new StatedTolerance(t.Value.Radians, "spec tolerance.tilt (uniform ±)")
            : null;
        var length = Of(spec?.Length, "tolerance.length");
        var depth = spec?.Depth is { } d && d.Value.Meters > 0 ? Of(d, "tolerance.depth")
            : new StatedTolerance(length.Value / 2, "half the length tolerance (" + length.Source + "): the cut path b/cos θ + 2 (depth − wall) changes by twice the depth");
        return new FeatureTolerances(Of(spec?.Position, "tolerance.position"), Of(spec?.Offset, "tolerance.offset"), length,
            Of(spec?.Width, "tolerance.width"), depth) { Tilt = tilt };
    }

    /// <summary>
    /// The one ± tolerance printed on every cut-list row: the tightest of the spec's offset, length, position and width
    /// tolerances (a normal σ counts as ±2σ, the 95 % band); without a tolerance block, or when none of them is positive,
    /// routine precision CNC milling, ±0.025 mm (<see cref="GeneralTolerances.PrecisionMilling"/>, common practice, no source).
    /// </summary>
    /// <param name="spec">The spec's tolerance block, or null.</param>
    public static Length CutListTolerance(ToleranceRequest? spec)
    {
        if (spec is null) return GeneralTolerances.PrecisionMilling;
        var values = new[] { spec.Offset, spec.Length, spec.Position, spec.Width }
            .Select(t => t.Distribution == ErrorDistribution.Normal ? 2 * t.Value.Meters : t.Value.Meters)
            .Where(v => v > 0).ToArray();
        return values.Length > 0 ? Quantities.Length.FromMeters(values.Min()) : GeneralTolerances.PrecisionMilling;
    }

    /// <summary>
    /// The tilt tolerance of an edge slot of length L: <see cref="Tilt"/> when the spec gives one; else the default
    /// milling tolerance ±0.025 mm taken as the error of the cutter's position at the slot's end, δθ = δx/(L/2) rad
    /// (common practice, no source: a CNC mill positions each end of the cut to its routine accuracy).
    /// </summary>
    /// <param name="slotLength">The slot's length L, &gt; 0.</param>
    public StatedTolerance TiltFor(Length slotLength)
    {
        if (!(slotLength.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(slotLength), slotLength.ToString(), "the slot length must be positive");
        return Tilt ?? new StatedTolerance(Default.Value / (slotLength.Meters / 2),
            "default: the routine ±0.025 mm of precision CNC milling at the slot's end, δθ = δx/(L/2) (common practice, no source)");
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
