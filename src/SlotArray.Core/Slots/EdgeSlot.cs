using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// First-order model of an inclined narrow-wall (edge) slot as a shunt element: resonant conductance from the
/// closed form of <see cref="EdgeSlotConductance"/>, a geometric resonance condition that gives the depth of cut
/// into each broad wall, and a single-pole length response near resonance. Coupling parameter: the signed tilt θ in
/// radians (alternate slots ±θ). Immutable; build with <see cref="Create"/>.
/// </summary>
/// <remarks>
/// <para>
/// No published model of the edge slot's resonant cut depth was available to this project, so this is a documented
/// FIRST-ORDER geometric model, flagged approximate in every output (warning code "edge-slot-cut-depth-approximate").
/// </para>
/// <para>
/// Geometry (tube of uniform wall thickness t = <see cref="RectangularWaveguide.WallThickness"/>): the cut crosses the
/// narrow wall at tilt θ and wraps into each broad wall to a depth D measured from the outer narrow-wall face
/// (the cut-list datum, <c>Fabrication.Datums</c>). The slot couples to the guide through its INNER aperture, so the
/// developed length is taken along the inside of the guide: across the inside height b at tilt θ, a run of b/cos θ,
/// plus D − t into each broad wall beyond the inner narrow-wall face:
/// L = b/cos θ + 2(D − t) (the convention of <see cref="Fabrication.Datums.EdgeSlotDepthOfCut"/>). The path on the
/// outer surface, (b + 2t)/cos θ + 2D, was rejected: with a 1.27 mm WR-90 wall it leaves a resonant cut shallower
/// than the wall itself, which cannot open the guide. The slot is taken as resonant when L equals L_r = κ λ/2 with κ = <see cref="ResonanceFraction"/>:
/// thin narrow slots resonate a few per cent below λ/2 (Stevenson 1948, assumptions; the thin-wall moment-method
/// values of <c>LongitudinalSlotMomentMethod</c> give 0.452–0.480 λ for a broad-wall slot). κ = 0.95 is an approximate mid value
/// (common practice, no source); wall thickness, the corner bends and the slot width, none modelled here, shift it.
/// Hence D = t + (κλ/2 − b/cos θ)/2; the slot is realisable only when κλ/2 &gt; b/cos θ (it must span the inside height).
/// </para>
/// <para>
/// Length response: y(L) = g_r(θ) h(L/L_r), h(ρ) = 1/(1 + j Q_s (ρ − 1/ρ)), the single-pole shape of a series-resonant
/// branch in shunt (Im y &gt; 0 below resonance, &lt; 0 above; the sign of the moment-method admittance, Stern &amp; Elliott 1985).
/// Q_s = <see cref="SeriesResonanceQ"/> was fitted (least squares on the complex y) to the five moment-method values of
/// <c>LongitudinalSlotMomentMethod</c> (P = 5; broad-wall longitudinal slot, WR-90, 9.375 GHz, x = 2 mm, thin wall,
/// L_r = 0.45654 λ, g_r = 0.09183): minimiser 6.1087, kept to four digits; rms complex residual 0.0038 (4 % of g_r), largest 0.0061 at L/λ = 0.50. The edge
/// slot's own Q is not known here; borrowing the broad-wall slot's value is an assumption.
/// </para>
/// <para>
/// Maximum tilt 30°: the cross-polarised lobes of alternating tilts reach tan 30° = −4.8 dB before element weighting
/// (<see cref="EdgeSlotCrossPolarization"/>), and X-band edge-slot arrays are commonly built with tilts of about 10–16°
/// (common practice, no source [C]); beyond about 30° the idealised closed form is stretched far from its use.
/// The slot width is carried for the cut list but does not enter this first-order model.
/// </para>
/// </remarks>
internal sealed record EdgeSlot : IShuntSlotModel
{
    /// <summary>Resonant developed length as a fraction κ of λ/2 (approximate, common practice; see remarks).</summary>
    public const double ResonanceFraction = 0.95;

    /// <summary>
    /// Q_s of the single-pole length response, fitted to five moment-method admittances (WR-90, 9.375 GHz, x = 2 mm)
    /// (rms complex residual 0.0038; see remarks).
    /// </summary>
    public const double SeriesResonanceQ = 6.109;

    /// <summary>Largest tilt the model accepts, 30° (see remarks).</summary>
    public static Angle MaximumTilt => Angle.FromDegrees(30);

    /// <summary>Code of the warning every output of this model carries.</summary>
    public const string ApproximateWarningCode = "edge-slot-cut-depth-approximate";

    private EdgeSlot(RectangularWaveguide guide, Length width)
    {
        Guide = guide;
        Width = width;
    }

