using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// The longitudinal broad-wall shunt slot by the finite-wall Galerkin moment method
/// (<see cref="LongitudinalSlotMomentMethod"/>): admittance solved directly, resonances from the cached
/// <see cref="ResonantCharacterisation"/> at each frequency asked for.
/// </summary>
internal sealed class MomentMethodSlotModel : IShuntSlotModel
{
    /// <summary>Shunt asymmetry |B − C|/|B| above which the shunt representation is flagged (10 %).</summary>
    public const double ShuntAsymmetryLimit = 0.10;

    private readonly ResonantCharacterisationCache _cache;

    /// <summary>A model for slots of the given width in the given guide (its wall thickness is used).</summary>
    /// <param name="guide">The guide.</param>
    /// <param name="width">Slot width.</param>
    /// <param name="options">Truncations of the moment method; the defaults when null.</param>
    /// <param name="cache">Where resonant characterisations are kept (shared by the composition root); a private one when null.</param>
    public MomentMethodSlotModel(RectangularWaveguide guide, Length width, MomentMethodOptions? options = null, ResonantCharacterisationCache? cache = null)
    {
        Solver = new LongitudinalSlotMomentMethod(guide, width, options);
        _cache = cache ?? new ResonantCharacterisationCache();
        _memoKey = ResonantCharacterisationCache.AdmittanceKeyOf(Solver);
    }

    private readonly string _memoKey;

    /// <summary>The moment-method solver.</summary>
    public LongitudinalSlotMomentMethod Solver { get; }

    /// <inheritdoc />
    public RectangularWaveguide Guide => Solver.Guide;

    /// <inheritdoc />
    public Length Width => Solver.Width;

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => SlotCouplingKind.Offset;

    /// <inheritdoc />
    public string Name => "moment-method";

    /// <inheritdoc />
    public double MaximumCoupling => StevensonLongitudinalSlot.MaximumOffset(Guide);

    /// <summary>The resonant characterisation at frequency f (computed once, cached).</summary>
    public ResonantCharacterisation Characterisation(Frequency f) => _cache.For(Solver, f);

    /// <inheritdoc />
    public Complex Admittance(double coupling, Length length, Frequency f) => _cache.Admittance(Solver, _memoKey, coupling, length, f);

    /// <inheritdoc />
    public SlotResonance Resonance(double coupling, Frequency f)
    {
        var c = Characterisation(f);
        return new SlotResonance(coupling, c.ResonantLength(coupling), c.ResonantConductance(coupling));
    }

    /// <inheritdoc />
    public SlotResonance ForConductance(double conductance, Frequency f) => Characterisation(f).ForConductance(conductance, Guide.Designation);

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => Characterisation(f).MaximumConductance;

    /// <inheritdoc />
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f)
    {
        var list = new List<DesignWarning>();
        double x = Math.Abs(coupling);
        if (x > MaximumCoupling)
            list.Add(new DesignWarning("slot-offset-range", FormattableString.Invariant(
                $"offset {x * 1e3:0.###} mm is beyond the usable a/4 = {MaximumCoupling * 1e3:0.###} mm; the resonance there is extrapolated")));
        var (low, high) = Guide.SingleModeBand;
        if (f <= low || f >= high)
            list.Add(new DesignWarning("slot-single-mode", $"{f} is outside the single-mode band {low} – {high}: the slot model assumes TE10 only"));
        else
        {
            double asym = Characterisation(f).ShuntAsymmetry(x);
            if (asym > ShuntAsymmetryLimit)
                list.Add(new DesignWarning("slot-shunt-validity", FormattableString.Invariant(
                    $"at offset {x * 1e3:0.###} mm the forward and backward scattered waves differ by {asym * 100:0.#} % (|B − C|/|B| > 10 %): the slot is not a pure shunt element (Stern and Elliott 1985); a T or Π network is needed")));
        }
        return list;
    }
}
