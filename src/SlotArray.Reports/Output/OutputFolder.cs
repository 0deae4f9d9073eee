using System.Text;
using SlotArray.Reports.Model;
using SlotArray.Reports.Plots;

namespace SlotArray.Reports;

/// <summary>One file of the output folder: its name and the writer that fills it.</summary>
/// <param name="Name">File name inside the folder, e.g. "design.json".</param>
/// <param name="Write">Writes the file's bytes for a report to a stream.</param>
internal sealed record OutputFile(string Name, Action<DesignReport, Stream> Write)
{
    /// <summary>
    /// For an entry that writes a varying set of files (drawing sheets, one DXF per face): the files for a report,
    /// name and bytes; null for a single file (<see cref="Name"/>, <see cref="Write"/>).
    /// </summary>
    public Func<DesignReport, IReadOnlyList<(string Name, byte[] Bytes)>>? Many { get; init; }

    /// <summary>For a <see cref="Many"/> entry: whether a file name is one this entry may write (so a later run may replace it).</summary>
    public Func<string, bool>? Owns { get; init; }
}

/// <summary>
/// Writes the whole output folder of <c>design</c> (architecture.md, "Output folder of design") atomically at
/// folder level. Every file is written into a temporary sibling folder; only when all succeeded is that folder moved
/// into place. Policy: a failed run leaves no new files and keeps an existing older output folder intact; a
/// successful run replaces an existing output folder whole (no file of an older design run survives; a
/// <c>tolerance</c> run's files are carried over). To protect a user's other work, an existing folder is replaced only
/// if it is empty or holds nothing but files of this tool; otherwise the run fails before writing anything, naming the
/// foreign entries (<see cref="OutputFolderCheck"/>, which commands also call before computing).
/// </summary>
internal static class OutputFolder
{
    /// <summary>The files of the output folder, in the order they are written.</summary>
    public static readonly IReadOnlyList<OutputFile> Files =
    [
        new("design.json", DesignJson.Write),
        new("cutlist.csv", Text(CutListCsv.Write)),
        new("layout.svg", Text(LayoutSvg.Write))
        {
            Many = r => [.. LayoutSvg.Sheets(r).Select(p => (p.Name, Utf8(p.Text)))],
            Owns = n => n == "layout.svg" || System.Text.RegularExpressions.Regex.IsMatch(n, "^layout-[0-9]+\\.svg$"),
        },
        new("face-broad.dxf", Text(Dxf.GuideFaceDxf.Write))
        {
            Many = r => [.. Dxf.GuideFaceDxf.Files(r).Select(p => (p.Name, Utf8(p.Text)))],
            Owns = n => System.Text.RegularExpressions.Regex.IsMatch(n, "^face-[a-z-]+\\.dxf$"),
        },
        new("pattern.png", (r, s) => PlotExport.Write(DesignPlots.Pattern(r), s, "png")),
        new("pattern.svg", (r, s) => PlotExport.Write(DesignPlots.Pattern(r), s, "svg")),
        new("taper.png", (r, s) => PlotExport.Write(DesignPlots.Taper(r), s, "png")),
        new("slots.png", (r, s) => PlotExport.Write(DesignPlots.Slots(r), s, "png")),
        new("sweep.png", (r, s) => PlotExport.Write(DesignPlots.Sweep(r), s, "png", 900, DesignPlots.SweepHeight)),
        new("scan.png", (r, s) => PlotExport.Write(ScanPlot.Build(r), s, "png", 900, ScanPlot.Height(r))),
        new("vertical.png", (r, s) => PlotExport.Write(DesignPlots.Vertical(r), s, "png"))
        {
            Many = r => r.Flare is null ? [] : [("vertical.png", PlotBytes(DesignPlots.Vertical(r)))],
            Owns = n => n == "vertical.png",
        },
        new("parts.csv", (r, s) => s.Write(Utf8(PartsCsv.ToText(r))))
        {
            Many = r => r.Parts.Count == 0 ? [] : [("parts.csv", Utf8(PartsCsv.ToText(r)))],
            Owns = n => n == "parts.csv",
        },
        new("parts.svg", (r, s) => s.Write(Utf8(PartsSvg.Build(r) ?? "")))
        {
            Many = r => PartsSvg.Build(r) is { } svg ? [("parts.svg", Utf8(svg))] : [],
            Owns = n => n == "parts.svg",
        },
        new("input.s1p", Text(TouchstoneWriter.Write)),
        new("summary.md", Text(SummaryMarkdown.Write)),
        new("spec.yaml", (r, s) => s.Write(new UTF8Encoding(false).GetBytes(r.SpecText ?? "# the spec's text was not given to this writer\n"))),
        new(DesignReport.SlotTableFileName, (r, s) => s.Write(r.SlotTableBytes ?? []))
        {
            Many = r => r.SlotTableBytes is { } bytes ? [(DesignReport.SlotTableFileName, bytes)] : [],
            Owns = n => n == DesignReport.SlotTableFileName,
        },
    ];

