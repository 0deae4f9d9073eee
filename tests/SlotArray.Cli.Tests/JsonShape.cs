using System.Text.Json;

namespace SlotArray.Cli.Tests;

/// <summary>
/// The shape of a JSON document without its values: one line per key path and the kinds of value seen there
/// ("design.slots[].offset_m: number, null"), arrays merged over their elements, in the order first met.
/// </summary>
internal static class JsonShape
{
    public static string Of(JsonElement root)
    {
        var kinds = new Dictionary<string, SortedSet<string>>(StringComparer.Ordinal);
        var order = new List<string>();
        void Note(string path, string kind)
        {
            if (!kinds.TryGetValue(path, out var set))
            {
                kinds[path] = set = new SortedSet<string>(StringComparer.Ordinal);
                order.Add(path);
            }
            set.Add(kind);
        }
        void Walk(JsonElement e, string path)
        {
            Note(path, Kind(e.ValueKind));
            if (e.ValueKind == JsonValueKind.Object)
                foreach (var p in e.EnumerateObject()) Walk(p.Value, path.Length == 0 ? p.Name : path + "." + p.Name);
            else if (e.ValueKind == JsonValueKind.Array)
                foreach (var item in e.EnumerateArray()) Walk(item, path + "[]");
        }
        Walk(root, "");
        return string.Concat(order.Select(p => $"{(p.Length == 0 ? "(root)" : p)}: {string.Join(", ", kinds[p])}\n"));
    }

    private static string Kind(JsonValueKind k) => k switch
    {
        JsonValueKind.Object => "object",
        JsonValueKind.Array => "array",
        JsonValueKind.String => "string",
        JsonValueKind.Number => "number",
        JsonValueKind.True or JsonValueKind.False => "boolean",
        JsonValueKind.Null => "null",
        _ => k.ToString(),
    };
}
