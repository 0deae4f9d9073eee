using System.Globalization;

namespace SlotArray.Reports;

/// <summary>Fixed, culture-free number formats shared by the text writers.</summary>
internal static class Invariant
{
    /// <summary>
    /// <paramref name="value"/> with exactly <paramref name="decimals"/> decimals, invariant culture, never "-0.000";
    /// "n/a" when the value is not finite.
    /// </summary>
    public static string Fixed(double value, int decimals)
    {
        if (!double.IsFinite(value)) return "n/a";
        string s = value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return s.StartsWith('-') && s.AsSpan(1).IndexOfAnyExcept("0.") < 0 ? s[1..] : s;
    }

    /// <summary>Metres printed as millimetres with <paramref name="decimals"/> decimals.</summary>
    public static string Mm(double meters, int decimals = 3) => Fixed(meters * 1e3, decimals);

    /// <summary>Hertz printed as gigahertz with <paramref name="decimals"/> decimals.</summary>
    public static string Ghz(double hertz, int decimals = 3) => Fixed(hertz * 1e-9, decimals);

    /// <summary>An integer in the invariant culture.</summary>
    public static string Int(int value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>The normalisation sentence every output carries (architecture.md, Conventions).</summary>
    public const string Normalisation = "conductances normalised to the TE10 characteristic admittance G0 (g = G/G0)";
}
