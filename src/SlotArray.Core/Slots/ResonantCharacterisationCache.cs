using System.Collections.Concurrent;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>
/// The in-memory store of moment-method resonant characterisations (<see cref="ResonantCharacterisation"/>), keyed by
/// every input (<see cref="ResonantCharacterisation.KeyOf"/>). One instance is made at the composition root and handed
/// to the slot models, so runs and tests that share it compute each table once and runs that do not stay apart.
/// Thread-safe; a table's values do not depend on which caller computed it first.
/// </summary>
public sealed class ResonantCharacterisationCache
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
}
