using SlotArray.Core.Design;
using SlotArray.Core.Marine;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Spec.Schema;

namespace SlotArray.Spec.Yaml;

/// <summary>The marine-antenna blocks: the polarisation filter in front of the slots.</summary>
internal sealed partial class SpecBuilder
{
    private static IReadOnlyList<string> FilterKeys => SpecKeys.Filter.Names;

    /// <summary>
    /// An optional length of a filter or flare block: null when absent or <c>auto</c>; otherwise above 0 and up to
    /// <paramref name="maxMeters"/>, with <paramref name="good"/> cleared on an error (reported at the key).
    /// </summary>
    private Length? LengthOrAuto(Section s, string key, string example, double maxMeters, ref bool good)
    {
        if (!s.Has(key) || IsAuto(s[key])) return null;
        var v = Quantity(s, key, QuantityKind.Length, false, example);
        if (v is null) { good = false; return null; }
        good &= Require(s, key, v > 0 && v <= maxMeters,
            $"'{key}' must be a length above 0 and up to {Num(maxMeters)} m, got {Num(v.Value * 1e3)} mm");
        return Length.FromMeters(v.Value);
    }

    /// <summary>Whether a key's scalar is the word <c>auto</c>.</summary>
    private static bool IsAuto(SpecNode? node) => node is ScalarNode { IsNull: false } sc && sc.Value.Trim().Equals("auto", StringComparison.OrdinalIgnoreCase);

    /// <summary>
    /// <c>filter</c> (optional): <c>auto</c>, or a block of spacing and depth (each a length or <c>auto</c>, default auto)
    /// and thickness (default 0.5 mm). Edge slots only (the other slots radiate no cross-polarised field in this model).
    /// </summary>
    private FilterRequest? Filter(Section root, SlotRequest? slots, out bool ok)
    {
        ok = true;
        if (!root.Has("filter")) return null;
        if (slots is not null && slots.Type != SlotType.Edge)
        {
            ok = Require(root, "filter", false, "'filter' is a polarisation filter for edge slots (their tilted fields radiate the cross-polarised lobes); remove it for broad-wall slots");
            return null;
        }
        if (IsAuto(root["filter"])) return FilterRequest.Auto;
        var s = Sub(root, "filter", FilterKeys, false);
        if (s is null) { ok = false; return null; }
        bool good = true;
        Length? Dimension(string key, string example) => LengthOrAuto(s, key, example, 1, ref good);
        var spacing = Dimension("spacing", "12 mm");
        var depth = Dimension("depth", "15 mm");
        ok = good;
        Length? thickness = null;
        if (s.Has("thickness"))
        {
            var t = Quantity(s, "thickness", QuantityKind.Length, false, "0.5 mm");
            if (t is null) ok = false;
            else if (Require(s, "thickness", t >= 0 && (spacing is null || t < spacing.Value.Meters),
                $"'thickness' must be 0 or more and below the spacing, got {Num(t.Value * 1e3)} mm")) thickness = Length.FromMeters(t.Value);
            else ok = false;
        }
        return ok ? new FilterRequest(spacing, depth, thickness) : null;
    }

    private static IReadOnlyList<string> FlareKeys => SpecKeys.Flare.Names;

    /// <summary>
    /// <c>flare</c> (optional): <c>auto</c>, or a block of length and aperture (each a length or <c>auto</c>, default
    /// auto) and phase_error (default 90 deg). Edge slots only (the flare is modelled as an H-plane horn, E along the guide).
    /// </summary>
    private FlareRequest? Flare(Section root, SlotRequest? slots, out bool ok)
    {
        ok = true;
        if (!root.Has("flare")) return null;
        if (slots is not null && slots.Type != SlotType.Edge)
        {
            ok = Require(root, "flare", false, "'flare' is modelled for edge slots (E along the guide, parallel to the plates); remove it for broad-wall slots");
            return null;
        }
        if (IsAuto(root["flare"])) return FlareRequest.Auto;
        var s = Sub(root, "flare", FlareKeys, false);
        if (s is null) { ok = false; return null; }
        bool good = true;
        Length? Dimension(string key, string example) => LengthOrAuto(s, key, example, 10, ref good);
        var length = Dimension("length", "150 mm");
        var aperture = Dimension("aperture", "100 mm");
        var phase = FlareDesign.DefaultPhaseError;
        if (s.Has("phase_error"))
        {
            var p = Quantity(s, "phase_error", QuantityKind.Angle, false, "90 deg");
            if (p is not null && Require(s, "phase_error", p > 0 && p <= 2 * Math.PI, $"'phase_error' must lie above 0 deg and up to 360 deg, got {Num(p.Value * 180 / Math.PI)} deg"))
                phase = Angle.FromRadians(p.Value);
            else good = false;
        }
        ok = good;
        return ok ? new FlareRequest(length, aperture, phase) : null;
    }

    private static IReadOnlyList<string> EnvironmentKeys => SpecKeys.Environment.Names;

    /// <summary><c>transmitter.frequency_tolerance</c> as read by the transmitter block; null when not given.</summary>
    private Frequency? _frequencyTolerance;

    /// <summary>
    /// The pointing budget's operating range: <c>environment.temperature: [low, high]</c> (°C, −100 to 200, low ≤ high) and
    /// <c>transmitter.frequency_tolerance</c> (read with the transmitter); null when neither is given.
    /// </summary>
    private OperatingRange? Operating(Section root, out bool ok)
    {
        ok = true;
        double low = Core.Fabrication.ThermalExpansion.ReferenceTemperatureCelsius, high = low;
        bool hasRange = false;
        if (root.Has("environment"))
        {
            var s = Sub(root, "environment", EnvironmentKeys, false);
            if (s is null) { ok = false; return null; }
            var node = s["temperature"];
            if (node is not null)
            {
                Current = node;
                if (node is not SequenceNode { Items.Count: 2 } seq || seq.Items.Any(i => i is not ScalarNode))
                {
                    D.Error(node, "'temperature' needs two temperatures, low and high, such as '[-25 degC, 55 degC]'");
                    ok = false;
                    return null;
                }
                double? lo = QuantityOf((ScalarNode)seq.Items[0], "temperature", QuantityKind.Temperature);
                double? hi = QuantityOf((ScalarNode)seq.Items[1], "temperature", QuantityKind.Temperature);
                if (lo is null || hi is null) { ok = false; return null; }
                if (!(lo >= -100 && hi <= 200 && lo <= hi))
                {
                    D.Error(node, $"'temperature' must be [low, high] with -100 degC ≤ low ≤ high ≤ 200 degC, got [{Num(lo.Value)} degC, {Num(hi.Value)} degC]");
                    ok = false;
                    return null;
                }
                (low, high, hasRange) = (lo.Value, hi.Value, true);
            }
        }
        if (!hasRange && _frequencyTolerance is null) return null;
        return new OperatingRange(low, high, _frequencyTolerance ?? Frequency.FromHertz(0));
    }
}
