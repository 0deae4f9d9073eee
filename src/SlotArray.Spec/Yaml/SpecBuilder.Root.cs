using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Spec.Schema;

namespace SlotArray.Spec.Yaml;

internal sealed partial class SpecBuilder
{
    private static readonly IReadOnlyList<string> RootKeys = SpecKeys.Root.Names;

    /// <summary>Section (or sections) of each key that is not a top-level key, for the hint on a key written at the top level.</summary>
    /// <remarks>Built on first use: static initialisers in different parts of a partial class run in no defined order.</remarks>
    private static Dictionary<string, string> Homes => s_homes ??= SpecKeys.Root.Keys
        .Where(k => k.Value is BlockValue)
        .SelectMany(k => ((BlockValue)k.Value).Section.Names.Select(n => (Key: n, Section: k.Name)))
        .GroupBy(p => p.Key).Where(g => !RootKeys.Contains(g.Key))
        .ToDictionary(g => g.Key, g => string.Join("' or '", g.Select(p => p.Section)), StringComparer.Ordinal);

    private static Dictionary<string, string>? s_homes;

    /// <summary>Default analysis band when none is given: the design frequency ± this fraction (2 %).</summary>
    internal const double DefaultBandFraction = 0.02;

    /// <summary>Lowest and highest design frequency accepted (1 MHz to 1 THz): outside, a unit is surely wrong.</summary>
    private const double MinFrequency = 1e6, MaxFrequency = 1e12;

    /// <summary>Reads the whole document; null when any error was recorded.</summary>
    public ArrayRequest? Build(SpecNode? root)
    {
        if (root is null)
        {
            D.Error(1, 1, "the spec is empty; start with 'spec: 1', 'name:', 'frequency:', 'guide:', 'slots:' and 'feed:' (see arrays/ for examples)");
            return null;
        }
        if (root is not MappingNode map)
        {
            D.Error(root, "the spec must be a block of 'key: value' lines starting with 'spec: 1'");
            return null;
        }
        var s = new Section(D, map, "", map, RootKeys, Homes);

        int? version = Integer(s, "spec", true, int.MinValue, int.MaxValue, "1");
        if (version is not null and not 1) D.Error(s["spec"]!, $"spec version {version} is not known to this program; write 'spec: 1'");
        string? name = Name(s);
        Frequency? f = DesignFrequency(s);
        (Frequency Low, Frequency High)? band = Band(s, f);
        var guide = Guide(s, f, band);
        Length? lambdaG = guide is not null && f is { } ff && ff > guide.CutoffTe10 ? guide.GuideWavelength(ff) : null;
        var slots = Slots(s, guide, f);
        var feed = Feed(s, lambdaG, slots, guide, f);
        var taper = Taper(s, slots?.Count);
        CouplingMode? coupling = s.Has("coupling") ? Choice(s, "coupling", SpecNames.CouplingModes, false) : CouplingMode.None;
        if (coupling == CouplingMode.Mutual && slots?.Type == SlotType.Edge && !Require(s, "coupling", false,
                "'coupling: mutual' is designed for broad-wall (longitudinal) slots only; edge slots have no coupled designer yet: write 'coupling: none'"))
            coupling = null;
        var couplingScale = CouplingScale(s, out bool couplingScaleOk);
        var tolerance = Tolerance(s, slots?.Type, out bool toleranceOk);
        var requirements = Requirements(s);
        var transmitter = Transmitter(s, out bool transmitterOk);
        double margin = Fabrication(s, out bool fabricationOk);
        var filter = Filter(s, slots, out bool filterOk);
        var flare = Flare(s, slots, out bool flareOk);
        // Edge slots in front of a flare radiate into it: their calibration follows unless slots.surround says otherwise.
        if (flare is not null && slots is not null && !surroundGiven)
            slots = slots with { Surround = EdgeSlotSurround.Flare };
        var operating = Operating(s, out bool operatingOk);
        fabricationOk &= filterOk && flareOk && operatingOk;
        var planar = Planar(s, slots, feed, guide, out bool planarOk);
        fabricationOk &= planarOk;

        if (D.ErrorCount > 0 || name is null || f is null || band is null || guide is null || slots is null || feed is null
            || taper is null || coupling is null || !couplingScaleOk || !toleranceOk || requirements is null || !transmitterOk || !fabricationOk)
            return null;
        return new ArrayRequest(name, f.Value, band.Value.Low, band.Value.High, guide, slots, feed, taper, coupling.Value,
            tolerance, requirements, transmitter) { PrototypeMargin = margin, Filter = filter, Flare = flare, Operating = operating, Planar = planar, MutualCouplingScale = couplingScale };
    }

