using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Patterns;
using SlotArray.Core.Slots;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.TravellingWave;

/// <summary>Far-field figures of squinted (travelling-wave) beams.</summary>
public class SquintedBeamFiguresTests
{
    [Theory]
    [InlineData(0.3)]
    [InlineData(-0.05)]
    public void Array_factor_at_one_off_broadside_sine_is_the_direct_sum(double u)
    {
        // AF(u) = Σ a_n exp(j k z_n u) (Balanis 2005 eq. 6-52, from memory), here typed out term by term.
        double[] z = [0.0, 0.013, 0.031, 0.052];
        Complex[] a = [1, new(0.5, 0.2), new(-0.3, 0.7), 2];
        double k = 2 * Math.PI / 0.032;
        Complex expected = 0;
        for (int i = 0; i < z.Length; i++) expected += a[i] * Complex.Exp(new Complex(0, k * z[i] * u));
        var af = ArrayFactor.AtSines(z, a, k, [u])[0];
        Check.Absolute(0, (af - expected).Magnitude, 1e-12, "direct sum");
    }

    [Fact]
    public void Squinted_travelling_wave_directivity_matches_the_numerical_half_space_integral()
    {
        // Edge slots: co-polar element uniform over the half-space, D = D_co/(1 + X/C) with the cross-polar power ratio.
        var slot = EdgeSlot.Create(Wr90, Width);
        var tw = TravellingWaveDesigner.Design(StickRequest.Of(TravellingWaveDesignerTests.Travelling(40, 0.10, spacing: 0.44, type: SlotType.Edge), slot, SlotArray.Core.Tapers.TaylorLineSource.Weights(40, -25, 4)));
        var sol = ArrayNetwork.Solve(tw.Design, slot, F0);
        var fig = ArrayFigures.At(tw.Design, sol);
        var z = tw.Design.Slots.Select(s => -s.Position.Meters).ToArray();
        var co = CrossPolarPattern.CoPolarSources(sol.Excitations, tw.Design.Slots.Select(s => s.Coupling).ToArray());
        // Independent quadrature: the Gauss-Legendre half-space integral with a uniform element.
        double half = Directivity.HalfSpace(z, co, F0.FreeSpaceWavenumber, ElementPatterns.Isotropic, fig.Metrics.BeamDirection.Radians);
        Check.Relative(half / (1 + fig.CrossPolar!.PowerRatio), fig.Directivity, 1e-6,
            "IEEE Std 145-2013 directivity: half-space directivity of a uniform element (numerical) = 2 × the closed-form full-sphere one");
        Check.Relative(fig.Directivity * sol.RadiatedPower, fig.Gain, 1e-12, "G = D × P_rad/P_inc");
        Assert.True(fig.Metrics.BeamDirection.Degrees < -5, "0.44 λg: beam well toward the feed");
    }
}
