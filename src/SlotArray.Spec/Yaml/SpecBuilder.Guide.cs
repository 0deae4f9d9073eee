using System.Globalization;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;
using SlotArray.Spec.Schema;

namespace SlotArray.Spec.Yaml;

internal sealed partial class SpecBuilder
{
    private static IReadOnlyList<string> GuideKeys => SpecKeys.Guide.Names;

    /// <summary>
    /// The guide: a catalogue <c>size</c> and/or inside <c>a</c>, <c>b</c> (which override the size), the required
    /// <c>wall</c>, <c>metal</c> or <c>conductivity</c> (default aluminium, with a warning), optional
    /// <c>permittivity</c> (default 1) and <c>roughness</c> (default 0). Checks b &lt; a, and that the design frequency
    /// lies in the single-mode band (error) and in a standard guide's recommended band (warning).
    /// </summary>
    private RectangularWaveguide? Guide(Section root, Frequency? f, (Frequency Low, Frequency High)? band)
    {
        var g = Sub(root, "guide", GuideKeys, true);
        if (g is null) return null;
        bool ok = true;

        StandardWaveguide? standard = null;
        string? size = Text(g, "size", false, "WR-90");
        if (size is not null)
        {
            standard = WaveguideCatalogue.Find(size);
            if (standard is null)
            {
                D.Error(g["size"]!, $"unknown guide size '{size.Trim()}'; near ones: {string.Join(", ", NearSizes(size))} (or give 'a' and 'b'; 'slotarray guides' lists all)");
                ok = false;
            }
        }
        else if (!g.Has("a") || !g.Has("b"))
        {
            D.Error(g.Anchor, "'guide' needs 'size' (e.g. 'size: WR-90') or both inside dimensions 'a' and 'b' (e.g. 'a: 22.86 mm', 'b: 10.16 mm')");
            ok = false;
        }

        double? a = Quantity(g, "a", QuantityKind.Length, false, "22.86 mm") ?? standard?.BroadWall.Meters;
        double? b = Quantity(g, "b", QuantityKind.Length, false, "10.16 mm") ?? standard?.NarrowWall.Meters;
        if (a is not null && !Require(g, "a", a > 0 && a <= 10, $"'a' must be a positive inside width up to 10 m, got {Mm(a.Value)}")) a = null;
        if (b is not null && !Require(g, "b", b > 0, $"'b' must be a positive inside height, got {Mm(b.Value)}")) b = null;
        if (a is not null && b is not null && !(b < a))
        {
            D.Error((SpecNode?)g["b"] ?? (SpecNode?)g["a"] ?? g.Anchor,
                $"the narrow wall b = {Mm(b.Value)} must be smaller than the broad wall a = {Mm(a.Value)}; swap them or check the units");
            ok = false;
        }

        double? wall = Quantity(g, "wall", QuantityKind.Length, true, "1.27 mm");
        if (wall is not null && !Require(g, "wall", wall >= 0 && (a is null || wall < a),
                $"'wall' must be zero or a positive thickness smaller than a, got {Mm(wall.Value)}")) wall = null;

        double? sigma = null;
        string? metalName = null;
        if (g.Has("metal") && g.Has("conductivity"))
        {
            D.Error(g.KeyNode("conductivity")!, "give either 'metal' or 'conductivity', not both");
            ok = false;
        }
        else if (g.Has("conductivity"))
        {
            sigma = Quantity(g, "conductivity", QuantityKind.Conductivity, true, "3.5e7 S/m");
            if (sigma is not null && !Require(g, "conductivity", sigma > 0 && sigma <= 1e9,
                    $"'conductivity' must be positive and at most 1e9 S/m, got {Num(sigma.Value)} S/m")) sigma = null;
            metalName = sigma is null ? null : $"σ = {Sigma(sigma.Value)} S/m";
        }
        else if (g.Has("metal"))
        {
            string? word = Text(g, "metal", true, "aluminium");
            if (word is not null)
            {
                var metal = Metal.Find(word);
                if (metal is null)
                    D.Error(g["metal"]!, $"unknown metal '{word.Trim()}'; known: {string.Join(", ", Metal.All.Select(m => m.Name))} (or give 'conductivity: 3.5e7 S/m')");
                else
                {
                    sigma = metal.Conductivity;
                    metalName = metal.Name;
                }
            }
        }
        else
        {
            sigma = Metal.Aluminium.Conductivity;
            metalName = Metal.Aluminium.Name;
            D.Warn(g.Anchor, $"no 'metal' or 'conductivity' in 'guide': assuming aluminium, σ = {Sigma(Metal.Aluminium.Conductivity)} S/m; write 'metal: aluminium' to silence this");
        }

        double? er = g.Has("permittivity") ? Number(g, "permittivity", false, "1.0") : 1.0;
        if (er is not null && !Require(g, "permittivity", er >= SpecKeys.MinPermittivity && er <= SpecKeys.MaxPermittivity, $"'permittivity' (relative, of the filling) must be between 1 and 100, got {Num(er.Value)}")) er = null;
        double? rough = g.Has("roughness") ? Quantity(g, "roughness", QuantityKind.Length, false, "0.8 um") : 0.0;
        if (rough is not null && !Require(g, "roughness", rough >= 0 && rough < 1e-3, $"'roughness' (RMS) must be between 0 and 1 mm, got {Mm(rough.Value)}")) rough = null;

        if (!ok || a is null || b is null || wall is null || sigma is null || metalName is null || er is null || rough is null)
            return null;

        bool overridden = standard is not null && (g.Has("a") || g.Has("b"));
        string designation = standard is null || overridden ? "custom" : standard.Designation;
        Current = g.Anchor;
        var guide = RectangularWaveguide.Create(Length.FromMeters(a.Value), Length.FromMeters(b.Value), Length.FromMeters(wall.Value),
            sigma.Value, metalName, designation, er.Value, Length.FromMeters(rough.Value));

        if (f is { } fd) CheckModes(root, guide, fd, band, overridden ? null : standard);
        return guide;
    }

