using System.Globalization;
using System.Numerics;
using System.Text;

namespace SlotArray.FullWave.Results;

/// <summary>One frequency of a two-port run: S11 and S21 at the port planes, and any extra probe phasors normalised to port 1's incident wave.</summary>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="S11">Reflection at port 1.</param>
/// <param name="S21">Transmission to port 2 (0 when the run has one port).</param>
/// <param name="Probes">Extra voltage probes ÷ port 1's incident wave, in the model's probe order.</param>
internal sealed record TwoPortPoint(double FrequencyHz, Complex S11, Complex S21, IReadOnlyList<Complex> Probes);

/// <summary>
/// The frequency response of one engine run, read from its probe files: S11 = u_ref,1/u_inc,1 and
/// S21 = u_out,2/u_inc,1, where u_out,2 is the wave leaving the structure through port 2 (the engine's own port
/// post-processing forms the same ratios). Stored as a small CSV beside the run so a rerun need not read the probes.
/// </summary>
/// <param name="Points">One entry per frequency, ascending.</param>
internal sealed record TwoPortResponse(IReadOnlyList<TwoPortPoint> Points)
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Reads the run folder's port (and extra) probes and forms the response at <paramref name="frequenciesHz"/>.</summary>
    /// <param name="folder">The run folder (the engine's working folder).</param>
    /// <param name="broadWallMeters">Inside broad dimension a of the ports' guide, m (sets the TE10 wave impedance).</param>
    /// <param name="frequenciesHz">Frequencies, Hz, above the TE10 cutoff.</param>
    /// <param name="portCount">1 or 2.</param>
    /// <param name="probeNames">Extra voltage probe file names.</param>
    public static TwoPortResponse FromProbes(string folder, double broadWallMeters, IReadOnlyList<double> frequenciesHz, int portCount,
        IReadOnlyList<string> probeNames)
    {
        var u1 = ProbeSeries.Read(Path.Combine(folder, "port_ut1"));
        var i1 = ProbeSeries.Read(Path.Combine(folder, "port_it1"));
        var u2 = portCount > 1 ? ProbeSeries.Read(Path.Combine(folder, "port_ut2")) : null;
        var i2 = portCount > 1 ? ProbeSeries.Read(Path.Combine(folder, "port_it2")) : null;
        var extra = probeNames.Select(n => ProbeSeries.Read(Path.Combine(folder, n))).ToList();
        var points = new List<TwoPortPoint>();
        foreach (double f in frequenciesHz)
        {
            double z = PortWaves.Te10WaveImpedance(f, broadWallMeters);
            var w1 = PortWaves.FromVoltageCurrent(u1.At(f), i1.At(f), z);
            var s21 = Complex.Zero;
            if (u2 is not null && i2 is not null)
            {
                var w2 = PortWaves.FromVoltageCurrent(u2.At(f), i2.At(f), z);
                s21 = w2.Reflected / w1.Incident;
            }
            points.Add(new TwoPortPoint(f, w1.Reflected / w1.Incident, s21, extra.Select(p => p.At(f) / w1.Incident).ToList()));
        }
        return new TwoPortResponse(points);
    }

    /// <summary>The response as CSV text (frequency_hz, s11_re, s11_im, s21_re, s21_im, then probe pairs), round-trip precision.</summary>
    public string ToCsv()
    {
        var sb = new StringBuilder();
        int probes = Points.Count > 0 ? Points[0].Probes.Count : 0;
        sb.Append("frequency_hz,s11_re,s11_im,s21_re,s21_im");
        for (int k = 0; k < probes; k++) sb.Append(Inv, $",p{k + 1}_re,p{k + 1}_im");
        sb.Append('\n');
        foreach (var p in Points)
        {
            sb.Append(Inv, $"{p.FrequencyHz:R},{p.S11.Real:R},{p.S11.Imaginary:R},{p.S21.Real:R},{p.S21.Imaginary:R}");
            foreach (var v in p.Probes) sb.Append(Inv, $",{v.Real:R},{v.Imaginary:R}");
            sb.Append('\n');
        }
        return sb.ToString();
    }

    /// <summary>Parses <see cref="ToCsv"/> output.</summary>
    /// <exception cref="InvalidDataException">The text is not such a table.</exception>
    public static TwoPortResponse FromCsv(string text)
    {
        var lines = text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        if (lines.Length < 2 || !lines[0].StartsWith("frequency_hz,", StringComparison.Ordinal)) throw new InvalidDataException("not a run response table");
        var points = new List<TwoPortPoint>();
        foreach (string line in lines.Skip(1))
        {
            var v = line.Split(',').Select(s => double.Parse(s, NumberStyles.Float, Inv)).ToArray();
            if (v.Length < 5 || (v.Length - 5) % 2 != 0) throw new InvalidDataException($"bad row: {line}");
            var probes = Enumerable.Range(0, (v.Length - 5) / 2).Select(k => new Complex(v[5 + 2 * k], v[6 + 2 * k])).ToList();
            points.Add(new TwoPortPoint(v[0], new Complex(v[1], v[2]), new Complex(v[3], v[4]), probes));
        }
        return new TwoPortResponse(points);
    }
}
