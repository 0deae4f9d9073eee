using System.Globalization;
using System.Text.RegularExpressions;
using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Spec;

/// <summary>The kinds of quantity a spec value or a command-line option can hold.</summary>
internal enum QuantityKind
{
    /// <summary>A length: m, cm, mm, um (µm), in, mil.</summary>
    Length,
    /// <summary>A frequency: Hz, kHz, MHz, GHz.</summary>
    Frequency,
    /// <summary>A plane angle: deg (°), rad.</summary>
    Angle,
    /// <summary>A level in decibels: dB.</summary>
    Decibels,
    /// <summary>A fraction in per cent: %.</summary>
    Percent,
    /// <summary>A power: mW, W, kW, MW.</summary>
    Power,
    /// <summary>An electrical conductivity: S/m.</summary>
    Conductivity,
    /// <summary>A distance in guide wavelengths: guide-wavelength (λg).</summary>
    GuideWavelengths,
    /// <summary>A temperature in degrees Celsius: degC (°C); kept in °C (an offset scale, not converted to kelvin).</summary>
    Temperature,
}

/// <summary>
/// Parses a number with its unit, e.g. <c>9.41 GHz</c>, <c>9.41GHz</c>, <c>1.27 mm</c>, <c>-26 dB</c>, <c>5 %</c>,
/// into SI (m, Hz, rad, W, S/m; dB as given; per cent as a fraction). Invariant culture (a dot, never a comma);
/// the unit is required; a unit of another kind, a non-finite number (<c>1e400</c>) or an unknown unit is an error
/// whose message says what to write instead. Shared by the YAML spec and the command-line options.
/// </summary>
internal static partial class QuantityParser
{
    private sealed record Unit(string Symbol, QuantityKind Kind, double Factor);

    private static readonly Unit[] Units =
    [
        new("m", QuantityKind.Length, 1), new("cm", QuantityKind.Length, 1e-2), new("mm", QuantityKind.Length, 1e-3),
        new("um", QuantityKind.Length, 1e-6), new("µm", QuantityKind.Length, 1e-6), new("μm", QuantityKind.Length, 1e-6),
        new("in", QuantityKind.Length, Length.MetersPerInch), new("inch", QuantityKind.Length, Length.MetersPerInch),
        new("mil", QuantityKind.Length, Length.MetersPerInch * 1e-3),
        new("Hz", QuantityKind.Frequency, 1), new("kHz", QuantityKind.Frequency, 1e3),
        new("MHz", QuantityKind.Frequency, 1e6), new("GHz", QuantityKind.Frequency, 1e9),
        new("deg", QuantityKind.Angle, Math.PI / 180), new("°", QuantityKind.Angle, Math.PI / 180),
        new("rad", QuantityKind.Angle, 1),
        new("dB", QuantityKind.Decibels, 1),
        new("%", QuantityKind.Percent, 1e-2),
        new("mW", QuantityKind.Power, 1e-3), new("W", QuantityKind.Power, 1), new("kW", QuantityKind.Power, 1e3),
        new("MW", QuantityKind.Power, 1e6),
        new("S/m", QuantityKind.Conductivity, 1),
        new("guide-wavelength", QuantityKind.GuideWavelengths, 1), new("guide-wavelengths", QuantityKind.GuideWavelengths, 1),
        new("λg", QuantityKind.GuideWavelengths, 1),
        new("degC", QuantityKind.Temperature, 1), new("°C", QuantityKind.Temperature, 1),
    ];

    /// <summary>
    /// A decimal number as a spec writes it (dot separator, optional exponent, the digits 0-9: .NET's \d would also take
    /// other scripts' digits, which the invariant number parser cannot read); shared with the JSON Schema's patterns.
    /// </summary>
    internal const string NumberPattern = @"[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?";

    [GeneratedRegex(@"^\s*(?<num>" + NumberPattern + @")\s*(?<unit>.*?)\s*$", RegexOptions.CultureInvariant)]
    private static partial Regex NumberAndUnit();

    /// <summary>The unit symbols of the given kinds, in table order (e.g. m, cm, mm, um, µm, μm, in, inch, mil).</summary>
    internal static IReadOnlyList<string> SymbolsOf(IReadOnlyList<QuantityKind> kinds)
        => Units.Where(u => kinds.Contains(u.Kind)).Select(u => u.Symbol).ToList();

