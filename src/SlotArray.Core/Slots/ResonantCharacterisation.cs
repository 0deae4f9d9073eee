using System.Collections.Concurrent;
using System.Globalization;
using MathNet.Numerics.Interpolation;
using MathNet.Numerics.RootFinding;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// Resonant length L_r(x) and conductance g_r(x) of a longitudinal slot over the usable offsets 0 &lt; x ≤ a/4, from the
/// moment method (<see cref="LongitudinalSlotMomentMethod"/>), tabulated and spline-interpolated. Built on demand and
/// cached in memory (thread-safe, keyed by every input); deterministic.
/// </summary>
/// <remarks>
/// Both L_r and g_r/sin²(πx/a) are even, smooth functions of x, so they are interpolated by natural cubic splines in
/// u = x² (MathNet <c>CubicSpline</c>); g_r = sin²(πx/a) × spline. Offsets are x_i = i·(a/4)/N, i = 1..N. The inverse
/// (offset for a conductance) is a Brent root of the interpolated g_r.
/// </remarks>
public sealed class ResonantCharacterisation
{
    private static readonly ConcurrentDictionary<string, Lazy<ResonantCharacterisation>> Cache = new();

    private readonly CubicSpline _length, _ratio;
    private readonly double _a;

    private ResonantCharacterisation(ResonantCharacterisationTable table, double broadWall)
    {
        Table = table;
        _a = broadWall;
        var u = table.OffsetsMeters.Select(x => x * x).ToArray();
        _length = CubicSpline.InterpolateNatural(u, table.ResonantLengthsMeters.ToArray());
        _ratio = CubicSpline.InterpolateNatural(u, table.OffsetsMeters.Select((x, i) => table.Conductances[i] / Sin2(x)).ToArray());
    }

    /// <summary>The tabulated values.</summary>
    public ResonantCharacterisationTable Table { get; }

    /// <summary>Largest tabulated (usable) offset, a/4.</summary>
    public double MaximumOffset => Table.OffsetsMeters[^1];

    private double Sin2(double x) { double s = Math.Sin(Math.PI * x / _a); return s * s; }

    /// <summary>
    /// The characterisation of slots of the solver's guide, wall and width at frequency f with <paramref name="offsetCount"/>
    /// tabulated offsets (cached; the first call computes it, in parallel over offsets).
    /// </summary>
    public static ResonantCharacterisation For(LongitudinalSlotMomentMethod solver, Frequency f, int offsetCount = 30)
    {
        ArgumentNullException.ThrowIfNull(solver);
        if (offsetCount < 4) throw new ArgumentOutOfRangeException(nameof(offsetCount), offsetCount, "at least 4 offsets are needed for the spline");
        string key = KeyOf(solver, f, offsetCount);
        return Cache.GetOrAdd(key, k => new Lazy<ResonantCharacterisation>(() => Compute(solver, f, offsetCount, k))).Value;
    }

    /// <summary>Rebuilds the splines from a stored table (for example one the CLI kept on disk). Throws when the table is stale.</summary>
    public static ResonantCharacterisation FromTable(LongitudinalSlotMomentMethod solver, ResonantCharacterisationTable table)
    {
        ArgumentNullException.ThrowIfNull(solver);
        ArgumentNullException.ThrowIfNull(table);
        string key = KeyOf(solver, Frequency.FromHertz(table.FrequencyHertz), table.OffsetsMeters.Count);
        if (table.FormatVersion != ResonantCharacterisationTable.CurrentFormatVersion || table.Key != key)
            throw new ArgumentException($"stored characterisation table does not match (version {table.FormatVersion}, key '{table.Key}'; expected '{key}')", nameof(table));
        return new ResonantCharacterisation(table, solver.Guide.BroadWall.Meters);
    }

