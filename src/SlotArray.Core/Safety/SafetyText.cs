using System.Globalization;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Safety;

/// <summary>Number formatting for the caution sentences: three significant figures, invariant culture, never an exponent.</summary>
internal static class SafetyText
{
    /// <summary>A value rounded to three significant figures, e.g. 9.97, 362, 0.0028.</summary>
    public static string Sig3(double v)
    {
        if (v == 0 || !double.IsFinite(v)) return v.ToString(CultureInfo.InvariantCulture);
        int digits = 2 - (int)Math.Floor(Math.Log10(Math.Abs(v)));
        double r = digits >= 0 ? Math.Round(v, Math.Min(digits, 15)) : Math.Round(v / Math.Pow(10, -digits)) * Math.Pow(10, -digits);
        return r.ToString("0.###############", CultureInfo.InvariantCulture);
    }

    /// <summary>A length in metres, three significant figures with the unit: "9.97 m".</summary>
    public static string Metres(Length l) => Sig3(l.Meters) + " m";
}
