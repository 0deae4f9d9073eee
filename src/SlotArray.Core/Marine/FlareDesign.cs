using System.Globalization;
using MathNet.Numerics.RootFinding;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Marine;

/// <summary>
/// <c>flare:</c> as asked: the length and aperture, each given or null for the tool to choose (<c>flare: auto</c> leaves
/// both to <see cref="FlareDesign"/>), and the largest phase error allowed when it chooses.
/// </summary>
/// <param name="Length">Axial depth from the slotted face to the aperture, or null.</param>
/// <param name="Aperture">Aperture height, or null.</param>
/// <param name="PhaseError">Largest phase error at the aperture edge an automatic flare may have (default <see cref="FlareDesign.DefaultPhaseError"/>).</param>
public sealed record FlareRequest(Length? Length, Length? Aperture, Angle PhaseError)
{
    /// <summary><c>flare: auto</c>.</summary>
    public static FlareRequest Auto { get; } = new(null, null, FlareDesign.DefaultPhaseError);
}

/// <summary>The flare and what it does: the vertical beam, the throat's evanescent stretch and the antenna's total gain.</summary>
/// <param name="Flare">The plates.</param>
/// <param name="Asked">What the spec asked.</param>
/// <param name="VerticalBeamwidth">Vertical half-power beamwidth at the design frequency.</param>
/// <param name="FirstSidelobeDb">First vertical sidelobe at the design frequency, dB; null when none before 90°.</param>
/// <param name="PhaseError">Largest phase error at the aperture edge at the design frequency.</param>
/// <param name="PhaseErrorLossDb">Broadside gain lost to the phase error, dB.</param>
/// <param name="ThroatLossDb">Attenuation of the stretch where the plates are under λ/2 apart, dB.</param>
/// <param name="CutoffPlane">Where the plates reach λ/2 apart, from the slotted face.</param>
/// <param name="VerticalDirectivity">Two-dimensional vertical directivity d_V.</param>
/// <param name="HorizontalDirectivity">Two-dimensional horizontal directivity d_H of the array's co-polar cut.</param>
/// <param name="TotalDirectivityDbi">The antenna's directivity d_H d_V / π, dBi.</param>
/// <param name="TotalGainDbi">Directivity × the array's efficiency and mismatch, dBi (the throat's evanescent stretch is reactive, not a loss: see <see cref="FlareDesign"/>).</param>
/// <param name="CutElevationDeg">Elevations of the vertical cut, degrees.</param>
/// <param name="CutLevelDb">The vertical cut, dB relative to boresight.</param>
/// <param name="Warnings">Validity limits.</param>
internal sealed record FlareOutcome(
    SectoralFlare Flare,
    FlareRequest Asked,
    Angle VerticalBeamwidth,
    double? FirstSidelobeDb,
    Angle PhaseError,
    double PhaseErrorLossDb,
    double ThroatLossDb,
    Length CutoffPlane,
    double VerticalDirectivity,
    double HorizontalDirectivity,
    double TotalDirectivityDbi,
    double TotalGainDbi,
    IReadOnlyList<double> CutElevationDeg,
    IReadOnlyList<double> CutLevelDb,
    IReadOnlyList<DesignWarning> Warnings);

