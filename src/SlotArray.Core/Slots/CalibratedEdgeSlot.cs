using System.Collections.Concurrent;
using System.Globalization;
using System.Numerics;
using MathNet.Numerics;
using MathNet.Numerics.Interpolation;
using MathNet.Numerics.RootFinding;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>Where an edge slot of a given tilt is cut for a design, and what it then presents.</summary>
/// <param name="Tilt">Tilt, radians (≥ 0).</param>
/// <param name="DepthMm">Cut depth from the outer narrow-wall face, mm.</param>
/// <param name="Admittance">y = Y/G0 of that cut at the design frequency.</param>
/// <param name="Resonant">True when Im y = 0 there (a resonance exists at this tilt); false at the depth where y is closest to a pure conductance (least b/g).</param>
/// <param name="PeakDepthMm">Depth of the conductance peak over the calibrated depths, mm.</param>
/// <param name="PeakConductance">Re y at that depth.</param>
internal sealed record EdgeSlotCut(double Tilt, double DepthMm, Complex Admittance, bool Resonant, double PeakDepthMm, double PeakConductance);

/// <summary>
/// Edge slot (inclined narrow-wall slot wrapping into both broad walls) from full-wave calibration: y(θ, D, f) read
/// from the repository's openEMS runs of the exact cut (<see cref="EdgeSlotCalibration"/>, interpolated by
/// <see cref="EdgeSlotAdmittanceSurface"/>) in the slot's surroundings, background susceptance included.
/// Coupling parameter: the signed tilt θ, radians; length: the developed length L = b/cos θ + 2(D − t) (the cut list's
/// convention, <see cref="EdgeSlot.DevelopedLength"/>).
/// </summary>
/// <remarks>
/// <para>Form. A narrow-wall inclined slot is a shunt element whose admittance is a single resonance riding on a
/// background susceptance; the moment-method analyses of the wrapped slot (C.-G. Jan, P. Hsu and R.-B. Wu, "Moment
/// method analysis of sidewall inclined slots in rectangular waveguides", IEEE Trans. Antennas Propag. 39(1), 1991; and
/// with finite wall thickness, C.-G. Jan, R.-B. Wu, P. Hsu and D.-C. Chang, IEEE Trans. Antennas Propag. 44(8), 1996;
/// both from memory, titles and numbers approximate) show it, and so do our runs. No published table was at hand, so the
/// numbers are the project's own full-wave runs (data/fullwave/edge-slot-calibration.csv: guide, kerf, wall, cutter,
/// surroundings, mesh, engine version, date), interpolated, not fitted to a formula.</para>
/// <para>Design cut. At each tilt the design depth is the one where y is closest to a pure conductance: the resonance
/// (the shallowest depth where Im y falls through zero, next to the conductance peak) when there is one; at small tilts
/// the capacitive background exceeds half the slot's own susceptance swing and no depth is purely conductive: then the
/// depth of least b/g. For a single resonance on a constant background, y = 1/(r + jx) + j b_0, the two zeros of b merge
/// at x = r exactly where min(b/g) reaches zero ([D]), so the rule is continuous in θ and the design conductance
/// g_d(θ) can be inverted. Designers then work with the complex y at that cut (<see cref="DesignsOffResonance"/>).</para>
/// </remarks>
internal sealed class CalibratedEdgeSlot : IShuntSlotModel
{
    /// <summary>Largest tilt the calibration covers.</summary>
    public static Angle MaximumTilt => Angle.FromDegrees(25);

    /// <summary>Warning code: the cut lies outside what the runs cover (tilt, depth, frequency, guide or surroundings).</summary>
    public const string ExtrapolatedWarningCode = "edge-slot-calibration-range";

    /// <summary>Warning code: no depth is purely conductive at this tilt.</summary>
    public const string NoResonanceWarningCode = "edge-slot-no-resonance";

    private const int TiltNodes = 97, DepthSamples = 49;
    private readonly ConcurrentDictionary<double, DesignCurve> curves = new();
    private readonly IReadOnlyList<DesignWarning> familyWarnings;

    private CalibratedEdgeSlot(RectangularWaveguide guide, Length width, EdgeSlotSurround surround, EdgeSlotAdmittanceSurface surface, IReadOnlyList<DesignWarning> warnings)
    {
        Guide = guide;
        Width = width;
        Surround = surround;
        Surface = surface;
        familyWarnings = warnings;
    }

