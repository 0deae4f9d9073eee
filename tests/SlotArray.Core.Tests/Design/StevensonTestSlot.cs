using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Tests.DesignTests;

/// <summary>
/// TEST DOUBLE, not a slot model of the product: a longitudinal broad-wall slot whose resonant conductance is
/// Stevenson's closed form g_r(x, f) = (480/(π·73)) (a/b)(λg/λ) cos²(πλ/(2λg)) sin²(πx/a) (Stevenson 1948 [M, D];
/// A. F. Stevenson, J. Appl. Phys. 19, 24–38, 1948; R_d = 73 Ω exactly so that WR-90 at 9.375 GHz gives the
/// coefficient 1.237057), with a single-pole length dependence y = g_r / (1 + jQ(L/L_r − L_r/L)).
/// The resonant length L_r = <see cref="ResonantFraction"/> · λ/2 does not depend on the offset; it scales with the
/// free-space wavelength, so a slot of fixed length goes off resonance as the frequency moves, like a real slot.
/// Q and the resonant fraction are test-double choices, not physics.
/// The frequency-independent variant (<see cref="FrequencyIndependent"/>) freezes g_r at one frequency and has no
/// susceptance: the idealised slot of the frequency-independent bandwidth check (ArrayNetworkTests).
/// </summary>
internal sealed class StevensonTestSlot(RectangularWaveguide guide, Length width, double q = 5, double resonantFraction = 0.95,
    double maximumCoupling = 5e-3, Frequency? frozenAt = null) : IShuntSlotModel
{
    /// <summary>480 Ω/(π R_d) with R_d = 73 Ω (Stevenson 1948).</summary>
    public const double StevensonConstant = 480 / (Math.PI * 73);

    public RectangularWaveguide Guide { get; } = guide;
    public Length Width { get; } = width;
    public SlotCouplingKind CouplingKind => SlotCouplingKind.Offset;
    public string Name => frozenAt is null ? "Stevenson test double" : "frequency-independent test double";
    public double MaximumCoupling { get; } = maximumCoupling;
    public double ResonantFraction { get; } = resonantFraction;

    /// <summary>A slot whose admittance is g_r(x, f0) at every frequency and length (no susceptance).</summary>
    public static StevensonTestSlot FrequencyIndependent(RectangularWaveguide guide, Length width, Frequency f0, double maximumCoupling = 5e-3)
        => new(guide, width, q: 0, maximumCoupling: maximumCoupling, frozenAt: f0);

    /// <summary>Stevenson coefficient K(f) with g_r = K sin²(πx/a).</summary>
    public double Coefficient(Frequency f)
    {
        var ff = frozenAt ?? f;
        double a = Guide.BroadWall.Meters, b = Guide.NarrowWall.Meters;
        double lambda = ff.FreeSpaceWavelength.Meters, lambdaG = Guide.GuideWavelength(ff).Meters;
        double c = Math.Cos(Math.PI * lambda / (2 * lambdaG));
        return StevensonConstant * (a / b) * (lambdaG / lambda) * c * c;
    }

    private double ResonantLength(Frequency f) => ResonantFraction * (frozenAt ?? f).FreeSpaceWavelength.Meters / 2;

    private double Conductance(double x, Frequency f)
    {
        double s = Math.Sin(Math.PI * x / Guide.BroadWall.Meters);
        return Coefficient(f) * s * s;
    }

    public Complex Admittance(double coupling, Length length, Frequency f)
    {
        double lr = ResonantLength(f), r = length.Meters / lr;
        return Conductance(coupling, f) / new Complex(1, q * (r - 1 / r));
    }

    public SlotResonance Resonance(double coupling, Frequency f)
        => new(coupling, Length.FromMeters(ResonantLength(f)), Conductance(coupling, f));

    public SlotResonance ForConductance(double conductance, Frequency f)
    {
        if (conductance > MaximumConductance(f))
            throw new InfeasibleDesignException($"g = {conductance} above the test double's maximum {MaximumConductance(f)}");
        double x = Guide.BroadWall.Meters / Math.PI * Math.Asin(Math.Sqrt(conductance / Coefficient(f)));
        return new SlotResonance(x, Length.FromMeters(ResonantLength(f)), conductance);
    }

    public double MaximumConductance(Frequency f) => Conductance(MaximumCoupling, f);

    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f) => [];
}
