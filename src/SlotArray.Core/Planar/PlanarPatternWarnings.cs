using System.Globalization;
using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Tapers;

namespace SlotArray.Core.Planar;

/// <summary>
/// The pattern cautions of a planar array in its principal planes: a grating lobe whose skirt (out to its first null)
/// reaches visible space (<see cref="GratingLobeSkirt"/>), and a principal-plane peak sidelobe more than
/// <see cref="SidelobeExcessDb"/> above the level the taper asked for.
/// </summary>
internal static class PlanarPatternWarnings
{
    /// <summary>How far above the asked level a principal-plane peak sidelobe may sit before it is named, dB (common practice, no source).</summary>
    public const double SidelobeExcessDb = 1.5;

    /// <summary>Stable code of the grating-lobe skirt caution.</summary>
    public const string GratingSkirtCode = "grating-lobe-skirt";

    /// <summary>Stable code of the sidelobe caution.</summary>
    public const string SidelobesCode = "planar-sidelobes-above-target";

    /// <summary>The grating-lobe skirt cautions of both planes (x-z along the branches, y-z across them) at f0.</summary>
    public static IEnumerable<DesignWarning> Grating(GratingLobeSkirt along, GratingLobeSkirt across, Frequency f0)
    {
        ArgumentNullException.ThrowIfNull(along);
        ArgumentNullException.ThrowIfNull(across);
        if (along.ReachesVisibleSpace) yield return Skirt("x-z plane (along the branches)", "slot spacing", along, f0);
        if (across.ReachesVisibleSpace) yield return Skirt("y-z plane (across the branches)", "branch pitch", across, f0);
    }

    /// <summary>The sidelobe cautions: each principal cut's peak sidelobe against the level its taper asked for.</summary>
    public static IEnumerable<DesignWarning> Sidelobes(ArrayRequest request, PlanarFigures figures)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(figures);
        var p = request.Planar ?? throw new ArgumentException("not a planar request", nameof(request));
        double? along = p.CircularSidelobesDb ?? Asked(request.Taper), across = p.CircularSidelobesDb ?? Asked(p.Across ?? request.Taper);
        if (Excess(figures.HPlane.PeakSidelobeDb, along) is { } h) yield return Sidelobe("x-z plane (along the branches)", h, along!.Value);
        if (Excess(figures.EPlane.PeakSidelobeDb, across) is { } e) yield return Sidelobe("y-z plane (across the branches)", e, across!.Value);
    }

    /// <summary>The skirt figures of a planar layout with the given excitations (layout order) and beam direction.</summary>
    public static (GratingLobeSkirt Along, GratingLobeSkirt Across) Skirts(PlanarLayout layout, IReadOnlyList<Complex> excitations, Frequency f0, double beamU = 0, double beamV = 0) =>
        GratingLobeSkirt.Of(layout, excitations, f0.FreeSpaceWavelength.Meters, beamU, beamV);

    private static double? Asked(TaperRequest t) =>
        t.Type is TaperType.Chebyshev or TaperType.Taylor or TaperType.Villeneuve or TaperType.TaylorOneParameter ? t.SidelobeLevelDb : null;

    private static double? Excess(double? peak, double? asked) => peak is { } pk && asked is { } a && pk > a + SidelobeExcessDb ? pk : null;

    private static DesignWarning Skirt(string plane, string what, GratingLobeSkirt s, Frequency f0) => new(GratingSkirtCode, string.Create(CultureInfo.InvariantCulture,
        $"{plane}: with the {what} {s.Spacing * 1e3:0.###} mm a grating lobe's main lobe reaches visible space at {f0} (its first null at |u| = {Math.Abs(s.InnerNullU):0.###} < 1, beam at u = {s.Beam:0.###}), raising the far sidelobes; a {what} of at most {s.LargestSpacing * 1e3:0.###} mm keeps it out"));

    private static DesignWarning Sidelobe(string plane, double peak, double asked) => new(SidelobesCode, string.Create(CultureInfo.InvariantCulture,
        $"{plane}: peak sidelobe {peak:0.##} dB over visible space is more than {SidelobeExcessDb:0.#} dB above the asked {asked:0.##} dB"));
}
