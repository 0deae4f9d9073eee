using System.Numerics;
using MathNet.Numerics.Interpolation;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// The "stevenson" longitudinal-slot model (spec <c>slots: {model: stevenson}</c>): Stevenson's resonant conductance,
/// with the resonant length and the length dependence borrowed from the moment method.
/// </summary>
/// <remarks>
/// <para>Exactly: g_r(x, f) = <see cref="StevensonLongitudinalSlot.Conductance"/>; L_r(x, f) = the moment-method resonant
/// length (finite wall, <see cref="ResonantCharacterisation"/>); y(x, L, f) = g_r(x, f) · h(L/L_r(x, f)).</para>
/// <para>h is Elliott's near-universal normalised admittance (R. S. Elliott, <i>Antenna Theory and Design</i>, 1981: measured
/// Y/G0 curves for different offsets nearly collapse on one function of l/l_r; from memory [M, Medium]).
/// Here h(ν) = y_MoM(x_ref, ν L_r(x_ref))/g_r,MoM(x_ref), computed once at the design frequency and the reference offset
/// x_ref = a/8, on 0.6 ≤ ν ≤ 1.35 (for a slot wider than 0.3 L_r from just above 2w/L_r, since the moment method needs
/// L &gt; 2w; 61 points, natural cubic splines of Re h and Im h). h(1) = 1 by construction.</para>
/// </remarks>
internal sealed class StevensonSlotModel : IShuntSlotModel
{
    /// <summary>Smallest L/L_r at which h is tabulated.</summary>
    public const double MinimumLengthRatio = 0.6;
    /// <summary>Largest L/L_r at which h is tabulated.</summary>
    public const double MaximumLengthRatio = 1.35;

    private readonly MomentMethodSlotModel _mom;
    private readonly CubicSpline _hRe, _hIm;

    /// <summary>The model for slots of the given width in the given guide; h is computed at the design frequency.</summary>
    /// <param name="guide">The guide.</param>
    /// <param name="width">Slot width.</param>
    /// <param name="designFrequency">Frequency at which h is computed.</param>
    /// <param name="options">Truncations of the moment method; the defaults when null.</param>
    /// <param name="cache">Where the moment method's resonant characterisations are kept; a private one when null.</param>
    public StevensonSlotModel(RectangularWaveguide guide, Length width, Frequency designFrequency, MomentMethodOptions? options = null,
        ResonantCharacterisationCache? cache = null)
    {
        _mom = new MomentMethodSlotModel(guide, width, options, cache);
        DesignFrequency = designFrequency;
        double xRef = guide.BroadWall.Meters / 8;
        var c = _mom.Characterisation(designFrequency);
        double lr = c.ResonantLength(xRef).Meters;
        var (_, atRes) = ResonantCharacterisation.FindResonance(_mom.Solver, xRef, designFrequency);
        double gRef = atRes.Admittance.Real;
        const int n = 61;
        // The moment method needs L > 2w: a wide slot's table starts just above that instead of at 0.6 L_r.
        LowestLengthRatio = Math.Max(MinimumLengthRatio, 2 * width.Meters / lr * (1 + 1e-6));
        if (LowestLengthRatio >= 0.95)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"slots {width} wide are too wide for the narrow-slot model at {designFrequency}: twice the width exceeds 95 % of the resonant length {lr * 1e3:0.##} mm; use slots narrower than {0.95 * lr / 2 * 1e3:0.##} mm"));
        var nu = new double[n];
        var re = new double[n];
        var im = new double[n];
        for (int i = 0; i < n; i++)
        {
            nu[i] = LowestLengthRatio + (MaximumLengthRatio - LowestLengthRatio) * i / (n - 1);
            var y = _mom.Solver.Solve(xRef, nu[i] * lr, designFrequency.Hertz, null).Admittance / gRef;
            re[i] = y.Real;
            im[i] = y.Imaginary;
        }
        _hRe = CubicSpline.InterpolateNatural(nu, re);
        _hIm = CubicSpline.InterpolateNatural(nu, im);
    }

    /// <summary>Smallest L/L_r at which h is tabulated for this width: <see cref="MinimumLengthRatio"/>, or just above 2w/L_r for a wide slot.</summary>
    public double LowestLengthRatio { get; }

    /// <summary>Frequency at which the normalised length dependence h was computed.</summary>
    public Frequency DesignFrequency { get; }

    /// <inheritdoc />
    public RectangularWaveguide Guide => _mom.Guide;

    /// <inheritdoc />
    public Length Width => _mom.Width;

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => SlotCouplingKind.Offset;

    /// <inheritdoc />
    public string Name => "stevenson";

    /// <inheritdoc />
    public double MaximumCoupling => StevensonLongitudinalSlot.MaximumOffset(Guide);

    /// <summary>h(ν), the normalised admittance y/g_r as a function of ν = L/L_r (h(1) = 1).</summary>
    public Complex NormalisedAdmittance(double lengthRatio)
    {
        if (!(lengthRatio >= LowestLengthRatio && lengthRatio <= MaximumLengthRatio))
            throw new ArgumentOutOfRangeException(nameof(lengthRatio), lengthRatio,
                FormattableString.Invariant($"L/L_r = {lengthRatio:0.###} is outside the tabulated {LowestLengthRatio:0.###}–{MaximumLengthRatio} of the Stevenson model's length dependence"));
        return new Complex(_hRe.Interpolate(lengthRatio), _hIm.Interpolate(lengthRatio));
    }

    /// <inheritdoc />
    public Complex Admittance(double coupling, Length length, Frequency f)
    {
        var r = Resonance(coupling, f);
        return r.Conductance * NormalisedAdmittance(length / r.ResonantLength);
    }

    /// <inheritdoc />
    public SlotResonance Resonance(double coupling, Frequency f)
        => new(coupling, _mom.Characterisation(f).ResonantLength(coupling), StevensonLongitudinalSlot.Conductance(Guide, coupling, f));

    /// <inheritdoc />
    public SlotResonance ForConductance(double conductance, Frequency f)
    {
        double x = StevensonLongitudinalSlot.Offset(Guide, conductance, f);
        return new SlotResonance(x, _mom.Characterisation(f).ResonantLength(x), conductance);
    }

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => StevensonLongitudinalSlot.MaximumConductance(Guide, f);

    /// <inheritdoc />
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f)
        => [.. StevensonLongitudinalSlot.Warnings(Guide, coupling, f).Where(w => w.Code != "stevenson-thin-wall")];
}
