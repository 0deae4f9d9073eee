using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.Slots.SlotTestGuides;

namespace SlotArray.Core.Tests.Slots;

/// <summary>
/// The Galerkin moment method (after Stern &amp; Elliott 1985) against its regression values ([N]; computed
/// with numpy by the same formulation), the brute-force modal sum, Stevenson's closed form and the stated physical trends.
/// </summary>
public class LongitudinalSlotMomentMethodTests
{
    private const string Reg = "moment method after Stern & Elliott 1985 [N] (P = 5, 301×301 modes, 280-point Gauss)";

    private static double Resonance(LongitudinalSlotMomentMethod s, double offsetMm, out Complex y)
    {
        var (l, sc) = ResonantCharacterisation.FindResonance(s, offsetMm * 1e-3, F);
        y = sc.Admittance;
        return l;
    }

    [Theory]
    [InlineData(0.42, 0.03967, 0.04526)]
    [InlineData(0.4565, 0.09183, 0.00011)]
    [InlineData(0.50, 0.04697, -0.04712)]
    public void Brute_force_sum_at_the_reference_truncation_reproduces_the_admittance_values(double lOverLambda, double g, double b)
    {
        var y = ThinP5.Solve(2e-3, lOverLambda * Lambda, F.Hertz, (300, 300)).Admittance;
        double mag = Math.Sqrt(g * g + b * b);
        Check.Absolute(g, y.Real, 1e-3 * mag, Reg);
        Check.Absolute(b, y.Imaginary, 1e-3 * mag, Reg);
    }

    [Theory]
    [InlineData(0.42, 0.03967, 0.04526)]
    [InlineData(0.44, 0.07468, 0.03539)]
    [InlineData(0.47, 0.08260, -0.02835)]
    [InlineData(0.50, 0.04697, -0.04712)]
    public void Accelerated_sum_agrees_with_the_reference_admittance_to_the_reference_truncation_error(double lOverLambda, double g, double b)
    {
        // The reference's 300×300 brute-force sum itself carries ~1e-2 |y| of truncation error in Re y at 0.42λ
        // (it converges as 1/M: see Accelerated_sum_equals_the_extrapolated_brute_force_sum), hence 1.5 %.
        var y = ThinP5.Solve(2e-3, lOverLambda * Lambda, F.Hertz, null).Admittance;
        double mag = Math.Sqrt(g * g + b * b);
        Check.Absolute(g, y.Real, 1.5e-2 * mag, Reg);
        Check.Absolute(b, y.Imaginary, 1.5e-2 * mag, Reg);
    }

    [Theory]
    [InlineData(0.42)] // the slowest-converging of the reference lengths
    [InlineData(0.55)] // above λ/2: the n = 0 terms of the closed-form sums take their trigonometric branch
    public void Accelerated_sum_equals_the_extrapolated_brute_force_sum(double lOverLambda)
    {
        // The brute-force tail falls as 1/M (M = N), so y∞ ≈ 2 y(2M) − y(M) (Richardson). Reference: the brute-force
        // sum of moment method after Stern & Elliott 1985, evaluated here; agreement to 4e-4 |y|.
        double len = lOverLambda * Lambda;
        var y1 = ThinP5.Solve(2e-3, len, F.Hertz, (300, 300)).Admittance;
        var y2 = ThinP5.Solve(2e-3, len, F.Hertz, (600, 600)).Admittance;
        var yInf = 2 * y2 - y1;
        var acc = ThinP5.Solve(2e-3, len, F.Hertz, null).Admittance;
        Check.Absolute(0, (acc - yInf).Magnitude, 4e-4 * yInf.Magnitude, "Richardson-extrapolated brute-force modal sum");
    }

    [Theory]
    [InlineData(1.0, 14.4686, 0.02346)]
    [InlineData(2.0, 14.5993, 0.09183)]
    [InlineData(3.0, 14.8062, 0.19935)]
    [InlineData(4.0, 15.0699, 0.33706)]
    [InlineData(5.0, 15.3596, 0.49384)]
    public void Thin_wall_resonance_at_p5_matches_the_regression_table(double offsetMm, double lengthMm, double g)
    {
        double l = Resonance(ThinP5, offsetMm, out var y);
        const string src = "moment method after Stern & Elliott 1985, numpy [N] (P = 5, 301×301 modes)";
        Check.Relative(lengthMm, l * 1e3, 1e-3, src);
        Check.Relative(g, y.Real, 1e-3 * 3, src + "; g_r carries the reference's own truncation error");
    }

