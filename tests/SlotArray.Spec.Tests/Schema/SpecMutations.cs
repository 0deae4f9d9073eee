using System.Globalization;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using SlotArray.Spec.Schema;

namespace SlotArray.Spec.Tests.Schema;

/// <summary>Mutations of a spec's JSON tree, guided by the key catalogue: benign ones (which may or may not stay valid) and structural errors.</summary>
public static partial class SpecMutations
{
    /// <summary>The kinds of structural error.</summary>
    public enum Structural
    {
        /// <summary>A key no block knows.</summary>
        UnknownKey,
        /// <summary>A known key with a typo.</summary>
        MisspeltKey,
        /// <summary>A block where a value belongs, a list or block where a single value belongs, a single value where a list or block belongs.</summary>
        WrongType,
        /// <summary>A word that is not one of the key's words.</summary>
        UnknownWord,
        /// <summary>A dimensioned value with its unit dropped.</summary>
        NumberWithoutUnit,
        /// <summary>A whole number outside its range.</summary>
        CountOutOfRange,
    }

    /// <summary>One key present in a document: the block holding it, its name and its definition.</summary>
    internal sealed record Site(JsonObject Parent, SpecSection Section, SpecKey Key)
    {
        public JsonNode? Node => Parent[Key.Name];
        public void Set(JsonNode? value) => Parent[Key.Name] = value;
    }

    [GeneratedRegex(@"^\s*(?<num>[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(?<unit>.*?)\s*$")]
    private static partial Regex NumberAndUnit();

    internal static List<Site> Sites(JsonObject doc)
    {
        var list = new List<Site>();
        Walk(doc, SpecKeys.Root, list);
        return list;
    }

    private static void Walk(JsonObject obj, SpecSection section, List<Site> list)
    {
        foreach (var (name, node) in obj.ToList())
        {
            var key = section.Keys.FirstOrDefault(k => k.Name == name);
            if (key is null) continue;
            list.Add(new Site(obj, section, key));
            var block = key.Value as BlockValue ?? (key.Value as AnyOfValue)?.Forms.OfType<BlockValue>().FirstOrDefault();
            if (block is not null && node is JsonObject child) Walk(child, block.Section, list);
        }
    }

    private static IEnumerable<(JsonObject Obj, SpecSection Section)> Blocks(JsonObject doc)
    {
        yield return (doc, SpecKeys.Root);
        foreach (var s in Sites(doc))
        {
            var block = s.Key.Value as BlockValue ?? (s.Key.Value as AnyOfValue)?.Forms.OfType<BlockValue>().FirstOrDefault();
            if (block is not null && s.Node is JsonObject o) yield return (o, block.Section);
        }
    }

    private static T Pick<T>(IReadOnlyList<T> items, Random rng) => items[rng.Next(items.Count)];

    private static QuantityValue? QuantityOf(SpecValue v) => v switch
    {
        QuantityValue q => q,
        AnyOfValue a => a.Forms.OfType<QuantityValue>().FirstOrDefault(),
        ListValue { Item: QuantityValue q } => q,
        _ => null,
    };

    /// <summary>A change that a valid spec may survive: a unit or spelling variant, a removed optional key, another word or count.</summary>
    public static void Benign(JsonObject doc, Random rng)
    {
        var sites = Sites(doc);
        var site = Pick(sites, rng);
        switch (rng.Next(6))
        {
            case 0:
                if (!site.Key.Required) site.Parent.Remove(site.Key.Name);
                break;
            case 1:
                if (site.Node is JsonValue v && v.TryGetValue(out string? text) && QuantityOf(site.Key.Value) is not null) site.Set(Respell(text, rng));
                else if (site.Node is JsonArray arr && arr.Count > 0 && arr[0] is JsonValue a0 && a0.TryGetValue(out string? t0))
                    arr[0] = Respell(t0, rng);
                break;
            case 2:
                if (site.Key.Value is ChoiceValue c && site.Node is JsonValue cv && cv.TryGetValue(out string? word))
                    site.Set(rng.Next(3) switch
                    {
                        0 => Pick(c.Words, rng),
                        1 => c.Folding == WordFolding.Words ? word.ToUpperInvariant().Replace('-', '_') : word.ToUpperInvariant(),
                        _ => c.Folding == WordFolding.Words ? word.Replace('-', ' ') : "  " + word,
                    });
                break;
            case 3:
                if (site.Key.Value is IntegerValue iv && site.Node is JsonValue n && n.TryGetValue(out long cur))
                {
                    long hi = Math.Min(iv.Maximum, iv.Minimum + 40);
                    site.Set(rng.Next(2) == 0 ? JsonValue.Create(cur.ToString(CultureInfo.InvariantCulture)) : JsonValue.Create(rng.NextInt64(iv.Minimum, hi + 1)));
                }
                break;
            case 4:
                var (obj, section) = Pick(Blocks(doc).ToList(), rng);
                var absent = section.Keys.Where(k => !obj.ContainsKey(k.Name) && k.Default is not null).ToList();
                if (absent.Count > 0)
                {
                    var k = Pick(absent, rng);
                    obj[k.Name] = k.Default switch { string s => JsonValue.Create(s), long l => JsonValue.Create(l), double d => JsonValue.Create(d), _ => null };
                }
                break;
            default:
                if (site.Key.Value is NumberValue && site.Node is JsonValue nv && nv.TryGetValue(out double x))
                    site.Set(JsonValue.Create(x.ToString("R", CultureInfo.InvariantCulture)));
                break;
        }
    }

