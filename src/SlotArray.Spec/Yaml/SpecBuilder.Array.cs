using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;
using SlotArray.Spec.Schema;

namespace SlotArray.Spec.Yaml;

internal sealed partial class SpecBuilder
{
    private static IReadOnlyList<string> SlotKeys => SpecKeys.Slots.Names;

    /// <summary>Whether the spec wrote <c>slots.surround</c> (else edge slots in front of a flare take <c>flare</c>).</summary>
    private bool surroundGiven;
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

    /// <summary>Narrowest slot accepted, as a fraction of the wavelength in the guide's filling (0.002): the moment-method
    /// solution loses its accuracy for narrower slots (a 0.01 mm slot in WR-90 at 9.41 GHz gives no usable admittance;
    /// 0.02 mm does: measured in this project).</summary>
    internal const double MinimumWidthWavelengths = 0.002;

    /// <summary>Widest longitudinal slot accepted, as a fraction of the wavelength in the guide's filling (0.2): the
    /// narrow-slot models need the slot length, about 0.44 to 0.52 wavelength at resonance, to exceed twice the width.</summary>
    internal const double MaximumWidthWavelengths = 0.2;

    /// <summary>
    /// Slots: required type (longitudinal or edge: inclined-series has no array designer), count (≥ 2), width (longitudinal:
    /// 0.002 to 0.2 wavelength and &lt; a/2; edge: &lt; b); optional cutter (≤ width) and model (default moment-method).
    /// </summary>
    private SlotRequest? Slots(Section root, RectangularWaveguide? guide, Frequency? f)
    {
        var s = Sub(root, "slots", SlotKeys, true);
        if (s is null) return null;
        SlotType? type = Choice(s, "type", SpecNames.SlotTypes, true);
        if (type == SlotType.InclinedSeries && !Require(s, "type", false,
                "'inclined-series' slots have a conductance formula ('slotarray slot' prints it) but no array designer yet: use 'longitudinal' (broad-wall) or 'edge' slots"))
            type = null;
        int? count = Integer(s, "count", true, int.MinValue, int.MaxValue, "16");
        if (count is not null && !Require(s, "count", count >= SpecKeys.MinSlots && count <= MaxSlots,
                $"'count' must be at least 2 (an array) and at most {MaxSlots}, got {count}")) count = null;
        double? width = Quantity(s, "width", QuantityKind.Length, true, "1.6 mm");
        if (width is not null && !Require(s, "width", width > 0, $"'width' must be a positive length, got {Mm(width.Value)}")) width = null;
        if (width is not null && guide is not null && !Require(s, "width", width < guide.BroadWall.Meters / 2,
                $"'width' {Mm(width.Value)} must be less than half the broad wall a/2 = {Mm(guide.BroadWall.Meters / 2)}")) width = null;
        if (width is not null && guide is not null && type == SlotType.Edge && !Require(s, "width", width < guide.NarrowWall.Meters,
                $"'width' {Mm(width.Value)} of an edge slot must be less than the narrow wall b = {Mm(guide.NarrowWall.Meters)} it is cut across")) width = null;
        if (width is not null && guide is not null && f is { } fd)
        {
            double lambda = fd.FreeSpaceWavelength.Meters / Math.Sqrt(guide.RelativePermittivity);
            if (!Require(s, "width", width >= MinimumWidthWavelengths * lambda,
                    $"'width' {Mm(width.Value)} is below {Num(MinimumWidthWavelengths)} wavelength ({Mm(MinimumWidthWavelengths * lambda)} at {Ghz(fd)}): the slot model is not reliable for so narrow a slot; use a wider slot"))
                width = null;
            else if (type == SlotType.Longitudinal && !Require(s, "width", width <= MaximumWidthWavelengths * lambda,
                    $"'width' {Mm(width.Value)} is above {Num(MaximumWidthWavelengths)} wavelength ({Mm(MaximumWidthWavelengths * lambda)} at {Ghz(fd)}): the narrow-slot model needs the resonant length (about half a wavelength) to exceed twice the width; use a narrower slot"))
                width = null;
        }
        double? cutter = s.Has("cutter") ? Quantity(s, "cutter", QuantityKind.Length, false, "1.6 mm") : null;
        bool cutterOk = !s.Has("cutter") || cutter is not null;
        if (cutter is not null && !Require(s, "cutter", cutter > 0 && (width is null || cutter <= width * (1 + 1e-9)),
                $"'cutter' (end-mill diameter) must be positive and no larger than the slot width{(width is null ? "" : $" {Mm(width.Value)}")}, got {Mm(cutter.Value)}"))
            cutterOk = false;
        SlotModelKind? model = s.Has("model") ? Choice(s, "model", SpecNames.SlotModels, false) : SlotModelKind.MomentMethod;
        var (data, extrapolate, dataOk) = SlotData(s, type, guide);
        surroundGiven = s.Has("surround");
        EdgeSlotSurround? surround = surroundGiven ? Choice(s, "surround", SpecNames.Surrounds, false) : EdgeSlotSurround.Tube;
        if (surround is not null && s.Has("surround") && type is not null && type != SlotType.Edge
            && !Require(s, "surround", false, "'surround' picks the edge-slot calibration; remove it for longitudinal or inclined series slots")) surround = null;
        if (type is null || count is null || width is null || !cutterOk || model is null || !dataOk || surround is null) return null;
        return new SlotRequest(type.Value, count.Value, Length.FromMeters(width.Value), cutter is null ? null : Length.FromMeters(cutter.Value), model.Value)
        {
            Data = data,
            Extrapolate = extrapolate,
            Surround = surround.Value,
        };
    }

