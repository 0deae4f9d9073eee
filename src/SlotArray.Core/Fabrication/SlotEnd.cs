using System.Globalization;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>How the ends of a slot are formed.</summary>
public enum SlotEndForm
{
    /// <summary>Round ends left by an end mill (radius = cutter radius).</summary>
    Round,
    /// <summary>Square (rectangular) ends: cannot be milled; need EDM, broaching or a punch.</summary>
    Square,
}

/// <summary>The end form of a slot as the cut list states it.</summary>
/// <param name="Form">Round or square.</param>
/// <param name="CutterDiameter">End-mill diameter for round ends; null for square ends.</param>
public sealed record SlotEnd(SlotEndForm Form, Length? CutterDiameter)
{
    /// <summary>The note a drawing must carry for square-ended slots (common practice [C]).</summary>
    public const string SquareEndNote = "square-ended slots cannot be milled: they need EDM, broaching or a punch";

    /// <summary>Round ends from an end mill of the given diameter.</summary>
    /// <param name="cutterDiameter">End-mill diameter, &gt; 0.</param>
    public static SlotEnd Round(Length cutterDiameter) => new(SlotEndForm.Round, cutterDiameter);

    /// <summary>Square ends.</summary>
    public static SlotEnd Square { get; } = new(SlotEndForm.Square, null);

    /// <summary>Round when a cutter is given, square otherwise.</summary>
    /// <param name="cutterDiameter">End-mill diameter, or null for square ends.</param>
    public static SlotEnd From(Length? cutterDiameter) => cutterDiameter is { } d ? Round(d) : Square;

    /// <summary>Whether the end form needs EDM, broaching or a punch (square ends).</summary>
    public bool NeedsSpecialProcess => Form == SlotEndForm.Square;

    /// <summary>The cut-list text: "round Ø1.6" (cutter diameter in mm, up to three decimals) or "square".</summary>
    public string Description => CutterDiameter is { } d
        ? "round Ø" + Math.Round(d.Millimeters, 3).ToString("0.###", CultureInfo.InvariantCulture)
        : "square";

    /// <inheritdoc />
    public override string ToString() => Description;
}