    /// <summary>
    /// A regular expression (ECMA-262 subset, for a JSON Schema <c>pattern</c>) that matches exactly the unit spellings
    /// <see cref="FindUnit"/> accepts for the given kinds: each symbol as written, and in any letter case where the
    /// case-folded symbol is unique (so <c>ghz</c> is matched, <c>mw</c> is not).
    /// </summary>
    internal static string UnitPattern(IReadOnlyList<QuantityKind> kinds)
    {
        var parts = Units.Where(u => kinds.Contains(u.Kind)).Select(u =>
        {
            bool foldable = Units.Count(v => string.Equals(v.Symbol, u.Symbol, StringComparison.OrdinalIgnoreCase)) == 1;
            return string.Concat(u.Symbol.Select(c => foldable && char.ToUpperInvariant(c) != char.ToLowerInvariant(c)
                ? $"[{char.ToLowerInvariant(c)}{char.ToUpperInvariant(c)}]"
                : Regex.Escape(c.ToString())));
        });
        return "(?:" + string.Join("|", parts.OrderByDescending(p => p.Length).ThenBy(p => p, StringComparer.Ordinal)) + ")";
    }

    /// <summary>What a value of each kind looks like, for messages: "a length such as '1.27 mm'".</summary>
    public static string Describe(QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "a length such as '1.27 mm' (m, cm, mm, um, in, mil)",
        QuantityKind.Frequency => "a frequency such as '9.41 GHz' (Hz, kHz, MHz, GHz)",
        QuantityKind.Angle => "an angle such as '15 deg' (deg, rad)",
        QuantityKind.Decibels => "a level such as '-26 dB'",
        QuantityKind.Percent => "a percentage such as '5 %'",
        QuantityKind.Power => "a power such as '25 kW' (W, kW, MW)",
        QuantityKind.Conductivity => "a conductivity such as '3.5e7 S/m'",
        QuantityKind.GuideWavelengths => "a distance such as '0.5 guide-wavelength'",
        QuantityKind.Temperature => "a temperature such as '-25 degC' (degC, °C)",
        _ => kind.ToString(),
    };

    private static string Noun(QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "a length",
        QuantityKind.Frequency => "a frequency",
        QuantityKind.Angle => "an angle",
        QuantityKind.Decibels => "a level in dB",
        QuantityKind.Percent => "a percentage",
        QuantityKind.Power => "a power",
        QuantityKind.Conductivity => "a conductivity",
        QuantityKind.GuideWavelengths => "a distance in guide wavelengths",
        QuantityKind.Temperature => "a temperature",
        _ => kind.ToString(),
    };

