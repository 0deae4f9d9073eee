using SlotArray.Core.Design;
using SlotArray.Core.Tapers;

namespace SlotArray.Core.Planar;

/// <summary>
/// The 2-D amplitude taper of a planar aperture: either separable (a 1-D taper along the branches times one across
/// them) or Hansen's circular Taylor for the whole aperture.
/// </summary>
/// <param name="Along">Separable: the taper along x, synthesised over the bounding grid's N columns.</param>
/// <param name="Across">Separable: the taper across y, synthesised over the M branches.</param>
/// <param name="CircularSidelobesDb">Circular Taylor: design sidelobe level, negative dB; null for separable.</param>
/// <param name="CircularNbar">Circular Taylor: n̄.</param>
internal sealed record ApertureTaper(TaperRequest Along, TaperRequest Across, double? CircularSidelobesDb = null, int CircularNbar = 5)
{
    /// <summary>A circular Taylor taper (Hansen 1960).</summary>
    /// <param name="sidelobesDb">Design sidelobe level, negative dB.</param>
    /// <param name="nbar">n̄.</param>
    public static ApertureTaper CircularTaylor(double sidelobesDb, int nbar) => new(TaperRequest.Uniform, TaperRequest.Uniform, sidelobesDb, nbar);

    /// <summary>True for Hansen's circular Taylor.</summary>
    public bool IsCircular => CircularSidelobesDb is not null;

    /// <summary>The design sidelobe level in the principal planes, dB (negative); null for uniform separable tapers (no level).</summary>
    public (double? Along, double? Across) DesignLevels => IsCircular
        ? (CircularSidelobesDb, CircularSidelobesDb)
        : (Level(Along), Level(Across));

    private static double? Level(TaperRequest t) => TaperSynthesis.LevelRange(t.Type) is null ? null : t.SidelobeLevelDb;

    /// <summary>
    /// The amplitude of every slot of <paramref name="layout"/>, max 1, in the layout's order, and the method's name.
    /// Separable: a(x_c) b(y_b) with the 1-D weights of the bounding grid (an outline cuts the product, it does not
    /// re-synthesise). Circular Taylor: g(ρ'), ρ' = √((x/R_x)² + (y/R_y)²) with the outline's semi-axes (a circle's or
    /// an ellipse's distribution scaled to it), sampled at the slot centres (Hansen 1960).
    /// </summary>
    /// <param name="layout">The aperture.</param>
    public (double[] Weights, string Method, IReadOnlyList<DesignWarning> Warnings) Weights(PlanarLayout layout)
    {
        ArgumentNullException.ThrowIfNull(layout);
        var w = new double[layout.Count];
        var warnings = new List<DesignWarning>();
        string method;
        if (IsCircular)
        {
            if (layout.Outline == PlanarOutline.Rectangle)
                throw new InfeasibleDesignException("the circular Taylor taper is for a circle or ellipse outline: set array.outline: circle (or ellipse), or use a separable taper");
            var d = Tapers.CircularTaylor.Parameters(CircularSidelobesDb!.Value, CircularNbar);
            var (rx, ry) = layout.SemiAxes;
            for (int i = 0; i < w.Length; i++)
            {
                var s = layout.Slots[i];
                double p = Math.Sqrt((s.X / rx) * (s.X / rx) + (s.Y / ry) * (s.Y / ry));
                w[i] = d.Distribution(Math.Min(p, 1));
            }
            method = FormattableString.Invariant($"circular Taylor n-bar (Hansen 1960), {CircularSidelobesDb:0.#} dB, n-bar {CircularNbar}");
        }
        else
        {
            var along = TaperSynthesis.Synthesize(Along, layout.Columns);
            var across = layout.Branches >= 2 ? TaperSynthesis.Synthesize(Across, layout.Branches) : null;
            warnings.AddRange(along.Warnings);
            if (across is not null) warnings.AddRange(across.Warnings.Where(x => !warnings.Contains(x)));
            if (along.IsDifference || (across?.IsDifference ?? false))
                throw new InfeasibleDesignException("a planar array here is designed for a sum pattern: difference tapers (Bayliss, odd given weights) are not supported yet; use a sum taper");
            for (int i = 0; i < w.Length; i++)
            {
                var s = layout.Slots[i];
                w[i] = along.Weights[s.Column] * (across is null ? 1 : across.Weights[s.Branch - 1]);
            }
            method = $"separable: {along.Method} along × {(across?.Method ?? "one branch")} across";
        }
        double max = w.Max(Math.Abs);
        for (int i = 0; i < w.Length; i++)
        {
            w[i] /= max;
            if (!(w[i] > 1e-6))
                throw new InfeasibleDesignException(FormattableString.Invariant(
                    $"branch {layout.Slots[i].Branch} slot {layout.Slots[i].Index}: the taper asks an amplitude of {w[i]:G3}, which no slot realises; use a gentler taper or a smaller n-bar"));
        }
        return (w, method, warnings);
    }
}
