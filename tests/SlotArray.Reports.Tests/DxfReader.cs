using System.Globalization;

namespace SlotArray.Reports.Tests;

/// <summary>One DXF entity as read back: type, layer and its numeric group codes (10/20 start or centre, 11/21 end, 40 radius, 50/51 angles).</summary>
internal sealed record DxfEntity(string Type, string Layer, IReadOnlyDictionary<int, double> Values, string? Text)
{
    public double this[int code] => Values[code];
}

/// <summary>
/// A small independent DXF reader for the tests: the file is a sequence of (group code, value) line pairs (Autodesk
/// "DXF Reference", group codes; from memory of the public reference). Reads the ENTITIES section's LINE, ARC, CIRCLE
/// and TEXT entities and the header variables; anything malformed throws.
/// </summary>
internal static class DxfReader
{
    public static (Dictionary<string, string> Header, List<string> Layers, List<DxfEntity> Entities) Read(string text)
    {
        var lines = text.Split("\r\n");
        if (lines[^1] == "") lines = lines[..^1];
        if (lines.Length % 2 != 0) throw new FormatException("a DXF file is a sequence of code/value line pairs");
        var pairs = Enumerable.Range(0, lines.Length / 2).Select(i => (Code: int.Parse(lines[2 * i].Trim(), CultureInfo.InvariantCulture), Value: lines[2 * i + 1])).ToList();
        if (pairs[^1] != (0, "EOF")) throw new FormatException("no EOF");
        var header = new Dictionary<string, string>();
        var layers = new List<string>();
        var entities = new List<DxfEntity>();
        string section = "";
        for (int i = 0; i < pairs.Count; i++)
        {
            var (code, value) = pairs[i];
            if (code == 0 && value == "SECTION") { section = pairs[++i].Value; continue; }
            if (section == "HEADER" && code == 9) header[value] = pairs[i + 1].Value;
            if (section == "TABLES" && code == 0 && value == "LAYER") layers.Add(pairs[i + 1].Value);
            if (section == "ENTITIES" && code == 0 && value is "LINE" or "ARC" or "CIRCLE" or "TEXT")
            {
                string layer = "";
                string? txt = null;
                var values = new Dictionary<int, double>();
                int j = i + 1;
                for (; j < pairs.Count && pairs[j].Code != 0; j++)
                {
                    if (pairs[j].Code == 8) layer = pairs[j].Value;
                    else if (pairs[j].Code == 1) txt = pairs[j].Value;
                    else values[pairs[j].Code] = double.Parse(pairs[j].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
                }
                entities.Add(new DxfEntity(value, layer, values, txt));
                i = j - 1;
            }
        }
        return (header, layers, entities);
    }
}
