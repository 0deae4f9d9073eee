using System.Globalization;
using SlotArray.Core.Quantities;

namespace SlotArray.Spec.Yaml;

/// <summary>
/// Reads typed values out of <see cref="Section"/>s, recording a positioned error (never throwing) for a missing,
/// empty, non-scalar, unit-less, wrongly-united or out-of-range value. Each getter returns null after an error.
/// The section readers live in the partial files beside this one.
/// </summary>
internal sealed partial class SpecBuilder(Diagnostics d)
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The node being read, so that an unexpected exception can still be reported at a position.</summary>
    public SpecNode? Current { get; private set; }

    private Diagnostics D { get; } = d;

    /// <summary>Opens a sub-mapping; null (after an error if it was not a mapping) when absent or malformed.</summary>
    private Section? Sub(Section parent, string key, IReadOnlyList<string> known, bool required)
    {
        var node = parent[key];
        if (node is null)
        {
            if (required) Missing(parent, key, $"a '{key}:' block with {string.Join(", ", known.Take(3))}, …");
            return null;
        }
        Current = node;
        if (node is MappingNode m)
            return new Section(D, m, parent.Path.Length == 0 ? key : $"{parent.Path}.{key}", parent.KeyNode(key)!, known);
        D.Error(node, $"'{key}' must be a block of keys ({string.Join(", ", known)}) indented on the lines below it");
        return null;
    }

    private void Missing(Section s, string key, string example)
        => D.Error(s.Anchor, s.Path.Length == 0
            ? $"the spec needs '{key}': add {example}"
            : $"'{s.Path}' needs '{key}': add {example}");

    /// <summary>The scalar text of a key; null when absent (error if required) or not a scalar.</summary>
    private ScalarNode? Scalar(Section s, string key, bool required, string example)
    {
        var node = s[key];
        if (node is null)
        {
            if (required) Missing(s, key, $"'{key}: {example}'");
            return null;
        }
        Current = node;
        if (node is not ScalarNode sc)
        {
            D.Error(node, $"'{key}' needs a single value such as '{example}', not a list or block");
            return null;
        }
        if (sc.IsNull)
        {
            D.Error(node, $"'{key}' has no value; write e.g. '{key}: {example}'");
            return null;
        }
        return sc;
    }

    /// <summary>A string value.</summary>
    private string? Text(Section s, string key, bool required, string example) => Scalar(s, key, required, example)?.Value;

    /// <summary>A quantity with a unit, in SI; an error (with the expected form) for anything else.</summary>
    private double? Quantity(Section s, string key, QuantityKind kind, bool required, string example)
    {
        var sc = Scalar(s, key, required, example);
        return sc is null ? null : QuantityOf(sc, key, kind);
    }

    private double? QuantityOf(ScalarNode sc, string key, QuantityKind kind)
    {
        if (QuantityParser.TryParse(sc.Value, kind, out double v, out string error)) return v;
        D.Error(sc, $"'{key}' {error}");
        return null;
    }

    /// <summary>A plain number without a unit.</summary>
    private double? Number(Section s, string key, bool required, string example)
    {
        var sc = Scalar(s, key, required, example);
        if (sc is null) return null;
        if (QuantityParser.TryParseNumber(sc.Value, out double v, out string error)) return v;
        D.Error(sc, $"'{key}': {error}; write e.g. '{key}: {example}'");
        return null;
    }

    /// <summary>A whole number in [min, max].</summary>
    private int? Integer(Section s, string key, bool required, int min, int max, string example)
    {
        var sc = Scalar(s, key, required, example);
        if (sc is null) return null;
        if (!long.TryParse(sc.Value.Trim(), NumberStyles.AllowLeadingSign, Inv, out long v))
        {
            D.Error(sc, $"'{key}' needs a whole number such as '{example}', not '{sc.Value.Trim()}'");
            return null;
        }
        if (v < min || v > max)
        {
            D.Error(sc, $"'{key}' must be between {min} and {max}, got {v}");
            return null;
        }
        return (int)v;
    }

    /// <summary>One of a fixed set of words; an unknown word lists them (and names the nearest).</summary>
    private T? Choice<T>(Section s, string key, IReadOnlyList<KeyValuePair<string, T>> table, bool required) where T : struct, Enum
    {
        var sc = Scalar(s, key, required, table[0].Key);
        if (sc is null) return null;
        string word = sc.Value.Trim();
        string norm = word.ToLowerInvariant().Replace('_', '-').Replace(' ', '-');
        norm = SpecNames.WordAliases.FirstOrDefault(a => a.Key == norm).Value ?? norm;
        foreach (var (name, value) in table)
            if (name == norm) return value;
        string? near = Section.Nearest(norm, table.Select(p => p.Key));
        D.Error(sc, $"'{key}' cannot be '{word}'{(near is null ? "" : $" (did you mean '{near}'?)")}; write one of: {string.Join(", ", table.Select(p => p.Key))}");
        return null;
    }

    /// <summary>Records an out-of-range error at the key's value unless <paramref name="ok"/>.</summary>
    private bool Require(Section s, string key, bool ok, string message)
    {
        if (!ok) D.Error((SpecNode?)s[key] ?? s.Anchor, message);
        return ok;
    }

    /// <summary>A frequency for messages: "9.41 GHz" (five significant figures).</summary>
    internal static string Ghz(Frequency f) => Ghz(f.Hertz);
    /// <summary>A frequency in hertz for messages, in GHz.</summary>
    internal static string Ghz(double hz) => string.Format(Inv, "{0:0.#####} GHz", hz / 1e9);
    /// <summary>A length for messages, in mm.</summary>
    internal static string Mm(double meters) => string.Format(Inv, "{0:0.####} mm", meters * 1e3);
    /// <summary>A plain number for messages.</summary>
    internal static string Num(double v) => v.ToString("G6", Inv);
}
