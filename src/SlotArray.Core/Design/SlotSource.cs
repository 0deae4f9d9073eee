using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Slots.Tables;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Design;

/// <summary>
/// Where a run's slot admittances come from (architecture.md, "Slot data is a port"): the built-in model the spec names,
/// or a user's fitted table. Chosen once at the composition root (the CLI, or a test) and handed to the pipeline; it also
/// carries the resonant-characterisation cache the built-in moment method keeps its tables in.
/// </summary>
internal sealed class SlotSource
{
    private readonly Length _tableWidth;

    private SlotSource(ResonantCharacterisationCache cache, SlotTableFit? table, Length tableWidth)
    {
        Cache = cache;
        Table = table;
        _tableWidth = tableWidth;
    }

    /// <summary>The cache of moment-method resonant characterisations shared by every model this source builds.</summary>
    public ResonantCharacterisationCache Cache { get; }

    /// <summary>The fitted user table, or null for the built-in models.</summary>
    public SlotTableFit? Table { get; }

    /// <summary>The built-in models, keeping their characterisations in <paramref name="cache"/> (a new one when null).</summary>
    public static SlotSource BuiltIn(ResonantCharacterisationCache? cache = null) => new(cache ?? new ResonantCharacterisationCache(), null, default);

    /// <summary>
    /// A fitted user table for slots of the given width; the built-in models (sharing <paramref name="cache"/>) still
    /// give the tolerance analysis its sensitivities to the slot width, the wall and the guide width.
    /// </summary>
    /// <param name="table">The fitted table (in the spec's guide).</param>
    /// <param name="width">The slot width the table was made for (the spec's).</param>
    /// <param name="cache">The moment method's cache; a new one when null.</param>
    public static SlotSource FromTable(SlotTableFit table, Length width, ResonantCharacterisationCache? cache = null)
    {
        ArgumentNullException.ThrowIfNull(table);
        return new(cache ?? new ResonantCharacterisationCache(), table, width);
    }

    /// <summary>
    /// The source a request asks for: its <c>slots.data</c> table fitted in its guide when it has one, else the built-in
    /// models. Throws <see cref="SlotTableException"/> when the table cannot be fitted.
    /// </summary>
    public static SlotSource For(ArrayRequest request, ResonantCharacterisationCache? cache = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        return request.Slots.Data is { } data ? FromTable(SlotTableFit.Fit(data, request.Guide), request.Slots.Width, cache) : BuiltIn(cache);
    }

    /// <summary>The slot model for the request's guide and slot width: the table's when this source has one, else the built-in model.</summary>
    /// <exception cref="InfeasibleDesignException">The slot type has no designer yet.</exception>
    public IShuntSlotModel ModelFor(ArrayRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        if (Table is null) return BuiltInModelFor(request);
        var model = new TabulatedSlotModel(Table, _tableWidth, request.Slots.Extrapolate);
        if (request.Guide == Table.Guide && request.Slots.Width == _tableWidth) return model;
        // A perturbed guide or width (tolerance analysis): the table's y plus the built-in model's change.
        return new ShiftedSlotModel(model, BuiltInModelFor(request),
            BuiltInModelFor(request with { Guide = Table.Guide, Slots = request.Slots with { Width = _tableWidth } }));
    }

    /// <summary>The built-in model for the request's slot type, guide and width.</summary>
    /// <exception cref="InfeasibleDesignException">The slot type has no designer yet.</exception>
    public IShuntSlotModel BuiltInModelFor(ArrayRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        return request.Slots.Type switch
        {
            SlotType.Longitudinal => LongitudinalSlotModels.Create(request.Slots.Model, request.Guide, request.Slots.Width, request.DesignFrequency, cache: Cache),
            SlotType.Edge => CalibratedEdgeSlot.Create(request.Guide, request.Slots.Width, request.Slots.Surround),
            _ => throw new InfeasibleDesignException(
                $"slots of type '{request.Slots.Type}' have a conductance formula (slot command) but no array designer yet: use 'longitudinal' or 'edge' slots"),
        };
    }
}
