using System.Globalization;
using System.Numerics;
using SlotArray.Core.Prototype;

namespace SlotArray.Spec.Measurements;

/// <summary>What a Touchstone file said about itself, to show back to the user.</summary>
/// <param name="Version">"1.x" or "2.0" (from the [Version] keyword).</param>
/// <param name="FrequencyUnit">Hz, kHz, MHz or GHz as written.</param>
/// <param name="Parameter">S, Y or Z.</param>
/// <param name="Format">RI, MA or DB.</param>
/// <param name="ReferenceResistances">Reference resistance of each port, Ω.</param>
/// <param name="PortCount">Number of ports.</param>
/// <param name="Points">Number of frequencies.</param>
internal sealed record TouchstoneHeader(string Version, string FrequencyUnit, string Parameter, string Format,
    IReadOnlyList<double> ReferenceResistances, int PortCount, int Points)
{
    /// <summary>One line for the user: "Touchstone 1.x, 1 port, 201 points, frequencies in GHz, S in DB/angle, R = 50 Ω".</summary>
    public string Describe() => string.Format(CultureInfo.InvariantCulture, "Touchstone {0}, {1} port{2}, {3} points, frequencies in {4}, {5}-parameters as {6}, reference resistance {7} Ω",
        Version, PortCount, PortCount == 1 ? "" : "s", Points, FrequencyUnit, Parameter,
        Format switch { "RI" => "real/imaginary", "MA" => "magnitude/angle (deg)", _ => "dB/angle (deg)" },
        string.Join(" / ", ReferenceResistances.Select(r => r.ToString("0.###", CultureInfo.InvariantCulture))));
}

/// <summary>
/// Reads Touchstone files of one and two ports, versions 1.x and 2.0 (Touchstone File Format Specification, Version 2.0,
/// IBIS Open Forum, 2009; the rules below are from memory of that document): comments after <c>!</c>; the option line
/// <c># [Hz|kHz|MHz|GHz] [S|Y|Z|H|G] [DB|MA|RI] [R n]</c> in any order and case, defaults GHz S MA R 50; version 2 keywords
/// [Version], [Number of Ports], [Two-Port Data Order] (12_21 or 21_12), [Number of Frequencies], [Number of Noise
/// Frequencies], [Reference], [Matrix Format] (Full only here), [Begin Information]/[End Information], [Network Data],
/// [Noise Data], [End]; version 1 takes the port count from the extension .sNp and writes two-port data as N11 N21 N12
/// N22, with any noise parameters after the network data (their first frequency is not above the last network
/// frequency). Data may wrap across lines. Z and Y are normalised to R in version 1 and in ohms/siemens in version 2;
/// they are converted to S with the reference resistance. H and G are refused.
/// </summary>
internal static class TouchstoneReader
{
    /// <summary>Reads a file.</summary>
    /// <exception cref="MeasurementFormatException">The file is malformed (file:line: message).</exception>
    public static (MeasuredNetwork Network, TouchstoneHeader Header) ReadFile(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (!System.IO.File.Exists(path)) throw new MeasurementFormatException(path, 0, "file not found");
        return Read(System.IO.File.ReadAllLines(path), path);
    }

