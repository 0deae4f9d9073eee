using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>
/// Babinet's principle as extended by Booker: the impedance of a slot in a perfectly conducting, infinitely thin,
/// infinite screen from the impedance of its complementary strip dipole.
/// </summary>
/// <remarks>
/// Source: H. G. Booker, "Slot aerials and their relation to complementary wire aerials (Babinet's principle)",
/// J. IEE 93 Pt IIIA, 620–626, 1946 (pages from memory) [M]:
/// two-sided radiation Z_slot Z_dipole = η²/4; a slot radiating into one half-space only (waveguide or cavity
/// behind it) has twice the impedance, Z = η²/(2 Z_d), Y = 2 Z_d/η². The reactance changes sign: a slot a little
/// shorter than resonance is inductive as an aperture. The strip of width w has the equivalent round-wire radius
/// w/4 (C. M. Butler, "A formulation of the finite-length narrow slot or strip equation", IEEE Trans. AP-30,
/// 1254–1257, 1982).
/// </remarks>
internal static class Babinet
{
    /// <summary>Z_slot = η²/(4 Z_d) two-sided, η²/(2 Z_d) one-sided (Ω).</summary>
    /// <param name="dipoleImpedance">Impedance Z_d of the complementary strip dipole, Ω; non-zero.</param>
    /// <param name="oneSided">True when the slot radiates into one half-space only.</param>
    /// <param name="eta">Wave impedance of the medium, Ω; default η0 = 376.730 Ω.</param>
    public static Complex SlotImpedance(Complex dipoleImpedance, bool oneSided, double eta = PhysicalConstants.Eta0)
    {
        if (dipoleImpedance == Complex.Zero || !double.IsFinite(dipoleImpedance.Real) || !double.IsFinite(dipoleImpedance.Imaginary))
            throw new ArgumentOutOfRangeException(nameof(dipoleImpedance), dipoleImpedance, "the dipole impedance must be finite and non-zero");
        if (!(eta > 0)) throw new ArgumentOutOfRangeException(nameof(eta), eta, "the wave impedance must be positive");
        return eta * eta / ((oneSided ? 2.0 : 4.0) * dipoleImpedance);
    }
}