/// <summary>
/// Chooses the flare (<c>flare: auto</c> with <c>requirements.vertical_beamwidth</c>) and works out what it does
/// (<see cref="SectoralFlare"/>).
/// </summary>
/// <remarks>
/// <para>Choice. For a largest phase error Φ the apex distance follows from the aperture, R = A²/(8λt) with t = Φ/(2π)
/// (Balanis's t = A²/(8λR)), and the length from the throat, L = R (A − T)/A; the vertical beamwidth then falls
/// monotonically as A grows, so A is found by Brent's method (MathNet.Numerics) to 10⁻⁹ m. A given length fixes
/// R = L A/(A − T) instead, and A is again found for the beamwidth.</para>
/// <para>Total gain. The aperture is separable (the slots' distribution along the guide, the flare's across it), so the
/// directivity is D = d_H d_V / π with the two-dimensional directivities d = 2π / ∫|F/F_max|² dθ of the two principal
/// cuts (for a rectangular aperture d = 2πLε/λ in each plane and D = 4π L_x L_y ε_x ε_y/λ², C. A. Balanis,
/// <i>Antenna Theory</i>, 4th ed., Wiley 2016, §12.5, directivity of rectangular apertures). The gain multiplies D by the
/// array's own gain/directivity (radiation efficiency, mismatch, any filter loss). Valid for beams narrow in both planes;
/// the array's own cut replaces the bare slot's vertical element pattern.</para>
/// <para>Throat. The evanescent stretch (<see cref="SectoralFlare.ThroatLossDb"/>) is lossless metal: it does not burn
/// power but stores it, so each slot sees a reactive load and radiates less for a given tilt (its radiation conductance
/// falls by roughly that attenuation, twice over in power). It is reported, with a warning, and not put in the gain: the
/// design's slot conductances are those of slots radiating into a half-space, so a flare with a cut-off throat needs its
/// slots characterised in the throat before the tilts are right.</para>
/// </remarks>
internal static class FlareDesign
{
    /// <summary>Largest phase error of an automatic flare when none is given: 90° (t = 1/4; common practice, no source: below the 135° of Balanis's optimum-gain H-plane horn, for a cleaner vertical pattern).</summary>
    public static Angle DefaultPhaseError { get; } = Angle.FromDegrees(90);

    /// <summary>Throat of a flare on a guide's slotted narrow wall: the guide's outer narrow-face height b + 2 × wall.</summary>
    /// <param name="guide">The guide.</param>
    public static Length ThroatOf(RectangularWaveguide guide)
    {
        ArgumentNullException.ThrowIfNull(guide);
        return guide.NarrowWall + 2.0 * guide.WallThickness;
    }