    /// <summary>
    /// Puts a stored table (for example one the CLI kept on disk) into the in-memory cache, so that <see cref="For"/>
    /// returns it without computing; a table already cached under its key is kept. Throws like <see cref="FromTable"/>
    /// when the table does not match the solver.
    /// </summary>
    public static void Preload(LongitudinalSlotMomentMethod solver, ResonantCharacterisationTable table)
    {
        var c = FromTable(solver, table);
        Cache.TryAdd(table.Key, new Lazy<ResonantCharacterisation>(() => c));
    }

    /// <summary>The tables computed or preloaded so far in this process, ordered by key (for a caller that stores them).</summary>
    public static IReadOnlyList<ResonantCharacterisationTable> CachedTables() =>
        [.. Cache.Values.Where(l => l.IsValueCreated).Select(l => l.Value.Table).OrderBy(t => t.Key, StringComparer.Ordinal)];

    /// <summary>The cache key: every input that determines the table.</summary>
    public static string KeyOf(LongitudinalSlotMomentMethod solver, Frequency f, int offsetCount)
    {
        ArgumentNullException.ThrowIfNull(solver);
        var g = solver.Guide;
        var o = solver.Options;
        return string.Create(CultureInfo.InvariantCulture,
            $"v{ResonantCharacterisationTable.CurrentFormatVersion};a={g.BroadWall.Meters:R};b={g.NarrowWall.Meters:R};t={g.WallThickness.Meters:R};er={g.RelativePermittivity:R};w={solver.Width.Meters:R};f={f.Hertz:R};n={offsetCount};P={o.BasisFunctions};cut={o.ModeCutFactor:R};nA={o.ClosedFormTerms};q={o.QuadraturePanels}x{o.QuadratureOrder};re={o.EquivalentRadiusFactor:R};P2={o.ExtrapolationBasisFunctions}");
    }

    /// <summary>Builds the table without the cache (benchmarks).</summary>
    internal static ResonantCharacterisation ComputeUncached(LongitudinalSlotMomentMethod solver, Frequency f, int n)
        => Compute(solver, f, n, KeyOf(solver, f, n));

    private static ResonantCharacterisation Compute(LongitudinalSlotMomentMethod solver, Frequency f, int n, string key)
    {
        double a = solver.Guide.BroadWall.Meters, xMax = StevensonLongitudinalSlot.MaximumOffset(solver.Guide);
        var x = new double[n];
        var lr = new double[n];
        var gr = new double[n];
        var asym = new double[n];
        Parallel.For(0, n, i =>
        {
            x[i] = xMax * (i + 1) / n;
            var r = FindResonance(solver, x[i], f);
            lr[i] = r.Length;
            gr[i] = r.Scattering.Admittance.Real;
            asym[i] = r.Scattering.ShuntAsymmetry;
        });
        var table = new ResonantCharacterisationTable(ResonantCharacterisationTable.CurrentFormatVersion, key, f.Hertz, x, lr, gr, asym);
        return new ResonantCharacterisation(table, a);
    }