    [Theory]
    [InlineData(7, 14.5442)]
    [InlineData(9, 14.5053)]
    public void Thin_wall_resonant_length_at_higher_basis_counts_matches_the_regression_values(int p, double lengthMm)
    {
        var s = new LongitudinalSlotMomentMethod(Wr90(0), SlotTestGuides.Width, new MomentMethodOptions(BasisFunctions: p, ExtrapolationBasisFunctions: 0));
        Check.Relative(lengthMm, Resonance(s, 2, out _) * 1e3, 1e-3, "moment method after Stern & Elliott 1985, numpy convergence line [N]");
    }

    [Fact]
    public void Interior_sum_is_converged_in_mode_count_and_closed_form_terms()
    {
        var baseY = Thick.Solve(2e-3, 15e-3, F.Hertz, null).Admittance;
        var fine = new LongitudinalSlotMomentMethod(Wr90(1.27), SlotTestGuides.Width, new MomentMethodOptions(ModeCutFactor: 10, ClosedFormTerms: 96));
        var y = fine.Solve(2e-3, 15e-3, F.Hertz, null).Admittance;
        Check.Absolute(0, (y - baseY).Magnitude, 1e-4 * y.Magnitude, "same model with 6× the remainder modes and 4× the closed-form terms");
    }

    [Fact]
    public void Exterior_quadrature_is_converged()
    {
        var baseY = Thick.Solve(3e-3, 15.5e-3, F.Hertz, null).Admittance;
        var fine = new LongitudinalSlotMomentMethod(Wr90(1.27), SlotTestGuides.Width, new MomentMethodOptions(QuadraturePanels: 24, QuadratureOrder: 24));
        var y = fine.Solve(3e-3, 15.5e-3, F.Hertz, null).Admittance;
        Check.Absolute(0, (y - baseY).Magnitude, 1e-6 * y.Magnitude, "same model with 8× the quadrature points");
    }

    [Fact]
    public void Finite_wall_resonant_length_converges_in_basis_count()
    {
        // Successive changes of L_r shrink (they fall roughly as 1/P for the finite wall); P = 9 is within 0.3 % of P = 15.
        double[] l = [.. new[] { 5, 7, 9, 15 }.Select(p =>
            Resonance(new LongitudinalSlotMomentMethod(Wr90(1.27), SlotTestGuides.Width, new MomentMethodOptions(BasisFunctions: p, ExtrapolationBasisFunctions: 0)), 2, out _))];
        Assert.True(Math.Abs(l[2] - l[1]) < Math.Abs(l[1] - l[0]), $"L_r(P) = {string.Join(", ", l)}");
        Check.Relative(l[3], l[2], 3e-3, "the same model at P = 15");
    }

    [Fact]
    public void Default_basis_extrapolation_agrees_with_the_extrapolation_from_far_larger_basis_counts()
    {
        // Richardson in P from (9, 15) (the default) against the same from (31, 41): the same model, 4× the basis.
        LongitudinalSlotMomentMethod S(int p1, int p2, int panels) => new(Wr90(1.27), SlotTestGuides.Width,
            new MomentMethodOptions(BasisFunctions: p1, ExtrapolationBasisFunctions: p2, QuadraturePanels: panels));
        var fine = S(31, 41, 16).Solve(5e-3, 15.2e-3, F.Hertz, null).Admittance;
        var y = Thick.Solve(5e-3, 15.2e-3, F.Hertz, null).Admittance;
        var p9 = S(9, 0, 6).Solve(5e-3, 15.2e-3, F.Hertz, null).Admittance;
        Check.Absolute(0, (y - fine).Magnitude, 1.5e-3 * fine.Magnitude, "(31, 41)-extrapolated moment method");
        Assert.True((p9 - fine).Magnitude > 10 * (y - fine).Magnitude, "the extrapolation must improve on P = 9 alone");
    }

