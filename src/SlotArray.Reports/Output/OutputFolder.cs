using System.Text;
using SlotArray.Reports.Model;
using SlotArray.Reports.Plots;

namespace SlotArray.Reports;

/// <summary>One file of the output folder: its name and the writer that fills it.</summary>
/// <param name="Name">File name inside the folder, e.g. "design.json".</param>
/// <param name="Write">Writes the file's bytes for a report to a stream.</param>
public sealed record OutputFile(string Name, Action<DesignReport, Stream> Write);

/// <summary>
/// Writes the whole output folder of <c>design</c> (architecture.md, "Output folder of design") atomically at
/// folder level. Every file is written into a temporary sibling folder; only when all succeeded is that folder moved
/// into place. Policy: a failed run leaves no new files and keeps an existing older output folder intact; a
/// successful run replaces an existing output folder whole (no file of an older design run survives; a
/// <c>tolerance</c> run's files are carried over). To protect a user's other work, an existing folder is replaced only
/// if it is empty or holds nothing but files of this tool; otherwise the run fails before writing anything, naming the
/// foreign entries (<see cref="OutputFolderCheck"/>, which commands also call before computing).
/// </summary>
public static class OutputFolder
{
    /// <summary>The files of the output folder, in the order they are written.</summary>
    public static readonly IReadOnlyList<OutputFile> Files =
    [
        new("design.json", DesignJson.Write),
        new("cutlist.csv", Text(CutListCsv.Write)),
        new("layout.svg", Text(LayoutSvg.Write)),
        new("pattern.png", (r, s) => PlotExport.Write(DesignPlots.Pattern(r), s, "png")),
        new("pattern.svg", (r, s) => PlotExport.Write(DesignPlots.Pattern(r), s, "svg")),
        new("taper.png", (r, s) => PlotExport.Write(DesignPlots.Taper(r), s, "png")),
        new("slots.png", (r, s) => PlotExport.Write(DesignPlots.Slots(r), s, "png")),
        new("sweep.png", (r, s) => PlotExport.Write(DesignPlots.Sweep(r), s, "png")),
        new("scan.png", (r, s) => PlotExport.Write(ScanPlot.Build(r), s, "png")),
        new("input.s1p", Text(TouchstoneWriter.Write)),
        new("summary.md", Text(SummaryMarkdown.Write)),
    ];

    /// <summary>Writes every file of <see cref="Files"/> for <paramref name="report"/> into <paramref name="directory"/>.</summary>
    /// <exception cref="OutputFolderException">The folder cannot be used (<see cref="OutputFolderCheck.Prepare"/>).</exception>
    /// <exception cref="IOException">A file system operation failed.</exception>
    public static void WriteAll(DesignReport report, string directory) => WriteAll(report, directory, Files);

    /// <summary>Writes the given files atomically at folder level (see the class remarks); the seam for failure tests.</summary>
    internal static void WriteAll(DesignReport report, string directory, IReadOnlyList<OutputFile> files)
    {
        string target = OutputFolderCheck.Prepare(directory, replacesWhole: true, files.Select(f => f.Name));
        string parent = Path.GetDirectoryName(target)!;
        string leaf = Path.GetFileName(target);
        Directory.CreateDirectory(parent);
        string stamp = OutputFolderCheck.NewStamp();
        string temp = OutputFolderCheck.Sibling(parent, leaf, "tmp", stamp);
        string old = OutputFolderCheck.Sibling(parent, leaf, "old", stamp);
        Directory.CreateDirectory(temp);
        try
        {
            // Render every file in memory in parallel (the plots dominate), then write them in the fixed order.
            var bytes = new byte[files.Count][];
            try
            {
                Parallel.For(0, files.Count, i =>
                {
                    using var ms = new MemoryStream();
                    files[i].Write(report, ms);
                    bytes[i] = ms.ToArray();
                });
            }
            catch (AggregateException e) when (e.InnerExceptions.Count > 0)
            {
                // a writer's own exception (not the AggregateException wrapper), as a sequential run throws it
                System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            }
            for (int i = 0; i < files.Count; i++)
            {
                using var fs = new FileStream(Path.Combine(temp, files[i].Name), FileMode.CreateNew, FileAccess.Write, FileShare.None);
                fs.Write(bytes[i]);
            }
            if (Directory.Exists(target))
            {
                // Another command's files (a tolerance run's) are not this run's to delete: they move with the new output.
                foreach (string name in OutputFolderCheck.ToleranceFiles.Where(n => files.All(f => f.Name != n)))
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

    /// <summary>Adapts a text writer to a stream: UTF-8 without byte-order mark, invariant culture.</summary>
    private static Action<DesignReport, Stream> Text(Action<DesignReport, TextWriter> write) => (r, s) =>
    {
        using var w = new StreamWriter(s, new UTF8Encoding(false), 1 << 16, leaveOpen: true);
        write(r, w);
    };
}
