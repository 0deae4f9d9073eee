namespace SlotArray.Spec.Schema;

/// <summary>What the value of one spec key may be; the JSON Schema and the starter spec are written from it.</summary>
internal abstract record SpecValue;

/// <summary>Free text (any scalar: YAML may read <c>16</c> or <c>true</c> as a number or a boolean, the parser takes its text).</summary>
/// <param name="Pattern">ECMA-262 pattern the text must match, or null.</param>
/// <param name="MaxLength">Longest text accepted, or null.</param>
internal sealed record TextValue(string? Pattern = null, int? MaxLength = null) : SpecValue;

/// <summary>A YAML boolean: <c>true</c> or <c>false</c> (also <c>True</c>, <c>TRUE</c>, … as the YAML 1.2 core schema reads them).</summary>
internal sealed record BooleanValue : SpecValue;

/// <summary>A whole number in [<paramref name="Minimum"/>, <paramref name="Maximum"/>] (a quoted numeral is accepted too).</summary>
internal sealed record IntegerValue(long Minimum, long Maximum) : SpecValue;

/// <summary>A plain number without a unit in [<paramref name="Minimum"/>, <paramref name="Maximum"/>].</summary>
/// <param name="Minimum">Smallest value, or null for none.</param>
/// <param name="Maximum">Largest value, or null for none.</param>
/// <param name="ExclusiveMinimum">Whether <paramref name="Minimum"/> itself is refused.</param>
internal sealed record NumberValue(double? Minimum, double? Maximum, bool ExclusiveMinimum = false) : SpecValue;

/// <summary>A number with a unit of one of <paramref name="Kinds"/> (e.g. <c>9.41 GHz</c>); its range is stated in words.</summary>
/// <param name="Kinds">The kinds accepted (a distance along the guide takes guide wavelengths or a length).</param>
/// <param name="Range">The accepted range in words, e.g. "1 MHz to 1000 GHz" (checked by the parser).</param>
internal sealed record QuantityValue(IReadOnlyList<QuantityKind> Kinds, string Range) : SpecValue;

/// <summary>How the parser matches a word of a <see cref="ChoiceValue"/>.</summary>
internal enum WordFolding
{
    /// <summary>Letter case ignored; '-', '_' and ' ' interchangeable (taper, feed and slot words).</summary>
    Words,
    /// <summary>Letter case ignored (metal names).</summary>
    CaseOnly,
    /// <summary>Letter case ignored, '-' and ' ' dropped anywhere (guide designations: <c>WR-90</c>, <c>wr90</c>).</summary>
    Designation,
}

/// <summary>One word of a fixed set.</summary>
/// <param name="Words">The words as the spec and the reports write them.</param>
/// <param name="Aliases">Other spellings the parser accepts (e.g. <c>center</c>, <c>aluminum</c>).</param>
/// <param name="Folding">How the parser compares words.</param>
internal sealed record ChoiceValue(IReadOnlyList<string> Words, IReadOnlyList<string> Aliases, WordFolding Folding) : SpecValue;

/// <summary>A YAML list of items.</summary>
/// <param name="Item">What each item is.</param>
/// <param name="MinItems">Fewest items.</param>
/// <param name="MaxItems">Most items, or null.</param>
internal sealed record ListValue(SpecValue Item, int MinItems, int? MaxItems) : SpecValue;

/// <summary>A block of keys (a YAML mapping) described by its own section.</summary>
internal sealed record BlockValue(SpecSection Section) : SpecValue;

/// <summary>Any one of several forms (e.g. a tolerance: <c>0.02 mm</c> or <c>{sigma: 0.02 mm}</c>).</summary>
internal sealed record AnyOfValue(IReadOnlyList<SpecValue> Forms) : SpecValue;