    /// <summary>
    /// The full length L_r at which Im y = 0 for a slot at offset x, by Brent's method (relative tolerance 1e-7) on
    /// 0.36λ ≤ L ≤ 0.62λ (λ in the filling). Throws <see cref="ConvergenceException"/> when Im y does not change sign there.
    /// </summary>
    public static (double Length, SlotScattering Scattering) FindResonance(LongitudinalSlotMomentMethod solver, double offset, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(solver);
        double lam = 2 * Math.PI / solver.Guide.MediumWavenumber(f);
        double Im(double len) => solver.Solve(offset, len, f.Hertz, null).Admittance.Imaginary;
        // The narrow-slot model needs L > 2w: the brackets start just above twice the width when that is longer.
        double shortest = 2 * solver.Width.Meters * (1 + 1e-6);
        double lo = Math.Max(0.44 * lam, shortest), hi = 0.52 * lam, flo = lo < hi ? Im(lo) : double.NaN, fhi = lo < hi ? Im(hi) : double.NaN;
        if (!(flo > 0 && fhi < 0))
        {
            lo = Math.Max(0.36 * lam, shortest);
            hi = 0.62 * lam;
            if (lo >= hi)
                throw new InfeasibleDesignException(FormattableString.Invariant(
                    $"slots {solver.Width} wide are too wide for the narrow-slot model at {f}: it needs the length (about half a wavelength, here at most {hi * 1e3:0.##} mm) to exceed twice the width; use slots narrower than {hi / 2 * 1e3:0.##} mm"));
            flo = Im(lo);
            fhi = Im(hi);
        }
        if (!(flo > 0 && fhi < 0))
            throw new ConvergenceException(FormattableString.Invariant(
                $"no resonance (Im y = 0) of the longitudinal slot at offset {offset * 1e3:0.###} mm between {lo * 1e3:0.##} and {hi * 1e3:0.##} mm at {f} in this guide (TE10 cutoff {solver.Guide.CutoffTe10}, {solver.Guide.NextModeName} cutoff {solver.Guide.SingleModeBand.High}, wall {solver.Guide.WallThickness}): move the frequency toward the middle of the single-mode band, or use a thicker wall"), 2, Math.Min(Math.Abs(flo), Math.Abs(fhi)));
        if (!Brent.TryFindRoot(Im, lo, hi, 1e-7 * lam, 100, out double root))
            throw new ConvergenceException($"resonance search of the longitudinal slot at offset {offset * 1e3:0.###} mm failed", 100, double.NaN);
        return (root, solver.Solve(offset, root, f.Hertz, null));
    }

    /// <summary>Interpolated resonant full length at offset x (m; signed, y(x) = y(−x)).</summary>
    public Length ResonantLength(double offset) => Length.FromMeters(_length.Interpolate(offset * offset));

    /// <summary>Interpolated resonant conductance g_r at offset x.</summary>
    public double ResonantConductance(double offset) => Sin2(offset) * _ratio.Interpolate(offset * offset);

    /// <summary>Largest resonant conductance, at the largest usable offset a/4.</summary>
    public double MaximumConductance => Table.Conductances[^1];

    /// <summary>
    /// The positive offset and the resonant length that give resonant conductance g. Throws
    /// <see cref="InfeasibleDesignException"/> above <see cref="MaximumConductance"/>.
    /// </summary>
    public SlotResonance ForConductance(double conductance, string guideName)
    {
        if (!(conductance > 0) || !double.IsFinite(conductance))
            throw new ArgumentOutOfRangeException(nameof(conductance), conductance, "conductance must be positive");
        if (conductance > MaximumConductance)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"a longitudinal slot needs g = {conductance:0.####}, above the {MaximumConductance:0.####} this guide ({guideName}) gives at {Table.FrequencyHertz / 1e9:0.######} GHz at the largest usable offset {MaximumOffset * 1e3:0.###} mm (a/4): use more slots or a gentler taper"));
        double x = conductance == MaximumConductance ? MaximumOffset
            : Brent.FindRoot(v => ResonantConductance(v) - conductance, 1e-9, MaximumOffset, 1e-12, 200);
        return new SlotResonance(x, ResonantLength(x), conductance);
    }

    /// <summary>Shunt asymmetry |B − C|/|B| at resonance, interpolated linearly between tabulated offsets.</summary>
    public double ShuntAsymmetry(double offset)
    {
        double x = Math.Abs(offset);
        var xs = Table.OffsetsMeters;
        if (x <= xs[0]) return Table.ShuntAsymmetries[0];
        for (int i = 1; i < xs.Count; i++)
            if (x <= xs[i])
                return Table.ShuntAsymmetries[i - 1] + (Table.ShuntAsymmetries[i] - Table.ShuntAsymmetries[i - 1]) * (x - xs[i - 1]) / (xs[i] - xs[i - 1]);
        return Table.ShuntAsymmetries[^1];
    }
}
