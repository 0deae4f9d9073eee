using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Prototype;

/// <summary>
/// The network data a fit uses: Re and Im of S11 (and |S21| of a two-port) at up to <c>maxPoints</c> of the measured
/// frequencies (evenly by index), each with the noise estimated from the data themselves: the RMS second difference
/// of neighbouring samples, σ² = ⟨|S_{i−1} − 2S_i + S_{i+1}|²⟩/(6 × the number of real components) (white noise of variance σ² gives
/// 6σ² per component in a second difference; the curve's own curvature over one step adds to it, so the estimate errs
/// high), floored at 10⁻⁵.
/// </summary>
internal sealed class NetworkFitData
{
    /// <summary>Noise floor of the estimate.</summary>
    public const double NoiseFloor = 1e-5;

    /// <summary>Selects the fit frequencies and estimates the noise.</summary>
    public NetworkFitData(MeasuredNetwork network, int maxPoints = 31)
    {
        ArgumentNullException.ThrowIfNull(network);
        Network = network;
        int count = network.Frequencies.Count;
        int take = Math.Min(count, Math.Max(5, maxPoints));
        Indices = Enumerable.Range(0, take).Select(i => (int)Math.Round(i * (count - 1.0) / (take - 1))).Distinct().ToArray();
        S11Noise = SecondDifferenceNoise(network.S11, 2);
        S21Noise = network.S21 is null ? 0 : SecondDifferenceNoise(network.S21.Select(z => (Complex)z.Magnitude).ToArray(), 1);
        var obs = new List<double>();
        var sig = new List<double>();
        foreach (int i in Indices)
        {
            obs.Add(network.S11[i].Real); sig.Add(S11Noise);
            obs.Add(network.S11[i].Imaginary); sig.Add(S11Noise);
            if (network.S21 is not null) { obs.Add(network.S21[i].Magnitude); sig.Add(S21Noise); }
        }
        Observed = [.. obs];
        Sigma = [.. sig];
    }

    /// <summary>The measurement.</summary>
    public MeasuredNetwork Network { get; }

    /// <summary>Indices of the measured frequencies used.</summary>
    public IReadOnlyList<int> Indices { get; }

    /// <summary>Noise of Re/Im S11 estimated from the data.</summary>
    public double S11Noise { get; }

    /// <summary>Noise of |S21| estimated from the data (0 for a one-port).</summary>
    public double S21Noise { get; }

    /// <summary>The data vector.</summary>
    public double[] Observed { get; }

    /// <summary>1σ of each datum.</summary>
    public double[] Sigma { get; }

    /// <summary>The model's data vector for given errors.</summary>
    public double[] Predict(PrototypeModel model, PrototypeErrors errors)
    {
        var design = model.Apply(errors);
        var slot = model.SlotModel(errors);
        int per = Network.S21 is null ? 2 : 3;
        var y = new double[Indices.Count * per];
        Parallel.For(0, Indices.Count, new ParallelOptions { MaxDegreeOfParallelism = 2 }, k =>
        {
            var sol = model.Solve(design, slot, Frequency.FromHertz(Network.Frequencies[Indices[k]]));
            y[per * k] = sol.S11.Real;
            y[per * k + 1] = sol.S11.Imaginary;
            if (per == 3) y[per * k + 2] = Math.Sqrt(Math.Max(0, sol.LoadPower));
        });
        return y;
    }

    private static double SecondDifferenceNoise(IReadOnlyList<Complex> s, int components)
    {
        if (s.Count < 3) return NoiseFloor;
        double sum = 0;
        for (int i = 1; i + 1 < s.Count; i++)
        {
            var d = s[i - 1] - 2 * s[i] + s[i + 1];
            sum += d.Real * d.Real + d.Imaginary * d.Imaginary;
        }
        return Math.Max(NoiseFloor, Math.Sqrt(sum / (s.Count - 2) / (6 * components)));
    }
}
