using System.Text;

namespace SlotArray.Spec.Schema;

/// <summary>The kinds of starter spec <c>slotarray init</c> writes.</summary>
internal enum StarterKind
{
    /// <summary>Longitudinal broad-wall slots, standing-wave, end-fed against a short.</summary>
    StandingWave,
    /// <summary>Longitudinal broad-wall slots, travelling-wave into a matched load (squinted beam).</summary>
    TravellingWave,
    /// <summary>Inclined narrow-wall (edge) slots, travelling-wave (horizontal polarisation).</summary>
    Edge,
}

/// <summary>
/// A commented starter spec: every key of <see cref="SpecKeys"/> on its own line with its unit, its default and one
/// line on what it does. Keys the kind uses carry the values of an invented scenario (which designs as written);
/// the others are commented out with their default or a typical value. New keys appear here without further work.
/// </summary>
internal static class StarterSpec
{
    /// <summary>The kinds as written on the command line.</summary>
    public static IReadOnlyList<KeyValuePair<string, StarterKind>> Kinds { get; } =
        [new("standing-wave", StarterKind.StandingWave), new("travelling-wave", StarterKind.TravellingWave), new("edge", StarterKind.Edge)];

    private const int CommentColumn = 40;

    /// <summary>The starter spec of <paramref name="kind"/>; its modeline points at <paramref name="schemaLocation"/>.</summary>
    public static string Text(StarterKind kind, string schemaLocation = SpecJsonSchema.FileName)
    {
        var (story, values) = Scenario(kind);
        var sb = new StringBuilder();
        sb.Append(SpecJsonSchema.Modeline(schemaLocation)).Append('\n');
        foreach (string line in story) sb.Append("# ").Append(line).Append('\n');
        sb.Append("# Design it as written: slotarray design <this file>. Every key is listed with its unit, its default and\n");
        sb.Append("# what it does; keys this kind does not use are commented out. Editor schema: slotarray schema > ")
          .Append(SpecJsonSchema.FileName).Append('\n');
        Write(sb, SpecKeys.Root, "", 0, true, values);
        return sb.ToString();
    }

    private static void Write(StringBuilder sb, SpecSection section, string prefix, int indent, bool blockActive, IReadOnlyDictionary<string, string> values)
    {
        foreach (var key in section.Keys)
        {
            string path = prefix + key.Name;
            bool active = blockActive && (values.ContainsKey(path) || values.Keys.Any(k => k.StartsWith(path + ".", StringComparison.Ordinal)));
            // A block, or a block-or-word key (filter, flare: a block or 'auto'): written as the block with its keys.
            var block = key.Value as BlockValue ?? (key.Value as AnyOfValue)?.Forms.OfType<BlockValue>().FirstOrDefault();
            if (block is not null && !values.ContainsKey(path))
            {
                Line(sb, indent, active, $"{key.Name}:", Comment(key));
                Write(sb, block.Section, path + ".", indent + 2, active, values);
                continue;
            }
            string value = values.TryGetValue(path, out string? v) ? v : Shown(key);
            Line(sb, indent, active, $"{key.Name}: {value}", Comment(key));
        }
    }

    private static string Shown(SpecKey key) => key.Default switch
    {
        string s => s,
        null => key.Example ?? "",
        var d => Convert.ToString(d, System.Globalization.CultureInfo.InvariantCulture) ?? "",
    };

    private static void Line(StringBuilder sb, int indent, bool active, string text, string comment)
    {
        string start = new string(' ', indent) + (active ? "" : "# ") + text;
        sb.Append(start).Append(' ', Math.Max(2, CommentColumn - start.Length)).Append("# ").Append(comment).Append('\n');
    }

    private static string Comment(SpecKey key)
    {
        var parts = new List<string> { key.Description };
        switch (key.Value)
        {
            case QuantityValue q:
                parts.Add(string.Join(" ", QuantityParser.SymbolsOf(q.Kinds).Where(u => u is not ("μm" or "inch" or "guide-wavelengths"))));
                break;
            case ChoiceValue c when c.Folding == WordFolding.Words || c.Words.Count <= 8:
                parts.Add(string.Join(" | ", c.Words));
                break;
            case IntegerValue i when i.Minimum < i.Maximum:
                parts.Add($"{i.Minimum} to {i.Maximum}");
                break;
            case AnyOfValue a when a.Forms.OfType<QuantityValue>().FirstOrDefault() is { } q2:
                string other = a.Forms.OfType<ChoiceValue>().FirstOrDefault() is { } word ? string.Join(" | ", word.Words) : "{sigma: …}";
                parts.Add(string.Join(" ", QuantityParser.SymbolsOf(q2.Kinds).Where(u => u is not ("μm" or "inch"))) + ", or " + other);
                break;
        }
        if (key.AppliesTo is not null) parts.Add($"{string.Join(", ", key.AppliesTo)} only");
        parts.Add(key.Required ? "required"
            : key.RequiredFor is not null && key.Default is null && key.DefaultText is null ? $"required for {string.Join(", ", key.RequiredFor)}"
            : $"default {key.DefaultForPeople}");
        return string.Join("; ", parts);
    }

