using System.Globalization;
using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots.Tables;

/// <summary>
/// Smooth fits of a user's slot table (pure): for every tabulated geometry (offset or tilt) and frequency, the resonant
/// length L_r and conductance g_r (where Im y = 0, by <see cref="SlotResonanceSolver"/> on the monotone fit of Im y
/// against length) and the normalised admittance h(ν) = y/g_r against ν = L/L_r; across geometries, monotone curves of
/// L_r and g_r; across frequencies, monotone curves again. y(c, L, f) = g_r(c, f) · h(L/L_r(c, f); c, f).
/// </summary>
/// <remarks>
/// <para>Why this shape: a slot's y against L/L_r is nearly the same function for every offset (R. S. Elliott,
/// <i>Antenna Theory and Design</i>, Prentice-Hall 1981, ch. 8: measured Y/G0 curves for different offsets nearly
/// collapse on one function of l/l_r), so h varies weakly with the geometry and is interpolated linearly between
/// tabulated geometries (held at the end ones outside), while L_r and g_r get monotone cubic curves
/// (<see cref="MonotoneCurve"/>). g_r is fitted as s(c) × (g_r/s(c)) with s = sin²(πx/a) for an offset (Stevenson's
/// longitudinal slot, A. F. Stevenson, J. Appl. Phys. 19, 24–38, 1948: g ∝ sin²(πx/a)) or s = sin²θ for a tilt: the
/// ratio varies slowly, so the curve through it is accurate between offsets where g_r itself bends (g_r ∝ x² near
/// the centre line), as the moment method's own characterisation does.</para>
/// <para>Outside the table: g_r beyond the tabulated geometries follows s(c) with the ratio of the nearest end, L_r is
/// held at the end value; outside the tabulated frequencies y(L, f) = y(L f/f_e, f_e) at the nearest tabulated f_e (the
/// slot's response scales with its electrical length; an approximation, flagged). The range check of the design
/// (<see cref="OutsideRange"/>) refuses or flags such slots.</para>
/// <para>Residuals: leave-one-out at the interior points of every fit (each point predicted by the fit through the
/// others), a measure of how well the table's spacing resolves the curves.</para>
/// </remarks>
internal sealed class SlotTableFit
{
    private readonly double[] _c, _f;
    private readonly Group[,] _g;            // [frequency k, coupling i]
    private readonly MonotoneCurve[] _lr, _ratio; // per frequency, against coupling: L_r and g_r/s(c)
    private readonly double _a;

    private SlotTableFit(SlotTable table, RectangularWaveguide guide, double[] c, double[] f, Group[,] g, SlotTableResiduals residuals)
    {
        Table = table;
        Guide = guide;
        _c = c;
        _f = f;
        _g = g;
        _a = guide.BroadWall.Meters;
        _lr = new MonotoneCurve[f.Length];
        _ratio = new MonotoneCurve[f.Length];
        for (int k = 0; k < f.Length; k++)
        {
            _lr[k] = new MonotoneCurve(c, [.. Enumerable.Range(0, c.Length).Select(i => g[k, i].ResonantLength)]);
            _ratio[k] = new MonotoneCurve(c, [.. Enumerable.Range(0, c.Length).Select(i => g[k, i].ResonantConductance / Shape(CouplingKind, _a, c[i]))]);
        }
        Residuals = residuals;
        double nuLow = 0, nuHigh = double.PositiveInfinity;
        foreach (var grp in g) { nuLow = Math.Max(nuLow, grp.H.Low); nuHigh = Math.Min(nuHigh, grp.H.High); }
        Range = new SlotDataRange(c[0], c[^1], nuLow, nuHigh, f[0], f[^1]);
    }

    /// <summary>The table fitted.</summary>
    public SlotTable Table { get; }

    /// <summary>The guide the table is used in (reference-plane shifts, edge-slot geometry).</summary>
    public RectangularWaveguide Guide { get; }

    /// <summary>Whether the geometry is an offset (m) or a tilt (rad).</summary>
    public SlotCouplingKind CouplingKind => Table.Geometry == SlotTableGeometry.Longitudinal ? SlotCouplingKind.Offset : SlotCouplingKind.Tilt;

    /// <summary>The tabulated ranges: |coupling|, L/L_r (common to every geometry and frequency), frequency.</summary>
    public SlotDataRange Range { get; }

    /// <summary>Leave-one-out residuals of the fits.</summary>
    public SlotTableResiduals Residuals { get; }

