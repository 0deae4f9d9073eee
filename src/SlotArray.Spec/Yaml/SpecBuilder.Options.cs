using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Spec.Schema;

namespace SlotArray.Spec.Yaml;

internal sealed partial class SpecBuilder
{
    private static IReadOnlyList<string> ToleranceKeys => SpecKeys.ToleranceBlock.Names;
    private static IReadOnlyList<string> SystematicKeys => SpecKeys.Systematic.Names;
    private static IReadOnlyList<string> SigmaKeys => SpecKeys.Sigma.Names;
    private static IReadOnlyList<string> SigmaAngleKeys => SpecKeys.SigmaAngle.Names;
    private static IReadOnlyList<string> RequirementKeys => SpecKeys.Requirements.Names;
    private static IReadOnlyList<string> TransmitterKeys => SpecKeys.Transmitter.Names;
    private static IReadOnlyList<string> FabricationKeys => SpecKeys.Fabrication.Names;

    /// <summary>Default Monte Carlo trials and seed when a tolerance block omits them.</summary>
    internal const int DefaultTrials = 1000, DefaultSeed = 1;
    /// <summary>Largest machining tolerance accepted (10 mm): beyond, a unit is surely wrong.</summary>
    private const double MaxTolerance = 0.01;
    /// <summary>Largest tilt tolerance accepted (5°, a sixth of the edge slot's largest tilt): beyond, a unit is surely wrong.</summary>
    private const double MaxTiltTolerance = 5 * Math.PI / 180;

    /// <summary>
    /// Tolerance block (optional): each error `0.02 mm` (uniform ±) or `{sigma: 0.02 mm}` (normal), absent = none; the
    /// tilt an angle (`0.1 deg`). The errors must be the slots' own: an offset for broad-wall slots, a tilt and a depth of
    /// cut for edge slots. A key for the other kind is refused rather than ignored: an engineer who writes it expects it
    /// in the Monte Carlo, and a yield computed without it would be read as covering it.
    /// </summary>
    private ToleranceRequest? Tolerance(Section root, SlotType? slotType, out bool ok)
    {
        ok = true;
        if (!root.Has("tolerance")) return null;
        var s = Sub(root, "tolerance", ToleranceKeys, false);
        if (s is null) { ok = false; return null; }
        bool kindOk = true;
        if (slotType == SlotType.Edge)
        {
            kindOk &= Require(s, "offset", !s.Has("offset"),
                "edge slots have no offset: their machining errors are the tilt and the depth of cut; write e.g. 'tilt: 0.1 deg' and 'depth: 0.02 mm' instead of 'offset'");
        }
        else if (slotType is not null)
        {
            foreach (string key in new[] { "tilt", "depth" })
                kindOk &= Require(s, key, !s.Has(key),
                    $"'{key}' applies to edge slots only; broad-wall slots' machining errors are offset, length, position and width: remove '{key}' (or give 'offset')");
        }
        var offset = OneTolerance(s, "offset");
        var tilt = TiltTolerance(s);
        var depth = OneTolerance(s, "depth");
        var length = OneTolerance(s, "length");
        var position = OneTolerance(s, "position");
        var width = OneTolerance(s, "width");
        var guideWidth = OneTolerance(s, "guide_width");
        var wall = OneTolerance(s, "wall");
        double? sysLength = 0, sysOffset = 0;
        if (s.Has("systematic"))
        {
            var sys = Sub(s, "systematic", SystematicKeys, false);
            if (sys is null) sysLength = null;
            else
            {
                sysLength = sys.Has("length") ? Quantity(sys, "length", QuantityKind.Length, false, "0.01 mm") : 0;
                sysOffset = sys.Has("offset") ? Quantity(sys, "offset", QuantityKind.Length, false, "0.01 mm") : 0;
                if (slotType == SlotType.Edge && !Require(sys, "offset", !sys.Has("offset"),
                        "edge slots have no offset: remove 'systematic.offset' (a systematic error of edge slots is a length: 'systematic: {length: …}')"))
                    sysOffset = null;
                if (sysLength is not null && !Require(sys, "length", Math.Abs(sysLength.Value) <= MaxTolerance, $"'length' must be within ±10 mm, got {Mm(sysLength.Value)}")) sysLength = null;
                if (sysOffset is not null && !Require(sys, "offset", Math.Abs(sysOffset.Value) <= MaxTolerance, $"'offset' must be within ±10 mm, got {Mm(sysOffset.Value)}")) sysOffset = null;
            }
        }
        int? trials = s.Has("trials") ? Integer(s, "trials", false, SpecKeys.MinTrials, SpecKeys.MaxTrials, "2000") : DefaultTrials;
        int? seed = s.Has("seed") ? Integer(s, "seed", false, 0, int.MaxValue, "7") : DefaultSeed;
        if (offset is null || length is null || position is null || width is null || guideWidth is null || wall is null
            || tilt is null || depth is null || !kindOk || sysLength is null || sysOffset is null || trials is null || seed is null)
        {
            ok = false;
            return null;
        }
        return new ToleranceRequest(offset, length, position, width, guideWidth, wall,
            Length.FromMeters(sysLength.Value), Length.FromMeters(sysOffset.Value), trials.Value, seed.Value) { Tilt = tilt, Depth = depth };
    }

