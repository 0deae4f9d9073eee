using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;
using SlotArray.Spec.Schema;

namespace SlotArray.Spec.Yaml;

internal sealed partial class SpecBuilder
{
    private static IReadOnlyList<string> SlotKeys => SpecKeys.Slots.Names;
    private static IReadOnlyList<string> FeedKeys => SpecKeys.Feed.Names;
    private static IReadOnlyList<string> TaperKeys => SpecKeys.Taper.Names;

    /// <summary>Largest slot count accepted.</summary>
    private const int MaxSlots = SpecKeys.MaxSlots;
    /// <summary>Default n̄ for Taylor, Villeneuve and Bayliss tapers.</summary>
    internal const int DefaultNbar = 4;
    /// <summary>Default travelling-wave load fraction, 5 % (common practice, no source).</summary>
    internal const double DefaultLoadFraction = 0.05;
    /// <summary>First sidelobe of a uniform line source, −13.26 dB (peak of |sin x / x| at x ≈ 4.4934; Balanis, Antenna Theory, from memory).</summary>
    private const double UniformSidelobeDb = -13.26;

    /// <summary>Slots: required type, count (≥ 2), width (&lt; a/2); optional cutter (≤ width) and model (default moment-method).</summary>
    private SlotRequest? Slots(Section root, RectangularWaveguide? guide)
    {
        var s = Sub(root, "slots", SlotKeys, true);
        if (s is null) return null;
        SlotType? type = Choice(s, "type", SpecNames.SlotTypes, true);
        int? count = Integer(s, "count", true, int.MinValue, int.MaxValue, "16");
        if (count is not null && !Require(s, "count", count >= SpecKeys.MinSlots && count <= MaxSlots,
                $"'count' must be at least 2 (an array) and at most {MaxSlots}, got {count}")) count = null;
        double? width = Quantity(s, "width", QuantityKind.Length, true, "1.6 mm");
        if (width is not null && !Require(s, "width", width > 0, $"'width' must be a positive length, got {Mm(width.Value)}")) width = null;
        if (width is not null && guide is not null && !Require(s, "width", width < guide.BroadWall.Meters / 2,
                $"'width' {Mm(width.Value)} must be less than half the broad wall a/2 = {Mm(guide.BroadWall.Meters / 2)}")) width = null;
        double? cutter = s.Has("cutter") ? Quantity(s, "cutter", QuantityKind.Length, false, "1.6 mm") : null;
        bool cutterOk = !s.Has("cutter") || cutter is not null;
        if (cutter is not null && !Require(s, "cutter", cutter > 0 && (width is null || cutter <= width * (1 + 1e-9)),
                $"'cutter' (end-mill diameter) must be positive and no larger than the slot width{(width is null ? "" : $" {Mm(width.Value)}")}, got {Mm(cutter.Value)}"))
            cutterOk = false;
        SlotModelKind? model = s.Has("model") ? Choice(s, "model", SpecNames.SlotModels, false) : SlotModelKind.MomentMethod;
        var (data, extrapolate, dataOk) = SlotData(s, type, guide);
        if (type is null || count is null || width is null || !cutterOk || model is null || !dataOk) return null;
        return new SlotRequest(type.Value, count.Value, Length.FromMeters(width.Value), cutter is null ? null : Length.FromMeters(cutter.Value), model.Value)
        {
            Data = data,
            Extrapolate = extrapolate,
        };
    }