    /// <summary><c>coupling_scale</c> and <c>coupling_phase</c>: the complex factor on the exterior mutual impedances (1 when absent).</summary>
    private System.Numerics.Complex CouplingScale(Section s, out bool ok)
    {
        ok = true;
        double? scale = s.Has("coupling_scale") ? Number(s, "coupling_scale", false, "0.9") : 1;
        if (scale is not null && !Require(s, "coupling_scale", scale >= SpecKeys.MinCouplingScale && scale <= SpecKeys.MaxCouplingScale,
                $"'coupling_scale' must be between {Num(SpecKeys.MinCouplingScale)} and {Num(SpecKeys.MaxCouplingScale)}, got {Num(scale.Value)}: it calibrates the mutual coupling model, it does not replace it"))
            scale = null;
        double? phase = s.Has("coupling_phase") ? Quantity(s, "coupling_phase", QuantityKind.Angle, false, "-25 deg") : 0;
        if (phase is not null && !Require(s, "coupling_phase", Math.Abs(phase.Value) <= Math.PI / 2 + 1e-12,
                $"'coupling_phase' must be between -90 deg and +90 deg, got {Num(phase.Value * 180 / Math.PI)} deg"))
            phase = null;
        if (scale is null || phase is null)
        {
            ok = false;
            return System.Numerics.Complex.One;
        }
        return System.Numerics.Complex.FromPolarCoordinates(scale.Value, phase.Value);
    }

    private string? Name(Section s)
    {
        string? name = Text(s, "name", true, "harbour-sensor-16")?.Trim();
        if (name is null) return null;
        char[] bad = ['/', '\\', ':', '*', '?', '"', '<', '>', '|'];
        if (name.Length > 0 && name.Trim('.').Length == 0)
        {
            // "." and ".." name the current and parent folders: the default output folder out/<name> would be out/ or the working folder.
            D.Error(s["name"]!, $"'name' cannot be '{name}': it is used as a folder name (out/<name>); write a word such as 'harbour-sensor-16'");
            return null;
        }
        if (name.Length == 0 || name.Length > 100 || name.Any(c => char.IsControl(c) || bad.Contains(c)))
        {
            D.Error(s["name"]!, "'name' is used in file names: write 1 to 100 letters, digits, spaces, '-', '_' or '.', e.g. 'harbour-sensor-16'");
            return null;
        }
        return name;
    }

    private Frequency? DesignFrequency(Section s)
    {
        double? hz = Quantity(s, "frequency", QuantityKind.Frequency, true, "9.41 GHz");
        if (hz is null) return null;
        if (!Require(s, "frequency", hz >= MinFrequency && hz <= MaxFrequency,
                $"'frequency' must be between 1 MHz and 1000 GHz, got {Ghz(hz.Value)}; check the unit"))
            return null;
        return Frequency.FromHertz(hz.Value);
    }

    /// <summary>The analysis band [low, high]; default: the design frequency ± 2 % (with a warning).</summary>
    private (Frequency, Frequency)? Band(Section s, Frequency? f)
    {
        var node = s["band"];
        if (node is null)
        {
            if (f is not { } ff) return null;
            var lo = Frequency.FromHertz(ff.Hertz * (1 - DefaultBandFraction));
            var hi = Frequency.FromHertz(ff.Hertz * (1 + DefaultBandFraction));
            D.Warn(s.Anchor, $"no 'band' given: analysing {Ghz(lo)} to {Ghz(hi)} (the design frequency ± 2 %); write e.g. 'band: [{Ghz(lo)}, {Ghz(hi)}]'");
            return (lo, hi);
        }
        Current = node;
        if (node is not SequenceNode { Items.Count: 2 } seq || seq.Items.Any(i => i is not ScalarNode))
        {
            D.Error(node, "'band' needs two frequencies, low and high, such as '[9.30 GHz, 9.52 GHz]'");
            return null;
        }
        double? low = QuantityOf((ScalarNode)seq.Items[0], "band", QuantityKind.Frequency);
        double? high = QuantityOf((ScalarNode)seq.Items[1], "band", QuantityKind.Frequency);
        if (low is null || high is null) return null;
        if (!(low > 0 && low < high))
        {
            D.Error(node, $"'band' must be [low, high] with 0 < low < high, got [{Ghz(low.Value)}, {Ghz(high.Value)}]");
            return null;
        }
        if (f is { } fd && (fd.Hertz < low || fd.Hertz > high))
        {
            D.Error(node, $"'band' [{Ghz(low.Value)}, {Ghz(high.Value)}] does not contain the design frequency {Ghz(fd)}; widen the band or move 'frequency'");
            return null;
        }
        return (Frequency.FromHertz(low.Value), Frequency.FromHertz(high.Value));
    }
}
