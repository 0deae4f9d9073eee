using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;

namespace SlotArray.Spec;

/// <summary>The words a spec uses for each choice (e.g. <c>standing-wave</c>), both ways; reports print the same words.</summary>
internal static class SpecNames
{
    /// <summary>Slot types: longitudinal | edge | inclined-series.</summary>
    public static IReadOnlyList<KeyValuePair<string, SlotType>> SlotTypes { get; } =
        [new("longitudinal", SlotType.Longitudinal), new("edge", SlotType.Edge), new("inclined-series", SlotType.InclinedSeries)];

    /// <summary>Slot models: moment-method | stevenson.</summary>
    public static IReadOnlyList<KeyValuePair<string, SlotModelKind>> SlotModels { get; } =
        [new("moment-method", SlotModelKind.MomentMethod), new("stevenson", SlotModelKind.Stevenson)];

    /// <summary>Edge-slot surroundings: tube | ground-plane | flare.</summary>
    public static IReadOnlyList<KeyValuePair<string, EdgeSlotSurround>> Surrounds { get; } =
        [new("tube", EdgeSlotSurround.Tube), new("ground-plane", EdgeSlotSurround.GroundPlane), new("flare", EdgeSlotSurround.Flare)];

    /// <summary>Feed types: standing-wave | travelling-wave.</summary>
    public static IReadOnlyList<KeyValuePair<string, FeedType>> FeedTypes { get; } =
        [new("standing-wave", FeedType.StandingWave), new("travelling-wave", FeedType.TravellingWave)];

    /// <summary>Feed positions: end | centre.</summary>
    public static IReadOnlyList<KeyValuePair<string, FeedPosition>> FeedPositions { get; } =
        [new("end", FeedPosition.End), new("centre", FeedPosition.Centre)];

    /// <summary>Taper families, as written in a spec.</summary>
    public static IReadOnlyList<KeyValuePair<string, TaperType>> TaperTypes { get; } =
    [
        new("uniform", TaperType.Uniform), new("chebyshev", TaperType.Chebyshev), new("taylor", TaperType.Taylor),
        new("villeneuve", TaperType.Villeneuve), new("taylor-one-parameter", TaperType.TaylorOneParameter),
        new("cosine-pedestal", TaperType.CosinePedestal), new("bayliss", TaperType.Bayliss), new("given", TaperType.Given),
    ];

    /// <summary>Other spellings accepted for a word of these tables (after folding case and '_'/' ' to '-'), each with the word it stands for.</summary>
    internal static IReadOnlyList<KeyValuePair<string, string>> WordAliases { get; } =
        [new("center", "centre"), new("traveling-wave", "travelling-wave"), new("moment", "moment-method")];

    /// <summary>Coupling modes: none | mutual.</summary>
    public static IReadOnlyList<KeyValuePair<string, CouplingMode>> CouplingModes { get; } =
        [new("none", CouplingMode.None), new("mutual", CouplingMode.Mutual)];

    /// <summary>The spec word for a value (e.g. <c>standing-wave</c> for <see cref="FeedType.StandingWave"/>).</summary>
    public static string Of<T>(IReadOnlyList<KeyValuePair<string, T>> table, T value) where T : struct, Enum
        => table.First(p => EqualityComparer<T>.Default.Equals(p.Value, value)).Key;

    /// <summary>Slot type as written in a spec.</summary>
    public static string Of(SlotType v) => Of(SlotTypes, v);
    /// <summary>Slot model as written in a spec.</summary>
    public static string Of(SlotModelKind v) => Of(SlotModels, v);
    /// <summary>Feed type as written in a spec.</summary>
    public static string Of(FeedType v) => Of(FeedTypes, v);
    /// <summary>Feed position as written in a spec.</summary>
    public static string Of(FeedPosition v) => Of(FeedPositions, v);
    /// <summary>Taper type as written in a spec.</summary>
    public static string Of(TaperType v) => Of(TaperTypes, v);
    /// <summary>Coupling mode as written in a spec.</summary>
    public static string Of(CouplingMode v) => Of(CouplingModes, v);
}