    /// <summary>Reads the lines of a file named <paramref name="name"/> (the name gives v1's port count).</summary>
    /// <exception cref="MeasurementFormatException">The file is malformed (file:line: message).</exception>
    public static (MeasuredNetwork Network, TouchstoneHeader Header) Read(IReadOnlyList<string> lines, string name)
    {
        ArgumentNullException.ThrowIfNull(lines);
        var h = new ReadState();
        for (int i = 0; i < lines.Count; i++)
        {
            int ln = i + 1;
            string raw = lines[i];
            int bang = raw.IndexOf('!');
            string text = (bang >= 0 ? raw[..bang] : raw).Trim();
            if (text.Length == 0 || h.Ended) continue;
            if (h.InInfo)
            {
                if (text.StartsWith("[End Information]", StringComparison.OrdinalIgnoreCase)) h.InInfo = false;
                continue;
            }
            if (text.StartsWith('['))
            {
                i = Keyword(h, text, lines, i, name);
                continue;
            }
            if (text.StartsWith('#'))
            {
                OptionLine(h, text, name, ln);
                continue;
            }
            if (h.Noise) continue;
            if (h.Version2 && !h.NetworkSection) throw new MeasurementFormatException(name, ln, "data before [Network Data]: a version 2 file puts its data after that keyword");
            foreach (var t in text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries)) h.Tokens.Add((t, ln));
        }
        if (h.Version2)
        {
            if (h.Ports is null) throw new MeasurementFormatException(name, 0, "a version 2 file needs [Number of Ports]");
            if (h.DeclaredPoints is null) throw new MeasurementFormatException(name, 0, "a version 2 file needs [Number of Frequencies]");
        }
        else
        {
            h.Ports ??= PortsFromExtension(name);
        }
        int n = h.Ports.Value;
        if (n > 2) throw new MeasurementFormatException(name, 0, $"{n} ports: an array is measured with one port (standing wave) or two (travelling wave into a load port)");
        var refs = h.References ?? Enumerable.Repeat(h.R, n).ToArray();
        if (refs.Length != n) throw new MeasurementFormatException(name, 0, $"[Reference] gives {refs.Length} resistances for {n} ports");
        return Data(h, refs, n, name);
    }

    /// <summary>What the reader has learnt of the file so far: the option line, the keywords and the data tokens.</summary>
    private sealed class ReadState
    {
        public string Unit { get; set; } = "GHz";
        public string Parameter { get; set; } = "S";
        public string Format { get; set; } = "MA";
        public string Order { get; set; } = "21_12";
        public double R { get; set; } = 50;
        public bool SawOption { get; set; }
        public bool Version2 { get; set; }
        public bool InInfo { get; set; }
        public bool Noise { get; set; }
        public bool Ended { get; set; }
        public bool NetworkSection { get; set; }
        public int? Ports { get; set; }
        public int? DeclaredPoints { get; set; }
        public double[]? References { get; set; }
        public List<(string Text, int Line)> Tokens { get; } = [];
    }

    /// <summary>One version 2 keyword line (index <paramref name="i"/>); returns the index of the last line it read.</summary>
    private static int Keyword(ReadState h, string text, IReadOnlyList<string> lines, int i, string name)
    {
        int ln = i + 1;
        int close = text.IndexOf(']');
        if (close < 0) throw new MeasurementFormatException(name, ln, $"keyword without its closing ']': '{text}'");
        string key = text[1..close].Trim().ToLowerInvariant();
        string arg = text[(close + 1)..].Trim();
        switch (key)
        {
            case "version":
                if (h.Tokens.Count > 0 || h.SawOption) throw new MeasurementFormatException(name, ln, "[Version] must come before the option line and the data");
                if (!arg.StartsWith("2", StringComparison.Ordinal)) throw new MeasurementFormatException(name, ln, $"[Version] {arg}: only 2.0 has keywords; omit [Version] for a version 1 file");
                h.Version2 = true; break;
            case "number of ports": h.Ports = PositiveInt(arg, name, ln, "[Number of Ports]"); break;
            case "two-port data order":
                if (arg is not ("12_21" or "21_12")) throw new MeasurementFormatException(name, ln, $"[Two-Port Data Order] '{arg}': write 12_21 or 21_12");
                h.Order = arg; break;
            case "number of frequencies": h.DeclaredPoints = PositiveInt(arg, name, ln, "[Number of Frequencies]"); break;
            case "number of noise frequencies": break;
            case "reference":
                var references = ParseNumbers(arg, name, ln).ToArray();
                // The references may continue on the next lines (one per port).
                while (h.Ports is int np && references.Length < np && i + 1 < lines.Count)
                {
                    i++;
                    string more = lines[i].Split('!')[0].Trim();
                    if (more.Length == 0) continue;
                    references = [.. references, .. ParseNumbers(more, name, i + 1)];
                }
                h.References = references;
                break;
            case "matrix format":
                if (!arg.Equals("Full", StringComparison.OrdinalIgnoreCase)) throw new MeasurementFormatException(name, ln, $"[Matrix Format] {arg}: only Full is read here (an array has at most two ports)");
                break;
            case "mixed-mode order": throw new MeasurementFormatException(name, ln, "[Mixed-Mode Order]: mixed-mode data are not an array's measurement; give single-ended S-parameters");
            case "begin information": h.InInfo = true; break;
            case "network data": h.NetworkSection = true; break;
            case "noise data": h.Noise = true; break;
            case "end": h.Ended = true; break;
            default: throw new MeasurementFormatException(name, ln, $"unknown keyword [{text[1..close]}]");
        }
        return i;
    }

    /// <summary>The option line ("# GHz S MA R 50"); a second one is ignored in version 1 and refused in version 2.</summary>
    private static void OptionLine(ReadState h, string text, string name, int ln)
    {
        if (h.SawOption)
        {
            if (h.Version2) throw new MeasurementFormatException(name, ln, "a second option line: version 2 allows one");
            return;
        }
        h.SawOption = true;
        var parts = text[1..].Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        for (int k = 0; k < parts.Length; k++)
        {
            string p = parts[k].ToUpperInvariant();
            switch (p)
            {
                case "HZ": h.Unit = "Hz"; break;
                case "KHZ": h.Unit = "kHz"; break;
                case "MHZ": h.Unit = "MHz"; break;
                case "GHZ": h.Unit = "GHz"; break;
                case "S" or "Y" or "Z": h.Parameter = p; break;
                case "H" or "G": throw new MeasurementFormatException(name, ln, $"{p}-parameters: give S-parameters (or Y or Z) of the array");
                case "DB" or "MA" or "RI": h.Format = p; break;
                case "R":
                    if (k + 1 >= parts.Length || !double.TryParse(parts[k + 1], NumberStyles.Float, CultureInfo.InvariantCulture, out double r) || !(r > 0))
                        throw new MeasurementFormatException(name, ln, "R must be followed by a positive reference resistance in ohms, e.g. 'R 50'");
                    h.R = r;
                    k++; break;
                default: throw new MeasurementFormatException(name, ln, $"option '{parts[k]}' is not a Touchstone option: write e.g. '# GHz S DB R 50'");
            }
        }
    }

    /// <summary>The network data: one point per frequency, converted to S11 (and S21 for two ports).</summary>
    private static (MeasuredNetwork Network, TouchstoneHeader Header) Data(ReadState h, double[] refs, int n, string name)
    {
        var tokens = h.Tokens;
        double scale = h.Unit switch { "Hz" => 1, "kHz" => 1e3, "MHz" => 1e6, _ => 1e9 };
        int per = 1 + 2 * n * n;
        var freqs = new List<double>();
        var s11 = new List<Complex>();
        var s21 = new List<Complex>();
        int at = 0;
        while (at < tokens.Count)
        {
            double f = Number(tokens[at], name) * scale;
            if (freqs.Count > 0 && f <= freqs[^1])
            {
                if (!h.Version2 && n == 2) break;   // version 1 noise parameters follow
                throw new MeasurementFormatException(name, tokens[at].Line, $"frequency {tokens[at].Text} is not above the previous one: frequencies must increase");
            }
            if (at + per > tokens.Count)
                throw new MeasurementFormatException(name, tokens[^1].Line, $"incomplete data at the end: a {n}-port point needs a frequency and {2 * n * n} numbers, found {tokens.Count - at - 1}");
            var v = new Complex[n * n];
            for (int k = 0; k < n * n; k++) v[k] = Pair(Number(tokens[at + 1 + 2 * k], name), Number(tokens[at + 2 + 2 * k], name), h.Format);
            at += per;
            // Order of the four two-port values: N11 N21 N12 N22 (version 1 and 21_12) or N11 N12 N21 N22 (12_21).
            Complex p11 = v[0], p21 = n == 2 ? (h.Order == "12_21" ? v[2] : v[1]) : 0, p12 = n == 2 ? (h.Order == "12_21" ? v[1] : v[2]) : 0, p22 = n == 2 ? v[3] : 0;
            var (a11, a21) = ToS(h.Parameter, h.Version2, refs, n, p11, p12, p21, p22);
            freqs.Add(f);
            s11.Add(a11);
            s21.Add(a21);
        }
        if (freqs.Count == 0) throw new MeasurementFormatException(name, 0, "no data");
        if (h.DeclaredPoints is int dp && dp != freqs.Count)
            throw new MeasurementFormatException(name, 0, $"[Number of Frequencies] says {dp}, the data hold {freqs.Count}");
        var header = new TouchstoneHeader(h.Version2 ? "2.0" : "1.x", h.Unit, h.Parameter, h.Format, refs, n, freqs.Count);
        return (new MeasuredNetwork(System.IO.Path.GetFileName(name), freqs, s11, n == 2 ? s21 : null, n), header);
    }

    private static (Complex S11, Complex S21) ToS(string parameter, bool version2, double[] refs, int n, Complex p11, Complex p12, Complex p21, Complex p22)
    {
        if (parameter == "S") return (p11, p21);
        // Normalise: version 2 gives ohms (Z) or siemens (Y); version 1 is already normalised to R.
        double r1 = refs[0], r2 = n == 2 ? refs[1] : refs[0];
        if (version2)
        {
            if (parameter == "Z") { p11 /= r1; p12 /= Math.Sqrt(r1 * r2); p21 /= Math.Sqrt(r1 * r2); p22 /= r2; }
            else { p11 *= r1; p12 *= Math.Sqrt(r1 * r2); p21 *= Math.Sqrt(r1 * r2); p22 *= r2; }
        }
        if (parameter == "Y")
        {
            // z = y⁻¹ for the normalised matrices.
            if (n == 1) p11 = 1 / p11;
            else
            {
                var det = p11 * p22 - p12 * p21;
                (p11, p12, p21, p22) = (p22 / det, -p12 / det, -p21 / det, p11 / det);
            }
        }
        // S = (z − I)(z + I)⁻¹ (D. M. Pozar, Microwave Engineering, 4th ed., 2012, eq. 4.44 with normalised impedances; from memory).
        if (n == 1) return ((p11 - 1) / (p11 + 1), 0);
        var d = (p11 + 1) * (p22 + 1) - p12 * p21;
        var s11 = ((p11 - 1) * (p22 + 1) - p12 * p21) / d;
        var s21 = 2 * p21 / d;
        return (s11, s21);
    }

    private static Complex Pair(double a, double b, string format) => format switch
    {
        "RI" => new Complex(a, b),
        "MA" => Complex.FromPolarCoordinates(a, b * Math.PI / 180),
        _ => Complex.FromPolarCoordinates(Math.Pow(10, a / 20), b * Math.PI / 180),
    };

    private static double Number((string Text, int Line) t, string name)
        => double.TryParse(t.Text, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v) ? v
            : throw new MeasurementFormatException(name, t.Line, $"'{t.Text}' is not a number");

    private static IEnumerable<double> ParseNumbers(string text, string name, int line)
        => text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries).Select(t => Number((t, line), name));

    private static int PositiveInt(string text, string name, int line, string key)
        => int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out int v) && v > 0 ? v
            : throw new MeasurementFormatException(name, line, $"{key} needs a positive whole number, found '{text}'");

    private static int PortsFromExtension(string name)
    {
        string ext = System.IO.Path.GetExtension(name).ToLowerInvariant();
        if (ext.Length >= 4 && ext[1] == 's' && ext[^1] == 'p' && int.TryParse(ext[2..^1], NumberStyles.None, CultureInfo.InvariantCulture, out int n) && n > 0) return n;
        throw new MeasurementFormatException(name, 0, "a version 1 Touchstone file takes its port count from its extension: name it .s1p or .s2p (or write a version 2 file with [Number of Ports])");
    }
}