    /// <summary>
    /// Parses <paramref name="text"/> as a quantity of one of the accepted kinds. On success returns true with
    /// the value in SI (or dB, or a fraction for per cent) and the kind found; on failure returns false and an
    /// error message that starts with what was expected, e.g. "needs a length such as '1.27 mm' (…), not '1.27 GHz', which is a frequency".
    /// </summary>
    public static bool TryParse(string? text, IReadOnlyList<QuantityKind> accepted, out double value, out QuantityKind kind, out string error)
    {
        value = 0; kind = accepted[0]; error = "";
        string expected = string.Join(", or ", accepted.Select(Describe));
        if (string.IsNullOrWhiteSpace(text)) { error = $"needs {expected}"; return false; }
        var m = NumberAndUnit().Match(text);
        if (!m.Success)
        {
            error = text.Any(c => char.IsDigit(c) && !char.IsAsciiDigit(c))
                ? $"needs {expected}; '{text.Trim()}' has digits other than 0-9: write the number with the digits 0-9"
                : $"needs {expected}; '{text.Trim()}' is not a number with a unit";
            return false;
        }
        double number = double.Parse(m.Groups["num"].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
        if (!double.IsFinite(number)) { error = $"needs {expected}; '{m.Groups["num"].Value}' is too large to be a finite number"; return false; }
        string symbol = m.Groups["unit"].Value;
        if (symbol.Length == 0) { error = $"needs {expected}; '{text.Trim()}' has no unit"; return false; }
        var unit = FindUnit(symbol);
        if (unit is null) { error = $"needs {expected}; '{symbol}' in '{text.Trim()}' is not a known unit"; return false; }
        if (!accepted.Contains(unit.Kind))
        {
            error = $"needs {expected}, not '{text.Trim()}', which is {Noun(unit.Kind)}";
            return false;
        }
        value = number * unit.Factor;
        kind = unit.Kind;
        if (!double.IsFinite(value)) { error = $"needs {expected}; '{text.Trim()}' is too large to be a finite number"; return false; }
        return true;
    }

    /// <summary>Parses a quantity of exactly one kind (see <see cref="TryParse(string?, IReadOnlyList{QuantityKind}, out double, out QuantityKind, out string)"/>).</summary>
    public static bool TryParse(string? text, QuantityKind kind, out double value, out string error)
        => TryParse(text, [kind], out value, out _, out error);

    /// <summary>An exact symbol, else a case-insensitive match that is unique (so "ghz" works but "mw" is refused).</summary>
    private static Unit? FindUnit(string symbol)
    {
        var exact = Units.FirstOrDefault(u => u.Symbol == symbol);
        if (exact is not null) return exact;
        var folded = Units.Where(u => string.Equals(u.Symbol, symbol, StringComparison.OrdinalIgnoreCase)).ToList();
        return folded.Count == 1 ? folded[0] : null;
    }

    /// <summary>Parses a length, e.g. <c>1.27 mm</c> or <c>0.05in</c>.</summary>
    public static bool TryParseLength(string? text, out Length value, out string error)
    {
        bool ok = TryParse(text, QuantityKind.Length, out double v, out error);
        value = Length.FromMeters(v);
        return ok;
    }

    /// <summary>Parses a frequency, e.g. <c>9.375 GHz</c> or <c>9375MHz</c>.</summary>
    public static bool TryParseFrequency(string? text, out Frequency value, out string error)
    {
        bool ok = TryParse(text, QuantityKind.Frequency, out double v, out error);
        value = Frequency.FromHertz(v);
        return ok;
    }

    /// <summary>Parses an angle, e.g. <c>15 deg</c> or <c>0.26 rad</c>.</summary>
    public static bool TryParseAngle(string? text, out Angle value, out string error)
    {
        bool ok = TryParse(text, QuantityKind.Angle, out double v, out error);
        value = Angle.FromRadians(v);
        return ok;
    }

    /// <summary>Parses a level in decibels, e.g. <c>-26 dB</c>; the value is returned in dB.</summary>
    public static bool TryParseDecibels(string? text, out double decibels, out string error)
        => TryParse(text, QuantityKind.Decibels, out decibels, out error);

    /// <summary>Parses a percentage, e.g. <c>5 %</c>; the value is returned as a fraction (0.05).</summary>
    public static bool TryParsePercent(string? text, out double fraction, out string error)
        => TryParse(text, QuantityKind.Percent, out fraction, out error);

    /// <summary>Parses a power, e.g. <c>25 kW</c>; the value is returned in watts.</summary>
    public static bool TryParsePower(string? text, out double watts, out string error)
        => TryParse(text, QuantityKind.Power, out watts, out error);

    /// <summary>Parses a conductivity, e.g. <c>3.5e7 S/m</c>; the value is returned in S/m.</summary>
    public static bool TryParseConductivity(string? text, out double siemensPerMeter, out string error)
        => TryParse(text, QuantityKind.Conductivity, out siemensPerMeter, out error);

    /// <summary>Parses a distance along the guide: <c>0.25 guide-wavelength</c> (also <c>λg</c>) or a length such as <c>18.6 mm</c>.</summary>
    public static bool TryParseGuideDistance(string? text, out GuideDistance value, out string error)
    {
        bool ok = TryParse(text, [QuantityKind.GuideWavelengths, QuantityKind.Length], out double v, out var kind, out error);
        value = kind == QuantityKind.Length ? GuideDistance.OfLength(Length.FromMeters(v)) : GuideDistance.InGuideWavelengths(v);
        return ok;
    }

    /// <summary>Parses a plain number without unit (counts, ratios), invariant culture; the error says what was expected.</summary>
    public static bool TryParseNumber(string? text, out double value, out string error)
    {
        value = 0; error = "";
        string t = (text ?? "").Trim();
        if (t.Length == 0) { error = "needs a number"; return false; }
        if (!double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out value))
        {
            error = NumberAndUnit().Match(t) is { Success: true } m && m.Groups["unit"].Length > 0
                ? $"'{t}' should be a plain number without a unit"
                : $"'{t}' is not a number";
            return false;
        }
        if (!double.IsFinite(value)) { error = $"'{t}' is too large to be a finite number"; return false; }
        return true;
    }
}
