using System.Globalization;
using MathNet.Numerics.Interpolation;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// Resonant length L_r(x) and conductance g_r(x) of a longitudinal slot over the usable offsets 0 &lt; x ≤ a/4, from the
/// moment method (<see cref="LongitudinalSlotMomentMethod"/>), tabulated and spline-interpolated. Built on demand and
/// kept in a <see cref="ResonantCharacterisationCache"/> the caller injects (thread-safe, keyed by every input); deterministic.
/// </summary>
/// <remarks>
/// Both L_r and g_r/sin²(πx/a) are even, smooth functions of x, so they are interpolated by natural cubic splines in
/// u = x² (MathNet <c>CubicSpline</c>); g_r = sin²(πx/a) × spline. Offsets are x_i = i·(a/4)/N, i = 1..N. Resonances and
/// the inverse (offset for a conductance, a root of the interpolated g_r) come from the shared <see cref="SlotResonanceSolver"/>.
/// </remarks>
internal sealed class ResonantCharacterisation
{
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

    /// <summary>The cache key: every input that determines the table.</summary>
    public static string KeyOf(LongitudinalSlotMomentMethod solver, Frequency f, int offsetCount)
    {
        ArgumentNullException.ThrowIfNull(solver);
        var g = solver.Guide;
        var o = solver.Options;
        return string.Create(CultureInfo.InvariantCulture,
            $"v{ResonantCharacterisationTable.CurrentFormatVersion};a={g.BroadWall.Meters:R};b={g.NarrowWall.Meters:R};t={g.WallThickness.Meters:R};er={g.RelativePermittivity:R};w={solver.Width.Meters:R};f={f.Hertz:R};n={offsetCount};P={o.BasisFunctions};cut={o.ModeCutFactor:R};nA={o.ClosedFormTerms};q={o.QuadraturePanels}x{o.QuadratureOrder};re={o.EquivalentRadiusFactor:R};P2={o.ExtrapolationBasisFunctions}");
    }

    /// <summary>Builds the table without a cache (benchmarks).</summary>
    internal static ResonantCharacterisation ComputeUncached(LongitudinalSlotMomentMethod solver, Frequency f, int n)
        => Compute(solver, f, n, KeyOf(solver, f, n));

    /// <summary>Computes the table of <paramref name="n"/> offsets (in parallel over offsets) under the given key.</summary>
    internal static ResonantCharacterisation Compute(LongitudinalSlotMomentMethod solver, Frequency f, int n, string key)
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
    /// The full length L_r at which Im y = 0 for a slot at offset x, by the shared <see cref="SlotResonanceSolver"/>
    /// (brackets 0.44–0.52λ, else 0.36–0.62λ, λ in the filling; accuracy 1e-7λ). Throws <see cref="ConvergenceException"/>
    /// when Im y does not change sign there.
    /// </summary>
    public static (double Length, SlotScattering Scattering) FindResonance(LongitudinalSlotMomentMethod solver, double offset, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(solver);
        double lam = 2 * Math.PI / solver.Guide.MediumWavenumber(f);
        var g = solver.Guide;
        double root = SlotResonanceSolver.ResonantLength(len => solver.Solve(offset, len, f.Hertz, null).Admittance.Imaginary, lam,
            FormattableString.Invariant($"the longitudinal slot {solver.Width.Millimeters:0.###} mm wide at offset {offset * 1e3:0.###} mm"), f,
            shortest: 2 * solver.Width.Meters * (1 + 1e-6),   // the narrow-slot model needs L > 2w
            advice: $"this guide (TE10 cutoff {g.CutoffTe10}, {g.NextModeName} cutoff {g.SingleModeBand.High}, wall {g.WallThickness}) gives the slot no resonance here; move the frequency toward the middle of the single-mode band, or use a thicker wall");
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
            : SlotResonanceSolver.CouplingForConductance(ResonantConductance, conductance, 1e-9, MaximumOffset);
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