    /// <summary>
    /// Feed: required type. Standing-wave: spacing default 0.5 guide-wavelength, position end|centre (default end),
    /// short default 0.25 guide-wavelength, no load. Travelling-wave: spacing required, load default 5 %, no short or position.
    /// </summary>
    private FeedRequest? Feed(Section root, Length? lambdaG)
    {
        var s = Sub(root, "feed", FeedKeys, true);
        if (s is null) return null;
        FeedType? type = Choice(s, "type", SpecNames.FeedTypes, true);
        bool ok = type is not null;
        bool standing = type == FeedType.StandingWave, travelling = type == FeedType.TravellingWave;

        GuideDistance? spacing = null;
        if (s.Has("spacing")) spacing = Distance(s, "spacing", lambdaG, "0.5 guide-wavelength");
        else if (travelling) Missing(s, "spacing", "'spacing: 0.7 guide-wavelength' (a travelling-wave array needs a spacing other than 0.5 guide-wavelength)");
        else spacing = GuideDistance.InGuideWavelengths(0.5);
        ok &= spacing is not null;
        if (spacing is not null && lambdaG is { } lg && type is not null)
        {
            double n = spacing.Resolve(lg) / lg;
            if (standing && Math.Abs(n - 0.5) > 0.005 && s.Has("spacing"))
                D.Warn(s["spacing"]!, $"a standing-wave array is normally spaced 0.5 guide-wavelength; {Num(n)} guide-wavelength tilts the beam off broadside");
            if (travelling && Math.Abs(n - 0.5) <= 0.005)
                D.Warn(s["spacing"]!, "a travelling-wave array spaced 0.5 guide-wavelength adds its reflections in phase: expect a poor match at the design frequency");
        }

        FeedPosition? position = FeedPosition.End;
        if (s.Has("position"))
        {
            position = Choice(s, "position", SpecNames.FeedPositions, false);
            if (travelling) ok &= Require(s, "position", false, "'position' applies to standing-wave feeds only; remove it");
        }
        ok &= position is not null;

        double? load = standing ? 0 : DefaultLoadFraction;
        if (s.Has("load"))
        {
            load = Quantity(s, "load", QuantityKind.Percent, false, "5 %");
            if (standing) ok &= Require(s, "load", false, "'load' applies to travelling-wave feeds only (a standing-wave array ends in a short); remove it");
            else if (load is not null && !Require(s, "load", load > 0 && load < 1, $"'load' must be between 0 % and 100 % (exclusive), got {Num(load.Value * 100)} %")) load = null;
        }
        else if (travelling)
            D.Warn(s.Anchor, $"no 'load' given: leaving {Num(DefaultLoadFraction * 100)} % of the input power for the load; write e.g. 'load: 5 %'");
        ok &= load is not null;

        GuideDistance? shortDistance = GuideDistance.InGuideWavelengths(0.25);
        if (s.Has("short"))
        {
            shortDistance = Distance(s, "short", lambdaG, "0.25 guide-wavelength");
            if (travelling) ok &= Require(s, "short", false, "'short' applies to standing-wave feeds only (a travelling-wave array ends in a load); remove it");
        }
        ok &= shortDistance is not null;

        return ok ? new FeedRequest(type!.Value, spacing!, position!.Value, standing ? 0 : load!.Value, shortDistance!) : null;
    }

    /// <summary>A distance along the guide, in guide wavelengths or a length, strictly between 0 and 1 guide-wavelength.</summary>
    private GuideDistance? Distance(Section s, string key, Length? lambdaG, string example)
    {
        var sc = Scalar(s, key, true, example);
        if (sc is null) return null;
        if (!QuantityParser.TryParseGuideDistance(sc.Value, out var d, out string error))
        {
            D.Error(sc, $"'{key}' {error}");
            return null;
        }
        double? n = d.GuideWavelengths ?? (lambdaG is { } lg ? d.Fixed!.Value / lg : null);
        if (n is not null && !(n > 0 && n < 1))
        {
            D.Error(sc, $"'{key}' must be between 0 and 1 guide-wavelength, got {Num(n.Value)} guide-wavelength");
            return null;
        }
        if (d.Fixed is { } len && !(len.Meters > 0))
        {
            D.Error(sc, $"'{key}' must be a positive distance, got {Mm(len.Meters)}");
            return null;
        }
        return d;
    }

