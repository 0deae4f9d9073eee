using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots.Tables;

/// <summary>
/// A user's slot table behind the slot port (<c>slots.data</c>): y from <see cref="SlotTableFit"/>, resonance from its
/// fits, the coupling for a conductance from the shared <see cref="SlotResonanceSolver"/>. With
/// <see cref="Extrapolate"/> the couplings reach the built-in limit (a/4 offset, 30° tilt) beyond the table, else they
/// stop at the table's largest.
/// </summary>
internal sealed class TabulatedSlotModel : IShuntSlotModel
{
    /// <summary>Largest offset reached when extrapolating: a/4, the usable limit of the built-in longitudinal models.</summary>
    private double BuiltInLimit => Fit.CouplingKind == SlotCouplingKind.Offset ? StevensonLongitudinalSlot.MaximumOffset(Guide) : EdgeSlot.MaximumTilt.Radians;

    /// <summary>The model of a fitted table for slots of the given width (the width is carried for the cut list; the table fixes it).</summary>
    /// <param name="fit">The fitted table.</param>
    /// <param name="width">Slot width (as the spec gives it).</param>
    /// <param name="extrapolate">Whether slots outside the table are allowed (and flagged) rather than refused.</param>
    public TabulatedSlotModel(SlotTableFit fit, Length width, bool extrapolate)
    {
        ArgumentNullException.ThrowIfNull(fit);
        Fit = fit;
        Width = width;
        Extrapolate = extrapolate;
    }

    /// <summary>The fitted table.</summary>
    public SlotTableFit Fit { get; }

    /// <summary>Whether slots outside the table are allowed (and flagged).</summary>
    public bool Extrapolate { get; }

    /// <inheritdoc />
    public RectangularWaveguide Guide => Fit.Guide;

    /// <inheritdoc />
    public Length Width { get; }

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => Fit.CouplingKind;

    /// <inheritdoc />
    public string Name => $"table {Fit.Table.Source}";

    /// <inheritdoc />
    public SlotDataRange Range => Fit.Range;

    /// <inheritdoc />
    public double MaximumCoupling => Extrapolate ? Math.Max(Fit.Range.CouplingHigh, BuiltInLimit) : Fit.Range.CouplingHigh;

    /// <inheritdoc />
    public Complex Admittance(double coupling, Length length, Frequency f) => Fit.Admittance(coupling, length.Meters, f);

    /// <inheritdoc />
    public SlotResonance Resonance(double coupling, Frequency f)
        => new(coupling, Length.FromMeters(Fit.ResonantLength(coupling, f)), Fit.ResonantConductance(coupling, f));

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => Fit.ResonantConductance(MaximumCoupling, f);

    /// <inheritdoc />
    public SlotResonance ForConductance(double conductance, Frequency f)
    {
        if (!(conductance > 0) || !double.IsFinite(conductance))
            throw new ArgumentOutOfRangeException(nameof(conductance), conductance, "conductance must be positive");
        double gMax = MaximumConductance(f);
        if (conductance > gMax)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"a slot needs g = {conductance:0.####}, above the {gMax:0.####} the slot table {Fit.Table.Source} gives at {f.Gigahertz:0.######} GHz at its largest {SlotTableFit.Noun(Fit.Table)} {SlotTableFit.Show(Fit.Table, MaximumCoupling)}{(Extrapolate ? " (extrapolated)" : "")}: use more slots, a gentler taper, or extend the table"));
        double c = conductance == gMax ? MaximumCoupling
            : SlotResonanceSolver.CouplingForConductance(x => Fit.ResonantConductance(x, f), conductance, 1e-9, MaximumCoupling);
        return new SlotResonance(c, Length.FromMeters(Fit.ResonantLength(c, f)), conductance);
    }

    /// <summary>Outside the single-mode band. (Slots outside the table are judged per slot by the design's range check.)</summary>
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f)
    {
        var (low, high) = Guide.SingleModeBand;
        return f <= low || f >= high
            ? [new DesignWarning("slot-single-mode", $"{f} is outside the single-mode band {low} – {high}: the slot table assumes TE10 only")]
            : [];
    }
}
