using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Tolerance;
using SlotArray.Core.Tests.DesignTests;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.ToleranceTests;

/// <summary>Designs and tolerance requests shared by the tolerance tests (the Stevenson test double: fast and closed-form).</summary>
internal static class ToleranceTestArrays
{
    public static MachiningTolerance Uniform(double mm) => new(Length.FromMillimeters(mm), ErrorDistribution.Uniform);
    public static MachiningTolerance Normal(double mm) => new(Length.FromMillimeters(mm), ErrorDistribution.Normal);

    public static ToleranceRequest Request(double offset = 0, double length = 0, double position = 0, double width = 0, double guideWidth = 0,
        double wall = 0, int trials = 64, int seed = 7, double systematicLength = 0)
        => new(Uniform(offset), Uniform(length), Uniform(position), Uniform(width), Uniform(guideWidth), Normal(wall),
            Length.FromMillimeters(systematicLength), Length.Zero, trials, seed);

    public static ToleranceRequest Typical(int trials = 64, int seed = 7)
        => Request(0.02, 0.03, 0.03, 0.02, 0.05, 0.05, trials, seed);

    public static SlotModelFactory Factory => (g, w) => new StevensonTestSlot(g, w);

    /// <summary>A designed end-fed array of N slots with the given amplitudes on the Stevenson test double.</summary>
    public static (ArrayDesign Design, StevensonTestSlot Slot) Designed(double[] amplitudes, Core.Waveguides.RectangularWaveguide? guide = null)
    {
        var g = guide ?? Wr90;
        var slot = new StevensonTestSlot(g, Width);
        return (StandingWaveDesigner.Design(StickRequest.Of(TestArrays.Request(amplitudes.Length, guide: g), slot, amplitudes)).Design, slot);
    }

    /// <summary>Taylor-like smooth taper for tests: a cosine on a pedestal (any taper with η_t &lt; 1 will do).</summary>
    public static double[] Tapered(int n) => Enumerable.Range(0, n).Select(i => 0.4 + 0.6 * Math.Sin(Math.PI * (i + 0.5) / n)).ToArray();
}

/// <summary>
/// A trial model that perturbs the excitations of a fixed aperture directly: e_n = a_n (1 + σ_a X_n) e^{jσ_φ Y_n}, X, Y
/// standard normal, positions fixed at half a free-space wavelength (so that the visible-space average of the error
/// pattern is exactly the incoherent sum Σ|ε_n|²). The seam for testing the statistics engine alone.
/// </summary>
internal sealed class ExcitationErrorModel(double[] amplitudes, double sigmaAmplitude, double sigmaPhase, Frequency f) : IToleranceTrialModel
{
    public Frequency Frequency { get; } = f;

    public TrialNetwork Nominal { get; } = new(
        Enumerable.Range(0, amplitudes.Length).Select(i => i * f.FreeSpaceWavelength.Meters / 2).ToArray(),
        amplitudes.Select(a => new Complex(a, 0)).ToArray(), 0, 1);

    public TrialNetwork Trial(ref TrialRandom random)
    {
        var e = new Complex[amplitudes.Length];
        for (int i = 0; i < e.Length; i++)
        {
            double da = sigmaAmplitude * random.NextNormal(), dp = sigmaPhase * random.NextNormal();
            e[i] = amplitudes[i] * (1 + da) * Complex.FromPolarCoordinates(1, dp);
        }
        return Nominal with { Excitations = e };
    }
}
