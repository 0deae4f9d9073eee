using System.Globalization;
using System.Text;
using SlotArray.Core.Waveguides;

namespace SlotArray.Spec.Tests;

/// <summary>
/// A spec as ordered sections of keys and text values, for the design fuzz (<see cref="DesignFuzzTests"/>): three small
/// bases (a broad-wall standing-wave array, an edge-slot travelling-wave array, a centre-fed custom tube), mutated one
/// key at a time from a table of ordinary, edge and out-of-range values for every key of the spec. Values may hold
/// placeholders resolved when rendered, so that a frequency can follow the guide ({fc:1.3}: 1.3 × the TE10 cutoff) and a
/// band the frequency ({band:0.02}: ± 2 %).
/// </summary>
internal sealed class FuzzSpec
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Sections in the order written; "" holds the top-level scalars.</summary>
    private static readonly string[] Order = ["", "guide", "slots", "feed", "taper", "tolerance", "requirements", "transmitter", "environment", "coupling"];

    /// <summary>Candidate values of every key, "section.key" (top-level keys without a section).</summary>
    private static readonly Dictionary<string, string[]> Values = new(StringComparer.Ordinal)
    {
        ["spec"] = ["1", "2"],
        ["name"] = ["fuzz", "..", ".", "a b", "x.y", "fuzz.", "-", "~", "f٣"],
        ["frequency"] = ["9.41 GHz", "9410 MHz", "{fc:1.0065}", "{fc:1.02}", "{fc:1.1}", "{fc:1.3}", "{fc:1.5}", "{fc:1.7}", "{fc:1.95}", "{fc:2.2}",
            "12.9 GHz", "6.6 GHz", "5.8 GHz", "٩.٤١ GHz", "9,41 GHz", "1 MHz"],
        ["band"] = ["{band:0.02}", "{band:0.005}", "{band:0.08}", "{band:0.2}", "{band:0.0001}", "[6.56 GHz, 6.64 GHz]", "[9.30 GHz, 9.52 GHz]", "[1 GHz]"],
        ["coupling"] = ["none", "mutual", "mutual", "strong"],
        ["coupling_scale"] = ["1", "0.9", "0.25", "4", "0.2", "5", "-1"],
        ["coupling_phase"] = ["0 deg", "-25 deg", "-90 deg", "90 deg", "120 deg", "0.3 rad", "25"],
        ["guide.size"] = ["WR-90", "WR-75", "WR-62", "WR-112", "WR-137", "WR-42", "WR-187", "WR-9O"],
        ["guide.a"] = ["22.86 mm", "40 mm", "15.8 mm", "0.9 in", "10 mm", "60 mm", "5 mm"],
        ["guide.b"] = ["10.16 mm", "20 mm", "5 mm", "2 mm", "1 mm", "30 mm"],
        ["guide.wall"] = ["1.27 mm", "0.001 mm", "0 mm", "0.5 mm", "2 mm", "5 mm", "-1 mm"],
        ["guide.metal"] = ["aluminium", "copper", "brass", "6061", "unobtainium"],
        ["guide.conductivity"] = ["5.8e7 S/m", "1e6 S/m", "1e3 S/m"],
        ["guide.permittivity"] = ["1", "1.5", "2.2", "0.5"],
        ["guide.roughness"] = ["0 um", "1 um", "20 um"],
        ["slots.type"] = ["longitudinal", "longitudinal", "edge", "edge", "inclined-series"],
        ["slots.count"] = ["2", "3", "4", "5", "6", "7", "8", "9", "10", "12", "16", "1"],
        ["slots.width"] = ["1.6 mm", "0.01 mm", "0.1 mm", "0.5 mm", "1 mm", "3 mm", "5 mm", "8 mm", "9.9 mm", "10.2 mm", "11 mm", "0.06 in"],
        ["slots.cutter"] = ["{width}", "1 mm", "0.2 mm", "1.6 mm", "3 mm", "20 mm"],
        ["slots.model"] = ["stevenson", "moment-method", "moment-method"],
        ["slots.surround"] = ["tube", "flare", "ground-plane", "horn"],
        ["feed.type"] = ["standing-wave", "travelling-wave"],
        ["feed.spacing"] = ["0.5 guide-wavelength", "0.1 guide-wavelength", "0.07 guide-wavelength", "0.25 guide-wavelength", "0.3 guide-wavelength",
            "0.45 guide-wavelength", "0.7 guide-wavelength", "0.9 guide-wavelength", "0.99 guide-wavelength", "20 mm", "5 mm", "3 mm", "30 mm"],
        ["feed.position"] = ["end", "centre", "middle"],
        ["feed.load"] = ["5 %", "1 %", "30 %", "0.1 %", "90 %", "auto"],
        ["feed.beam"] = ["-4.5 deg", "-10 deg", "5 deg", "60 deg", "-85 deg"],
        ["feed.short"] = ["0.25 guide-wavelength", "0.75 guide-wavelength", "0.05 guide-wavelength", "0.5 guide-wavelength", "0.1 guide-wavelength", "3 mm"],
        ["taper.type"] = ["uniform", "chebyshev", "taylor", "villeneuve", "taylor-one-parameter", "cosine-pedestal", "bayliss", "given", "circular-taylor"],
        ["taper.sidelobes"] = ["-14 dB", "-15 dB", "-20 dB", "-26 dB", "-30 dB", "-40 dB", "-60 dB", "-61 dB", "-70 dB", "-13.3 dB"],
        ["taper.nbar"] = ["2", "3", "4", "5", "6", "8"],
        ["taper.edge"] = ["-20 dB", "-3 dB", "-40 dB"],
        ["taper.exponent"] = ["1", "2", "3"],
        ["taper.weights"] = ["{weights}", "{weights}", "{weights+1}", "[0, 0]"],
        ["tolerance.offset"] = ["0.02 mm", "{sigma: 0.02 mm}", "20 mm"],
        ["tolerance.length"] = ["0.03 mm", "0 mm"],
        ["tolerance.tilt"] = ["0.1 deg", "{sigma: 0.05 deg}", "9 deg", "0.1 mm"],
        ["tolerance.depth"] = ["0.02 mm", "{sigma: 0.01 mm}", "20 mm"],
        ["tolerance.position"] = ["0.03 mm", "{sigma: 0.01 mm}"],
        ["tolerance.width"] = ["0.02 mm"],
        ["tolerance.guide_width"] = ["0.05 mm"],
        ["tolerance.wall"] = ["0.05 mm", "{sigma: 0.05 mm}"],
        ["tolerance.systematic"] = ["{length: 0.01 mm}", "{offset: 0.01 mm}"],
        ["tolerance.trials"] = ["10", "0"],
        ["tolerance.seed"] = ["7", "-1"],
        ["requirements.sidelobes"] = ["-24 dB", "3 dB"],
        ["requirements.cross_polar"] = ["-25 dB"],
        ["requirements.vswr"] = ["1.5", "1.5:1", "0.9"],
        ["transmitter.peak_power"] = ["25 kW", "1 MW", "5 W"],
        ["transmitter.average_power"] = ["20 W", "30 kW"],
        ["transmitter.frequency_tolerance"] = ["30 MHz", "0 Hz", "-1 MHz"],
        ["environment.temperature"] = ["[-25 degC, 55 degC]", "[20 °C, 20 °C]", "[60 degC, 10 degC]", "[-25 K, 55 K]"],
        ["requirements.vertical_beamwidth"] = ["22 deg", "60 deg", "2 deg", "0 deg"],
        ["filter"] = ["auto", "{spacing: 12 mm, depth: 10 mm}", "{spacing: 20 mm, depth: auto}", "{depth: auto, thickness: 1 mm}", "{spacing: 1 mm, thickness: 2 mm}"],
        ["array"] = ["{type: linear}", "{type: planar, branches: 2}", "{type: planar, branches: 4, outline: circle}", "{type: planar, branches: 2, pitch: 20 mm}",
            "{type: planar, branches: 3, common_wall: 30 mm}", "{type: planar}", "{type: line}", "{branches: 2}"],
        ["taper_across"] = ["{type: taylor, sidelobes: -20 dB}", "{type: uniform}", "{type: circular-taylor, sidelobes: -30 dB}", "{type: given, weights: [1, 1]}"],
        ["feed.guide"] = ["{size: WR-90, wall: 1 mm}", "{a: 21.54 mm, b: 10.16 mm, wall: 1 mm}", "{a: 30 mm, b: 10 mm, wall: 1 mm}"],
        ["flare"] = ["auto", "{aperture: 100 mm, length: 150 mm}", "{aperture: 10 mm, length: 50 mm}", "{aperture: auto, phase_error: 45 deg}", "{length: 200 mm}"],
    };

    /// <summary>Every key the generator can write.</summary>
    public static IReadOnlyCollection<string> AllKeys => Values.Keys;

    /// <summary>The small bases: broad-wall standing-wave end-fed, edge-slot travelling-wave, centre-fed custom tube.</summary>
    private static readonly (string Key, string Value)[][] Bases =
    [
        [("spec", "1"), ("name", "fuzz-broad"), ("frequency", "9.41 GHz"), ("band", "{band:0.01}"), ("guide.size", "WR-90"), ("guide.wall", "1.27 mm"),
            ("guide.metal", "aluminium"), ("slots.type", "longitudinal"), ("slots.count", "8"), ("slots.width", "1.6 mm"), ("slots.cutter", "1.6 mm"),
            ("slots.model", "moment-method"), ("feed.type", "standing-wave"), ("feed.spacing", "0.5 guide-wavelength"), ("feed.position", "end"),
            ("feed.short", "0.25 guide-wavelength"), ("taper.type", "taylor"), ("taper.sidelobes", "-26 dB"), ("taper.nbar", "3"), ("coupling", "none")],
        [("spec", "1"), ("name", "fuzz-edge"), ("frequency", "9.41 GHz"), ("band", "[9.30 GHz, 9.50 GHz]"), ("guide.size", "WR-90"), ("guide.wall", "1.27 mm"),
            ("guide.metal", "aluminium"), ("slots.type", "edge"), ("slots.count", "10"), ("slots.width", "1.6 mm"), ("slots.cutter", "1.6 mm"),
            ("feed.type", "travelling-wave"), ("feed.spacing", "20.0 mm"), ("feed.load", "5 %"), ("taper.type", "taylor"), ("taper.sidelobes", "-25 dB"),
            ("taper.nbar", "3"), ("requirements.sidelobes", "-22 dB"), ("transmitter.peak_power", "25 kW")],
        [("spec", "1"), ("name", "fuzz-tube"), ("frequency", "5.8 GHz"), ("band", "[5.725 GHz, 5.875 GHz]"), ("guide.a", "40 mm"), ("guide.b", "20 mm"),
            ("guide.wall", "2 mm"), ("guide.metal", "6061"), ("slots.type", "longitudinal"), ("slots.count", "6"), ("slots.width", "3 mm"),
            ("slots.cutter", "3 mm"), ("feed.type", "standing-wave"), ("feed.position", "centre"), ("taper.type", "chebyshev"), ("taper.sidelobes", "-25 dB"),
            ("tolerance.offset", "0.02 mm"), ("tolerance.trials", "10"), ("requirements.vswr", "1.8")],
    ];

    private readonly Dictionary<string, string> _keys = new(StringComparer.Ordinal);
    private readonly List<string> _order = [];

    private void Set(string key, string value)
    {
        if (!_keys.ContainsKey(key)) _order.Add(key);
        _keys[key] = value;
    }

    private void Remove(string key)
    {
        _keys.Remove(key);
        _order.Remove(key);
    }

    /// <summary>A base with one to four mutations; every key written or removed is added to <paramref name="touched"/>.</summary>
    public static FuzzSpec Generate(Random rng, ISet<string> touched)
    {
        var spec = new FuzzSpec();
        foreach (var (k, v) in Bases[rng.Next(Bases.Length)]) spec.Set(k, v);
        int mutations = 1 + rng.Next(4);
        var keys = Values.Keys.ToArray();
        for (int m = 0; m < mutations; m++)
        {
            string key = keys[rng.Next(keys.Length)];
            touched.Add(key);
            if (rng.Next(10) == 0) spec.Remove(key);
            else
            {
                var candidates = Values[key];
                spec.Set(key, candidates[rng.Next(candidates.Length)]);
            }
        }
        return spec;
    }

    /// <summary>The YAML text, placeholders resolved.</summary>
    public string Render()
    {
        var sb = new StringBuilder();
        foreach (string section in Order)
        {
            var keys = _order.Where(k => SectionOf(k) == section).ToList();
            if (keys.Count == 0) continue;
            if (section.Length > 0 && section != "coupling") sb.Append(section).Append(":\n");
            foreach (string k in keys)
            {
                string name = section.Length > 0 && section != "coupling" ? "  " + k[(section.Length + 1)..] : k;
                sb.Append(name).Append(": ").Append(Resolve(_keys[k])).Append('\n');
            }
        }
        return sb.ToString();
    }

    private static string SectionOf(string key) => key.Contains('.', StringComparison.Ordinal) ? key[..key.IndexOf('.', StringComparison.Ordinal)] : key == "coupling" ? "coupling" : "";

    private string Resolve(string value)
    {
        if (!value.StartsWith('{') || value.StartsWith("{sigma", StringComparison.Ordinal) || value.StartsWith("{length", StringComparison.Ordinal)
            || value.StartsWith("{offset", StringComparison.Ordinal))
            return value;
        string body = value[1..^1];
        string[] parts = body.Split(':');
        switch (parts[0])
        {
            case "fc":
                return Ghz(CutoffHz() * double.Parse(parts[1], Inv));
            case "band":
                double f = FrequencyHz(), x = double.Parse(parts[1], Inv);
                return $"[{Ghz(f * (1 - x))}, {Ghz(f * (1 + x))}]";
            case "width":
                return _keys.TryGetValue("slots.width", out string? w) ? w : "1.6 mm";
            case "weights":
            case "weights+1":
                int n = (int.TryParse(_keys.GetValueOrDefault("slots.count", "8"), Inv, out int c) ? c : 8) + (parts[0] == "weights+1" ? 1 : 0);
                return "[" + string.Join(", ", Enumerable.Range(0, Math.Clamp(n, 1, 64)).Select(i => (0.4 + 0.6 * Math.Sin(Math.PI * (i + 0.5) / n)).ToString("0.###", Inv))) + "]";
            default:
                return value;
        }
    }

    /// <summary>TE10 cutoff c/(2a√εr) of the guide as written (a, else the catalogue size, else WR-90), Hz.</summary>
    private double CutoffHz()
    {
        double a = 22.86e-3;
        if (_keys.TryGetValue("guide.a", out string? at) && QuantityParser.TryParse(Resolve(at), QuantityKind.Length, out double av, out _) && av > 0) a = av;
        else if (_keys.TryGetValue("guide.size", out string? size) && WaveguideCatalogue.Find(size) is { } g) a = g.BroadWall.Meters;
        double er = _keys.TryGetValue("guide.permittivity", out string? e) && double.TryParse(e, NumberStyles.Float, Inv, out double ev) && ev >= 1 ? ev : 1;
        return 299_792_458.0 / (2 * a * Math.Sqrt(er));
    }

    /// <summary>The design frequency as written (9.41 GHz when it cannot be read), Hz.</summary>
    private double FrequencyHz()
    {
        string text = Resolve(_keys.GetValueOrDefault("frequency", "9.41 GHz"));
        return QuantityParser.TryParse(text, QuantityKind.Frequency, out double f, out _) && f > 0 ? f : 9.41e9;
    }

    private static string Ghz(double hz) => (hz / 1e9).ToString("0.######", Inv) + " GHz";
}
