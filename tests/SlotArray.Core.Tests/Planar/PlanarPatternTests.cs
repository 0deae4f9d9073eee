using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Patterns;
using SlotArray.Core.Planar;
using SlotArray.Core.Quantities;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.PlanarTests;

/// <summary>The 2-D array factor, cuts, peak sidelobe and directivity of a planar aperture.</summary>
public class PlanarPatternTests
{
    private const double K = 2 * Math.PI;   // λ = 1 m

    private static (double[] X, double[] Y) Grid(int nx, int ny, double dx, double dy)
    {
        var x = new List<double>();
        var y = new List<double>();
        for (int j = 0; j < ny; j++)
            for (int i = 0; i < nx; i++) { x.Add((i - 0.5 * (nx - 1)) * dx); y.Add((j - 0.5 * (ny - 1)) * dy); }
        return (x.ToArray(), y.ToArray());
    }

    private static double Dirichlet(int n, double psi)
        => Math.Abs(Math.Sin(psi / 2)) < 1e-12 ? n : Math.Sin(n * psi / 2) / Math.Sin(psi / 2);

    /// <summary>
    /// A uniform M × N rectangular grid: |AF(u, v)| = |sin(Nψx/2)/sin(ψx/2)| |sin(Mψy/2)/sin(ψy/2)|, ψ = k d u (the
    /// closed form of the uniform planar array, C. A. Balanis, <i>Antenna Theory</i>, 3rd ed., Wiley 2005, eq. 6-89, from memory).
    /// </summary>
    [Theory]
    [InlineData(7, 5, 0.5, 0.7)]
    [InlineData(12, 9, 0.62, 0.81)]
    public void Uniform_rectangular_grid_matches_the_closed_form(int nx, int ny, double dx, double dy)
    {
        var (x, y) = Grid(nx, ny, dx, dy);
        var af = new PlanarArrayFactor(x, y, Enumerable.Repeat(Complex.One, x.Length).ToArray(), K);
        var rng = new Random(3);
        for (int t = 0; t < 200; t++)
        {
            double r = Math.Sqrt(rng.NextDouble()), phi = 2 * Math.PI * rng.NextDouble(), u = r * Math.Cos(phi), v = r * Math.Sin(phi);
            double expected = Math.Abs(Dirichlet(nx, K * dx * u) * Dirichlet(ny, K * dy * v));
            Check.Absolute(expected, af.ArrayFactorAt(u, v).Magnitude, 1e-9 * nx * ny, "Balanis 2005 eq. 6-89 (uniform planar array)");
        }
        // The fast grid uses the same sum factorised in u and v.
        var g = af.PowerGrid(41);
        for (int i = 0; i < 41; i += 5)
            for (int j = 0; j < 41; j += 5)
            {
                double u = -1 + i / 20.0, v = -1 + j / 20.0;
                if (u * u + v * v > 1) { Assert.True(double.IsNaN(g[i, j])); continue; }
                Check.Relative(af.Power(u, v), g[i, j], 1e-9, "the same sum, direct");
            }
    }