    /// <summary>
    /// Feed: required type. Standing-wave: spacing default 0.5 guide-wavelength, position end|centre (default end),
    /// short default 0.25 guide-wavelength, no load. Travelling-wave: spacing required, load default 5 %, no short or position.
    /// </summary>
    private FeedRequest? Feed(Section root, Length? lambdaG, SlotRequest? slots, RectangularWaveguide? guide, Frequency? f)
    {
        var s = Sub(root, "feed", FeedKeys, true);
        if (s is null) return null;
        if (s.Has("guide"))
        {
            feedGuideNode = s.KeyNode("guide");
            feedGuide = Guide(s, f, null);
        }
        FeedType? type = Choice(s, "type", SpecNames.FeedTypes, true);
        bool ok = type is not null;
        bool standing = type == FeedType.StandingWave, travelling = type == FeedType.TravellingWave;

        GuideDistance? spacing = null;
        Angle? beam = null;
        if (s.Has("beam"))
        {
            if (!travelling) ok &= Require(s, "beam", false, "'beam' applies to travelling-wave feeds only (a standing-wave array's beam is set by its spacing); remove it");
            else if (s.Has("spacing")) ok &= Require(s, "beam", false, "give 'spacing' or 'beam', not both: the beam direction sets the spacing");
            else (spacing, beam) = SpacingForBeam(s, guide, f);
        }
        else if (s.Has("spacing")) spacing = Distance(s, "spacing", lambdaG, "0.5 guide-wavelength");
        else if (travelling) Missing(s, "spacing", "'spacing: 0.7 guide-wavelength' or 'beam: -4.5 deg' (a travelling-wave array needs a spacing other than 0.5 guide-wavelength)");
        if (spacing is null && !s.Has("spacing") && !s.Has("beam") && !travelling) spacing = GuideDistance.InGuideWavelengths(0.5);
        ok &= spacing is not null;
        if (spacing is not null && lambdaG is { } lg && type is not null)
        {
            double n = spacing.Resolve(lg) / lg;
            if (standing && Math.Abs(n - 0.5) > 0.005 && s.Has("spacing"))
                D.Warn(s["spacing"]!, $"a standing-wave array is normally spaced 0.5 guide-wavelength; {Num(n)} guide-wavelength tilts the beam off broadside");
            if (travelling && Math.Abs(n - 0.5) <= 0.005)
                D.Warn((SpecNode?)s["spacing"] ?? s["beam"] ?? s.Anchor, "a travelling-wave array spaced 0.5 guide-wavelength adds its reflections in phase: expect a poor match at the design frequency");
            if (slots is not null && guide is not null && f is { } fd)
                ok &= SpacingFits(s, spacing.Resolve(lg), slots, guide, fd, travelling);
        }

        FeedPosition? position = FeedPosition.End;
        if (s.Has("position"))
        {
            position = Choice(s, "position", SpecNames.FeedPositions, false);
            if (travelling) ok &= Require(s, "position", false, "'position' applies to standing-wave feeds only; remove it");
        }
        ok &= position is not null;

        double? load = standing ? 0 : DefaultLoadFraction;
        bool autoLoad = false;
        if (s.Has("load") && s["load"] is ScalarNode { IsNull: false } word && word.Value.Trim().Equals("auto", StringComparison.OrdinalIgnoreCase))
        {
            autoLoad = true;
            if (standing) ok &= Require(s, "load", false, "'load' applies to travelling-wave feeds only (a standing-wave array ends in a short); remove it");
        }
        else if (s.Has("load"))
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

        return ok ? new FeedRequest(type!.Value, spacing!, position!.Value, standing ? 0 : load!.Value, shortDistance!) { AutoLoad = autoLoad, Beam = beam } : null;
    }