    /// <summary>Invented scenarios, one per kind: a few lines of story and the values of the keys the kind uses.</summary>
    private static (string[] Story, Dictionary<string, string> Values) Scenario(StarterKind kind)
    {
        var common = new Dictionary<string, string>(StringComparer.Ordinal)
        {
            ["spec"] = "1",
            ["guide.size"] = "WR-90", ["guide.wall"] = "1.27 mm", ["guide.metal"] = "aluminium",
            ["guide.permittivity"] = "1", ["guide.roughness"] = "0 mm",
            ["slots.width"] = "1.6 mm", ["slots.cutter"] = "1.6 mm", ["slots.model"] = "moment-method",
            ["taper.type"] = "taylor", ["taper.nbar"] = "4",
            ["coupling"] = "none",
            ["tolerance.offset"] = "0.02 mm", ["tolerance.length"] = "0.03 mm", ["tolerance.position"] = "0.03 mm",
            ["tolerance.width"] = "0.02 mm", ["tolerance.guide_width"] = "0.05 mm", ["tolerance.wall"] = "{sigma: 0.05 mm}",
            ["tolerance.systematic.length"] = "0 mm", ["tolerance.systematic.offset"] = "0 mm",
            ["tolerance.trials"] = "500", ["tolerance.seed"] = "1",
            ["requirements.vswr"] = "2.0",
            ["transmitter.peak_power"] = "10 kW", ["transmitter.average_power"] = "10 W",
        };
        switch (kind)
        {
            case StarterKind.StandingWave:
                common["name"] = "workshop-beacon-10";
                common["frequency"] = "9.5 GHz"; common["band"] = "[9.45 GHz, 9.55 GHz]";
                common["slots.type"] = "longitudinal"; common["slots.count"] = "10";
                common["feed.type"] = "standing-wave"; common["feed.spacing"] = "0.5 guide-wavelength";
                common["feed.position"] = "end"; common["feed.short"] = "0.25 guide-wavelength";
                common["taper.sidelobes"] = "-25 dB";
                common["requirements.sidelobes"] = "-22 dB"; common["requirements.cross_polar"] = "-25 dB";
                return (["Starter spec (standing-wave), an invented scenario: a 10-slot X-band beacon antenna for a workshop",
                         "test range, longitudinal broad-wall slots in WR-90 aluminium, end-fed against a short."], common);
            case StarterKind.TravellingWave:
                common["name"] = "survey-link-20";
                common["frequency"] = "10 GHz"; common["band"] = "[9.9 GHz, 10.1 GHz]";
                common["slots.type"] = "longitudinal"; common["slots.count"] = "20";
                common["feed.type"] = "travelling-wave"; common["feed.spacing"] = "0.45 guide-wavelength"; common["feed.load"] = "5 %";
                common["taper.sidelobes"] = "-25 dB";
                common["requirements.sidelobes"] = "-20 dB";
                return (["Starter spec (travelling-wave), an invented scenario: a 20-slot X-band survey-link antenna,",
                         "longitudinal broad-wall slots in WR-90 aluminium fed from one end into a matched load;",
                         "the spacing off 0.5 guide-wavelength squints the beam and keeps the slot reflections apart."], common);
            default:
                common["name"] = "deck-radar-32";
                common["frequency"] = "9.41 GHz"; common["band"] = "[9.35 GHz, 9.47 GHz]";
                common["slots.type"] = "edge"; common["slots.count"] = "32";
                // Edge slots' machining errors are the tilt and the depth of cut, not an offset.
                common.Remove("tolerance.offset"); common.Remove("tolerance.systematic.offset");
                common["tolerance.tilt"] = "0.1 deg"; common["tolerance.depth"] = "0.02 mm";
                common["feed.type"] = "travelling-wave"; common["feed.spacing"] = "20 mm"; common["feed.load"] = "5 %";
                common["taper.sidelobes"] = "-25 dB";
                common["requirements.sidelobes"] = "-20 dB";
                return (["Starter spec (edge), an invented scenario: a 32-slot X-band deck radar antenna, inclined",
                         "narrow-wall (edge) slots in WR-90 aluminium (horizontal polarisation), travelling-wave into a",
                         "matched load. The alternating tilts radiate cross-polar lobes: a polarisation filter is usual."], common);
        }
    }
}
