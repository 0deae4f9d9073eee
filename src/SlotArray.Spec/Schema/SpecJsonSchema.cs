using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace SlotArray.Spec.Schema;

/// <summary>
/// The JSON Schema (draft 2020-12) of the YAML spec, written from <see cref="SpecKeys"/> (the definitions the parser
/// uses): every key with its description, type, enum values, default and, for a dimensioned value, a pattern
/// (number, optional space, one of the key's units). Unknown keys are errors (<c>additionalProperties: false</c>).
/// The schema is permissive where the parser is: it never refuses a spec the parser accepts (a quoted number, a word in
/// another letter case), while the parser also checks what a schema cannot (ranges of dimensioned values, b &lt; a).
/// </summary>
internal static class SpecJsonSchema
{
    /// <summary>The schema's identifier.</summary>
    public const string Id = "urn:slotarray:spec:1";

    /// <summary>The file name the bundled specs' modeline points at (in the repository's <c>schema/</c> folder).</summary>
    public const string FileName = "slotarray-spec.schema.json";

    /// <summary>The comment YAML editors read to find the schema (yaml-language-server), pointing at <paramref name="location"/>.</summary>
    public static string Modeline(string location) => $"# yaml-language-server: $schema={location}";

    /// <summary>The schema as indented JSON text ending in a newline (deterministic: same program, same bytes).</summary>
    public static string Text() => Build().ToJsonString(new JsonSerializerOptions
    {
        WriteIndented = true,
        TypeInfoResolver = new System.Text.Json.Serialization.Metadata.DefaultJsonTypeInfoResolver(),
        Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    }).ReplaceLineEndings("\n") + "\n";

    /// <summary>The schema as a JSON tree.</summary>
    public static JsonObject Build()
    {
        var root = Section(SpecKeys.Root);
        var schema = new JsonObject
        {
            ["$schema"] = "https://json-schema.org/draft/2020-12/schema",
            ["$id"] = Id,
            ["title"] = "SlotArray spec, version 1",
        };
        foreach (var (k, v) in root.ToList())
        {
            root.Remove(k);
            schema[k] = v;
        }
        return schema;
    }

    private static JsonObject Section(SpecSection s)
    {
        var properties = new JsonObject();
        foreach (var key in s.Keys) properties[key.Name] = Key(key);
        var o = new JsonObject
        {
            ["type"] = "object",
            ["description"] = s.Description,
            ["properties"] = properties,
            ["additionalProperties"] = false,
        };
        var required = s.Keys.Where(k => k.Required).Select(k => (JsonNode)k.Name).ToArray();
        if (required.Length > 0) o["required"] = new JsonArray(required);
        var all = new JsonArray();
        if (s.RequireOneOf.Count > 0)
            all.Add(new JsonObject { ["anyOf"] = new JsonArray([.. s.RequireOneOf.Select(set => (JsonNode)new JsonObject { ["required"] = Strings(set) })]) });
        foreach (var (x, y) in s.Exclusive)
            all.Add(new JsonObject { ["not"] = new JsonObject { ["required"] = Strings([x, y]) } });
        foreach (var rule in TypeRules(s)) all.Add(rule);
        if (all.Count > 0) o["allOf"] = all;
        return o;
    }

    /// <summary>For each word of the section's <c>type</c>: the keys it needs and the keys that do not apply to it.</summary>
    private static IEnumerable<JsonObject> TypeRules(SpecSection s)
    {
        if (s.Keys.FirstOrDefault(k => k.Name == "type")?.Value is not ChoiceValue type) yield break;
        foreach (string word in type.Words)
        {
            var needs = s.Keys.Where(k => k.RequiredFor?.Contains(word) == true).Select(k => k.Name).ToList();
            var barred = s.Keys.Where(k => !k.Applies(word)).Select(k => k.Name).ToList();
            if (needs.Count == 0 && barred.Count == 0) continue;
            var then = new JsonObject();
            if (needs.Count > 0) then["required"] = Strings(needs);
            if (barred.Count > 0)
            {
                var props = new JsonObject();
                foreach (string b in barred) props[b] = false;
                then["properties"] = props;
            }
            yield return new JsonObject
            {
                ["if"] = new JsonObject { ["properties"] = new JsonObject { ["type"] = new JsonObject { ["const"] = word } }, ["required"] = Strings(["type"]) },
                ["then"] = then,
            };
        }
    }

    private static JsonObject Key(SpecKey key)
    {
        var o = Value(key.Value);
        var text = new List<string> { Capital(key.Description) + "." };
        if (key.Value is QuantityValue q)
            text.Add($"Units: {string.Join(", ", QuantityParser.SymbolsOf(q.Kinds))}; range: {q.Range}.");
        text.Add(key.Required ? "Required." : $"Default: {key.DefaultForPeople}.");
        if (key.AppliesTo is not null) text.Add($"Only for type {string.Join(", ", key.AppliesTo)}.");
        if (key.RequiredFor is not null && !key.Required) text.Add($"Required for type {string.Join(", ", key.RequiredFor)}.");
        var described = new JsonObject { ["description"] = string.Join(" ", text) };
        if (key.Default is { } d) described["default"] = d switch
        {
            string str => JsonValue.Create(str),
            long l => JsonValue.Create(l),
            double x => JsonValue.Create(x),
            _ => throw new ArgumentException($"default of '{key.Name}' must be a string, long or double", nameof(key)),
        };
        if (key.Example is { } ex && key.Value is not (ListValue or BlockValue))
            described["examples"] = new JsonArray(key.Value switch
            {
                IntegerValue => JsonValue.Create(long.Parse(ex, CultureInfo.InvariantCulture)),
                NumberValue => JsonValue.Create(double.Parse(ex, CultureInfo.InvariantCulture)),
                _ => JsonValue.Create(ex),
            });
        foreach (var (k, v) in o.ToList())
        {
            o.Remove(k);
            if (k != "description") described[k] = v;   // a block's own one-line description gives way to the key's
        }
        return described;
    }