    /// <summary>The tilt error: `0.1 deg` (uniform ±) or `{sigma: 0.05 deg}` (normal), absent = none.</summary>
    private AngleTolerance? TiltTolerance(Section s)
    {
        if (!s.Has("tilt")) return AngleTolerance.None;
        var e = Error(s, "tilt", QuantityKind.Angle, SigmaAngleKeys, MaxTiltTolerance, "0.1 deg", v => $"between 0 and 5 deg, got {Num(v * 180 / Math.PI)} deg");
        return e is { } x ? new AngleTolerance(Angle.FromRadians(x.Value), x.Law) : null;
    }

    private MachiningTolerance? OneTolerance(Section s, string key)
    {
        if (!s.Has(key)) return MachiningTolerance.None;
        var e = Error(s, key, QuantityKind.Length, SigmaKeys, MaxTolerance, "0.02 mm", v => $"between 0 and 10 mm, got {Mm(v)}");
        return e is { } x ? new MachiningTolerance(Length.FromMeters(x.Value), x.Law) : null;
    }

    /// <summary>One machining error, SI: a quantity (uniform ±) or `{sigma: …}` (normal), 0 to <paramref name="max"/>; null after an error.</summary>
    private (double Value, ErrorDistribution Law)? Error(Section s, string key, QuantityKind kind, IReadOnlyList<string> sigmaKeys, double max,
        string example, Func<double, string> range)
    {
        var node = s[key]!;
        Current = node;
        double? v;
        ErrorDistribution law;
        Section? sigma = null;
        if (node is MappingNode)
        {
            sigma = Sub(s, key, sigmaKeys, false);
            if (sigma is null) return null;
            v = Quantity(sigma, "sigma", kind, true, example);
            law = ErrorDistribution.Normal;
        }
        else
        {
            v = Quantity(s, key, kind, false, example);
            law = ErrorDistribution.Uniform;
        }
        if (v is null) return null;
        if (!(v >= 0 && v <= max))
        {
            D.Error((SpecNode?)sigma?["sigma"] ?? node, $"'{key}' tolerance must be {range(v.Value)}");
            return null;
        }
        return (v.Value, law);
    }

