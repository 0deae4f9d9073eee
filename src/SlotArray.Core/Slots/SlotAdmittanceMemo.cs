using System.Collections.Concurrent;
using System.Globalization;
using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>One remembered moment-method solve: the solver's inputs (<see cref="SlotAdmittanceMemo.KeyOf"/>), the slot and y = Y/G0.</summary>
/// <param name="Solver">The solver key: guide, wall, filling, slot width and moment-method options.</param>
/// <param name="OffsetMeters">Offset x of the slot from the centreline, m (signed, as solved).</param>
/// <param name="LengthMeters">Slot length, m.</param>
/// <param name="FrequencyHertz">Frequency, Hz.</param>
/// <param name="Real">Re y.</param>
/// <param name="Imaginary">Im y.</param>
public sealed record SlotAdmittanceEntry(string Solver, double OffsetMeters, double LengthMeters, double FrequencyHertz, double Real, double Imaginary);

/// <summary>
/// A process-wide memo of moment-method slot admittances: the value of <see cref="LongitudinalSlotMomentMethod"/> for
/// (solver inputs, offset, length, frequency), kept exactly as solved, so that a run gives the same numbers with or
/// without it. The design's frequency nodes, the tolerance surrogates and the sensitivities ask for the same few hundred
/// solves on every run of a spec; the CLI stores the entries on disk (<see cref="Entries"/>) and preloads them
/// (<see cref="Preload"/>), as it does for the resonant characterisation tables. Pure (no I/O) like the rest of Core.
/// </summary>
public static class SlotAdmittanceMemo
{
    private static readonly ConcurrentDictionary<(string Solver, double Offset, double Length, double Frequency), Complex> Memo = new();

    /// <summary>Every input of the solver that determines y besides the slot's offset, length and frequency.</summary>
    public static string KeyOf(LongitudinalSlotMomentMethod solver)
    {
        ArgumentNullException.ThrowIfNull(solver);
        var g = solver.Guide;
        var o = solver.Options;
        return string.Create(CultureInfo.InvariantCulture,
            $"a={g.BroadWall.Meters:R};b={g.NarrowWall.Meters:R};t={g.WallThickness.Meters:R};er={g.RelativePermittivity:R};w={solver.Width.Meters:R};P={o.BasisFunctions};cut={o.ModeCutFactor:R};nA={o.ClosedFormTerms};q={o.QuadraturePanels}x{o.QuadratureOrder};re={o.EquivalentRadiusFactor:R};P2={o.ExtrapolationBasisFunctions}");
    }

    /// <summary>y of the slot: the remembered value, else the solver's (then remembered).</summary>
    /// <param name="solver">The moment-method solver.</param>
    /// <param name="key">Its key, <see cref="KeyOf"/>.</param>
    /// <param name="offset">Offset x, m.</param>
    /// <param name="length">Slot length.</param>
    /// <param name="f">Frequency.</param>
    public static Complex Admittance(LongitudinalSlotMomentMethod solver, string key, double offset, Length length, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(solver);
        var k = (key, offset, length.Meters, f.Hertz);
        if (Memo.TryGetValue(k, out var y)) return y;
        y = solver.Solve(Length.FromMeters(offset), length, f).Admittance;
        Memo.TryAdd(k, y);
        return y;
    }

    /// <summary>Number of remembered solves.</summary>
    public static int Count => Memo.Count;

    /// <summary>The remembered solves, in a fixed order (solver, frequency, offset, length), for a caller that stores them.</summary>
    public static IReadOnlyList<SlotAdmittanceEntry> Entries() =>
        [.. Memo.Select(p => new SlotAdmittanceEntry(p.Key.Solver, p.Key.Offset, p.Key.Length, p.Key.Frequency, p.Value.Real, p.Value.Imaginary))
            .OrderBy(e => e.Solver, StringComparer.Ordinal).ThenBy(e => e.FrequencyHertz).ThenBy(e => e.OffsetMeters).ThenBy(e => e.LengthMeters)];

    /// <summary>
    /// Remembers stored solves (for example the CLI's disk cache); an entry already present is kept. Entries that are not
    /// finite are skipped. Returns the number added.
    /// </summary>
    public static int Preload(IEnumerable<SlotAdmittanceEntry> entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        int added = 0;
        foreach (var e in entries)
        {
            if (e?.Solver is null || !double.IsFinite(e.OffsetMeters) || !double.IsFinite(e.LengthMeters) || !double.IsFinite(e.FrequencyHertz)
                || !double.IsFinite(e.Real) || !double.IsFinite(e.Imaginary))
                continue;
            if (Memo.TryAdd((e.Solver, e.OffsetMeters, e.LengthMeters, e.FrequencyHertz), new Complex(e.Real, e.Imaginary))) added++;
        }
        return added;
    }
}
