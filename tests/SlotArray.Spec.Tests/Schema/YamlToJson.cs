using System.Globalization;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace SlotArray.Spec.Tests.Schema;

/// <summary>
/// Converts a YAML document to the JSON tree an editor's schema validator sees, resolving plain scalars by the
/// YAML 1.2 core schema (YAML 1.2.2 specification, 2021, section 10.3.2, tag resolution): null, booleans, integers
/// (decimal, 0o octal, 0x hex) and floats become JSON values, everything else (and every quoted scalar) a string.
/// </summary>
internal static partial class YamlToJson
{
    [GeneratedRegex(@"^(?:~|null|Null|NULL|)$")] private static partial Regex Null();
    [GeneratedRegex(@"^(?:true|True|TRUE|false|False|FALSE)$")] private static partial Regex Bool();
    [GeneratedRegex(@"^[-+]?[0-9]+$")] private static partial Regex DecimalInt();
    [GeneratedRegex(@"^0o[0-7]+$")] private static partial Regex OctalInt();
    [GeneratedRegex(@"^0x[0-9a-fA-F]+$")] private static partial Regex HexInt();
    [GeneratedRegex(@"^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)(?:[eE][-+]?[0-9]+)?$")] private static partial Regex Float();

    /// <summary>The JSON tree of the first document of <paramref name="yaml"/>.</summary>
    public static JsonNode? Convert(string yaml)
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(yaml));
        return Node(stream.Documents[0].RootNode);
    }

    private static JsonNode? Node(YamlNode node) => node switch
    {
        YamlMappingNode m => new JsonObject(m.Children.Select(p => new KeyValuePair<string, JsonNode?>(((YamlScalarNode)p.Key).Value!, Node(p.Value)))),
        YamlSequenceNode s => new JsonArray([.. s.Children.Select(Node)]),
        YamlScalarNode sc => Scalar(sc),
        _ => throw new NotSupportedException(node.GetType().Name),
    };

    private static JsonNode? Scalar(YamlScalarNode sc)
    {
        string v = sc.Value ?? "";
        if (sc.Style is not ScalarStyle.Plain) return JsonValue.Create(v);
        if (Null().IsMatch(v)) return null;
        if (Bool().IsMatch(v)) return JsonValue.Create(v.Equals("true", StringComparison.OrdinalIgnoreCase));
        if (DecimalInt().IsMatch(v) && long.TryParse(v, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out long i)) return JsonValue.Create(i);
        if (OctalInt().IsMatch(v)) return JsonValue.Create(System.Convert.ToInt64(v[2..], 8));
        if (HexInt().IsMatch(v)) return JsonValue.Create(long.Parse(v[2..], NumberStyles.HexNumber, CultureInfo.InvariantCulture));
        if (Float().IsMatch(v)) return JsonValue.Create(double.Parse(v, CultureInfo.InvariantCulture));
        return JsonValue.Create(v);
    }
}
