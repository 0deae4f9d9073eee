using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Fabrication;

/// <summary>
/// How machining errors move the electrical quantities, to size tolerances (derived here from the cited formulas [D]; WR-90 values by numpy [N]).
/// </summary>
internal static class MachiningSensitivity
{
    /// <summary>
    /// Relative change of a longitudinal slot's Stevenson conductance per unit offset error, d(ln g)/dx = (2π/a) cot(πx/a)
    /// (1/m). From g ∝ sin²(πx/a) (A. F. Stevenson, "Theory of slots in rectangular wave-guides", J. Appl. Phys. 19,
    /// 24–38, 1948), differentiated [D] ([N]: WR-90, x = 2.098 mm → 0.927 /mm).
    /// </summary>
    /// <param name="offset">Offset x from the centreline, 0 &lt; |x| &lt; a/2 (the sign does not matter).</param>
    /// <param name="broadWall">Inside broad dimension a.</param>
    public static double ConductanceLogSlope(Length offset, Length broadWall)
    {
        double a = broadWall.Meters, x = Math.Abs(offset.Meters);
        if (!(a > 0)) throw new ArgumentOutOfRangeException(nameof(broadWall), broadWall.ToString(), "the broad wall must be positive");
        if (!(x > 0 && x < a / 2)) throw new ArgumentOutOfRangeException(nameof(offset), offset.ToString(), $"the offset must satisfy 0 < |x| < a/2 = {0.5 * broadWall}");
        return 2 * Math.PI / a / Math.Tan(Math.PI * x / a);
    }

    /// <summary>
    /// Sensitivity of the guide wavelength to the broad dimension, (dλg/λg)/(da/a) = −u/(1 − u), u = (λ/2a)², λ the
    /// wavelength in the filling. From λg = λ/√(1 − (λ/2a)²) (D. M. Pozar, <i>Microwave Engineering</i>, 4th ed., 2012,
    /// Sec. 3.3) differentiated [D] ([N]: −0.958 for WR-90 at 9.375 GHz).
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="f">Frequency, above the TE10 cutoff.</param>
    public static double GuideWavelengthWidthSensitivity(RectangularWaveguide guide, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(guide);
        _ = guide.PhaseConstant(f);   // throws below cutoff
        double r = guide.MediumVelocity / f.Hertz / (2 * guide.BroadWall.Meters);
        double u = r * r;
        return -u / (1 - u);
    }

    /// <summary>
    /// Phase error accumulated over a length of line when the broad dimension is off by Δa:
    /// Δφ = −β ℓ (dλg/λg) = −(2π ℓ/λg) S Δa/a, S from <see cref="GuideWavelengthWidthSensitivity"/> [D]
    /// ([N]: ±0.076 mm on WR-90 at 9.375 GHz gives about 0.58° per λg/2 section).
    /// Positive when the guide is wider than designed (λg shorter, more phase).
    /// </summary>
    /// <param name="guide">The guide as designed.</param>
    /// <param name="f">Frequency, above the TE10 cutoff.</param>
    /// <param name="broadWallError">Δa, signed.</param>
    /// <param name="lineLength">Length ℓ of line, ≥ 0.</param>
    public static Angle PhaseErrorFromWidthError(RectangularWaveguide guide, Frequency f, Length broadWallError, Length lineLength)
    {
        double s = GuideWavelengthWidthSensitivity(guide, f);
        double dlg = s * broadWallError.Meters / guide.BroadWall.Meters;
        return Angle.FromRadians(-guide.PhaseConstant(f) * lineLength.Meters * dlg);
    }

    /// <summary>
    /// Relative shift of a slot's resonant frequency for a length error, Δf/f ≈ −ΔL/L (resonance scales about as 1/L)
    /// [D; ±0.025 mm on 15 mm ≈ ∓0.17 %].
    /// </summary>
    /// <param name="slotLength">Slot length L, &gt; 0.</param>
    /// <param name="lengthError">ΔL, signed.</param>
    public static double ResonanceShiftFromLengthError(Length slotLength, Length lengthError)
    {
        if (!(slotLength.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(slotLength), slotLength.ToString(), "the slot length must be positive");
        return -lengthError.Meters / slotLength.Meters;
    }
}
