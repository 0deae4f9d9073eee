namespace SlotArray.FullWave.Model;

/// <summary>
/// One axis of a graded rectilinear mesh: lines on every geometry edge (so slot lengths, offsets and walls are
/// exact on the grid), cells no larger than the local size asked at each edge near it, growing away from it by at
/// most the grading ratio and never above the largest cell. Grading of 1.3–1.5 between neighbouring FDTD cells
/// is common practice (no source).
/// </summary>
internal static class MeshBuilder
{
    /// <summary>Mesh lines, mm, ascending, from the anchors (edge position and local cell size there, mm).</summary>
    /// <param name="anchors">Geometry edges with the cell size wanted at each, mm; at least two distinct positions.</param>
    /// <param name="largestCellMm">Largest cell anywhere, mm, &gt; 0.</param>
    /// <param name="grading">Largest ratio of neighbouring cells, &gt; 1; default 1.4.</param>
    /// <param name="mergeMm">Edges closer than this share one line (at their mean), mm; default 0.001. Near-coincident
    /// edges (e.g. slots at 2.825 and 2.852 mm offsets) would otherwise force a sliver cell that sets a tiny time step.</param>
    public static IReadOnlyList<double> Lines(IEnumerable<(double AtMm, double CellMm)> anchors, double largestCellMm, double grading = 1.4,
        double mergeMm = 1e-3)
    {
        if (!(largestCellMm > 0)) throw new ArgumentOutOfRangeException(nameof(largestCellMm), largestCellMm, "the largest cell must be positive");
        if (!(grading > 1)) throw new ArgumentOutOfRangeException(nameof(grading), grading, "the grading ratio must be above 1");
        // Merge anchors closer than mergeMm into their mean, keeping the finer cell; the outermost stay where they are.
        var sorted = anchors.OrderBy(a => a.AtMm).ToList();
        var groups = new List<List<(double At, double Cell)>>();
        foreach (var a in sorted)
        {
            if (groups.Count > 0 && a.AtMm - groups[^1][0].At < Math.Max(mergeMm, 1e-3)) groups[^1].Add((a.AtMm, a.CellMm));
            else groups.Add([(a.AtMm, a.CellMm)]);
        }
        var fixedLines = groups.Select((g, i) => (At: i == 0 ? g[0].At : i == groups.Count - 1 ? g[^1].At : g.Average(x => x.At),
            Cell: Math.Min(g.Min(x => x.Cell), largestCellMm))).ToList();
        if (fixedLines.Count < 2) throw new ArgumentException("a mesh axis needs at least two distinct edges", nameof(anchors));
        // The finest cell an anchor asks also limits its neighbours' graded reach.
        var result = new List<double> { fixedLines[0].At };
        for (int i = 0; i + 1 < fixedLines.Count; i++)
        {
            var (p, hp) = fixedLines[i];
            var (q, hq) = fixedLines[i + 1];
            result.AddRange(Fill(p, q, hp, hq, largestCellMm, grading));
            result.Add(q);
        }
        return result;
    }

    /// <summary>Interior lines of the gap (p, q): cells start at hp from p and hq from q, grow by the ratio, cap at hmax.</summary>
    private static IEnumerable<double> Fill(double p, double q, double hp, double hq, double hmax, double r)
    {
        var left = new List<double>();
        var right = new List<double>();
        double x = p, y = q, hl = hp, hr = hq;
        while (true)
        {
            double gap = y - x;
            if (gap <= Math.Max(hl, hr) * 1.0000001) break;
            if (hl <= hr) { x += hl; left.Add(x); hl = Math.Min(hl * r, hmax); }
            else { y -= hr; right.Add(y); hr = Math.Min(hr * r, hmax); }
        }
        // A sliver left in the middle: move the line beside it to halve the last two cells instead.
        double last = y - x;
        double neighbour = Math.Min(left.Count > 0 ? hl / r : hp, right.Count > 0 ? hr / r : hq);
        if (last < 0.5 * neighbour)
        {
            if (left.Count > 0 && (right.Count == 0 || hl <= hr))
            {
                double before = left.Count > 1 ? left[^2] : p;
                left[^1] = 0.5 * (before + y);
            }
            else if (right.Count > 0)
            {
                double before = right.Count > 1 ? right[^2] : q;
                right[^1] = 0.5 * (before + x);
            }
        }
        right.Reverse();
        return left.Concat(right);
    }
}
