using SlotArray.Core.Quantities;

namespace SlotArray.Core.Patterns;

/// <summary>
/// Figures of merit of a difference (monopulse) pattern: two lobes either side of a null at boresight. The
/// difference lobes are found by walking outward from boresight to the first maximum, then to the next minimum;
/// everything beyond those minima is the sidelobe region. Levels are relative to the higher difference lobe, dB.
/// </summary>
/// <param name="Boresight">The boresight direction (where the null should be).</param>
/// <param name="NullDepthDb">|F(boresight)|² relative to the difference peak, dB (interpolated complex field; floored at −300 dB).</param>
/// <param name="NormalizedSlope">|dF/dθ| at boresight divided by the peak |F|, per radian (the monopulse error slope of the normalised pattern).</param>
/// <param name="DifferencePeakDirections">Directions of the left and right difference lobes.</param>
/// <param name="PeakSidelobeDb">Highest point of the sidelobe region, dB; null if the grid holds none.</param>
/// <param name="LobeSeparationNulls">Angle between the outer minima of the two difference lobes (the difference pattern's "null-to-null" extent); NaN if one reaches a grid end.</param>
internal sealed record DifferencePatternMetrics(
    Angle Boresight,
    double NullDepthDb,
    double NormalizedSlope,
    (Angle Left, Angle Right) DifferencePeakDirections,
    double? PeakSidelobeDb,
    Angle LobeSeparationNulls)
{
    /// <summary>Measures a difference pattern whose null is meant to be at <paramref name="boresight"/>.</summary>
    /// <param name="pattern">The sampled pattern; the boresight must lie strictly inside its grid.</param>
    /// <param name="boresight">Boresight angle, rad (default 0, broadside).</param>
    public static DifferencePatternMetrics Measure(Pattern pattern, double boresight = 0)
    {
        ArgumentNullException.ThrowIfNull(pattern);
        var th = pattern.Theta;
        var p = pattern.Power;
        if (!(boresight > th[0] && boresight < th[^1]))
            throw new ArgumentOutOfRangeException(nameof(boresight), boresight, "The boresight must lie inside the pattern's angle grid: widen the grid.");
        if (!(pattern.PeakPower > 0)) throw new ArgumentException("The pattern is zero everywhere: check the excitations.", nameof(pattern));
        int j = 0;
        while (th[j + 1] < boresight) j++;               // th[j] < boresight ≤ th[j+1]
        double t = (boresight - th[j]) / (th[j + 1] - th[j]);
        var f0 = pattern.Field[j] * (1 - t) + pattern.Field[j + 1] * t;
        var slope = (pattern.Field[j + 1] - pattern.Field[j]) / (th[j + 1] - th[j]);

        int startL = p[j] <= p[j + 1] ? j : j + 1;       // the sample nearest the null
        int peakL = LobeSearch.AscendTo(p, startL, -1), peakR = LobeSearch.AscendTo(p, startL, +1);
        var (tL, pL) = LobeSearch.RefineMaximum(th, p, peakL);
        var (tR, pR) = LobeSearch.RefineMaximum(th, p, peakR);
        double peak = Math.Max(pL, pR);
        int iL = LobeSearch.DescendTo(p, peakL, -1), iR = LobeSearch.DescendTo(p, peakR, +1);

        double? psl = null;
        for (int i = 0; i < p.Length; i++)
        {
            if (i >= iL && i <= iR) continue;
            bool isMax = (i == 0 || p[i] >= p[i - 1]) && (i == p.Length - 1 || p[i] >= p[i + 1]);
            if (!isMax) continue;
            double pw = LobeSearch.RefineMaximum(th, p, i).Power;
            if (psl is null || pw > psl) psl = pw;
        }
        double sep = LobeSearch.AtEnd(p, iL) || LobeSearch.AtEnd(p, iR)
            ? double.NaN
            : LobeSearch.RefineMinimum(th, p, iR) - LobeSearch.RefineMinimum(th, p, iL);
        double depth = Math.Max(-300, LobeSearch.Db(f0.Real * f0.Real + f0.Imaginary * f0.Imaginary) - LobeSearch.Db(peak));
        return new DifferencePatternMetrics(
            Angle.FromRadians(boresight),
            depth,
            slope.Magnitude / Math.Sqrt(peak),
            (Angle.FromRadians(tL), Angle.FromRadians(tR)),
            psl is null ? null : LobeSearch.Db(psl.Value / peak),
            Angle.FromRadians(sep));
    }
}