    /// <summary>The flare as asked, automatic dimensions chosen for <paramref name="verticalBeamwidth"/> at <paramref name="f0"/>.</summary>
    /// <param name="asked">The spec's flare.</param>
    /// <param name="throat">Throat height.</param>
    /// <param name="f0">Design frequency.</param>
    /// <param name="verticalBeamwidth">Required vertical beamwidth; needed when the aperture is automatic.</param>
    /// <exception cref="InfeasibleDesignException">No requirement for an automatic aperture, or no aperture up to 100 λ gives the beamwidth.</exception>
    public static SectoralFlare Choose(FlareRequest asked, Length throat, Frequency f0, Angle? verticalBeamwidth)
    {
        ArgumentNullException.ThrowIfNull(asked);
        double lambda = f0.FreeSpaceWavelength.Meters, t = asked.PhaseError.Radians / (2 * Math.PI), T = throat.Meters;
        if (!(t > 0)) throw new InfeasibleDesignException("flare.phase_error must be above 0 deg: give e.g. 90 deg");
        SectoralFlare Make(double a)
        {
            if (asked.Length is { } len) return new SectoralFlare(throat, Length.FromMeters(a), len);
            double r = a * a / (8 * lambda * t);
            return new SectoralFlare(throat, Length.FromMeters(a), Length.FromMeters(Math.Max(r * (a - T) / a, 1e-6)));
        }
        if (asked.Aperture is { } given) return Make(given.Meters).Validated();
        if (verticalBeamwidth is not { } want)
            throw new InfeasibleDesignException("flare: the aperture is chosen for requirements.vertical_beamwidth: give 'requirements: {vertical_beamwidth: 22 deg}' or 'flare.aperture'");
        double lo = Math.Max(T, 0.51 * lambda) * 1.0001, hi = 100 * lambda;
        double Excess(double a) => Make(a).HalfPowerBeamwidth(f0).Degrees - want.Degrees;
        double top;
        try { top = Excess(lo); }
        catch (InfeasibleDesignException) { top = double.PositiveInfinity; }
        if (top < 0)
            throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                $"requirements.vertical_beamwidth {want.Degrees:0.##} deg is wider than the smallest flare on this guide gives ({want.Degrees + top:0.##} deg with a {lo * 1e3:0.#} mm aperture): ask for a narrower vertical beam or omit the flare"));
        if (Excess(hi) > 0)
            throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                $"requirements.vertical_beamwidth {want.Degrees:0.##} deg needs a flare aperture beyond 100 wavelengths: ask for a wider vertical beam"));
        // Between lo and the first aperture with a half-power beam the pattern may have none: start the bracket there.
        double a0 = lo;
        while (double.IsPositiveInfinity(top)) { a0 *= 1.1; try { top = Excess(a0); } catch (InfeasibleDesignException) { } }
        return Make(Brent.FindRoot(Excess, a0, hi, 1e-9, 200)).Validated();
    }

    /// <summary>
    /// The flare's figures for a design: vertical beam, first sidelobe, phase error and its loss, throat loss, and the
    /// antenna's total directivity and gain with the array's co-polar cut (<paramref name="atDesign"/>).
    /// </summary>
    /// <param name="asked">The spec's flare.</param>
    /// <param name="guide">The guide (the throat is its slotted face).</param>
    /// <param name="atDesign">The array's figures at the design frequency.</param>
    /// <param name="verticalBeamwidth">requirements.vertical_beamwidth, or null.</param>
    public static FlareOutcome Analyse(FlareRequest asked, RectangularWaveguide guide, FrequencyFigures atDesign, Angle? verticalBeamwidth)
    {
        ArgumentNullException.ThrowIfNull(atDesign);
        var f0 = atDesign.Frequency;
        var flare = Choose(asked, ThroatOf(guide), f0, verticalBeamwidth);
        double throatLoss = flare.ThroatLossDb(f0);
        double dV = flare.VerticalDirectivity(f0);
        double dH = HorizontalDirectivity(atDesign.Pattern);
        double d = dH * dV / Math.PI;
        double efficiency = atDesign.Directivity > 0 ? atDesign.Gain / atDesign.Directivity : 0;
        double gain = d * efficiency;
        var (deg, db) = flare.Cut(f0);
        var warnings = new List<DesignWarning>
        {
            new("flare-model", string.Create(CultureInfo.InvariantCulture,
                $"flare: an H-plane sectoral horn (E along the guide, parallel to the plates): cos(πy/A) aperture field with its quadratic phase (Balanis 2016, §13.2); infinite, perfectly conducting plates, no edge diffraction (far sidelobes and back lobe not modelled); the slots' detuning by the throat is not modelled: check one slot in the throat full-wave")),
        };
        if (throatLoss > 0)
            warnings.Add(new("flare-evanescent-throat", string.Create(CultureInfo.InvariantCulture,
                $"the flare's plates start {flare.Throat.Millimeters:0.##} mm apart, under λ/2 = {f0.FreeSpaceWavelength.Millimeters / 2:0.##} mm: the slots' field is below cutoff for the first {flare.CutoffPlane(f0).Millimeters:0.##} mm of the flare and decays {throatLoss:0.###} dB there; that stretch is reactive, so the slots radiate less for their tilts (their conductance falls) and detune: the tilts were designed for slots radiating into a half-space and must be characterised in the throat (or the throat opened to λ/2 at the slotted face)")));
        var sidelobe = flare.FirstSidelobe(f0);
        return new FlareOutcome(flare, asked, flare.HalfPowerBeamwidth(f0), sidelobe?.LevelDb, flare.MaximumPhaseError(f0), flare.PhaseErrorLossDb(f0),
            throatLoss, flare.CutoffPlane(f0), dV, dH, Patterns.Directivity.ToDbi(d), Patterns.Directivity.ToDbi(gain), deg, db, warnings.AsReadOnly());
    }

    /// <summary>Two-dimensional directivity of a cut, 2π / ∫ |F/F_max|² dθ (trapezoidal on the cut's own grid).</summary>
    /// <param name="cut">The cut.</param>
    public static double HorizontalDirectivity(Patterns.Pattern cut)
    {
        ArgumentNullException.ThrowIfNull(cut);
        var th = cut.Theta;
        var p = cut.Power;
        double sum = 0;
        for (int i = 1; i < th.Length; i++) sum += 0.5 * (p[i] + p[i - 1]) * (th[i] - th[i - 1]);
        return 2 * Math.PI * cut.PeakPower / sum;
    }
}
