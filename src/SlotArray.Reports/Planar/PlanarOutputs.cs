using System.Text;
using SlotArray.Core.Planar;

namespace SlotArray.Reports.Planar;

/// <summary>
/// Every output file of a planar design, rendered in memory and written atomically at folder level (as the linear
/// design's): design.json, summary.md, input.s1p, cutlist-branch-NN.csv, cutlist-feed.csv, plate.svg, plate.dxf,
/// feed-wall.dxf, pattern-uv.png, pattern-cuts.png, sweep.png.
/// </summary>
internal static class PlanarOutputs
{
    /// <summary>Every name a planar design may write (the branch cut lists for up to 200 branches), for the output-folder check.</summary>
    public static IReadOnlyList<string> PossibleNames { get; } =
    [
        "design.json", "summary.md", "input.s1p", "cutlist-feed.csv", "plate.svg", "plate.dxf", "feed-wall.dxf", "pattern-uv.png",
        "pattern-cuts.png", "sweep.png", .. Enumerable.Range(1, 200).Select(b => $"cutlist-branch-{b:00}.csv"),
    ];

    /// <summary>The files, in order.</summary>
    public static IReadOnlyList<(string Name, byte[] Bytes)> Render(PlanarResult r, double? designSidelobesDb)
    {
        ArgumentNullException.ThrowIfNull(r);
        var utf8 = new UTF8Encoding(false);
        var list = new List<(string, byte[])>
        {
            ("design.json", utf8.GetBytes(PlanarJson.ToText(r))),
            ("summary.md", utf8.GetBytes(PlanarSummary.Markdown(r, designSidelobesDb))),
            ("input.s1p", utf8.GetBytes(Touchstone(r))),
        };
        foreach (var b in r.Design.Branches)
            list.Add(($"cutlist-branch-{b.Number:00}.csv", utf8.GetBytes(PlanarFabrication.BranchCutList(r, b))));
        list.Add(("cutlist-feed.csv", utf8.GetBytes(PlanarFabrication.FeedCutList(r))));
        list.Add(("plate.svg", utf8.GetBytes(PlanarFabrication.PlateSvg(r))));
        list.Add(("plate.dxf", Encoding.ASCII.GetBytes(PlanarFabrication.PlateDxf(r))));
        list.Add(("feed-wall.dxf", Encoding.ASCII.GetBytes(PlanarFabrication.FeedDxf(r))));
        var plots = new byte[3][];
        Parallel.For(0, 3, i => plots[i] = i switch
        {
            0 => PlanarPlots.UvMap(r),
            1 => PlanarPlots.Cuts(r, designSidelobesDb),
            _ => PlanarPlots.Sweep(r),
        });
        list.Add(("pattern-uv.png", plots[0]));
        list.Add(("pattern-cuts.png", plots[1]));
        list.Add(("sweep.png", plots[2]));
        return list;
    }

    /// <summary>Writes them into <paramref name="directory"/> (replaced whole on success, untouched on failure).</summary>
    public static IReadOnlyList<string> WriteAll(PlanarResult r, double? designSidelobesDb, string directory)
    {
        var files = Render(r, designSidelobesDb);
        OutputFolder.WriteRendered(directory, PossibleNames, () => files);
        return [.. files.Select(f => f.Name)];
    }

    private static string Touchstone(PlanarResult r)
    {
        var sb = new StringBuilder();
        sb.Append("! SlotArray input reflection of planar array '").Append(r.Design.Name).Append("' at the feed guide's input\n");
        sb.Append("! normalised to the feed guide's TE10 wave impedance (R 1); frequency in Hz, Re(S11), Im(S11)\n");
        sb.Append(TouchstoneWriter.OptionLine).Append('\n');
        foreach (var p in r.Sweep)
            sb.Append(Invariant.Fixed(p.Frequency.Hertz, 3)).Append(' ').Append(Invariant.Fixed(p.S11.Real, 9)).Append(' ').Append(Invariant.Fixed(p.S11.Imaginary, 9)).Append('\n');
        return sb.ToString();
    }
}