    /// <summary>The design frequency must be in the TE10-only band; a standard guide's recommended band is advice.</summary>
    private void CheckModes(Section root, RectangularWaveguide guide, Frequency f, (Frequency Low, Frequency High)? band, StandardWaveguide? standard)
    {
        var at = (SpecNode?)root["frequency"] ?? root.Anchor;
        var (lo, hi) = guide.SingleModeBand;
        if (f <= lo)
            D.Error(at, $"{Ghz(f)} is below the TE10 cutoff {Ghz(lo)} of this guide: no mode propagates; use a wider guide (a > {Mm(guide.BroadWall.Meters * lo.Hertz / f.Hertz)})");
        else if (f >= hi)
            D.Error(at, $"{Ghz(f)} is above the {guide.NextModeName} cutoff {Ghz(hi)} of this guide: it is no longer single-mode; use a smaller guide or a lower frequency");
        else if (standard is not null && (f < standard.BandLow || f > standard.BandHigh))
            D.Warn(at, $"{Ghz(f)} is outside the recommended band {Ghz(standard.BandLow)} to {Ghz(standard.BandHigh)} of {standard.Designation}: loss and dispersion rise near cutoff");
        if (band is { } bd && root["band"] is { } bandNode)
        {
            if (bd.Low <= lo)
                D.Error(bandNode, $"the band's low edge {Ghz(bd.Low)} is at or below the TE10 cutoff {Ghz(lo)} of this guide; raise it");
            if (bd.High >= hi)
                D.Warn(bandNode, $"the band's high edge {Ghz(bd.High)} is above the {guide.NextModeName} cutoff {Ghz(hi)}: the analysis there ignores the higher mode");
        }
    }

    /// <summary>A conductivity for messages, e.g. "3.77e7".</summary>
    internal static string Sigma(double v) => v.ToString("0.###e0", CultureInfo.InvariantCulture);

    /// <summary>The three catalogue sizes nearest to an unknown name (by WR number when it has one, else by spelling).</summary>
    private static IEnumerable<string> NearSizes(string size)
    {
        string digits = new(size.Where(char.IsAsciiDigit).Take(6).ToArray());
        var all = WaveguideCatalogue.All;
        if (digits.Length > 0 && size.Trim().StartsWith("WR", StringComparison.OrdinalIgnoreCase))
        {
            int n = int.Parse(digits, CultureInfo.InvariantCulture);
            return all.OrderBy(g => Math.Abs(int.Parse(g.Designation[3..], CultureInfo.InvariantCulture) - n)).Take(3).Select(g => g.Designation);
        }
        string key = size.Trim().ToUpperInvariant();
        return all.OrderBy(g => Math.Min(Section.EditDistance(key, g.Designation), Section.EditDistance(key, g.Iec)))
            .Take(3).Select(g => g.Designation);
    }
}