    /// <summary>
    /// The model for a guide, kerf and surroundings: the calibration family of the same surroundings (tube when a ground
    /// plane has none) in the same guide, else in the nearest guide by broad-wall width, read by similitude.
    /// </summary>
    /// <param name="guide">The guide (its wall thickness is the tube's).</param>
    /// <param name="width">Kerf; &gt; 0 and less than b.</param>
    /// <param name="surround">What the slots radiate into.</param>
    /// <param name="families">Calibration families; null for the repository's.</param>
    public static CalibratedEdgeSlot Create(RectangularWaveguide guide, Length width, EdgeSlotSurround surround = EdgeSlotSurround.Tube,
        IReadOnlyList<EdgeSlotCalibrationFamily>? families = null)
    {
        ArgumentNullException.ThrowIfNull(guide);
        if (!(width.Meters > 0) || !(width < guide.NarrowWall))
            throw new ArgumentOutOfRangeException(nameof(width), width.ToString(), $"the edge-slot width must be positive and less than the narrow wall b = {guide.NarrowWall}, got {width}");
        families ??= EdgeSlotCalibration.Families;
        var warnings = new List<DesignWarning>();
        var pool = families.Where(f => f.Surround == surround).ToList();
        if (pool.Count == 0)
        {
            pool = families.Where(f => f.Surround == EdgeSlotSurround.Tube).ToList();
            warnings.Add(new DesignWarning(ExtrapolatedWarningCode, $"no full-wave calibration for edge slots in the surroundings '{Word(surround)}': the bare-tube runs are used"));
        }
        if (pool.Count == 0) throw new InvalidOperationException("the edge-slot calibration table has no families");
        double a = guide.BroadWall.Millimeters;
        var family = pool.OrderBy(f => Math.Abs(Math.Log(a / f.BroadWallMm)) + Math.Abs(Math.Log(guide.NarrowWall.Millimeters / f.NarrowWallMm)))
            .ThenBy(f => Math.Abs(f.WidthMm - width.Millimeters)).First();
        var surface = new EdgeSlotAdmittanceSurface(family, guide);
        var inv = CultureInfo.InvariantCulture;
        if (Math.Abs(surface.Scale - 1) > 1e-3 || Math.Abs(guide.NarrowWall.Millimeters - family.NarrowWallMm) > 0.01)
            warnings.Add(new DesignWarning(ExtrapolatedWarningCode, string.Format(inv,
                "edge-slot admittance read from the {0} runs by similitude (scale {1:0.###}; the wall and kerf are not scaled): verify with `slotarray calibrate-edge` in {2}",
                family.Guide, surface.Scale, guide.Designation)));
        if (Math.Abs(guide.WallThickness.Millimeters - family.WallMm) > 0.01 || Math.Abs(width.Millimeters - family.WidthMm) > 0.01)
            warnings.Add(new DesignWarning(ExtrapolatedWarningCode, string.Format(inv,
                "edge-slot runs were made with a {0:0.###} mm wall and a {1:0.###} mm kerf; this tube has {2:0.###} mm and {3:0.###} mm",
                family.WallMm, family.WidthMm, guide.WallThickness.Millimeters, width.Millimeters)));
        return new CalibratedEdgeSlot(guide, width, surround, surface, warnings);
    }

    /// <inheritdoc />
    public RectangularWaveguide Guide { get; }

    /// <inheritdoc />
    public Length Width { get; }

    /// <summary>What the slots radiate into.</summary>
    public EdgeSlotSurround Surround { get; }

    /// <summary>The interpolated calibration.</summary>
    public EdgeSlotAdmittanceSurface Surface { get; }

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => SlotCouplingKind.Tilt;

    /// <inheritdoc />
    public string Name => $"edge slot (full-wave calibration, {Surface.Family.Guide}, {Word(Surface.Family.Surround)})";

    /// <inheritdoc />
    public double MaximumCoupling => MaximumTilt.Radians;

    /// <summary>True: the design cut may carry a susceptance (see remarks); designers must use its complex admittance.</summary>
    public bool DesignsOffResonance => true;

