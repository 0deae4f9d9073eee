using SlotArray.Core.Patterns;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Patterns;

/// <summary>Directivities (IEEE Std 145-2013 definition; Balanis 2005) against numpy/scipy integrals [N], independent of this code.</summary>
public class DirectivityTests
{
    private const double Lambda = 1.0;
    private static readonly double K = 2 * Math.PI / Lambda;

    [Theory]
    [InlineData(2)]
    [InlineData(10)]
    [InlineData(33)]
    public void Uniform_isotropic_array_at_half_wavelength_has_directivity_exactly_N(int n)
    {
        var z = ArrayGeometry.Uniform(n, 0.5);
        var w = Enumerable.Repeat(1.0, n).ToArray();
        // At d = λ/2 the sinc cross terms vanish: D = N (IEEE Std 145-2013 directivity sanity check; Balanis 2005 Sec. 6.10, from memory).
        Check.Relative(n, Directivity.Isotropic(z, w, K), 1e-12, "IEEE Std 145-2013 directivity: exactly N");
        // The numerical integral over the full sphere agrees, and over a half-space doubles it.
        Check.Relative(n, Directivity.FullSphere(z, ArrayFactor.ToComplex(w), K, ElementPatterns.Isotropic), 1e-9, "IEEE Std 145-2013 directivity");
        Check.Relative(2 * n, Directivity.HalfSpace(z, w, K, ElementPatterns.Isotropic), 1e-9, "IEEE Std 145-2013 directivity: half-space doubles it");
    }

    [Fact]
    public void Closed_form_agrees_with_integration_for_arbitrary_positions_and_taper()
    {
        var z = new[] { 0.0, 0.37, 0.81, 1.5, 1.93, 2.8 };
        var w = new[] { 0.4, 0.8, 1.0, 0.9, 0.6, 0.3 };
        double closed = Directivity.Isotropic(z, w, K, 0.1);
        double numeric = Directivity.FullSphere(z, ArrayFactor.ToComplex(w), K, ElementPatterns.Isotropic, 0.1);
        Check.Relative(closed, numeric, 1e-9, "∫ e^{jkΔz u} du / 2 = sinc(kΔz): closed form vs quadrature");
    }

    [Fact]
    public void Single_half_wave_slot_in_a_half_space_has_D_3_2818()
        => Check.Absolute(3.2818, Directivity.HalfSpace([0.0], new[] { 1.0 }, K, ElementPatterns.HalfWaveSlotHPlane), 6e-5,
            "Balanis 2005 (4 / ∫ cos²((π/2)cos θ)/sin θ dθ)");

    [Fact]
    public void Ten_uniform_slots_at_0_69959_wavelengths_have_D_28_420()
    {
        var z = ArrayGeometry.Uniform(10, 0.69959);
        Check.Absolute(28.420, Directivity.HalfSpace(z, Enumerable.Repeat(1.0, 10).ToArray(), K, ElementPatterns.HalfWaveSlotHPlane), 6e-4,
            "IEEE Std 145-2013 directivity");
        var z20 = ArrayGeometry.Uniform(20, 0.69959);
        Check.Absolute(56.401, Directivity.HalfSpace(z20, Enumerable.Repeat(1.0, 20).ToArray(), K, ElementPatterns.HalfWaveSlotHPlane), 6e-4,
            "IEEE Std 145-2013 directivity (N = 20 uniform)");
    }
}