    [Theory]
    [InlineData(1.0)]
    [InlineData(2.0)]
    [InlineData(3.0)]
    [InlineData(4.0)]
    [InlineData(5.0)]
    public void Thin_wall_resonant_conductance_is_within_3_percent_of_stevenson(double offsetMm)
    {
        Resonance(Thin, offsetMm, out var y);
        Check.Relative(StevensonLongitudinalSlot.Conductance(Wr90(0), offsetMm * 1e-3, F), y.Real, 0.03,
            "Stevenson 1948: same physics, resonant half-wave slot");
    }

    [Fact]
    public void Single_basis_function_gives_close_to_stevenson()
    {
        var s = new LongitudinalSlotMomentMethod(Wr90(0), SlotTestGuides.Width, new MomentMethodOptions(BasisFunctions: 1, ExtrapolationBasisFunctions: 0));
        Resonance(s, 2, out var y);
        Check.Relative(0.09112, y.Real, 0.03, "moment method after Stern & Elliott 1985: P = 1 reduces to Stevenson's derivation");
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(1.27)]
    public void Susceptance_is_positive_below_resonance_and_negative_above(double wallMm)
    {
        var s = wallMm == 0 ? Thin : Thick;
        double l = Resonance(s, 2, out _);
        Assert.True(s.Solve(2e-3, 0.95 * l, F.Hertz, null).Admittance.Imaginary > 0, "moment method after Stern & Elliott 1985: Im y > 0 below resonance");
        Assert.True(s.Solve(2e-3, 1.05 * l, F.Hertz, null).Admittance.Imaginary < 0, "moment method after Stern & Elliott 1985: Im y < 0 above resonance");
    }

    [Fact]
    public void Admittance_is_even_in_offset_and_its_conductance_is_never_negative()
    {
        foreach (double x in new[] { 0.5e-3, 2e-3, 4.5e-3 })
            foreach (double r in new[] { 0.40, 0.45, 0.5, 0.55 })
            {
                var yp = Thick.Solve(x, r * Lambda, F.Hertz, null);
                var ym = Thick.Solve(-x, r * Lambda, F.Hertz, null);
                Check.Absolute(0, (yp.Admittance - ym.Admittance).Magnitude, 1e-12 * yp.Admittance.Magnitude, "symmetry of the guide about its centre line");
                Assert.True(yp.Admittance.Real >= 0, $"Re y = {yp.Admittance.Real} at x = {x}, L = {r}λ (passivity)");
            }
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(1.27)]
    public void Admittance_is_continuous_through_half_a_free_space_wavelength(double wallMm)
    {
        // At L = λ/2 the first slot-cavity mode and the n = 0 closed-form terms pass their cutoff; y must not jump.
        var s = wallMm == 0 ? Thin : Thick;
        var y1 = s.Solve(2e-3, 0.4999 * Lambda, F.Hertz, null).Admittance;
        var y2 = s.Solve(2e-3, 0.5 * Lambda, F.Hertz, null).Admittance;
        var y3 = s.Solve(2e-3, 0.5001 * Lambda, F.Hertz, null).Admittance;
        Check.Absolute(0, (y3 - y1).Magnitude, 1e-2 * y1.Magnitude, "continuity: the slope alone gives ~0.6 % over 2e-4 λ; the bug this guards against jumped by ~100 %");
        Check.Absolute(0, (y2 - (y1 + y3) / 2).Magnitude, 1e-5 * y1.Magnitude, "continuity at the cutoff itself");
    }

    [Fact]
    public void Vanishing_wall_thickness_reproduces_the_thin_wall_result()
    {
        var nearly = new LongitudinalSlotMomentMethod(Wr90(1e-7), SlotTestGuides.Width); // t = 0.1 nm
        foreach (double r in new[] { 0.44, 0.46, 0.5 })
        {
            var y0 = Thin.Solve(2e-3, r * Lambda, F.Hertz, null);
            var yt = nearly.Solve(2e-3, r * Lambda, F.Hertz, null);
            Check.Absolute(0, (yt.Admittance - y0.Admittance).Magnitude, 1e-6 * y0.Admittance.Magnitude, "t → 0 limit of the two-aperture model");
            Check.Absolute(0, (yt.Forward - y0.Forward).Magnitude, 1e-6 * y0.Forward.Magnitude, "t → 0 limit of the two-aperture model");
        }
    }

