using System.Numerics;
using MathNet.Numerics.Interpolation;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;

namespace SlotArray.Core.Design;

/// <summary>
/// A smooth two-dimensional surrogate of an isolated slot's admittance y(x, L) at one frequency, for the Newton
/// iterations of Elliott's design procedure: tensor-product natural cubic splines of
/// q(x, u) = y(x, u·L_r(x)) / sin²(πx/a) over the offset x (in the variable x²) and the length ratio u = L/L_r(x),
/// built from direct solves of the slot model at the grid nodes, and a spline of the resonant length L_r(x) over x².
/// </summary>
/// <remarks>
/// <para>Why this form: Elliott's observation that the admittance curves of different offsets nearly collapse when
/// written as g_r(x)·h(L/L_r(x)) ([M]; R. S. Elliott, <i>Antenna Theory and Design</i>,
/// Prentice-Hall 1981, Ch. 8) and Stevenson's g_r ∝ sin²(πx/a) (A. F. Stevenson, J. Appl. Phys. 19, 24–38, 1948)
/// make q slowly varying in both variables, so a coarse grid interpolates it to well below the moment method's own
/// convergence (the tests check the surrogate against direct solves between the nodes). Even in x: the admittance
/// of a longitudinal slot does not depend on the side of the centre line, hence the variable x².</para>
/// <para>Cost: <see cref="OffsetNodes"/> × <see cref="RatioNodes"/> direct solves once (about 0.2 s with the moment
/// method), then a few microseconds per evaluation.</para>
/// </remarks>
internal sealed class ElliottSlotSurrogate
{
    /// <summary>Offset nodes of the grid (uniform in x from 1 % of the largest offset to the largest).</summary>
    public const int OffsetNodes = 14;

    /// <summary>Length-ratio nodes of the grid (uniform in u).</summary>
    public const int RatioNodes = 13;

    /// <summary>Smallest length ratio L/L_r covered.</summary>
    public const double MinimumRatio = 0.88;

    /// <summary>Largest length ratio L/L_r covered.</summary>
    public const double MaximumRatio = 1.12;

    private readonly double a;
    private readonly double[] s;              // x² at the offset nodes
    private readonly CubicSpline[] qRe, qIm;  // per offset node, over u
    private readonly CubicSpline lr;          // L_r over x²

    /// <summary>Builds the surrogate of <paramref name="slot"/> at frequency <paramref name="f"/> over offsets up to <paramref name="maximumOffset"/>.</summary>
    /// <param name="slot">An offset-coupled (longitudinal) slot model.</param>
    /// <param name="f">The design frequency.</param>
    /// <param name="maximumOffset">Largest offset (m) covered; defaults to the model's <see cref="IShuntSlotModel.MaximumCoupling"/>.</param>
    public ElliottSlotSurrogate(IShuntSlotModel slot, Frequency f, double? maximumOffset = null)
    {
        ArgumentNullException.ThrowIfNull(slot);
        if (slot.CouplingKind != SlotCouplingKind.Offset)
            throw new ArgumentException($"Elliott's procedure here is for offset (longitudinal) slots; the model '{slot.Name}' is {slot.CouplingKind}-coupled", nameof(slot));
        Frequency = f;
        a = slot.Guide.BroadWall.Meters;
        MaximumOffset = maximumOffset ?? slot.MaximumCoupling;
        MinimumOffset = 0.01 * MaximumOffset;
        s = new double[OffsetNodes];
        var lengths = new double[OffsetNodes];
        qRe = new CubicSpline[OffsetNodes];
        qIm = new CubicSpline[OffsetNodes];
        var u = new double[RatioNodes];
        for (int j = 0; j < RatioNodes; j++) u[j] = MinimumRatio + (MaximumRatio - MinimumRatio) * j / (RatioNodes - 1);
        for (int i = 0; i < OffsetNodes; i++)
        {
            double x = MinimumOffset + (MaximumOffset - MinimumOffset) * i / (OffsetNodes - 1);
            s[i] = x * x;
            double l = slot.Resonance(x, f).ResonantLength.Meters;
            lengths[i] = l;
            double sin2 = Sin2(x);
            var re = new double[RatioNodes];
            var im = new double[RatioNodes];
            for (int j = 0; j < RatioNodes; j++)
            {
                var y = slot.Admittance(x, Length.FromMeters(u[j] * l), f) / sin2;
                re[j] = y.Real;
                im[j] = y.Imaginary;
            }
            qRe[i] = CubicSpline.InterpolateNatural(u, re);
            qIm[i] = CubicSpline.InterpolateNatural(u, im);
        }
        lr = CubicSpline.InterpolateNatural(s, lengths);
    }

    /// <summary>The frequency the surrogate was built at.</summary>
    public Frequency Frequency { get; }

    /// <summary>Smallest offset magnitude (m) of the grid; below it the splines extrapolate in x² toward x = 0.</summary>
    public double MinimumOffset { get; }

    /// <summary>Largest offset magnitude (m) covered.</summary>
    public double MaximumOffset { get; }

    /// <summary>Resonant full length L_r(x) (m) interpolated over x².</summary>
    public double ResonantLength(double offset) => lr.Interpolate(offset * offset);

    /// <summary>The interpolated admittance y = Y/G0 of a slot of offset x (m, either sign) and full length L (m).</summary>
    public Complex Admittance(double offset, double length)
    {
        double x2 = offset * offset;
        double r = length / lr.Interpolate(x2);
        Span<double> re = stackalloc double[OffsetNodes];
        Span<double> im = stackalloc double[OffsetNodes];
        for (int i = 0; i < OffsetNodes; i++)
        {
            re[i] = qRe[i].Interpolate(r);
            im[i] = qIm[i].Interpolate(r);
        }
        double qr = CubicSpline.InterpolateNatural(s, re.ToArray()).Interpolate(x2);
        double qi = CubicSpline.InterpolateNatural(s, im.ToArray()).Interpolate(x2);
        return Sin2(offset) * new Complex(qr, qi);
    }

    private double Sin2(double x)
    {
        double v = Math.Sin(Math.PI * x / a);
        return v * v;
    }
}