    private static JsonObject Value(SpecValue value) => value switch
    {
        TextValue t => Text(t),
        BooleanValue => AnyOf(new JsonObject { ["type"] = "boolean" }, PatternString("^(?:true|True|TRUE|false|False|FALSE)$")),   // the parser reads a quoted word too
        IntegerValue i => i.Minimum == i.Maximum
            ? AnyOf(new JsonObject { ["const"] = i.Minimum }, PatternString(@"^\s*\+?0*" + i.Minimum.ToString(CultureInfo.InvariantCulture) + @"\s*$"))
            : AnyOf(new JsonObject { ["type"] = "integer", ["minimum"] = i.Minimum, ["maximum"] = i.Maximum }, PatternString(@"^\s*[+-]?[0-9]+\s*$")),
        NumberValue n => AnyOf(Number(n), PatternString(@"^\s*" + QuantityParser.NumberPattern + @"\s*$")),
        QuantityValue q => new JsonObject
        {
            ["type"] = "string",
            ["pattern"] = @"^\s*" + QuantityParser.NumberPattern + @"\s*" + QuantityParser.UnitPattern(q.Kinds) + @"\s*$",
        },
        ChoiceValue c => Choice(c),
        ListValue l => List(l),
        BlockValue b => Section(b.Section),
        AnyOfValue a => new JsonObject { ["anyOf"] = new JsonArray([.. a.Forms.Select(f => (JsonNode)Value(f))]) },
        _ => throw new ArgumentOutOfRangeException(nameof(value), value.GetType().Name),
    };

    private static JsonObject Text(TextValue t)
    {
        var o = new JsonObject { ["type"] = Strings(["string", "number", "boolean"]) };
        if (t.Pattern is not null) o["pattern"] = t.Pattern;   // applies to strings only
        if (t.MaxLength is { } m) o["maxLength"] = m;
        return o;
    }

    private static JsonObject Number(NumberValue n)
    {
        var o = new JsonObject { ["type"] = "number" };
        if (n.Minimum is { } min) o[n.ExclusiveMinimum ? "exclusiveMinimum" : "minimum"] = min;
        if (n.Maximum is { } max) o["maximum"] = max;
        return o;
    }

    private static JsonObject PatternString(string pattern) => new() { ["type"] = "string", ["pattern"] = pattern };

    private static JsonObject AnyOf(JsonObject first, JsonObject second) => new() { ["anyOf"] = new JsonArray(first, second) };

    private static JsonObject List(ListValue l)
    {
        var o = new JsonObject { ["type"] = "array", ["items"] = Value(l.Item), ["minItems"] = l.MinItems };
        if (l.MaxItems is { } m) o["maxItems"] = m;
        return o;
    }

    /// <summary>
    /// The words as an <c>enum</c> (what an editor offers), or any spelling the parser folds onto one of them (letter
    /// case, and for words '_' or ' ' for '-'; for designations '-' and ' ' anywhere). A word that YAML reads as a
    /// number (the alloy <c>6061</c>) is also accepted as that number.
    /// </summary>
    private static JsonObject Choice(ChoiceValue c)
    {
        var accepted = c.Words.Concat(c.Aliases).ToList();
        var enumValues = new JsonArray([.. c.Words.Select(w => (JsonNode)w!)]);
        foreach (string w in accepted)
            if (long.TryParse(w, NumberStyles.None, CultureInfo.InvariantCulture, out long n)) enumValues.Add(n);
        string pattern = @"^\s*(?:" + string.Join("|", accepted.Select(w => Folded(w, c.Folding))) + @")\s*$";
        return AnyOf(new JsonObject { ["enum"] = enumValues }, new JsonObject { ["type"] = "string", ["pattern"] = pattern });
    }

    private static string Folded(string word, WordFolding folding)
    {
        var sb = new System.Text.StringBuilder();
        if (folding == WordFolding.Designation) sb.Append("[- ]*");
        foreach (char ch in word)
        {
            if (folding == WordFolding.Designation && ch is '-' or ' ') continue;
            if (folding == WordFolding.Words && ch is '-' or '_' or ' ') sb.Append("[-_ ]");
            else if (char.ToUpperInvariant(ch) != char.ToLowerInvariant(ch)) sb.Append('[').Append(char.ToLowerInvariant(ch)).Append(char.ToUpperInvariant(ch)).Append(']');
            else sb.Append(Regex.Escape(ch.ToString()));
            if (folding == WordFolding.Designation) sb.Append("[- ]*");
        }
        return sb.ToString();
    }

    private static JsonArray Strings(IEnumerable<string> items) => new([.. items.Select(i => (JsonNode)i!)]);

    private static string Capital(string s) => s.Length == 0 ? s : char.ToUpperInvariant(s[0]) + s[1..];
}
