using System.Collections.Concurrent;
using System.Globalization;
using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>
/// The in-memory store of moment-method resonant characterisations (<see cref="ResonantCharacterisation"/>), keyed by
/// every input (<see cref="ResonantCharacterisation.KeyOf"/>). One instance is made at the composition root and handed
/// to the slot models, so runs and tests that share it compute each table once and runs that do not stay apart.
/// Thread-safe; a table's values do not depend on which caller computed it first.
/// </summary>
internal sealed class ResonantCharacterisationCache
{
    private readonly ConcurrentDictionary<string, Lazy<ResonantCharacterisation>> _tables = new();

    /// <summary>
    /// The characterisation of slots of the solver's guide, wall and width at frequency f with <paramref name="offsetCount"/>
    /// tabulated offsets (the first call computes it, in parallel over offsets; later calls return the same object).
    /// </summary>
    public ResonantCharacterisation For(LongitudinalSlotMomentMethod solver, Frequency f, int offsetCount = 30)
    {
        ArgumentNullException.ThrowIfNull(solver);
        if (offsetCount < 4) throw new ArgumentOutOfRangeException(nameof(offsetCount), offsetCount, "at least 4 offsets are needed for the spline");
        string key = ResonantCharacterisation.KeyOf(solver, f, offsetCount);
        return _tables.GetOrAdd(key, k => new Lazy<ResonantCharacterisation>(() => ResonantCharacterisation.Compute(solver, f, offsetCount, k))).Value;
    }

    /// <summary>
    /// Puts a stored table (for example one the CLI kept on disk) into the cache, so that <see cref="For"/> returns it
    /// without computing; a table already held under its key is kept. Throws like <see cref="ResonantCharacterisation.FromTable"/>
    /// when the table does not match the solver.
    /// </summary>
    public void Preload(LongitudinalSlotMomentMethod solver, ResonantCharacterisationTable table)
    {
        var c = ResonantCharacterisation.FromTable(solver, table);
        _tables.TryAdd(table.Key, new Lazy<ResonantCharacterisation>(() => c));
    }

    /// <summary>The tables computed or preloaded so far, ordered by key (for a caller that stores them).</summary>
    public IReadOnlyList<ResonantCharacterisationTable> Tables() =>
        [.. _tables.Values.Where(l => l.IsValueCreated).Select(l => l.Value.Table).OrderBy(t => t.Key, StringComparer.Ordinal)];

    private readonly ConcurrentDictionary<(string Solver, double Offset, double Length, double Frequency), Complex> _admittances = new();

    /// <summary>Every input of a moment-method solver that determines y besides the slot's offset, length and frequency.</summary>
    public static string AdmittanceKeyOf(LongitudinalSlotMomentMethod solver)
    {
        ArgumentNullException.ThrowIfNull(solver);
        var g = solver.Guide;
        var o = solver.Options;
        return string.Create(CultureInfo.InvariantCulture,
            $"a={g.BroadWall.Meters:R};b={g.NarrowWall.Meters:R};t={g.WallThickness.Meters:R};er={g.RelativePermittivity:R};w={solver.Width.Meters:R};P={o.BasisFunctions};cut={o.ModeCutFactor:R};nA={o.ClosedFormTerms};q={o.QuadraturePanels}x{o.QuadratureOrder};re={o.EquivalentRadiusFactor:R};P2={o.ExtrapolationBasisFunctions}");
    }

    /// <summary>
    /// y = Y/G0 of a moment-method solve, remembered for the run: the design's frequency nodes, the tolerance surrogates
    /// and the sensitivities ask for the same few hundred solves on every run of a spec, so the CLI stores them on disk
    /// (<see cref="Admittances"/>, <see cref="PreloadAdmittances"/>). The value is the solver's exactly, so results are the
    /// same with or without the memo.
    /// </summary>
    /// <param name="solver">The solver.</param>
    /// <param name="key">Its key, <see cref="AdmittanceKeyOf"/>.</param>
    /// <param name="offset">Offset x, m (signed, as solved).</param>
    /// <param name="length">Slot length.</param>
    /// <param name="f">Frequency.</param>
    public Complex Admittance(LongitudinalSlotMomentMethod solver, string key, double offset, Length length, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(solver);
        var k = (key, offset, length.Meters, f.Hertz);
        if (_admittances.TryGetValue(k, out var y)) return y;
        y = solver.Solve(Length.FromMeters(offset), length, f).Admittance;
        _admittances.TryAdd(k, y);
        return y;
    }

    /// <summary>Number of remembered solves.</summary>
    public int AdmittanceCount => _admittances.Count;

    /// <summary>The remembered solves in a fixed order (solver, frequency, offset, length), for a caller that stores them.</summary>
    public IReadOnlyList<SlotAdmittanceEntry> Admittances() =>
        [.. _admittances.Select(p => new SlotAdmittanceEntry(p.Key.Solver, p.Key.Offset, p.Key.Length, p.Key.Frequency, p.Value.Real, p.Value.Imaginary))
            .OrderBy(e => e.Solver, StringComparer.Ordinal).ThenBy(e => e.FrequencyHertz).ThenBy(e => e.OffsetMeters).ThenBy(e => e.LengthMeters)];

    /// <summary>Remembers stored solves (e.g. from the CLI's disk cache); present or non-finite entries are skipped. Returns the number added.</summary>
    public int PreloadAdmittances(IEnumerable<SlotAdmittanceEntry> entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        int added = 0;
        foreach (var e in entries)
        {
            if (e?.Solver is null || !double.IsFinite(e.OffsetMeters) || !double.IsFinite(e.LengthMeters) || !double.IsFinite(e.FrequencyHertz)
                || !double.IsFinite(e.Real) || !double.IsFinite(e.Imaginary))
                continue;
            if (_admittances.TryAdd((e.Solver, e.OffsetMeters, e.LengthMeters, e.FrequencyHertz), new Complex(e.Real, e.Imaginary))) added++;
        }
        return added;
    }
}

/// <summary>One remembered moment-method solve (<see cref="ResonantCharacterisationCache.Admittance"/>).</summary>
/// <param name="Solver">The solver key (<see cref="ResonantCharacterisationCache.AdmittanceKeyOf"/>).</param>
/// <param name="OffsetMeters">Offset x of the slot from the centreline, m (signed, as solved).</param>
/// <param name="LengthMeters">Slot length, m.</param>
/// <param name="FrequencyHertz">Frequency, Hz.</param>
/// <param name="Real">Re y.</param>
/// <param name="Imaginary">Im y.</param>
internal sealed record SlotAdmittanceEntry(string Solver, double OffsetMeters, double LengthMeters, double FrequencyHertz, double Real, double Imaginary);