    /// <summary>
    /// Taper (optional; default uniform with a warning): type; sidelobes (dB, required where the family has a design
    /// level); nbar (default 4); cosine-pedestal edge (required) and exponent (default 2); given weights (one per slot).
    /// A key the chosen family does not use is an error.
    /// </summary>
    private TaperRequest? Taper(Section root, int? slotCount)
    {
        if (!root.Has("taper"))
        {
            D.Warn(root.Anchor, "no 'taper' given: using a uniform taper (first sidelobe about -13 dB); write e.g. 'taper: {type: taylor, sidelobes: -26 dB}'");
            return TaperRequest.Uniform;
        }
        var s = Sub(root, "taper", TaperKeys, true);
        if (s is null) return null;
        TaperType? type = Choice(s, "type", SpecNames.TaperTypes, true);
        if (type is null) return null;
        var t = type.Value;
        string family = SpecNames.Of(t);
        bool usesSll = SpecKeys.Taper["sidelobes"].Applies(family);
        bool usesNbar = SpecKeys.Taper["nbar"].Applies(family);
        bool ok = true;
        foreach (var key in SpecKeys.Taper.Keys.Where(k => !k.Applies(family)).Select(k => k.Name))
            if (s.Has(key)) ok &= Require(s, key, false, $"'{key}' does not apply to a {family} taper; remove it");

        double? sll = UniformSidelobeDb;
        if (usesSll)
        {
            sll = Quantity(s, "sidelobes", QuantityKind.Decibels, true, "-26 dB");
            bool continuous = t != TaperType.Chebyshev;
            if (sll is not null && !Require(s, "sidelobes", sll >= -100 && (continuous ? sll < UniformSidelobeDb : sll < 0),
                    continuous
                        ? $"'sidelobes' for a {family} taper must be between -100 dB and {Num(UniformSidelobeDb)} dB (the uniform level), got {Num(sll.Value)} dB"
                        : $"'sidelobes' must be between -100 dB and 0 dB (negative, e.g. '-30 dB'), got {Num(sll.Value)} dB")) sll = null;
        }
        int? nbar = usesNbar && s.Has("nbar") ? Integer(s, "nbar", false, SpecKeys.MinNbar, SpecKeys.MaxNbar, "4") : DefaultNbar;
        double? edge = -20;
        if (t == TaperType.CosinePedestal)
        {
            edge = Quantity(s, "edge", QuantityKind.Decibels, true, "-20 dB");
            if (edge is not null && !Require(s, "edge", edge < 0 && edge >= -100, $"'edge' must be a negative level between -100 dB and 0 dB, got {Num(edge.Value)} dB")) edge = null;
        }
        double? exponent = t == TaperType.CosinePedestal && s.Has("exponent") ? Number(s, "exponent", false, "2") : 2;
        if (exponent is not null && !Require(s, "exponent", exponent >= SpecKeys.MinExponent && exponent <= SpecKeys.MaxExponent, $"'exponent' must be between 1 and 20, got {Num(exponent.Value)}")) exponent = null;
        IReadOnlyList<double>? weights = null;
        if (t == TaperType.Given)
        {
            weights = Weights(s, slotCount);
            ok &= weights is not null;
        }
        if (!ok || sll is null || nbar is null || edge is null || exponent is null) return null;
        return new TaperRequest(t, sll.Value, nbar.Value, edge.Value, exponent.Value, weights);
    }

    private IReadOnlyList<double>? Weights(Section s, int? slotCount)
    {
        var node = s["weights"];
        if (node is null)
        {
            Missing(s, "weights", "'weights: [0.5, 1, 1, 0.5]' (one per slot)");
            return null;
        }
        Current = node;
        if (node is not SequenceNode seq || seq.Items.Count == 0)
        {
            D.Error(node, "'weights' needs a list of numbers, one per slot, such as '[0.5, 1, 1, 0.5]'");
            return null;
        }
        var values = new List<double>();
        foreach (var item in seq.Items)
        {
            if (item is ScalarNode sc && QuantityParser.TryParseNumber(sc.Value, out double v, out _)) values.Add(v);
            else D.Error(item, "each of 'weights' must be a plain number such as '0.75'");
        }
        if (values.Count != seq.Items.Count) return null;
        if (slotCount is { } n && values.Count != n)
        {
            D.Error(node, $"'weights' has {values.Count} numbers but 'slots.count' is {n}: give one weight per slot");
            return null;
        }
        if (values.All(v => v == 0))
        {
            D.Error(node, "'weights' are all zero: give at least one non-zero weight");
            return null;
        }
        return values;
    }
}
