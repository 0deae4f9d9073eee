using System.Numerics;
using MathNet.Numerics.Interpolation;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// y(θ, D, f) of an edge slot interpolated in one calibration family (MathNet.Numerics splines): in frequency a natural
/// cubic spline per tilt and depth node; across the depth nodes a natural cubic spline (a straight line with two);
/// across the tilt nodes a monotone piecewise-cubic (PCHIP): of g/s(θ) for the conductance, s(θ) the idealised tilt law
/// of <see cref="EdgeSlotConductance"/>, so that g → 0 as θ → 0 (the slot's resonant mode is not excited by the
/// narrow-wall current it lies along) and the ratio, which varies slowly, is what is interpolated; of b itself for the
/// susceptance, whose background does not vanish with the tilt (the wraps in the broad walls cut the guide's
/// longitudinal current at any tilt and store energy in the slot's odd, non-radiating mode: [D], reasoning from the TE10
/// wall currents, borne out by the runs: b ≈ +0.009 at 5°). Below the smallest tilt node g/s and b are held.
/// </summary>
/// <remarks>
/// Other guides (or the same guide at another frequency outside the family's band) are reached by electrical
/// similitude: all lengths scale with s = a/a_family and frequencies with 1/s, so the family is read at f·s and at the
/// cut depth whose inner developed length b/cos θ + 2(D − t) (the cut list's convention) is the request's divided by s.
/// The wall and the kerf are not scaled (they are what the shop has): that part of the transfer is an approximation,
/// reported by <see cref="CalibratedEdgeSlot.Warnings"/>.
/// </remarks>
internal sealed class EdgeSlotAdmittanceSurface
{
    /// <summary>
    /// Mesh correction of the calibration's cut depths, mm: the runs (normal mesh: cells of w/4 over the kerf, λ/20
    /// largest) resonate at a shallower cut than the same cut on the fine mesh (w/5, λ/30). Measured at 20° in WR-90
    /// (bare tube, 9.375 GHz): resonant depth 2.66 mm (coarse), 2.97 mm (normal), 3.06 mm (fine); so a cut of true depth
    /// D is read from the runs at D − 0.09 mm. The trend (0.31 mm then 0.09 mm) suggests the converged depth lies
    /// roughly 0.05–0.1 mm deeper still (README, edge-slot model limits).
    /// </summary>
    public const double MeshDepthCorrectionMm = 0.09;

    private readonly CubicSpline[][] re, im;
    private readonly RectangularWaveguide familyGuide;

    /// <summary>Interpolates a family for slots cut in <paramref name="guide"/>.</summary>
    public EdgeSlotAdmittanceSurface(EdgeSlotCalibrationFamily family, RectangularWaveguide guide)
    {
        Family = family;
        Guide = guide;
        Scale = guide.BroadWall.Millimeters / family.BroadWallMm;
        familyGuide = RectangularWaveguide.Create(Length.FromMillimeters(family.BroadWallMm), Length.FromMillimeters(family.NarrowWallMm),
            Length.FromMillimeters(family.WallMm), guide.Conductivity, guide.MetalName);
        int nt = family.Tilts.Count;
        var fGhz = family.FrequenciesHz.Select(f => f * 1e-9).ToArray();
        re = new CubicSpline[nt][];
        im = new CubicSpline[nt][];
        for (int i = 0; i < nt; i++)
        {
            var t = family.Tilts[i];
            re[i] = new CubicSpline[t.DepthsMm.Count];
            im[i] = new CubicSpline[t.DepthsMm.Count];
            for (int j = 0; j < t.DepthsMm.Count; j++)
            {
                var y = Enumerable.Range(0, fGhz.Length).Select(k => t.Y[j, k]).ToArray();
                re[i][j] = CubicSpline.InterpolateNaturalSorted(fGhz, y.Select(v => v.Real).ToArray());
                im[i][j] = CubicSpline.InterpolateNaturalSorted(fGhz, y.Select(v => v.Imaginary).ToArray());
            }
        }
    }

    /// <summary>The family interpolated.</summary>
    public EdgeSlotCalibrationFamily Family { get; }

    /// <summary>The guide the slots are cut in.</summary>
    public RectangularWaveguide Guide { get; }

    /// <summary>Similitude scale s = a/a_family (1 in the family's own guide).</summary>
    public double Scale { get; }

    /// <summary>The family's frequency at which the request's frequency is read, Hz (f·s).</summary>
    public double FamilyFrequency(Frequency f) => f.Hertz * Scale;

