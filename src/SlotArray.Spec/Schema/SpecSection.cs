namespace SlotArray.Spec.Schema;

/// <summary>One key of the spec: its value, what it does, whether it is required, its default and where it applies.</summary>
/// <param name="Name">The key as written in the spec (e.g. <c>guide_width</c>).</param>
/// <param name="Value">What its value may be.</param>
/// <param name="Description">One line on what it does (no default, no units: those are added from the other fields).</param>
internal sealed record SpecKey(string Name, SpecValue Value, string Description)
{
    /// <summary>Whether the key must be given.</summary>
    public bool Required { get; init; }
    /// <summary>The value used when the key is absent, as the spec writes it (a string, a whole number or a number); null when there is none.</summary>
    public object? Default { get; init; }
    /// <summary>A typical value as the spec writes it, for keys without a <see cref="Default"/> (editors offer it; the starter spec shows it).</summary>
    public string? Example { get; init; }
    /// <summary>The default in words when it is not one value (e.g. "frequency ± 2 %"); null to print <see cref="Default"/>.</summary>
    public string? DefaultText { get; init; }
    /// <summary>The words of the section's <c>type</c> key for which this key may be given; null when it always may.</summary>
    public IReadOnlyList<string>? AppliesTo { get; init; }
    /// <summary>The words of the section's <c>type</c> key for which this key must be given; null when none.</summary>
    public IReadOnlyList<string>? RequiredFor { get; init; }

    /// <summary>Whether the key may be given with the section's <c>type</c> word (true when it always may).</summary>
    public bool Applies(string typeWord) => AppliesTo is null || AppliesTo.Contains(typeWord);

    /// <summary>The default for people: <see cref="DefaultText"/>, else <see cref="Default"/>, else "required" or "none".</summary>
    public string DefaultForPeople => DefaultText ?? Default switch
    {
        null => Required ? "required" : "none",
        double d => d.ToString(System.Globalization.CultureInfo.InvariantCulture),
        var v => Convert.ToString(v, System.Globalization.CultureInfo.InvariantCulture) ?? "none",
    };
}

/// <summary>A block of keys (the top level, <c>guide</c>, <c>tolerance.systematic</c>, …).</summary>
/// <param name="Path">Dotted path ("" for the top level).</param>
/// <param name="Description">One line on what the block holds.</param>
/// <param name="Keys">Its keys, in the order a spec writes them.</param>
internal sealed record SpecSection(string Path, string Description, IReadOnlyList<SpecKey> Keys)
{
    /// <summary>Alternative sets of keys of which at least one set must be given in full (guide: <c>size</c>, or <c>a</c> and <c>b</c>).</summary>
    public IReadOnlyList<IReadOnlyList<string>> RequireOneOf { get; init; } = [];
    /// <summary>Pairs of keys that must not both be given (guide: <c>metal</c> and <c>conductivity</c>).</summary>
    public IReadOnlyList<(string, string)> Exclusive { get; init; } = [];

    /// <summary>The key names, in order: the parser's known keys for this block.</summary>
    public IReadOnlyList<string> Names => [.. Keys.Select(k => k.Name)];

    /// <summary>The key of that name.</summary>
    public SpecKey this[string name] => Keys.FirstOrDefault(k => k.Name == name)
        ?? throw new KeyNotFoundException($"'{Path}' has no key '{name}'");
}
