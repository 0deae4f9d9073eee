using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Prototype;

/// <summary>
/// A slot model corrected by what a prototype showed: y'(c, l, f) = k_G · y(c, l (1 + s_L), f), i.e. each slot behaves
/// as the inner model's slot (1 + s_L) times as long, coupling k_G times as much. Scaling the whole admittance follows
/// Stevenson's result that a slot's admittance near resonance scales with the square of its coupling to the TE10 mode
/// (A. F. Stevenson, "Theory of slots in rectangular wave-guides", J. Appl. Phys. 19, 1948, the
/// resonant conductance g ∝ sin²(πx/a)), so a coupling error moves G and B together.
/// </summary>
internal sealed class CalibratedSlotModel : IShuntSlotModel
{
    /// <summary>Wraps <paramref name="inner"/>.</summary>
    /// <param name="inner">The design's slot model.</param>
    /// <param name="lengthScale">s_L, fractional (&gt; −0.5).</param>
    /// <param name="conductanceScale">k_G (&gt; 0).</param>
    public CalibratedSlotModel(IShuntSlotModel inner, double lengthScale, double conductanceScale)
    {
        ArgumentNullException.ThrowIfNull(inner);
        if (!(lengthScale > -0.5 && lengthScale < 0.5)) throw new ArgumentOutOfRangeException(nameof(lengthScale), lengthScale, "the length scale must lie within ±50 %");
        if (!(conductanceScale > 0 && double.IsFinite(conductanceScale))) throw new ArgumentOutOfRangeException(nameof(conductanceScale), conductanceScale, "the conductance scale must be positive");
        Inner = inner;
        LengthScale = lengthScale;
        ConductanceScale = conductanceScale;
    }

    /// <summary>The design's slot model.</summary>
    public IShuntSlotModel Inner { get; }

    /// <summary>s_L.</summary>
    public double LengthScale { get; }

    /// <summary>k_G.</summary>
    public double ConductanceScale { get; }

    /// <inheritdoc />
    public RectangularWaveguide Guide => Inner.Guide;

    /// <inheritdoc />
    public Length Width => Inner.Width;

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => Inner.CouplingKind;

    /// <inheritdoc />
    public string Name => Inner.Name + " (calibrated on a prototype)";

    /// <inheritdoc />
    public double MaximumCoupling => Inner.MaximumCoupling;

    /// <inheritdoc />
    public Complex Admittance(double coupling, Length length, Frequency f)
        => ConductanceScale * Inner.Admittance(coupling, (1 + LengthScale) * length, f);

    /// <inheritdoc />
    public SlotResonance Resonance(double coupling, Frequency f)
    {
        var r = Inner.Resonance(coupling, f);
        return r with { ResonantLength = (1 / (1 + LengthScale)) * r.ResonantLength, Conductance = r.Conductance * ConductanceScale };
    }

    /// <inheritdoc />
    public SlotResonance ForConductance(double conductance, Frequency f)
    {
        var r = Inner.ForConductance(conductance / ConductanceScale, f);
        return r with { ResonantLength = (1 / (1 + LengthScale)) * r.ResonantLength, Conductance = r.Conductance * ConductanceScale };
    }

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => ConductanceScale * Inner.MaximumConductance(f);

    /// <inheritdoc />
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f) => Inner.Warnings(coupling, f);
}
