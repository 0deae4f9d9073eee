using System.Globalization;
using System.Numerics;

namespace SlotArray.FullWave.Results;

/// <summary>
/// A time series the engine wrote for one probe: '%' comment lines, then rows of time (s) and value (V or A),
/// whitespace separated (further columns ignored).
/// </summary>
/// <param name="Time">Sample times, s.</param>
/// <param name="Value">Samples.</param>
internal sealed record ProbeSeries(IReadOnlyList<double> Time, IReadOnlyList<double> Value)
{
    /// <summary>Reads a probe file.</summary>
    /// <exception cref="InvalidDataException">A row does not parse or the file has fewer than two rows.</exception>
    public static ProbeSeries Read(string path)
    {
        var t = new List<double>();
        var v = new List<double>();
        int lineNo = 0;
        foreach (string raw in File.ReadLines(path))
        {
            lineNo++;
            string line = raw.Trim();
            if (line.Length == 0 || line[0] == '%') continue;
            var parts = line.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
            if (parts.Length < 2 || !double.TryParse(parts[0], NumberStyles.Float, CultureInfo.InvariantCulture, out double ti)
                || !double.TryParse(parts[1], NumberStyles.Float, CultureInfo.InvariantCulture, out double vi))
                throw new InvalidDataException($"{path}:{lineNo}: expected 'time value', found '{line}'");
            t.Add(ti);
            v.Add(vi);
        }
        if (t.Count < 2) throw new InvalidDataException($"{path}: fewer than two samples (did the engine run?)");
        return new ProbeSeries(t, v);
    }

    /// <summary>
    /// The phasor at <paramref name="frequencyHz"/> (e^{jωt} convention): X(f) = 2 Δt Σ x(tₙ) e^{−j2πf tₙ}, the
    /// single-sided Fourier integral of a pulse response by the rectangle rule (A. V. Oppenheim and R. W. Schafer,
    /// Discrete-Time Signal Processing, 3rd ed., Pearson 2010, section 8.1, from memory). Each probe's own times
    /// are used, so the half-step offset between the engine's E and H samples is accounted for.
    /// </summary>
    public Complex At(double frequencyHz)
    {
        double dt = Time[1] - Time[0];
        double w = 2 * Math.PI * frequencyHz;
        double re = 0, im = 0;
        for (int n = 0; n < Time.Count; n++)
        {
            double ph = w * Time[n];
            re += Value[n] * Math.Cos(ph);
            im -= Value[n] * Math.Sin(ph);
        }
        return 2 * dt * new Complex(re, im);
    }
}
