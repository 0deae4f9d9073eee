namespace SlotArray.Spec.Yaml;

/// <summary>Collects the errors and warnings of one pass over a spec.</summary>
internal sealed class Diagnostics(string file)
{
    private readonly List<SpecError> _errors = [];
    private readonly List<SpecWarning> _warnings = [];

    /// <summary>File name used in every message.</summary>
    public string File { get; } = file;
    /// <summary>Errors so far.</summary>
    public int ErrorCount => _errors.Count;
    /// <summary>Errors ordered by position (stable).</summary>
    public IReadOnlyList<SpecError> Errors => _errors.OrderBy(e => e.Line).ThenBy(e => e.Column).ToList();
    /// <summary>Warnings ordered by position (stable).</summary>
    public IReadOnlyList<SpecWarning> Warnings => _warnings.OrderBy(e => e.Line).ThenBy(e => e.Column).ToList();

    /// <summary>An error at a position (clamped to line and column ≥ 1).</summary>
    public void Error(long line, long column, string message) => _errors.Add(new(File, Math.Max(1, line), Math.Max(1, column), message));
    /// <summary>An error at a node.</summary>
    public void Error(SpecNode at, string message) => Error(at.Line, at.Column, message);
    /// <summary>A warning at a position.</summary>
    public void Warn(long line, long column, string message) => _warnings.Add(new(File, Math.Max(1, line), Math.Max(1, column), message));
    /// <summary>A warning at a node.</summary>
    public void Warn(SpecNode at, string message) => Warn(at.Line, at.Column, message);
}

/// <summary>
/// One mapping of the spec with its known keys: reports non-scalar, duplicate and unknown keys (suggesting the
/// nearest known key) once, on construction, then gives the value of each key.
/// </summary>
internal sealed class Section
{
    private readonly Dictionary<string, (ScalarNode Key, SpecNode Value)> _entries = new(StringComparer.Ordinal);

    /// <summary>Dotted path of the section ("guide", "tolerance.systematic"; "" for the top level).</summary>
    public string Path { get; }
    /// <summary>Where a missing key is reported: the section's own key in its parent (or the document start).</summary>
    public SpecNode Anchor { get; }

    /// <summary>Reads the keys of <paramref name="map"/>; <paramref name="homes"/> maps a key of another section to that section, for a hint.</summary>
    public Section(Diagnostics d, MappingNode map, string path, SpecNode anchor, IReadOnlyList<string> known,
        IReadOnlyDictionary<string, string>? homes = null)
    {
        Path = path; Anchor = anchor;
        foreach (var (keyNode, value) in map.Entries)
        {
            if (keyNode is not ScalarNode key || key.IsNull)
            {
                d.Error(keyNode, $"a key {Where} must be a plain word such as '{known[0]}'");
                continue;
            }
            if (_entries.TryGetValue(key.Value, out var first))
            {
                d.Error(key, $"duplicate key '{key.Value}' {Where} (first given at line {first.Key.Line}); keep one of them");
                continue;
            }
            if (!known.Contains(key.Value))
            {
                string? near = Nearest(key.Value, known);
                if (homes is not null && homes.TryGetValue(key.Value, out string? home))
                    d.Error(key, $"unknown key '{key.Value}' {Where}; it belongs in '{home}' (indent it under that block)");
                else d.Error(key, near is not null
                    ? $"unknown key '{key.Value}' {Where}; did you mean '{near}'?"
                    : $"unknown key '{key.Value}' {Where}; known keys: {string.Join(", ", known)}");
                continue;
            }
            _entries[key.Value] = (key, value);
        }
    }

    /// <summary>"in 'guide'", or "at the top level".</summary>
    public string Where => Path.Length == 0 ? "at the top level" : $"in '{Path}'";

    /// <summary>The value of a key, or null when absent.</summary>
    public SpecNode? this[string key] => _entries.TryGetValue(key, out var e) ? e.Value : null;

    /// <summary>The key node itself, or null when absent.</summary>
    public ScalarNode? KeyNode(string key) => _entries.TryGetValue(key, out var e) ? e.Key : null;

    /// <summary>Whether the key is present.</summary>
    public bool Has(string key) => _entries.ContainsKey(key);

    /// <summary>The nearest candidate by edit distance (ignoring case), when close enough to be a likely typo.</summary>
    public static string? Nearest(string word, IEnumerable<string> candidates)
    {
        string w = word.ToLowerInvariant();
        var best = candidates.Select(c => (c, d: EditDistance(w, c.ToLowerInvariant()))).OrderBy(p => p.d).ThenBy(p => p.c, StringComparer.Ordinal).FirstOrDefault();
        return best.c is not null && best.d <= Math.Max(2, w.Length / 3) ? best.c : null;
    }

    /// <summary>Levenshtein distance (insert, delete, substitute; unit costs).</summary>
    public static int EditDistance(string a, string b)
    {
        var prev = new int[b.Length + 1];
        var cur = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++) prev[j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            cur[0] = i;
            for (int j = 1; j <= b.Length; j++)
                cur[j] = Math.Min(Math.Min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1));
            (prev, cur) = (cur, prev);
        }
        return prev[b.Length];
    }
}
