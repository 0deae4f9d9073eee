namespace SlotArray.Spec.Yaml;

/// <summary>A node of the spec's YAML tree with its 1-based start position.</summary>
internal abstract record SpecNode(long Line, long Column);

/// <summary>A scalar: its text, and whether it was quoted (a quoted empty string is a value, a plain empty one is not).</summary>
internal sealed record ScalarNode(string Value, bool Quoted, long Line, long Column) : SpecNode(Line, Column)
{
    /// <summary>An empty plain scalar or <c>~</c>/<c>null</c>: the key was written without a value.</summary>
    public bool IsNull => !Quoted && Value is "" or "~" or "null" or "Null" or "NULL";
}

/// <summary>A sequence.</summary>
internal sealed record SequenceNode(IReadOnlyList<SpecNode> Items, long Line, long Column) : SpecNode(Line, Column);

/// <summary>A mapping, entries in document order; duplicates are kept so that they can be reported.</summary>
internal sealed record MappingNode(IReadOnlyList<KeyValuePair<SpecNode, SpecNode>> Entries, long Line, long Column)
    : SpecNode(Line, Column);
