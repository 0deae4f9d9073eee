using SlotArray.Core.Design;
using SlotArray.Core.Slots.Tables;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Spec.Yaml;

internal sealed partial class SpecBuilder
{
    /// <summary>
    /// <c>slots.data</c> (a slot table, path relative to the spec; read, parsed and fitted here so that its errors come
    /// back as spec errors at the key, with the table's own line and column) and <c>slots.extrapolate</c>.
    /// </summary>
    private (SlotTable? Table, bool Extrapolate, bool Ok) SlotData(Section s, SlotType? type, RectangularWaveguide? guide)
    {
        bool ok = true;
        bool extrapolate = false;
        if (s.Has("extrapolate"))
        {
            var sc = Scalar(s, "extrapolate", false, "true");
            if (sc is null) ok = false;
            else if (sc.Value is "true" or "True" or "TRUE") extrapolate = true;
            else if (sc.Value is not ("false" or "False" or "FALSE")) { D.Error(sc, $"'extrapolate' is true or false, not '{sc.Value}'"); ok = false; }
            if (!s.Has("data")) { D.Error((SpecNode?)sc ?? s.Anchor, "'extrapolate' applies to a slot table: give 'data: my-slots.csv' too, or remove it"); ok = false; }
        }
        if (!s.Has("data")) return (null, extrapolate, ok);
        if (s.Has("model")) { D.Error(s["model"]!, "give 'model' (a built-in slot model) or 'data' (your own slot table), not both: the table replaces the model"); ok = false; }
        var node = Scalar(s, "data", false, "my-slots.csv");
        if (node is null || type is null || guide is null) return (null, extrapolate, false);
        string name = node.Value.Trim();
        string baseDir = Path.GetDirectoryName(Path.GetFullPath(D.File)) ?? ".";
        string path = Path.Combine(baseDir, name);
        byte[] bytes;
        try { bytes = File.ReadAllBytes(path); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            D.Error(node, $"cannot read the slot table '{name}' ({e.Message}); the path is relative to the spec's folder {baseDir}");
            return (null, extrapolate, false);
        }
        var geometry = type switch
        {
            SlotType.Longitudinal => SlotTableGeometry.Longitudinal,
            SlotType.Edge => SlotTableGeometry.Edge,
            _ => SlotTableGeometry.InclinedSeries,
        };
        try
        {
            var table = SlotTableCsv.Parse(bytes, name, geometry);
            SlotTableFit.Fit(table, guide);   // the fit's own checks (resonance in every row group, g_r increasing, …)
            return (table, extrapolate, ok);
        }
        catch (SlotTableException e)
        {
            string at = e.Line > 0 ? (e.Column > 0 ? $"{name}:{e.Line}:{e.Column}" : $"{name}:{e.Line}") : name;
            D.Error(node, $"slot table {at}: {e.Message}");
            return (null, extrapolate, false);
        }
    }
}
