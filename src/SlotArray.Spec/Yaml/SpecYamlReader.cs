using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace SlotArray.Spec.Yaml;

/// <summary>
/// Builds a <see cref="SpecNode"/> tree from YamlDotNet's parser events. The representation model
/// (<c>YamlStream</c>) throws on the first duplicate key, which would end the pass; this tree keeps duplicates
/// so that every error can be collected. Syntax errors surface as <see cref="YamlException"/> with a position.
/// </summary>
internal static class SpecYamlReader
{
    /// <summary>Deeper nesting than any spec needs; a guard against runaway input.</summary>
    private const int MaxDepth = 32;

    /// <summary>
    /// Reads one YAML document; null when the text holds no document. Any failure of the parser (which on some
    /// malformed input throws other exceptions than <see cref="YamlException"/>) becomes a YamlException at the
    /// last position reached.
    /// </summary>
    public static SpecNode? Read(string text)
    {
        var parser = new Parser(new StringReader(text));
        try
        {
            return ReadDocument(parser);
        }
        catch (Exception e) when (e is not YamlException)
        {
            var at = Position(parser);
            throw new YamlException(at, at, "the text cannot be read as YAML here", e);
        }
    }

    private static Mark Position(Parser parser)
    {
        try
        {
            return parser.Current?.Start ?? Mark.Empty;
        }
        catch (InvalidOperationException)
        {
            return Mark.Empty;
        }
    }

    private static SpecNode? ReadDocument(Parser parser)
    {
        parser.Consume<StreamStart>();
        if (parser.TryConsume<StreamEnd>(out _)) return null;
        parser.Consume<DocumentStart>();
        var anchors = new Dictionary<string, SpecNode>(StringComparer.Ordinal);
        var root = ReadNode(parser, anchors, 0);
        parser.Consume<DocumentEnd>();
        if (parser.Current is DocumentStart next)
            throw new YamlException(next.Start, next.End, "a spec holds one YAML document; remove the second '---' and what follows");
        return root;
    }

    private static SpecNode ReadNode(IParser parser, Dictionary<string, SpecNode> anchors, int depth)
    {
        var start = parser.Current ?? throw new YamlException("unexpected end of the document");
        if (depth > MaxDepth) throw new YamlException(start.Start, start.End, $"nested more than {MaxDepth} levels deep");
        SpecNode node;
        string? anchor = null;
        switch (start)
        {
            case AnchorAlias alias:
                parser.MoveNext();
                return anchors.TryGetValue(alias.Value.Value, out var target)
                    ? target
                    : throw new YamlException(alias.Start, alias.End, $"alias '*{alias.Value.Value}' has no anchor '&{alias.Value.Value}' before it");
            case Scalar s:
                parser.MoveNext();
                if (!s.Anchor.IsEmpty) anchor = s.Anchor.Value;
                node = new ScalarNode(s.Value, s.Style is ScalarStyle.SingleQuoted or ScalarStyle.DoubleQuoted, s.Start.Line, s.Start.Column);
                break;
            case SequenceStart q:
            {
                parser.MoveNext();
                if (!q.Anchor.IsEmpty) anchor = q.Anchor.Value;
                var items = new List<SpecNode>();
                while (!parser.TryConsume<SequenceEnd>(out _)) items.Add(ReadNode(parser, anchors, depth + 1));
                node = new SequenceNode(items, q.Start.Line, q.Start.Column);
                break;
            }
            case MappingStart m:
            {
                parser.MoveNext();
                if (!m.Anchor.IsEmpty) anchor = m.Anchor.Value;
                var entries = new List<KeyValuePair<SpecNode, SpecNode>>();
                while (!parser.TryConsume<MappingEnd>(out _))
                {
                    var key = ReadNode(parser, anchors, depth + 1);
                    var value = ReadNode(parser, anchors, depth + 1);
                    entries.Add(new(key, value));
                }
                node = new MappingNode(entries, m.Start.Line, m.Start.Column);
                break;
            }
            default:
                throw new YamlException(start.Start, start.End, $"unexpected YAML event {start.GetType().Name}");
        }
        if (anchor is not null) anchors[anchor] = node;
        return node;
    }
}