    /// <summary>The family's cut depth, mm, equivalent to a cut of depth <paramref name="depthMm"/> at tilt θ in the request's guide (similitude and <see cref="MeshDepthCorrectionMm"/>).</summary>
    public double FamilyDepthMm(double tilt, double depthMm)
    {
        double c = Math.Cos(tilt);
        double developed = Guide.NarrowWall.Millimeters / c + 2 * (depthMm - Guide.WallThickness.Millimeters);
        return Family.WallMm + (developed / Scale - Family.NarrowWallMm / c) / 2 - MeshDepthCorrectionMm;
    }

    /// <summary>The request's cut depth, mm, equivalent to the family's cut depth <paramref name="familyDepthMm"/> at tilt θ (inverse of <see cref="FamilyDepthMm"/>).</summary>
    public double RequestDepthMm(double tilt, double familyDepthMm)
    {
        double c = Math.Cos(tilt);
        double developed = (Family.NarrowWallMm / c + 2 * (familyDepthMm + MeshDepthCorrectionMm - Family.WallMm)) * Scale;
        return Guide.WallThickness.Millimeters + (developed - Guide.NarrowWall.Millimeters / c) / 2;
    }

    /// <summary>y = Y/G0 of a cut of the family's depth <paramref name="familyDepthMm"/> at tilt θ (radians, sign ignored), read at the family's frequency <paramref name="familyHz"/>.</summary>
    public Complex AtFamily(double tilt, double familyDepthMm, double familyHz)
    {
        double th = Math.Abs(tilt), fGhz = familyHz * 1e-9;
        var f = Frequency.FromHertz(familyHz);
        int nt = Family.Tilts.Count;
        var tilts = Family.Tilts.Select(t => t.TiltDeg * Math.PI / 180).ToArray();
        var ratioRe = new double[nt];
        var ratioIm = new double[nt];
        for (int i = 0; i < nt; i++)
        {
            var depths = Family.Tilts[i].DepthsMm.ToArray();
            int nd = depths.Length;
            var vr = new double[nd];
            var vi = new double[nd];
            for (int j = 0; j < nd; j++)
            {
                vr[j] = re[i][j].Interpolate(fGhz);
                vi[j] = im[i][j].Interpolate(fGhz);
            }
            double s = EdgeSlotConductance.Conductance(familyGuide, Angle.FromRadians(tilts[i]), f);
            ratioRe[i] = AcrossDepth(depths, vr, familyDepthMm) / s;
            ratioIm[i] = AcrossDepth(depths, vi, familyDepthMm);
        }
        double at = Math.Clamp(th, tilts[0], tilts[^1]);
        double shape = EdgeSlotConductance.Conductance(familyGuide, Angle.FromRadians(th), f);
        return new Complex(shape * AcrossTilt(tilts, ratioRe, at), AcrossTilt(tilts, ratioIm, at));
    }

    /// <summary>
    /// The family's depths, mm, over which a cut at tilt θ is read from runs on both sides in tilt: the overlap of the
    /// depth ranges of the tilt nodes that bracket θ (the nearest node's outside the tilts run).
    /// </summary>
    public (double Low, double High) FamilyDepthRange(double tilt)
    {
        double deg = Math.Abs(tilt) * 180 / Math.PI;
        var t = Family.Tilts;
        int hi = Enumerable.Range(0, t.Count).FirstOrDefault(i => t[i].TiltDeg >= deg, t.Count - 1), lo = Math.Max(0, t[hi].TiltDeg > deg ? hi - 1 : hi);
        return (Math.Max(t[lo].DepthsMm[0], t[hi].DepthsMm[0]), Math.Min(t[lo].DepthsMm[^1], t[hi].DepthsMm[^1]));
    }

    /// <summary>y = Y/G0 of a cut of depth <paramref name="depthMm"/> (request's guide) at tilt θ and frequency f.</summary>
    public Complex Admittance(double tilt, double depthMm, Frequency f) => AtFamily(tilt, FamilyDepthMm(tilt, depthMm), FamilyFrequency(f));

    private static double AcrossDepth(double[] depths, double[] values, double d) =>
        depths.Length switch
        {
            1 => values[0],
            2 => values[0] + (values[1] - values[0]) * (d - depths[0]) / (depths[1] - depths[0]),
            _ => CubicSpline.InterpolateNaturalSorted(depths, values).Interpolate(d),
        };

    private static double AcrossTilt(double[] tilts, double[] values, double t) =>
        tilts.Length switch
        {
            1 => values[0],
            2 => values[0] + (values[1] - values[0]) * (t - tilts[0]) / (tilts[1] - tilts[0]),
            _ => CubicSpline.InterpolatePchipSorted(tilts, values).Interpolate(t),
        };
}