    /// <summary>The tabulated geometries (offsets in m or tilts in rad), increasing.</summary>
    public IReadOnlyList<double> Couplings => _c;

    /// <summary>The tabulated frequencies (Hz), increasing.</summary>
    public IReadOnlyList<double> Frequencies => _f;

    /// <summary>The resonance found at a tabulated geometry i and frequency k: L_r (m) and g_r.</summary>
    public (double ResonantLength, double ResonantConductance) TabulatedResonance(int frequencyIndex, int couplingIndex)
        => (_g[frequencyIndex, couplingIndex].ResonantLength, _g[frequencyIndex, couplingIndex].ResonantConductance);

    /// <summary>
    /// Fits a table for use in the given guide. Throws <see cref="SlotTableException"/> (with the file line where there is
    /// one) when the table cannot be fitted: missing frequencies, too few lengths, no resonance, g_r not increasing.
    /// </summary>
    public static SlotTableFit Fit(SlotTable table, RectangularWaveguide guide)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(guide);
        if (table.Geometry == SlotTableGeometry.InclinedSeries)
            throw new SlotTableException("the table describes inclined series slots, which have no array designer yet: use a table of longitudinal or edge slots");
        if (table.Rows.Count == 0) throw new SlotTableException("the table has no rows");
        var rows = table.Rows.Select(r => Prepare(table, r, guide)).ToList();
        double[] c = [.. rows.Select(r => r.Coupling).Distinct().Order()];
        double[] f = [.. rows.Select(r => r.Frequency).Distinct().Order()];
        if (c.Length < 2)
            throw new SlotTableException($"the table has one {Noun(table)} only ({Show(table, c[0])}): give at least two (more give a better fit)");
        var groups = new Group[f.Length, c.Length];
        for (int k = 0; k < f.Length; k++)
            for (int i = 0; i < c.Length; i++)
            {
                var member = rows.Where(r => r.Coupling == c[i] && r.Frequency == f[k]).OrderBy(r => r.Length).ToList();
                if (member.Count == 0)
                    throw new SlotTableException(FormattableString.Invariant(
                        $"no rows for {Noun(table)} {Show(table, c[i])} at {f[k] / 1e9:0.######} GHz: every {Noun(table)} needs every tabulated frequency"));
                groups[k, i] = Group.Of(table, member, c[i], f[k]);
            }
        for (int k = 0; k < f.Length; k++)
            for (int i = 1; i < c.Length; i++)
                if (!(groups[k, i].ResonantConductance > groups[k, i - 1].ResonantConductance))
                    throw new SlotTableException(FormattableString.Invariant(
                        $"the resonant conductance does not increase with the {Noun(table)} at {f[k] / 1e9:0.######} GHz: g_r = {groups[k, i - 1].ResonantConductance:0.#####} at {Show(table, c[i - 1])} but {groups[k, i].ResonantConductance:0.#####} at {Show(table, c[i])}; check those rows"),
                        groups[k, i].FirstLine);
        var kind = table.Geometry == SlotTableGeometry.Longitudinal ? SlotCouplingKind.Offset : SlotCouplingKind.Tilt;
        double a = guide.BroadWall.Meters;
        return new SlotTableFit(table, guide, c, f, groups, SlotTableResiduals.Of(c, groups, x => Shape(kind, a, x)));
    }

    /// <summary>Resonant length L_r (m) at coupling c and frequency f (electrical scaling outside the tabulated frequencies).</summary>
    public double ResonantLength(double coupling, Frequency f)
    {
        var (fe, scale) = Scaled(f);
        return AcrossFrequency(fe, k => _lr[k].At(Math.Abs(coupling))) * scale;
    }

    /// <summary>Resonant conductance g_r at coupling c and frequency f (see remarks for outside the table).</summary>
    public double ResonantConductance(double coupling, Frequency f) => AcrossFrequency(Scaled(f).Frequency, k => Conductance(k, Math.Abs(coupling)));

    /// <summary>y = g_r(c, f) · h(L/L_r(c, f); c, f), normalised to G0.</summary>
    public Complex Admittance(double coupling, double length, Frequency f)
    {
        double c = Math.Abs(coupling);
        var (fe, scale) = Scaled(f);
        double lengthAtEdge = length / scale;
        double re = AcrossFrequency(fe, k => AtFrequency(k, c, lengthAtEdge).Real);
        double im = AcrossFrequency(fe, k => AtFrequency(k, c, lengthAtEdge).Imaginary);
        return new Complex(re, im);
    }

    /// <summary>
    /// Why a slot of coupling c and length L at frequency f lies outside the table (empty when it lies inside): the
    /// coupling, L/L_r or the frequency beyond what the table holds.
    /// </summary>
    public IReadOnlyList<string> OutsideRange(double coupling, double length, Frequency f)
    {
        var why = new List<string>();
        var r = Range;
        if (!r.CoversCoupling(coupling))
            why.Add($"{Noun(Table)} {Show(Table, Math.Abs(coupling))} is outside the table's {Show(Table, r.CouplingLow)} to {Show(Table, r.CouplingHigh)}");
        double fr = f.Hertz;
        if (fr < r.FrequencyLow * (1 - 1e-12) || fr > r.FrequencyHigh * (1 + 1e-12))
            why.Add(FormattableString.Invariant($"frequency {fr / 1e9:0.######} GHz is outside the table's {r.FrequencyLow / 1e9:0.######} to {r.FrequencyHigh / 1e9:0.######} GHz"));
        double nu = length / ResonantLength(coupling, f);
        if (nu < r.LengthRatioLow - 1e-9 || nu > r.LengthRatioHigh + 1e-9)
            why.Add(FormattableString.Invariant($"length {length * 1e3:0.###} mm is L/L_r = {nu:0.####}, outside the table's {r.LengthRatioLow:0.####} to {r.LengthRatioHigh:0.####}"));
        return why;
    }

    /// <summary>The tabulated frequency f_e to use and the length scale f_e/f (1 inside the tabulated frequencies).</summary>
    private (double Frequency, double Scale) Scaled(Frequency f)
    {
        double fr = f.Hertz;
        if (fr < _f[0]) return (_f[0], _f[0] / fr);
        if (fr > _f[^1]) return (_f[^1], _f[^1] / fr);
        return (fr, 1);
    }

    private double AcrossFrequency(double f, Func<int, double> valueAt)
    {
        if (_f.Length == 1) return valueAt(0);
        int exact = Array.IndexOf(_f, f);
        if (exact >= 0) return valueAt(exact);
        return new MonotoneCurve(_f, [.. Enumerable.Range(0, _f.Length).Select(valueAt)]).At(f);
    }

    /// <summary>g_r at tabulated frequency k: s(c) times the monotone curve of g_r/s(c), held at its end values outside.</summary>
    private double Conductance(int k, double c) => Shape(CouplingKind, _a, c) * _ratio[k].At(c);

    /// <summary>The shape s(c) of the resonant conductance: sin²(πx/a) for an offset, sin²θ for a tilt.</summary>
    internal static double Shape(SlotCouplingKind kind, double broadWall, double c)
    {
        double s = kind == SlotCouplingKind.Offset ? Math.Sin(Math.PI * c / broadWall) : Math.Sin(c);
        return s * s;
    }

    private Complex AtFrequency(int k, double c, double length)
    {
        double lr = _lr[k].At(c), gr = Conductance(k, c), nu = length / lr;
        int hi = Array.FindIndex(_c, x => x >= c);
        Complex h;
        if (hi <= 0) h = _g[k, hi < 0 ? _c.Length - 1 : 0].Shape(nu);
        else
        {
            double t = (c - _c[hi - 1]) / (_c[hi] - _c[hi - 1]);
            h = (1 - t) * _g[k, hi - 1].Shape(nu) + t * _g[k, hi].Shape(nu);
        }
        return gr * h;
    }

    internal static string Noun(SlotTable t) => t.Geometry == SlotTableGeometry.Longitudinal ? "offset" : "tilt";

    internal static string Show(SlotTable t, double c) => t.Geometry == SlotTableGeometry.Longitudinal
        ? string.Create(CultureInfo.InvariantCulture, $"{c * 1e3:0.####} mm")
        : string.Create(CultureInfo.InvariantCulture, $"{c * 180 / Math.PI:0.###} deg");

    private static Prepared Prepare(SlotTable table, SlotTableRow r, RectangularWaveguide guide)
    {
        if (!(r.Coupling >= 0) || !double.IsFinite(r.Coupling))
            throw new SlotTableException($"the {Noun(table)} must be zero or positive (y is even in it)", r.Line);
        if (!(r.Frequency > guide.CutoffTe10.Hertz))
            throw new SlotTableException($"the frequency must lie above the guide's TE10 cutoff {guide.CutoffTe10}", r.Line);
        double length = SlotTableConversion.RowLength(table, r, guide);
        if (table.Geometry == SlotTableGeometry.Edge && !double.IsNaN(r.CutDepth) && !double.IsNaN(r.Length)
            && Math.Abs(length - r.Length) > 1e-5)
            throw new SlotTableException(FormattableString.Invariant(
                $"length {r.Length * 1e3:0.###} mm and cut depth {r.CutDepth * 1e3:0.###} mm disagree: this guide's L = b/cos θ + 2(D − t) gives {length * 1e3:0.###} mm; give one of them or make them agree to 0.01 mm"), r.Line);
        if (!(length > 0) || !double.IsFinite(length))
            throw new SlotTableException("the slot length (or the developed length from the cut depth) must be positive", r.Line);
        var y = SlotTableConversion.ElementValue(table, r, guide);
        if (!double.IsFinite(y.Real) || !double.IsFinite(y.Imaginary))
            throw new SlotTableException("the response gives no finite admittance (S11 = −1 or z = 0?)", r.Line);
        return new Prepared(r.Line, r.Coupling, length, r.Frequency, y);
    }

    internal sealed record Prepared(int Line, double Coupling, double Length, double Frequency, Complex Y);

    /// <summary>One geometry at one frequency: its resonance and its h(ν).</summary>
    internal sealed class Group
    {
        public required double ResonantLength { get; init; }
        public required double ResonantConductance { get; init; }
        public required MonotoneCurve H { get; init; }
        public required MonotoneCurve HIm { get; init; }
        public required int FirstLine { get; init; }
        public required double[] Nu { get; init; }
        public required double[] HRe { get; init; }
        public required double[] HImValues { get; init; }

        public Complex Shape(double nu) => new(H.At(nu), HIm.At(nu));

        public static Group Of(SlotTable table, IReadOnlyList<Prepared> rows, double c, double f)
        {
            string where = FormattableString.Invariant($"{Noun(table)} {Show(table, c)} at {f / 1e9:0.######} GHz");
            if (rows.Count < 3)
                throw new SlotTableException($"{where} has {rows.Count} length(s): give at least three, on both sides of resonance", rows[0].Line);
            for (int j = 1; j < rows.Count; j++)
                if (rows[j].Length == rows[j - 1].Length)
                    throw new SlotTableException($"{where}: two rows with the same length (lines {rows[j - 1].Line} and {rows[j].Line})", rows[j].Line);
            double[] len = [.. rows.Select(r => r.Length)];
            double[] b = [.. rows.Select(r => r.Y.Imaginary)];
            int cross = -1;
            for (int j = 1; j < b.Length && cross < 0; j++) if (b[j - 1] > 0 && b[j] <= 0) cross = j;
            if (cross < 0)
            {
                bool rising = Enumerable.Range(1, b.Length - 1).Any(j => b[j - 1] < 0 && b[j] >= 0);
                throw new SlotTableException(rising
                    ? $"{where}: b rises through zero with length; a shunt slot's b falls (b > 0 below resonance) with phasors e^(jωt): an engine using e^(−iωt) gives the conjugate — conjugate the responses"
                    : $"{where}: b does not change sign over the lengths given ({len[0] * 1e3:0.###} to {len[^1] * 1e3:0.###} mm): give lengths on both sides of resonance", rows[0].Line);
            }
            var imCurve = new MonotoneCurve(len, b);
            var reCurve = new MonotoneCurve(len, [.. rows.Select(r => r.Y.Real)]);
            double lr = b[cross] == 0 ? len[cross]
                : SlotResonanceSolver.ResonantLength(imCurve.Raw, len[cross - 1], len[cross], 1e-12 * len[cross], where);
            double gr = reCurve.At(lr);
            if (!(gr > 0)) throw new SlotTableException($"{where}: the conductance at resonance is {gr:0.#####}, not positive", rows[0].Line);
            double[] nu = [.. len.Select(l => l / lr)];
            double[] hre = [.. rows.Select(r => r.Y.Real / gr)];
            double[] him = [.. rows.Select(r => r.Y.Imaginary / gr)];
            return new Group
            {
                ResonantLength = lr,
                ResonantConductance = gr,
                H = new MonotoneCurve(nu, hre),
                HIm = new MonotoneCurve(nu, him),
                FirstLine = rows.Min(r => r.Line),
                Nu = nu,
                HRe = hre,
                HImValues = him,
            };
        }
    }
}