    /// <summary>The same quantity written another way: without the space, in another letter case, or in a smaller unit.</summary>
    private static string Respell(string text, Random rng)
    {
        var m = NumberAndUnit().Match(text);
        if (!m.Success) return text;
        string num = m.Groups["num"].Value, unit = m.Groups["unit"].Value;
        double x = double.Parse(num, CultureInfo.InvariantCulture);
        return rng.Next(3) switch
        {
            0 => num + unit,
            1 => unit switch { "GHz" => $"{num} ghz", "mm" => $"{num} MM", "dB" => $"{num} db", _ => $"{num}  {unit}" },
            _ => unit switch
            {
                "GHz" => (x * 1000).ToString("R", CultureInfo.InvariantCulture) + " MHz",
                "mm" => (x * 1000).ToString("R", CultureInfo.InvariantCulture) + " um",
                "kW" => (x * 1000).ToString("R", CultureInfo.InvariantCulture) + " W",
                _ => text,
            },
        };
    }

    /// <summary>Applies one structural error of <paramref name="kind"/>; returns what was done, for messages.</summary>
    public static string Break(JsonObject doc, Structural kind, Random rng)
    {
        var sites = Sites(doc);
        switch (kind)
        {
            case Structural.UnknownKey:
            {
                var (obj, section) = Pick(Blocks(doc).ToList(), rng);
                string key = Pick(["colour", "polarisation", "gain", "notes", "feed_type", "slot_count"], rng);
                obj[key] = "x";
                return $"added '{key}' in '{section.Path}'";
            }
            case Structural.MisspeltKey:
            {
                var site = Pick(sites.Where(s => s.Key.Name.Length >= 3).ToList(), rng);
                string name = site.Key.Name, bad;
                do
                {
                    int i = rng.Next(name.Length - 1);
                    bad = rng.Next(3) switch
                    {
                        0 => name[..i] + name[i + 1] + name[i] + name[(i + 2)..],
                        1 => name.Remove(i, 1),
                        _ => name.Insert(i, name[i].ToString()),
                    };
                } while (bad == name || site.Section.Names.Contains(bad));
                var value = site.Node?.DeepClone();
                site.Parent.Remove(name);
                site.Parent[bad] = value;
                return $"'{site.Section.Path}.{name}' written '{bad}'";
            }
            case Structural.WrongType:
            {
                var site = Pick(sites, rng);
                var node = site.Node;
                JsonNode? replacement = node switch
                {
                    JsonObject => JsonValue.Create("yes"),
                    JsonArray a => a.Count > 0 ? a[0]!.DeepClone() : JsonValue.Create(1),
                    _ => rng.Next(2) == 0 ? new JsonArray(node?.DeepClone()) : new JsonObject { ["value"] = node?.DeepClone() },
                };
                site.Set(replacement);
                return $"'{site.Section.Path}.{site.Key.Name}' became {replacement?.ToJsonString()}";
            }
            case Structural.UnknownWord:
            {
                var site = Pick(sites.Where(s => s.Key.Value is ChoiceValue).ToList(), rng);
                string word = Pick(["bogus", "hexagonal", "sideways", "WR-91", "plutonium", site.Node!.ToString() + "x"], rng);
                site.Set(word);
                return $"'{site.Key.Name}: {word}'";
            }
            case Structural.NumberWithoutUnit:
            {
                var site = Pick(sites.Where(s => QuantityOf(s.Key.Value) is not null && s.Node is JsonValue v && v.TryGetValue(out string? _)).ToList(), rng);
                string num = NumberAndUnit().Match(site.Node!.GetValue<string>()).Groups["num"].Value;
                site.Set(rng.Next(2) == 0 ? JsonValue.Create(double.Parse(num, CultureInfo.InvariantCulture)) : JsonValue.Create(num));
                return $"'{site.Key.Name}: {num}'";
            }
            case Structural.CountOutOfRange:
            {
                var candidates = sites.Where(s => s.Key.Value is IntegerValue { Minimum: var lo, Maximum: var hi } && lo < hi).ToList();
                var site = Pick(candidates, rng);
                var iv = (IntegerValue)site.Key.Value;
                long bad = rng.Next(3) switch { 0 => iv.Minimum - 1 - rng.Next(3), 1 => iv.Maximum + 1 + rng.Next(1000), _ => -1 - rng.Next(100) };
                if (bad >= iv.Minimum) bad = iv.Minimum - 1;
                site.Set(JsonValue.Create(bad));
                return $"'{site.Key.Name}: {bad}'";
            }
            default:
                throw new ArgumentOutOfRangeException(nameof(kind));
        }
    }
}
