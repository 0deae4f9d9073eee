using OxyPlot;
using SkiaPng = OxyPlot.SkiaSharp.PngExporter;
using SkiaSvg = OxyPlot.SkiaSharp.SvgExporter;

namespace SlotArray.Reports.Plots;

/// <summary>
/// Exports an OxyPlot model to PNG or SVG through SkiaSharp (headless). The core OxyPlot SVG exporter
/// mislays text, so the Skia one is used for both formats.
/// </summary>
internal static class PlotExport
{
    /// <summary>The font every plot uses; DejaVu Sans ships with fonts-dejavu-core on Debian.</summary>
    public const string Font = "DejaVu Sans";

    /// <summary>A new white plot model with the house font and a title.</summary>
    public static PlotModel NewModel(string title) => new()
    {
        Title = title,
        Background = OxyColors.White,
        DefaultFont = Font,
        TitleFontSize = 14,
        DefaultFontSize = 12,
    };

    /// <summary>Writes the plot to a stream in the given format ("png" or "svg").</summary>
    public static void Write(PlotModel model, Stream stream, string format, int width = 900, int height = 520)
    {
        IExporter exporter = format.ToLowerInvariant() switch
        {
            "png" => new SkiaPng { Width = width, Height = height },
            "svg" => new SkiaSvg { Width = width, Height = height },
            _ => throw new ArgumentException($"unsupported plot format '{format}': use png or svg", nameof(format)),
        };
        if (exporter is SkiaSvg)
        {
            // The Skia SVG canvas numbers its clip paths (cl_ plus a hex number) from a process-wide counter, so the same plot written twice
            // in one process differed; renumber them in order of appearance to make the file deterministic.
            using var buffer = new MemoryStream();
            exporter.Export(model, buffer);
            string svg = System.Text.Encoding.UTF8.GetString(buffer.ToArray());
            var ids = new Dictionary<string, string>(StringComparer.Ordinal);
            svg = System.Text.RegularExpressions.Regex.Replace(svg, @"\bcl_[0-9a-fA-F]+\b", m =>
            {
                if (!ids.TryGetValue(m.Value, out string? id)) ids[m.Value] = id = "cl_" + (ids.Count + 1).ToString(System.Globalization.CultureInfo.InvariantCulture);
                return id;
            });
            byte[] bytes = new System.Text.UTF8Encoding(false).GetBytes(svg);
            stream.Write(bytes, 0, bytes.Length);
            return;
        }
        exporter.Export(model, stream);
    }

    /// <summary>Writes the plot to a file atomically (temporary file in the same folder, then moved into place).</summary>
    public static void WriteFile(PlotModel model, string path, int width = 900, int height = 520)
    {
        string format = Path.GetExtension(path).TrimStart('.');
        AtomicFile.Write(path, s => Write(model, s, format, width, height));
    }
}