    /// <summary>Cut depth D = t + (L − b/cos θ)/2 of a developed length L (the cut list's convention).</summary>
    public double DepthMm(double tilt, Length developedLength) =>
        Guide.WallThickness.Millimeters + (developedLength.Millimeters - Guide.NarrowWall.Millimeters / Math.Cos(tilt)) / 2;

    /// <summary>Developed length L = b/cos θ + 2(D − t) of a cut of depth D, mm.</summary>
    public Length DevelopedLength(double tilt, double depthMm) =>
        Length.FromMillimeters(Guide.NarrowWall.Millimeters / Math.Cos(tilt) + 2 * (depthMm - Guide.WallThickness.Millimeters));

    /// <inheritdoc />
    public Complex Admittance(double coupling, Length length, Frequency f)
    {
        RequireTilt(coupling);
        if (!(length.Meters > 0) || !double.IsFinite(length.Meters))
            throw new ArgumentOutOfRangeException(nameof(length), length.ToString(), "the slot length must be positive");
        var (lo, hi) = Surface.Family.Band;
        double ff = Math.Clamp(Surface.FamilyFrequency(f), lo, hi);
        return Surface.AtFamily(coupling, Surface.FamilyDepthMm(coupling, DepthMm(coupling, length)), ff);
    }

    /// <summary>The design cut at tilt θ and frequency f (see remarks).</summary>
    public EdgeSlotCut DesignCut(double tilt, Frequency f)
    {
        RequireTilt(tilt);
        double th = Math.Abs(tilt);
        var (lo, hi) = Surface.Family.Band;
        double ff = Math.Clamp(Surface.FamilyFrequency(f), lo, hi);
        var (d0, d1) = Surface.FamilyDepthRange(th);
        var grid = Enumerable.Range(0, DepthSamples).Select(i => d0 + (d1 - d0) * i / (DepthSamples - 1)).ToArray();
        var y = grid.Select(d => Surface.AtFamily(th, d, ff)).ToArray();
        int peak = Array.IndexOf(y, y.MaxBy(v => v.Real));
        double peakDepth = Refine(d => -Surface.AtFamily(th, d, ff).Real, grid, peak);
        var peakY = Surface.AtFamily(th, peakDepth, ff);
        double depth;
        bool resonant = false;
        int cross = Enumerable.Range(0, DepthSamples - 1).FirstOrDefault(i => y[i].Imaginary > 0 && y[i + 1].Imaginary <= 0, -1);
        if (cross >= 0)
        {
            depth = Brent.FindRoot(d => Surface.AtFamily(th, d, ff).Imaginary, grid[cross], grid[cross + 1], 1e-9, 100);
            resonant = true;
        }
        else
        {
            int least = Array.IndexOf(y, y.MinBy(v => v.Imaginary / v.Real));
            depth = Refine(d => { var v = Surface.AtFamily(th, d, ff); return v.Imaginary / v.Real; }, grid, least);
        }
        return new EdgeSlotCut(th, Surface.RequestDepthMm(th, depth), Surface.AtFamily(th, depth, ff), resonant, Surface.RequestDepthMm(th, peakDepth), peakY.Real);
    }

    /// <inheritdoc />
    public SlotResonance Resonance(double coupling, Frequency f)
    {
        var c = DesignCut(coupling, f);
        return new SlotResonance(coupling, DevelopedLength(coupling, c.DepthMm), c.Admittance.Real);
    }

