using System.Text;

namespace SlotArray.Reports.Dxf;

/// <summary>
/// A small ASCII DXF writer: a header (AutoCAD R12 format, AC1009, which CAM and CAD programs commonly open), a layer
/// table, and LINE, ARC, CIRCLE and TEXT entities, each on a named layer. Every value is written as a group code line
/// and a value line ("\r\n" line ends, as AutoCAD writes them), numbers in invariant culture with 6 decimals (1 nm in
/// mm). Format: Autodesk, "DXF Reference" (group codes 0/2/8/10–40/50–51/62/70/72; HEADER, TABLES, ENTITIES
/// sections; from memory of the public reference).
/// </summary>
internal sealed class DxfWriter
{
    private readonly StringBuilder _entities = new();
    private readonly List<(string Name, int Colour)> _layers = [];

    /// <summary>Declares a layer (ACI colour 1–255); layers appear in the table in declaration order.</summary>
    /// <param name="name">Layer name, upper-case letters, digits, '-' or '_'.</param>
    /// <param name="colour">AutoCAD colour index, 1 … 255.</param>
    public void Layer(string name, int colour)
    {
        if (string.IsNullOrEmpty(name) || name.Any(c => !(char.IsAsciiLetterUpper(c) || char.IsAsciiDigit(c) || c is '-' or '_')))
            throw new ArgumentException($"layer name '{name}': use upper-case letters, digits, '-' or '_'", nameof(name));
        if (colour is < 1 or > 255) throw new ArgumentOutOfRangeException(nameof(colour), colour, "the colour index must be 1 to 255");
        if (_layers.Any(l => l.Name == name)) throw new ArgumentException($"layer {name} is declared twice", nameof(name));
        _layers.Add((name, colour));
    }

    /// <summary>A line from (x1, y1) to (x2, y2), mm.</summary>
    public void Line(string layer, double x1, double y1, double x2, double y2)
    {
        Entity("LINE", layer);
        Point(10, x1, y1);
        Point(11, x2, y2);
    }

    /// <summary>A counter-clockwise arc, mm and degrees.</summary>
    public void Arc(string layer, double cx, double cy, double radius, double startDeg, double endDeg)
    {
        Entity("ARC", layer);
        Point(10, cx, cy);
        Pair(40, Num(radius));
        Pair(50, Num(startDeg));
        Pair(51, Num(endDeg));
    }

    /// <summary>A circle, mm.</summary>
    public void Circle(string layer, double cx, double cy, double radius)
    {
        Entity("CIRCLE", layer);
        Point(10, cx, cy);
        Pair(40, Num(radius));
    }

    /// <summary>A single-line text with its insertion point at the lower left, height in mm.</summary>
    public void Text(string layer, double x, double y, double height, string text)
    {
        Entity("TEXT", layer);
        Point(10, x, y);
        Pair(40, Num(height));
        Pair(1, Ascii(text));
    }

    /// <summary>The whole file: HEADER (version, metric drawing, units mm), TABLES (LTYPE, LAYER), ENTITIES, EOF.</summary>
    public string Build(double minX, double minY, double maxX, double maxY)
    {
        var sb = new StringBuilder();
        void P(int code, string value) { sb.Append(code.ToString(System.Globalization.CultureInfo.InvariantCulture)).Append("\r\n").Append(value).Append("\r\n"); }
        P(0, "SECTION"); P(2, "HEADER");
        P(9, "$ACADVER"); P(1, "AC1009");
        P(9, "$INSBASE"); P(10, Num(0)); P(20, Num(0)); P(30, Num(0));
        P(9, "$EXTMIN"); P(10, Num(minX)); P(20, Num(minY)); P(30, Num(0));
        P(9, "$EXTMAX"); P(10, Num(maxX)); P(20, Num(maxY)); P(30, Num(0));
        P(9, "$MEASUREMENT"); P(70, "1");
        P(9, "$INSUNITS"); P(70, "4");
        P(0, "ENDSEC");
        P(0, "SECTION"); P(2, "TABLES");
        P(0, "TABLE"); P(2, "LTYPE"); P(70, "1");
        P(0, "LTYPE"); P(2, "CONTINUOUS"); P(70, "0"); P(3, "Solid line"); P(72, "65"); P(73, "0"); P(40, Num(0));
        P(0, "ENDTAB");
        P(0, "TABLE"); P(2, "LAYER"); P(70, _layers.Count.ToString(System.Globalization.CultureInfo.InvariantCulture));
        foreach (var (name, colour) in _layers)
        {
            P(0, "LAYER"); P(2, name); P(70, "0"); P(62, colour.ToString(System.Globalization.CultureInfo.InvariantCulture)); P(6, "CONTINUOUS");
        }
        P(0, "ENDTAB");
        P(0, "ENDSEC");
        P(0, "SECTION"); P(2, "ENTITIES");
        sb.Append(_entities);
        P(0, "ENDSEC");
        P(0, "EOF");
        return sb.ToString();
    }

    private void Entity(string type, string layer)
    {
        if (_layers.All(l => l.Name != layer)) throw new ArgumentException($"layer {layer} is not declared", nameof(layer));
        Pair(0, type);
        Pair(8, layer);
    }

    private void Point(int code, double x, double y)
    {
        Pair(code, Num(x));
        Pair(code + 10, Num(y));
        Pair(code + 20, Num(0));
    }

    private void Pair(int code, string value) =>
        _entities.Append(code.ToString(System.Globalization.CultureInfo.InvariantCulture)).Append("\r\n").Append(value).Append("\r\n");

    /// <summary>A number with 6 decimals, invariant culture, no negative zero.</summary>
    private static string Num(double v)
    {
        if (!double.IsFinite(v)) throw new ArgumentOutOfRangeException(nameof(v), v, "DXF coordinates must be finite");
        string s = v.ToString("0.000000", System.Globalization.CultureInfo.InvariantCulture);
        return s == "-0.000000" ? "0.000000" : s;
    }

    /// <summary>R12 text is 8-bit: anything outside printable ASCII becomes '?' (e.g. the degree sign is written "deg").</summary>
    private static string Ascii(string text) => new([.. text.Select(c => c is >= ' ' and <= '~' ? c : '?')]);
}
