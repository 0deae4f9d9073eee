using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Planar;

/// <summary>
/// The pattern figures of a planar array at one frequency: principal and diagonal cuts, the peak sidelobe over the
/// whole visible region, directivity by integration against the aperture formula, and gain with the wall losses.
/// </summary>
/// <param name="HPlane">The x-z cut (along the branches; the slots' H-plane).</param>
/// <param name="EPlane">The y-z cut (across the branches; the slots' E-plane).</param>
/// <param name="Diagonal">The cut at φ = 45°.</param>
/// <param name="HPlaneCut">The sampled x-z cut.</param>
/// <param name="EPlaneCut">The sampled y-z cut.</param>
/// <param name="DiagonalCut">The sampled 45° cut.</param>
/// <param name="Beam">The beam peak in u-v.</param>
/// <param name="PeakSidelobe">The highest sidelobe anywhere in the visible region; null when none.</param>
/// <param name="DirectivityDbi">Directivity by integration over the front half space, dBi.</param>
/// <param name="ApertureDirectivityDbi">4πA/λ² η_t (A: the slots' cells, η_t the taper efficiency of the excitations), dBi.</param>
/// <param name="TaperEfficiency">η_t = |Σ e|²/(N Σ|e|²).</param>
/// <param name="RadiationEfficiency">Radiated over accepted power (the walls take the rest).</param>
/// <param name="GainDbi">Directivity × radiation efficiency, dBi (mismatch not included).</param>
/// <param name="HPlaneArrayFactorPeakSidelobeDb">Peak sidelobe of the x-z cut of the array factor alone (isotropic elements), dB; null when none.</param>
/// <param name="EPlaneArrayFactorPeakSidelobeDb">The same for the y-z cut (where the slot's element pattern is 1, equal to <see cref="EPlane"/>'s).</param>
internal sealed record PlanarFigures(PatternMetrics HPlane, PatternMetrics EPlane, PatternMetrics Diagonal, Pattern HPlaneCut, Pattern EPlaneCut,
    Pattern DiagonalCut, UvPoint Beam, UvPoint? PeakSidelobe, double DirectivityDbi, double ApertureDirectivityDbi, double TaperEfficiency,
    double RadiationEfficiency, double GainDbi, double? HPlaneArrayFactorPeakSidelobeDb, double? EPlaneArrayFactorPeakSidelobeDb)
{
    /// <summary>Figures of the array field <paramref name="field"/> (aperture area <paramref name="area"/>, m²) with the network's power budget.</summary>
    public static PlanarFigures Of(PlanarArrayFactor field, double area, IReadOnlyList<System.Numerics.Complex> excitations, Frequency f,
        double radiated, double accepted)
    {
        ArgumentNullException.ThrowIfNull(field);
        var grid = AngleGrid.UniformInTheta(-Math.PI / 2, Math.PI / 2, Math.Max(1801, 40 * (int)Math.Ceiling(f.FreeSpaceWavenumber * field.Extent / Math.PI) + 1));
        var h = field.Cut(0, grid);
        var e = field.Cut(Math.PI / 2, grid);
        var dg = field.Cut(Math.PI / 4, grid);
        var (beam, psl) = field.BeamAndPeakSidelobe();
        double d = field.Directivity(beam.U, beam.V);
        double eta = PatternMetrics.TaperEfficiency(excitations);
        double lam = f.FreeSpaceWavelength.Meters;
        double rad = accepted > 0 ? Math.Clamp(radiated / accepted, 0, 1) : 1;
        return new PlanarFigures(PatternMetrics.Measure(h), PatternMetrics.Measure(e), PatternMetrics.Measure(dg), h, e, dg, beam, psl,
            10 * Math.Log10(d), 10 * Math.Log10(4 * Math.PI * area * eta / (lam * lam)), eta, rad, 10 * Math.Log10(d * rad),
            PatternMetrics.Measure(field.Cut(0, grid, false)).PeakSidelobeDb, PatternMetrics.Measure(field.Cut(Math.PI / 2, grid, false)).PeakSidelobeDb);
    }
}