    /// <summary>
    /// A separable taper's principal cuts are the 1-D patterns of its two factors (the planar array factor factorises,
    /// Balanis 2005 Sec. 6.10, from memory): the x-z cut is the along-taper line array with the slot's H-plane element,
    /// the y-z cut the across-taper line array with the slot's (isotropic) E-plane element; peak sidelobe and beamwidth
    /// of each agree with <see cref="PatternMetrics"/> on the 1-D pattern.
    /// </summary>
    [Theory]
    [InlineData(10, 8, -25, -25, TaperType.Villeneuve, 3)]
    [InlineData(16, 12, -30, -20, TaperType.Taylor, 4)]
    public void Separable_taper_reproduces_the_linear_figures_in_each_principal_plane(int nx, int ny, double along, double across, TaperType type, int nbar)
    {
        double dx = 0.70, dy = 0.75;
        var ta = new TaperRequest(type, along, nbar, -20, 2, null);
        var tc = new TaperRequest(type, across, nbar, -20, 2, null);
        var layout = PlanarLayout.Create(ny, nx, Length.FromMeters(dx), Length.FromMeters(dy), PlanarOutline.Rectangle);
        var (w, _, _) = new ApertureTaper(ta, tc).Weights(layout);
        var af = new PlanarArrayFactor(layout.Slots.Select(s => s.X).ToArray(), layout.Slots.Select(s => s.Y).ToArray(),
            w.Select(a => new Complex(a, 0)).ToArray(), K);
        var grid = AngleGrid.UniformInTheta(-Math.PI / 2, Math.PI / 2, 4001);
        var wa = TaperSynthesis.Synthesize(ta, nx).Weights.ToArray();
        var wc = TaperSynthesis.Synthesize(tc, ny).Weights.ToArray();
        var xa = Enumerable.Range(0, nx).Select(i => (i - 0.5 * (nx - 1)) * dx).ToArray();
        var yc = Enumerable.Range(0, ny).Select(i => (i - 0.5 * (ny - 1)) * dy).ToArray();
        var h1 = PatternMetrics.Measure(ArrayFactor.ComputeDirect(xa, ArrayFactor.ToComplex(wa), K, grid, ElementPatterns.HalfWaveSlotHPlane));
        var e1 = PatternMetrics.Measure(ArrayFactor.ComputeDirect(yc, ArrayFactor.ToComplex(wc), K, grid, ElementPatterns.Isotropic));
        var h2 = PatternMetrics.Measure(af.Cut(0, grid));
        var e2 = PatternMetrics.Measure(af.Cut(Math.PI / 2, grid));
        const string src = "separability of the planar array factor (Balanis 2005 Sec. 6.10)";
        Check.Absolute(h1.PeakSidelobeDb!.Value, h2.PeakSidelobeDb!.Value, 1e-6, src);
        Check.Absolute(e1.PeakSidelobeDb!.Value, e2.PeakSidelobeDb!.Value, 1e-6, src);
        Check.Relative(h1.HalfPowerBeamwidth.Radians, h2.HalfPowerBeamwidth.Radians, 1e-9, src);
        Check.Relative(e1.HalfPowerBeamwidth.Radians, e2.HalfPowerBeamwidth.Radians, 1e-9, src);
        // And over the whole visible region no lobe beats the principal planes' (the product of two lobes is lower).
        var (beam, psl) = af.BeamAndPeakSidelobe();
        Check.Absolute(0, beam.U, 1e-5, "broadside beam of an in-phase aperture");
        Assert.True(psl!.Value.LevelDb <= Math.Max(h2.PeakSidelobeDb.Value, e2.PeakSidelobeDb.Value) + 0.01,
            $"visible-region peak sidelobe {psl.Value.LevelDb:0.00} dB above the principal planes' ({h2.PeakSidelobeDb:0.00}, {e2.PeakSidelobeDb:0.00} dB)");
    }

    /// <summary>
    /// Directivity by integration against the aperture formula D = 4πA/λ² · η_t for a large broadside array without grating
    /// lobes (A = N d_x d_y; e.g. R. C. Hansen, <i>Phased Array Antennas</i>, Wiley 1998, Sec. 2.2, from memory); the formula
    /// ignores the element pattern and edge effects, so agreement within 0.35 dB is what it promises here.
    /// </summary>
    [Theory]
    [InlineData(20, 20, 0.5, 0.5, TaperType.Uniform)]
    [InlineData(24, 18, 0.7, 0.75, TaperType.Taylor)]
    public void Directivity_by_integration_agrees_with_the_aperture_formula(int nx, int ny, double dx, double dy, TaperType type)
    {
        var t = new TaperRequest(type, -30, 5, -20, 2, null);
        var layout = PlanarLayout.Create(ny, nx, Length.FromMeters(dx), Length.FromMeters(dy), PlanarOutline.Rectangle);
        var (w, _, _) = new ApertureTaper(t, t).Weights(layout);
        var e = w.Select(a => new Complex(a, 0)).ToArray();
        var af = new PlanarArrayFactor(layout.Slots.Select(s => s.X).ToArray(), layout.Slots.Select(s => s.Y).ToArray(), e, K);
        double expected = 4 * Math.PI * layout.Area * PatternMetrics.TaperEfficiency(e);
        Check.Absolute(10 * Math.Log10(expected), 10 * Math.Log10(af.Directivity()), 0.35, "4πA/λ² η_t (Hansen 1998)");
    }

    /// <summary>The outline keeps exactly the slots whose centres are inside (checked against the ellipse equation directly).</summary>
    [Fact]
    public void Outline_keeps_the_slots_inside()
    {
        var layout = PlanarLayout.Create(16, 20, Length.FromMeters(0.7), Length.FromMeters(0.75), PlanarOutline.Circle);
        double r = Math.Min(10 * 0.7, 8 * 0.75);
        int inside = 0;
        for (int j = 0; j < 16; j++)
            for (int i = 0; i < 20; i++)
            {
                double x = (i - 9.5) * 0.7, y = (j - 7.5) * 0.75;
                if (x * x + y * y <= r * r) inside++;
            }
        Assert.Equal(inside, layout.Count);
        Assert.All(layout.Slots, s => Assert.True(s.X * s.X + s.Y * s.Y <= r * r * (1 + 1e-12)));
        Assert.All(layout.FedBranches, b => Assert.Equal(0, layout.BranchSlots(b).Count % 2));
        var ellipse = PlanarLayout.Create(16, 20, Length.FromMeters(0.7), Length.FromMeters(0.75), PlanarOutline.Ellipse);
        Assert.All(ellipse.Slots, s => Assert.True(Math.Pow(s.X / 7.0, 2) + Math.Pow(s.Y / 6.0, 2) <= 1 + 1e-12));
        Assert.True(ellipse.Count > layout.Count, "the ellipse reaches further along x than the circle");
    }
}
