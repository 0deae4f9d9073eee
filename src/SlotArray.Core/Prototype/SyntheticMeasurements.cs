using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Prototype;

/// <summary>
/// Synthetic "measurements" of a plate with known errors, from the design's own network model (full coupled solution,
/// mutual impedances at the erroneous geometry): S-parameters and co-polar cuts with phase, with uniform noise of
/// ±<c>noiseDb</c> on every level and ±<c>noiseDeg</c> on every phase from a seeded generator. For tests and the README's
/// worked example; never a stand-in for a real bench.
/// </summary>
internal static class SyntheticMeasurements
{
    /// <summary>Generates the measurements.</summary>
    /// <param name="model">The plate's model (its slot model should be the real one).</param>
    /// <param name="truth">The errors the plate really has.</param>
    /// <param name="low">Lowest frequency of the network sweep.</param>
    /// <param name="high">Highest frequency.</param>
    /// <param name="points">Sweep points, ≥ 5.</param>
    /// <param name="cutFrequencies">Frequencies of the pattern cuts.</param>
    /// <param name="angleStepDeg">Angle step of the cuts, deg (−90° to +90°).</param>
    /// <param name="noiseDb">Half-width of the uniform level noise, dB.</param>
    /// <param name="noiseDeg">Half-width of the uniform phase noise, deg.</param>
    /// <param name="seed">Seed of the noise.</param>
    /// <param name="twoPort">Whether to include S21 (a travelling-wave array measured into its load port).</param>
    public static PrototypeMeasurements Generate(PrototypeModel model, PrototypeErrors truth, Frequency low, Frequency high, int points,
        IReadOnlyList<Frequency> cutFrequencies, double angleStepDeg, double noiseDb, double noiseDeg, int seed, bool twoPort = false)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(cutFrequencies);
        var exact = model.RefreezeAt(truth);
        var rng = new Random(seed);
        Complex Noisy(Complex z) => Complex.FromPolarCoordinates(z.Magnitude * Math.Pow(10, noiseDb * (2 * rng.NextDouble() - 1) / 20),
            z.Phase + noiseDeg * Math.PI / 180 * (2 * rng.NextDouble() - 1));
        var freqs = Enumerable.Range(0, points).Select(i => low.Hertz + (high.Hertz - low.Hertz) * i / (points - 1)).ToArray();
        var design = exact.Apply(truth);
        var slot = exact.SlotModel(truth);
        var sols = freqs.Select(f => exact.Solve(design, slot, Frequency.FromHertz(f))).ToArray();
        var s11 = sols.Select(s => Noisy(s.S11)).ToArray();
        var s21 = twoPort ? sols.Select(s => Noisy(Math.Sqrt(Math.Max(0, s.LoadPower)))).ToArray() : null;
        var network = new MeasuredNetwork("synthetic", freqs, s11, s21, twoPort ? 2 : 1);
        int count = (int)Math.Round(180 / angleStepDeg) + 1;
        var angles = Enumerable.Range(0, count).Select(i => (-90 + i * angleStepDeg) * Math.PI / 180).Where(t => Math.Abs(t) < Math.PI / 2 - 1e-9).ToArray();
        var cuts = cutFrequencies.Select(f =>
        {
            var sol = exact.Solve(design, slot, f);
            var field = PrototypeModel.Field(design, sol.Excitations, f, angles);
            double peak = field.Max(z => z.Magnitude);
            var noisy = field.Select(z => Noisy(z / peak)).ToArray();
            return new MeasuredCut($"synthetic cut {f}", f, angles, noisy.Select(z => 20 * Math.Log10(Math.Max(z.Magnitude, 1e-6))).ToArray(),
                noisy.Select(z => z.Phase).ToArray());
        }).ToArray();
        return new PrototypeMeasurements(network, cuts);
    }
}