    /// <summary>Writes every file of <see cref="Files"/> for <paramref name="report"/> into <paramref name="directory"/>.</summary>
    /// <exception cref="OutputFolderException">The folder cannot be used (<see cref="OutputFolderCheck.Prepare"/>).</exception>
    /// <exception cref="IOException">A file system operation failed.</exception>
    public static void WriteAll(DesignReport report, string directory) => WriteAll(report, directory, Files);

    /// <summary>Writes the given files atomically at folder level (see the class remarks); the seam for failure tests.</summary>
    internal static void WriteAll(DesignReport report, string directory, IReadOnlyList<OutputFile> files)
        => WriteRendered(directory, files.Select(f => f.Name), () =>
        {
            // Render every file in memory in parallel (the plots dominate), then write them in the fixed order.
            var rendered = new IReadOnlyList<(string Name, byte[] Bytes)>[files.Count];
            try
            {
                Parallel.For(0, files.Count, i =>
                {
                    if (files[i].Many is { } many)
                    {
                        rendered[i] = many(report);
                        return;
                    }
                    using var ms = new MemoryStream();
                    files[i].Write(report, ms);
                    rendered[i] = [(files[i].Name, ms.ToArray())];
                });
            }
            catch (AggregateException e) when (e.InnerExceptions.Count > 0)
            {
                // a writer's own exception (not the AggregateException wrapper), as a sequential run throws it
                System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            }
            return [.. rendered.SelectMany(r => r)];
        });

    /// <summary>
    /// Writes the files <paramref name="render"/> returns into <paramref name="directory"/>, atomically at folder level: a
    /// sibling temporary folder is filled and then swapped in whole (see the class remarks); <paramref name="names"/> are
    /// the names the run owns (for the folder check).
    /// </summary>
    internal static void WriteRendered(string directory, IEnumerable<string> names, Func<IReadOnlyList<(string Name, byte[] Bytes)>> render)
    {
        string target = OutputFolderCheck.Prepare(directory, replacesWhole: true, names);
        string parent = Path.GetDirectoryName(target)!;
        string leaf = Path.GetFileName(target);
        Directory.CreateDirectory(parent);
        string stamp = OutputFolderCheck.NewStamp();
        string temp = OutputFolderCheck.Sibling(parent, leaf, "tmp", stamp);
        string old = OutputFolderCheck.Sibling(parent, leaf, "old", stamp);
        Directory.CreateDirectory(temp);
        try
        {
            var rendered = render();
            foreach (var (name, data) in rendered)
            {
                using var fs = new FileStream(Path.Combine(temp, name), FileMode.CreateNew, FileAccess.Write, FileShare.None);
                fs.Write(data);
            }
            if (Directory.Exists(target))
            {
                // Another command's files (a tolerance run's) are not this run's to delete: they move with the new output.
                foreach (string name in OutputFolderCheck.ToleranceFiles.Where(n => rendered.All(f => f.Name != n)))
                    if (File.Exists(Path.Combine(target, name))) File.Copy(Path.Combine(target, name), Path.Combine(temp, name));
                Directory.Move(target, old);
                try { Directory.Move(temp, target); }
                catch
                {
                    Directory.Move(old, target); // put the older output back whole
                    throw;
                }
                Directory.Delete(old, recursive: true);
            }
            else
            {
                Directory.Move(temp, target);
            }
        }
        finally
        {
            if (Directory.Exists(temp)) Directory.Delete(temp, recursive: true);
        }
    }

    /// <summary>The names of the files <see cref="WriteAll(DesignReport, string)"/> writes for <paramref name="report"/>, in order.</summary>
    public static IReadOnlyList<string> NamesFor(DesignReport report) =>
        [.. Files.SelectMany(f => f.Many is { } many ? many(report).Select(p => p.Name) : [f.Name])];

    private static byte[] Utf8(string text) => new UTF8Encoding(false).GetBytes(text);

    private static byte[] PlotBytes(OxyPlot.PlotModel model)
    {
        using var stream = new MemoryStream();
        PlotExport.Write(model, stream, "png");
        return stream.ToArray();
    }

    /// <summary>Adapts a text writer to a stream: UTF-8 without byte-order mark, invariant culture.</summary>
    private static Action<DesignReport, Stream> Text(Action<DesignReport, TextWriter> write) => (r, s) =>
    {
        using var w = new StreamWriter(s, new UTF8Encoding(false), 1 << 16, leaveOpen: true);
        write(r, w);
    };
}