    /// <inheritdoc />
    public SlotResonance ForConductance(double conductance, Frequency f)
    {
        if (!double.IsFinite(conductance) || conductance <= 0)
            throw new ArgumentOutOfRangeException(nameof(conductance), conductance, "the edge-slot conductance g must be a positive number");
        var curve = CurveAt(f);
        double max = curve.Conductance[^1];
        if (conductance > max * (1 + 1e-12))
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"an edge slot needs g = {conductance:0.#####}, above the largest {max:0.#####} that a {MaximumTilt.Degrees:0} deg tilt gives in {Guide.Designation} ({Word(Surround)}) at {f}: use more slots, a gentler taper or (travelling wave) a larger load fraction"));
        double tilt = conductance >= max ? curve.Tilt[^1]
            : Brent.FindRoot(t => curve.ConductanceSpline.Interpolate(t) - conductance, curve.Tilt[0], curve.Tilt[^1], 1e-12, 200);
        var cut = DesignCut(tilt, f);
        return new SlotResonance(tilt, DevelopedLength(tilt, cut.DepthMm), cut.Admittance.Real);
    }

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => CurveAt(f).Conductance[^1];

    /// <summary>The smallest conductance the calibrated tilts give (at the smallest calibrated tilt) at frequency f.</summary>
    public double MinimumCalibratedConductance(Frequency f) => DesignCut(Surface.Family.TiltsDeg[0] * Math.PI / 180, f).Admittance.Real;

    /// <inheritdoc />
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f)
    {
        RequireTilt(coupling);
        var list = new List<DesignWarning>(familyWarnings);
        var inv = CultureInfo.InvariantCulture;
        var (lo, hi) = Surface.Family.Band;
        double ff = Surface.FamilyFrequency(f), deg = Math.Abs(coupling) * 180 / Math.PI;
        if (ff < lo - 1 || ff > hi + 1)
            list.Add(new DesignWarning(ExtrapolatedWarningCode, string.Format(inv, "{0} lies outside the edge-slot runs' band ({1:0.###} to {2:0.###} GHz in {3}): the band edge's admittance is used",
                f, lo / Surface.Scale * 1e-9, hi / Surface.Scale * 1e-9, Guide.Designation)));
        if (deg < Surface.Family.TiltsDeg[0] - 1e-9)
            list.Add(new DesignWarning(ExtrapolatedWarningCode, string.Format(inv, "tilt {0:0.##} deg is below the smallest run ({1:0.##} deg): the admittance follows the idealised sin^2-type tilt law from there",
                deg, Surface.Family.TiltsDeg[0])));
        var cut = DesignCut(coupling, f);
        if (!cut.Resonant)
            list.Add(new DesignWarning(NoResonanceWarningCode, string.Format(inv,
                "at tilt {0:0.##} deg no cut depth is purely conductive (background susceptance): the design cut ({1:0.###} mm) presents y = {2:0.####}{3:+0.####;-0.####}j and the designs use it as it is",
                deg, cut.DepthMm, cut.Admittance.Real, cut.Admittance.Imaginary)));
        return list;
    }

    /// <summary>The surroundings as the spec spells them.</summary>
    public static string Word(EdgeSlotSurround s) => s switch { EdgeSlotSurround.GroundPlane => "ground-plane", EdgeSlotSurround.Flare => "flare", _ => "tube" };

    private DesignCurve CurveAt(Frequency f) => curves.GetOrAdd(f.Hertz, _ =>
    {
        double top = MaximumTilt.Radians, bottom = top / (TiltNodes - 1);
        var t = Enumerable.Range(0, TiltNodes).Select(i => bottom + (top - bottom) * i / (TiltNodes - 1)).ToArray();
        var g = t.Select(x => DesignCut(x, f).Admittance.Real).ToArray();
        for (int i = 1; i < g.Length; i++)
            if (!(g[i] > g[i - 1]))
                throw new InvalidOperationException(FormattableString.Invariant($"the calibrated edge-slot conductance does not rise with tilt near {t[i] * 180 / Math.PI:0.##} deg at {f}: check the calibration table"));
        return new DesignCurve(t, g, CubicSpline.InterpolatePchipSorted(t, g));
    });

    /// <summary>Golden-section refinement (MathNet) of a grid minimum of <paramref name="fn"/> between the grid's neighbours of index <paramref name="at"/>.</summary>
    private static double Refine(Func<double, double> fn, double[] grid, int at)
    {
        if (at == 0 || at == grid.Length - 1) return grid[at];
        try { return FindMinimum.OfScalarFunctionConstrained(fn, grid[at - 1], grid[at + 1], 1e-7); }
        catch (MathNet.Numerics.Optimization.OptimizationException) { return grid[at]; }
    }

    private static void RequireTilt(double tilt)
    {
        if (!double.IsFinite(tilt) || Math.Abs(tilt) > MaximumTilt.Radians + 1e-9)
            throw new ArgumentOutOfRangeException(nameof(tilt), tilt,
                FormattableString.Invariant($"the edge-slot tilt must lie within ±{MaximumTilt.Degrees:0} deg (the calibrated range), got {tilt * 180 / Math.PI:0.###} deg"));
    }

    private sealed record DesignCurve(double[] Tilt, double[] Conductance, CubicSpline ConductanceSpline);
}
