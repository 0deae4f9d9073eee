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
    /// re-synthesise); a sampled Taylor line source too short to reach its level is replaced by Villeneuve's discrete
    /// n̄ taper (<see cref="Synthesize"/>). Circular Taylor: g(ρ'), ρ' = √((x/R_x)² + (y/R_y)²) with the outline's
    /// semi-axes (a circle's or an ellipse's distribution scaled to it), sampled at the slot centres (Hansen 1960).
    /// </summary>
    /// <param name="layout">The aperture.</param>
    public (double[] Weights, string Method, IReadOnlyList<DesignWarning> Warnings) Weights(PlanarLayout layout)
    {
        ArgumentNullException.ThrowIfNull(layout);
        var warnings = new List<DesignWarning>();
        if (IsCircular && layout.Outline == PlanarOutline.Rectangle)
            throw new InfeasibleDesignException("the circular Taylor taper is for a circle or ellipse outline: set array.outline: circle (or ellipse), or use a separable taper");
        var (w, method) = Raw(layout, null, null, warnings);
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

    /// <summary>
    /// The amplitudes (unnormalised, layout order) of the same taper synthesised for other design levels: the separable
    /// along and across tapers at <paramref name="along"/> and <paramref name="across"/> dB (null: as asked; a family
    /// without a level ignores them), the circular Taylor at <paramref name="along"/>. For the designer's principal-plane
    /// correction (<see cref="PrincipalPlaneCorrection"/>), which moves the levels until the realised cuts reach the asked ones.
    /// </summary>
    /// <param name="layout">The aperture.</param>
    /// <param name="along">Level along x (separable) or of the whole aperture (circular), dB.</param>
    /// <param name="across">Level across the branches (separable), dB.</param>
    public double[] AmplitudesAt(PlanarLayout layout, double? along, double? across) => Raw(layout, along, across, []).Weights;

    private (double[] Weights, string Method) Raw(PlanarLayout layout, double? along, double? across, List<DesignWarning> warnings)
    {
        var w = new double[layout.Count];
        if (IsCircular)
        {
            double level = Math.Clamp(along ?? CircularSidelobesDb!.Value, -60, -17.6);
            var d = Tapers.CircularTaylor.Parameters(level, CircularNbar);
            var (rx, ry) = layout.SemiAxes;
            for (int i = 0; i < w.Length; i++)
            {
                var s = layout.Slots[i];
                double p = Math.Sqrt((s.X / rx) * (s.X / rx) + (s.Y / ry) * (s.Y / ry));
                w[i] = d.Distribution(Math.Min(p, 1));
            }
            return (w, FormattableString.Invariant($"circular Taylor n-bar (Hansen 1960), {CircularSidelobesDb:0.#} dB, n-bar {CircularNbar}"));
        }
        var a = Synthesize(At(Along, along), layout.Columns, warnings);
        var b = layout.Branches >= 2 ? Synthesize(At(Across, across), layout.Branches, warnings) : null;
        if (a.IsDifference || (b?.IsDifference ?? false))
            throw new InfeasibleDesignException("a planar array here is designed for a sum pattern: difference tapers (Bayliss, odd given weights) are not supported yet; use a sum taper");
        for (int i = 0; i < w.Length; i++)
        {
            var s = layout.Slots[i];
            w[i] = a.Weights[s.Column] * (b is null ? 1 : b.Weights[s.Branch - 1]);
        }
        return (w, $"separable: {a.Method} along × {(b?.Method ?? "one branch")} across");
    }

    private static TaperRequest At(TaperRequest t, double? level)
    {
        if (level is null || TaperSynthesis.LevelRange(t.Type) is not { } range) return t;
        return t with { SidelobeLevelDb = Math.Clamp(level.Value, range.Lowest, range.Highest) };
    }

    /// <summary>
    /// The 1-D taper of <paramref name="count"/> elements. A Taylor line source sampled at few elements misses its level
    /// (e.g. N = 8, −25 dB, n̄ = 4 reaches only about −24.1 dB): when the sampled weights miss the asked level by more than
    /// 0.1 dB, Villeneuve's discrete n̄ taper (A. T. Villeneuve, "Taylor patterns for discrete arrays", IEEE Trans. AP-32,
    /// 1089–1093, 1984), which places the array's own zeros, is used instead with n̄ ≤ (N − 1)/2, if it comes closer; a
    /// warning says so. Other families as asked.
    /// </summary>
    private static TaperResult Synthesize(TaperRequest t, int count, List<DesignWarning> warnings)
    {
        var r = TaperSynthesis.Synthesize(t, count);
        int nbar = Math.Min(t.Nbar, (count - 1) / 2);
        if (t.Type == TaperType.Taylor && nbar >= 2 && count <= TaperSynthesis.MeasuredSidelobeCheckLimit)
        {
            double sampled = TaperSynthesis.MeasuredPeakSidelobeDb(r.Weights, false);
            if (sampled > t.SidelobeLevelDb + 0.1)
            {
                var v = TaperSynthesis.Synthesize(t with { Type = TaperType.Villeneuve, Nbar = nbar }, count);
                double discrete = TaperSynthesis.MeasuredPeakSidelobeDb(v.Weights, false);
                if (discrete < sampled)
                {
                    Add(warnings, new DesignWarning("discrete-taylor", FormattableString.Invariant(
                        $"The Taylor line source sampled at {count} elements reaches only {sampled:0.00} dB, not {t.SidelobeLevelDb:0.##} dB: the planar design uses Villeneuve's discrete n-bar taper (n-bar {nbar}) for those {count} elements, which reaches {discrete:0.00} dB.")));
                    foreach (var w in v.Warnings) Add(warnings, w);
                    return v;
                }
            }
        }
        foreach (var w in r.Warnings) Add(warnings, w);
        return r;
    }

    private static void Add(List<DesignWarning> list, DesignWarning w)
    {
        if (!list.Contains(w)) list.Add(w);
    }
}