    /// <summary>An edge-slot model for a guide (inside a, b and the uniform wall thickness t) and a slot width.</summary>
    /// <param name="guide">The guide; its wall thickness is taken for both the narrow and the broad walls.</param>
    /// <param name="width">Slot (saw or cutter) width; &gt; 0 and less than b.</param>
    public static EdgeSlot Create(RectangularWaveguide guide, Length width)
    {
        ArgumentNullException.ThrowIfNull(guide);
        if (!(width.Meters > 0) || !(width < guide.NarrowWall))
            throw new ArgumentOutOfRangeException(nameof(width), width.ToString(),
                $"the edge-slot width must be positive and less than the narrow wall b = {guide.NarrowWall}, got {width}");
        return new EdgeSlot(guide, width);
    }

    /// <inheritdoc />
    public RectangularWaveguide Guide { get; }

    /// <inheritdoc />
    public Length Width { get; }

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => SlotCouplingKind.Tilt;

    /// <inheritdoc />
    public string Name => "edge slot (Stevenson-type conductance, first-order cut depth)";

    /// <inheritdoc />
    public double MaximumCoupling => MaximumTilt.Radians;

    /// <summary>Outer height of the narrow wall, b + 2t, that the cut crosses.</summary>
    public Length OuterHeight => Guide.NarrowWall + 2 * Guide.WallThickness;

    /// <summary>Resonant developed length L_r = κ λ/2 (λ in the guide's filling medium is not used: the slot radiates into air).</summary>
    /// <param name="f">Frequency; &gt; 0.</param>
    public Length ResonantLength(Frequency f) => ResonanceFraction / 2 * f.FreeSpaceWavelength;

    /// <summary>Developed length L = b/cos θ + 2(D − t) of a cut of depth D at tilt θ (inner aperture, first-order geometry, see remarks).</summary>
    /// <param name="tilt">Signed tilt; |θ| ≤ <see cref="MaximumTilt"/>.</param>
    /// <param name="cutDepth">Depth D of cut into each broad wall from the outer narrow-wall face; ≥ t (the wall).</param>
    public Length DevelopedLength(Angle tilt, Length cutDepth)
    {
        RequireTilt(tilt.Radians);
        if (!(cutDepth.Meters >= Guide.WallThickness.Meters) || !double.IsFinite(cutDepth.Meters))
            throw new ArgumentOutOfRangeException(nameof(cutDepth), cutDepth.ToString(), "the cut depth must be at least the wall thickness, else the cut does not open the guide");
        return Length.FromMeters(Guide.NarrowWall.Meters / Math.Cos(tilt.Radians) + 2 * (cutDepth.Meters - Guide.WallThickness.Meters));
    }