    [Fact]
    public void Thicker_walls_lengthen_the_resonant_slot_and_sharpen_the_resonance()
    {
        // Direction stated by Elliott 1981, Ch. 8 [M, Low–Medium] after Oliner 1957 and Josefsson 1987: thicker walls
        // lengthen the resonant slot and narrow its bandwidth; g_r changes modestly. Sharpness: L_r |dB/dL| / g_r at resonance.
        double prevL = 0, prevSharp = 0, g0 = 0;
        foreach (double t in new[] { 0.0, 0.5, 1.27, 2.0 })
        {
            var s = t == 0 ? Thin : new LongitudinalSlotMomentMethod(Wr90(t), SlotTestGuides.Width);
            double l = Resonance(s, 2, out var y);
            double d = (s.Solve(2e-3, l * 1.0005, F.Hertz, null).Admittance.Imaginary - s.Solve(2e-3, l * 0.9995, F.Hertz, null).Admittance.Imaginary) / (0.001 * l);
            double sharp = -l * d / y.Real;
            Assert.True(l > prevL, $"L_r({t} mm) = {l}");
            Assert.True(sharp > prevSharp, $"sharpness({t} mm) = {sharp}");
            if (t == 0) g0 = y.Real; else Check.Relative(g0, y.Real, 0.05, "Elliott 1981, Ch. 8: the change of g_r is modest");
            prevL = l;
            prevSharp = sharp;
        }
    }

    [Fact]
    public void Forward_and_backward_amplitudes_differ_by_a_few_percent_for_offsets_of_1_to_5_mm()
    {
        // Elliott 1981, Ch. 8 [N]: the MoM shows |B − C|/|B| ≈ 3–6 % for x = 1–5 mm in WR-90 (thin wall).
        foreach (double x in new[] { 1.0, 3.0, 5.0 })
        {
            Resonance(Thin, x, out _);
            var (l, sc) = ResonantCharacterisation.FindResonance(Thin, x * 1e-3, F);
            Assert.InRange(sc.ShuntAsymmetry, 0.02, 0.07);
            Assert.True(l > 0);
        }
    }

    [Fact]
    public void The_scattering_keeps_its_bits()
    {
        // Issue 12: results stay bit-identical where the method is unchanged. SHA-256 of B, C and y of 54 slots (two widths,
        // three offsets, lengths and frequencies; WR-90, 1.27 mm copper wall, default P = 9 and 15 with extrapolation),
        // recorded with the pairwise scalar remainder sum before it ran in vector lanes (main at 16de445).
        var guide = SlotArray.Core.Waveguides.RectangularWaveguide.FromStandard(SlotArray.Core.Waveguides.WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27),
            SlotArray.Core.Waveguides.Metal.Copper);
        var bytes = new List<byte>();
        foreach (double w in new[] { 1.5875, 1.0 })
        {
            var mm = new LongitudinalSlotMomentMethod(guide, Length.FromMillimeters(w));
            foreach (double x in new[] { 0.5, 2.0, -4.0 })
                foreach (double len in new[] { 14.0, 15.2, 16.5 })
                    foreach (double f in new[] { 8.5, 9.375, 10.2 })
                    {
                        var sc = mm.Solve(Length.FromMillimeters(x), Length.FromMillimeters(len), Frequency.FromGigahertz(f));
                        foreach (var c in new[] { sc.Admittance, sc.Backward, sc.Forward })
                        {
                            bytes.AddRange(BitConverter.GetBytes(c.Real));
                            bytes.AddRange(BitConverter.GetBytes(c.Imaginary));
                        }
                    }
        }
        Assert.Equal("FAAAD92E4D21795B9463F4AE5530E49C53D010349084840EFCB33C7F45C7A68F",
            Convert.ToHexString(System.Security.Cryptography.SHA256.HashData(bytes.ToArray())));
    }
}