    /// <summary>Requirements (optional): sidelobes and cross_polar in dB (negative), vswr &gt; 1 (a number, or '1.5:1').</summary>
    private Requirements? Requirements(Section root)
    {
        if (!root.Has("requirements")) return Core.Design.Requirements.None;
        var s = Sub(root, "requirements", RequirementKeys, false);
        if (s is null) return null;
        bool ok = true;
        double? sll = null, xpol = null, vswr = null;
        if (s.Has("sidelobes"))
        {
            sll = Quantity(s, "sidelobes", QuantityKind.Decibels, false, "-26 dB");
            ok &= sll is not null && Require(s, "sidelobes", sll < 0 && sll >= -100, $"'sidelobes' must be a negative level down to -100 dB, got {Num(sll.Value)} dB");
        }
        if (s.Has("cross_polar"))
        {
            xpol = Quantity(s, "cross_polar", QuantityKind.Decibels, false, "-25 dB");
            ok &= xpol is not null && Require(s, "cross_polar", xpol < 0 && xpol >= -100, $"'cross_polar' must be a negative level down to -100 dB, got {Num(xpol.Value)} dB");
        }
        if (s.Has("vswr"))
        {
            var sc = Scalar(s, "vswr", false, "1.5");
            string text = sc?.Value.Trim() ?? "";
            if (text.EndsWith(":1", StringComparison.Ordinal)) text = text[..^2];
            if (sc is not null && QuantityParser.TryParseNumber(text, out double v, out _) && v > 1 && v <= 100) vswr = v;
            else
            {
                if (sc is not null) D.Error(sc, $"'vswr' must be a number above 1 such as '1.5' (or '1.5:1'), got '{sc.Value.Trim()}'");
                ok = false;
            }
        }
        Angle? vertical = null;
        if (s.Has("vertical_beamwidth"))
        {
            var v = Quantity(s, "vertical_beamwidth", QuantityKind.Angle, false, "22 deg");
            if (v is not null && Require(s, "vertical_beamwidth", v > 0 && v < Math.PI, $"'vertical_beamwidth' must lie between 0 deg and 180 deg, got {Num(v.Value * 180 / Math.PI)} deg"))
                vertical = Angle.FromRadians(v.Value);
            else ok = false;
        }
        return ok ? new Requirements(sll, xpol, vswr) { VerticalBeamwidth = vertical } : null;
    }

    /// <summary>Transmitter (optional): peak_power and average_power (W, kW, MW), positive, average ≤ peak.</summary>
    private TransmitterRequest? Transmitter(Section root, out bool ok)
    {
        ok = true;
        if (!root.Has("transmitter")) return null;
        var s = Sub(root, "transmitter", TransmitterKeys, false);
        if (s is null) { ok = false; return null; }
        double? peak = null, average = null;
        if (s.Has("peak_power"))
        {
            peak = Quantity(s, "peak_power", QuantityKind.Power, false, "25 kW");
            ok &= peak is not null && Require(s, "peak_power", peak > 0 && peak <= 1e9, $"'peak_power' must be positive and at most 1000 MW, got {Num(peak.Value)} W");
        }
        if (s.Has("average_power"))
        {
            average = Quantity(s, "average_power", QuantityKind.Power, false, "20 W");
            ok &= average is not null && Require(s, "average_power", average > 0 && average <= 1e9, $"'average_power' must be positive and at most 1000 MW, got {Num(average.Value)} W");
        }
        if (ok && peak is not null && average is not null)
            ok &= Require(s, "average_power", average <= peak, $"'average_power' {Num(average.Value)} W cannot exceed 'peak_power' {Num(peak.Value)} W");
        if (s.Has("frequency_tolerance"))
        {
            var tol = Quantity(s, "frequency_tolerance", QuantityKind.Frequency, false, "30 MHz");
            if (tol is not null && Require(s, "frequency_tolerance", tol >= 0 && tol < 1e12, $"'frequency_tolerance' must be 0 Hz or more, got {Num(tol.Value)} Hz"))
                _frequencyTolerance = Frequency.FromHertz(tol.Value);
            else ok = false;
        }
        return ok ? new TransmitterRequest(peak, average) : null;
    }

    /// <summary>Fabrication (optional): prototype_margin, a percentage within ±5 % (0 when absent).</summary>
    private double Fabrication(Section root, out bool ok)
    {
        ok = true;
        if (!root.Has("fabrication")) return 0;
        var s = Sub(root, "fabrication", FabricationKeys, false);
        if (s is null) { ok = false; return 0; }
        if (!s.Has("prototype_margin")) return 0;
        double? m = Quantity(s, "prototype_margin", QuantityKind.Percent, false, "-0.5 %");
        ok &= m is not null && Require(s, "prototype_margin", Math.Abs(m.Value) <= Core.Fabrication.PrototypeMargin.Limit,
            $"'prototype_margin' must lie within ±5 % (a first plate is usually cut about 0.5 % short: -0.5 %), got {Num(m.Value * 100)} %");
        return ok ? m!.Value : 0;
    }
}