    /// <summary>
    /// Depth of cut D = t + (L − b/cos θ)/2 into each broad wall, from the outer narrow-wall face, that gives the
    /// developed length L. Throws <see cref="InfeasibleDesignException"/> when L ≤ b/cos θ (the slot cannot span the inside height).
    /// </summary>
    /// <param name="tilt">Signed tilt; |θ| ≤ <see cref="MaximumTilt"/>.</param>
    /// <param name="developedLength">Developed slot length L; &gt; 0.</param>
    public Length CutDepth(Angle tilt, Length developedLength)
    {
        double d = RawCutDepth(tilt.Radians, developedLength.Meters);
        if (!(d > Guide.WallThickness.Meters))
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"an edge slot of developed length {developedLength.Millimeters:0.###} mm at tilt {tilt} is shorter than the {Guide.NarrowWall.Millimeters / Math.Cos(tilt.Radians):0.###} mm it takes to cross the inside height of the narrow wall: the guide's narrow wall is too tall for a resonant edge slot at this frequency; use a lower-height guide or measured cut-depth data"));
        return Length.FromMeters(d);
    }

    /// <summary>The cut depth that makes the slot resonant at frequency f: <see cref="CutDepth"/> at <see cref="ResonantLength"/>.</summary>
    /// <param name="tilt">Signed tilt; |θ| ≤ <see cref="MaximumTilt"/>.</param>
    /// <param name="f">Frequency.</param>
    public Length ResonantCutDepth(Angle tilt, Frequency f) => CutDepth(tilt, ResonantLength(f));

    /// <summary>The single-pole length response h(ρ) = 1/(1 + j Q_s (ρ − 1/ρ)), ρ = L/L_r &gt; 0 (h(1) = 1).</summary>
    /// <param name="lengthRatio">ρ = L/L_r; &gt; 0.</param>
    public static Complex ResponseShape(double lengthRatio)
    {
        if (!(lengthRatio > 0) || !double.IsFinite(lengthRatio))
            throw new ArgumentOutOfRangeException(nameof(lengthRatio), lengthRatio, "the length ratio L/L_r must be a positive number");
        return 1 / new Complex(1, SeriesResonanceQ * (lengthRatio - 1 / lengthRatio));
    }

    /// <summary>y = g_r(θ) h(L/L_r): normalised shunt admittance of a slot of developed length L (see remarks).</summary>
    /// <param name="coupling">Signed tilt θ, radians; |θ| ≤ <see cref="MaximumCoupling"/>.</param>
    /// <param name="length">Developed slot length L; &gt; 0.</param>
    /// <param name="f">Frequency; above the TE10 cutoff.</param>
    public Complex Admittance(double coupling, Length length, Frequency f)
    {
        RequireTilt(coupling);
        if (!(length.Meters > 0) || !double.IsFinite(length.Meters))
            throw new ArgumentOutOfRangeException(nameof(length), length.ToString(), "the slot length must be positive");
        double g = EdgeSlotConductance.Conductance(Guide, Angle.FromRadians(coupling), f);
        return g * ResponseShape(length / ResonantLength(f));
    }

    /// <inheritdoc />
    public SlotResonance Resonance(double coupling, Frequency f)
    {
        RequireTilt(coupling);
        return new SlotResonance(coupling, ResonantLength(f), EdgeSlotConductance.Conductance(Guide, Angle.FromRadians(coupling), f));
    }

    /// <inheritdoc />
    public SlotResonance ForConductance(double conductance, Frequency f)
    {
        var tilt = EdgeSlotConductance.TiltForConductance(Guide, conductance, f, MaximumTilt);
        return new SlotResonance(tilt.Radians, ResonantLength(f), conductance);
    }

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => EdgeSlotConductance.Conductance(Guide, MaximumTilt, f);

    /// <summary>
    /// Always the approximate-model warning; also: outside the single-mode band, a resonant cut that does not open the
    /// guide (D ≤ t), and wraps reaching past a quarter of the broad wall inside the guide (D − t &gt; a/4).
    /// </summary>
    /// <param name="coupling">Signed tilt θ, radians; |θ| ≤ <see cref="MaximumCoupling"/>.</param>
    /// <param name="f">Frequency.</param>
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f)
    {
        RequireTilt(coupling);
        var list = new List<DesignWarning>
        {
            new(ApproximateWarningCode, "edge-slot cut depth from a first-order geometric model; verify by measurement or full-wave analysis"),
        };
        var band = Guide.SingleModeBand;
        if (f <= band.Low || f >= band.High)
            list.Add(new DesignWarning("guide-not-single-mode", $"{f} lies outside the single-mode band {band.Low} to {band.High} of {Guide.Designation}: the edge-slot closed form assumes TE10 only"));
        double d = RawCutDepth(coupling, ResonantLength(f).Meters), t = Guide.WallThickness.Meters;
        if (!(d > t))
            list.Add(new DesignWarning("edge-slot-cut-too-shallow", FormattableString.Invariant(
                $"at tilt {coupling * 180 / Math.PI:0.###} deg the resonant slot is too short to cross the {Guide.NarrowWall.Millimeters:0.###} mm inside height of the narrow wall: the first-order model gives no resonant cut; use measured cut-depth data")));
        else if (d - t > Guide.BroadWall.Meters / 4)
            list.Add(new DesignWarning("edge-slot-cut-too-deep", FormattableString.Invariant(
                $"the resonant cut reaches {(d - t) * 1e3:0.###} mm into each broad wall inside the guide, more than a/4 = {Guide.BroadWall.Millimeters / 4:0.###} mm: the narrow-wall conductance formula no longer describes the slot")));
        return list;
    }

    private double RawCutDepth(double tilt, double developedLength)
    {
        RequireTilt(tilt);
        if (!(developedLength > 0) || !double.IsFinite(developedLength))
            throw new ArgumentOutOfRangeException(nameof(developedLength), developedLength, "the developed length must be a positive length in metres");
        return Guide.WallThickness.Meters + (developedLength - Guide.NarrowWall.Meters / Math.Cos(tilt)) / 2;
    }

    private static void RequireTilt(double tilt)
    {
        if (!double.IsFinite(tilt) || Math.Abs(tilt) > MaximumTilt.Radians + 1e-12)
            throw new ArgumentOutOfRangeException(nameof(tilt), tilt,
                FormattableString.Invariant($"the edge-slot tilt must lie within ±{MaximumTilt.Degrees:0} deg, got {tilt * 180 / Math.PI:0.###} deg"));
    }
}
