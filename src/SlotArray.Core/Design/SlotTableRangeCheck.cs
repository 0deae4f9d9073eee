using SlotArray.Core.Slots;
using SlotArray.Core.Slots.Tables;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Design;

/// <summary>
/// The verdict on a design made from a user's slot table: which slots need a geometry, length or frequency the table
/// does not hold. Without <c>slots.extrapolate</c> such a design is refused (exit 1, naming the slot and the range);
/// with it, the slots are flagged (warnings here, a column in the cut list).
/// </summary>
internal static class SlotTableRangeCheck
{
    /// <summary>Code of the per-slot warning for a slot outside the table.</summary>
    public const string ExtrapolatedCode = "slot-table-extrapolated";

    /// <summary>The table model behind a slot model (through the analysis wrapper), or null for a built-in model.</summary>
    public static TabulatedSlotModel? TableOf(IShuntSlotModel slot) => slot switch
    {
        TabulatedSlotModel t => t,
        FrequencyInterpolatedSlotModel w => TableOf(w.Inner),
        _ => null,
    };

    /// <summary>For each slot of the design outside the table at the design frequency: its index (1-based) and why. Empty for a built-in model.</summary>
    public static IReadOnlyList<(int Index, string Reason)> Outside(ArrayDesign design, IShuntSlotModel slot)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(slot);
        if (TableOf(slot) is not { } table) return [];
        var list = new List<(int, string)>();
        foreach (var s in design.Slots)
        {
            var why = table.Fit.OutsideRange(s.Coupling, s.Length.Meters, design.DesignFrequency);
            if (why.Count > 0) list.Add((s.Index, string.Join("; ", why)));
        }
        return list;
    }

    /// <summary>
    /// Refuses a design with slots outside the table unless the table model extrapolates; then returns one warning per
    /// such slot (empty for a built-in model or a design inside the table).
    /// </summary>
    /// <exception cref="InfeasibleDesignException">Slots lie outside the table and <c>slots.extrapolate</c> is not set.</exception>
    public static IReadOnlyList<DesignWarning> Check(ArrayDesign design, IShuntSlotModel slot)
    {
        var outside = Outside(design, slot);
        if (outside.Count == 0) return [];
        var table = TableOf(slot)!;
        if (!table.Extrapolate)
        {
            var (index, reason) = outside[0];
            throw new InfeasibleDesignException(
                $"slot {index} needs a slot outside the slot table {table.Fit.Table.Source}: {reason}"
                + (outside.Count > 1 ? $" ({outside.Count} of {design.Slots.Count} slots are outside: {string.Join(", ", outside.Select(o => o.Index))})" : "")
                + ": extend the table, or set slots.extrapolate: true to design with extrapolated values (those slots are flagged)");
        }
        return [.. outside.Select(o => new DesignWarning(ExtrapolatedCode, $"slot {o.Index}: outside the slot table {table.Fit.Table.Source} ({o.Reason}); extrapolated"))];
    }
}