    /// <summary>
    /// <c>feed.beam</c>: the asked direction and the spacing that gives it by the phase condition
    /// (<see cref="TravellingWaveBeam.SpacingFor"/>); errors at the key when the angle is out of range or unreachable.
    /// </summary>
    private (GuideDistance? Spacing, Angle? Beam) SpacingForBeam(Section s, RectangularWaveguide? guide, Frequency? f)
    {
        var radians = Quantity(s, "beam", QuantityKind.Angle, false, "-4.5 deg");
        if (radians is not { } r) return (null, null);
        var beam = Angle.FromRadians(r);
        if (!Require(s, "beam", Math.Abs(beam.Degrees) <= 80, $"'beam' must lie between -80 deg and +80 deg from broadside, got {Num(beam.Degrees)} deg")) return (null, null);
        if (guide is null || f is not { } fd) return (null, null);
        try
        {
            return (GuideDistance.OfLength(TravellingWaveBeam.SpacingFor(guide, beam, fd)), beam);
        }
        catch (ArgumentOutOfRangeException e)
        {
            Require(s, "beam", false, $"'beam': {e.Message.Split(" (Parameter")[0]}; ask for a direction nearer the load end (positive) or broadside");
            return (null, null);
        }
    }

    /// <summary>
    /// Spacing checks that need no design: slots that must overlap whatever the designer does (error) and spacings with a
    /// grating lobe in real space (warning, as the designer's). Broad-wall slots alternate sides, so every other slot is on
    /// the same side: two spacings must exceed the shortest resonant length the slot models return, 0.36 wavelength in the
    /// filling (the lower end of their resonance search), or twice the width when that is longer, plus the round-end
    /// allowance. An edge-slot cut is at least its width along the guide, so the spacing must exceed the width.
    /// Grating lobes: standing wave, d ≥ λ (broadside beam); travelling wave, d (1 + |sin θ|) ≥ λ at the beam θ of the
    /// phase condition (<see cref="TravellingWaveBeam.HasGratingLobe"/>).
    /// </summary>
    private bool SpacingFits(Section s, Length spacing, SlotRequest slots, RectangularWaveguide guide, Frequency f, bool travelling)
    {
        var at = (SpecNode?)s["spacing"] ?? s["beam"] ?? s.Anchor;
        double d = spacing.Meters, w = slots.Width.Meters;
        if (slots.Type == SlotType.Longitudinal)
        {
            double lambda = f.FreeSpaceWavelength.Meters / Math.Sqrt(guide.RelativePermittivity);
            double roundEnd = slots.Cutter is { } c ? Core.Fabrication.RoundEndedSlot.LengthCorrection(slots.Width, c).Meters : 0;
            double shortest = Math.Max(0.36 * lambda, 2 * w) + roundEnd;
            if (2 * d <= shortest)
            {
                D.Error(at, $"slots spaced {Mm(d)} overlap: broad-wall slots alternate sides, so every other slot is {Mm(2 * d)} from the next on its side, "
                    + $"less than a resonant slot's length (at least {Mm(shortest)} tip to tip at {Ghz(f)}); use a spacing above {Mm(shortest / 2)}");
                return false;
            }
        }
        else if (slots.Type == SlotType.Edge && d <= w)
        {
            D.Error(at, $"edge slots {Mm(w)} wide cannot be cut {Mm(d)} apart: each cut is at least its width along the guide; use a spacing above {Mm(w)}");
            return false;
        }
        double lambda0 = f.FreeSpaceWavelength.Meters;
        if (!travelling && d >= lambda0)
            D.Warn(at, $"slot spacing {Mm(d)} is not less than the free-space wavelength {Mm(lambda0)} at {Ghz(f)}: grating lobes appear in real space");
        else if (travelling && TravellingWaveBeam.HasGratingLobe(guide, spacing, f))
            D.Warn(at, $"slot spacing {Mm(d)} puts a grating lobe in real space at {Ghz(f)} (d (1 + |sin θ|) ≥ λ at the beam direction θ): use a smaller spacing");
        return true;
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
    private TaperRequest? Taper(Section root, int? slotCount, string key = "taper")
    {
        if (!root.Has(key))
        {
            if (key == "taper")
                D.Warn(root.Anchor, "no 'taper' given: using a uniform taper (first sidelobe about -13 dB); write e.g. 'taper: {type: taylor, sidelobes: -26 dB}'");
            return TaperRequest.Uniform;
        }
        var s = Sub(root, key, TaperKeys, true);
        if (s is null) return null;
        if (s["type"] is ScalarNode { IsNull: false } typeNode && typeNode.Value.Trim().ToLowerInvariant().Replace('_', '-') == SpecKeys.CircularTaylor)
            return CircularTaper(s, key);
        TaperType? type = Choice(s, "type", SpecNames.TaperTypes, true);
        if (type is null) return null;
        var t = type.Value;
        string family = SpecNames.Of(t);
        bool usesSll = SpecKeys.Taper["sidelobes"].Applies(family);
        bool usesNbar = SpecKeys.Taper["nbar"].Applies(family);
        bool ok = true;
        foreach (var name in SpecKeys.Taper.Keys.Where(k => !k.Applies(family)).Select(k => k.Name))
            if (s.Has(name)) ok &= Require(s, name, false, $"'{name}' does not apply to a {family} taper; remove it");

        double? sll = UniformSidelobeDb;
        if (usesSll)
        {
            sll = Quantity(s, "sidelobes", QuantityKind.Decibels, true, "-26 dB");
            // The family's own range (TaperSynthesis.LevelRange), never below the spec's -100 dB.
            var (highest, lowest) = TaperSynthesis.LevelRange(t)!.Value;
            lowest = Math.Max(lowest, -100);
            if (sll is not null && !Require(s, "sidelobes", sll >= lowest && sll <= highest,
                    $"'sidelobes' for a {family} taper must be between {Num(lowest)} dB and {Num(highest)} dB, got {Num(sll.Value)} dB")) sll = null;
        }
        int? nbar = usesNbar && s.Has("nbar") ? Integer(s, "nbar", false, SpecKeys.MinNbar, SpecKeys.MaxNbar, "4") : DefaultNbar;
        if (nbar is not null && usesNbar && slotCount is { } count && nbar > TaperSynthesis.MaximumNbar(t, count))
        {
            int most = TaperSynthesis.MaximumNbar(t, count);
            D.Error((SpecNode?)s["nbar"] ?? s["type"]!, most < 2
                ? $"a {family} taper needs at least 5 slots (n̄ ≥ 2 and N ≥ 2n̄ + 1), 'slots.count' is {count}: use a taylor taper or more slots"
                : $"a {family} taper of {count} slots takes n̄ at most (N - 1)/2 = {most}{(s.Has("nbar") ? "" : $" (the default is {DefaultNbar})")}: write 'nbar: {most}' or use more slots");
            nbar = null;
        }
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
