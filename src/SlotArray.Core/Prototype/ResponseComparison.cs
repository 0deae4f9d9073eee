using System.Collections.Immutable;
using System.Numerics;
using MathNet.Numerics.Interpolation;
using SlotArray.Core.Design;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Prototype;

/// <summary>One row of the comparison table: a figure measured and predicted, and their difference (measured − predicted).</summary>
/// <param name="Quantity">What it is, with its unit.</param>
/// <param name="Measured">Measured value (NaN when the data do not give it).</param>
/// <param name="Predicted">Predicted value.</param>
internal sealed record ComparisonRow(string Quantity, double Measured, double Predicted)
{
    /// <summary>Measured − predicted.</summary>
    public double Difference => Measured - Predicted;
}

/// <summary>The figures of one pattern cut, from its samples.</summary>
/// <param name="Beam">Beam direction, deg.</param>
/// <param name="Hpbw">Half-power beamwidth, deg.</param>
/// <param name="PeakSidelobe">Peak sidelobe within the cut, dB (NaN when the cut shows none).</param>
internal sealed record CutFigures(double Beam, double Hpbw, double PeakSidelobe);

/// <summary>
/// The comparison table's figures: best-match frequency (the smallest |S11| sample, refined by the parabola through it
/// and its neighbours in dB), S11 at the design frequency (Re and Im interpolated linearly between the samples around
/// it), and per cut the beam direction, HPBW and peak sidelobe by the tool's own <see cref="PatternMetrics"/> on the
/// cut resampled to 0.02° (linear in field amplitude).
/// </summary>
internal static class ResponseComparison
{
    /// <summary>Best-match frequency of sampled S11, Hz.</summary>
    public static double BestMatch(IReadOnlyList<double> f, IReadOnlyList<Complex> s11)
    {
        ArgumentNullException.ThrowIfNull(f);
        ArgumentNullException.ThrowIfNull(s11);
        int i = 0;
        for (int k = 1; k < s11.Count; k++) if (s11[k].Magnitude < s11[i].Magnitude) i = k;
        if (i == 0 || i == s11.Count - 1) return f[i];
        double y0 = Db(s11[i - 1]), y1 = Db(s11[i]), y2 = Db(s11[i + 1]);
        double x0 = f[i - 1], x1 = f[i], x2 = f[i + 1];
        // Vertex of the parabola through the three points (divided differences).
        double d1 = (y1 - y0) / (x1 - x0), d2 = (y2 - y1) / (x2 - x1), c = (d2 - d1) / (x2 - x0);
        if (!(c > 0)) return x1;
        double v = 0.5 * (x0 + x1) - d1 / (2 * c);
        return Math.Clamp(v, x0, x2);
    }

    /// <summary>S11 at frequency <paramref name="at"/> by linear interpolation of Re and Im.</summary>
    public static Complex At(IReadOnlyList<double> f, IReadOnlyList<Complex> s11, double at)
    {
        var re = LinearSpline.InterpolateSorted(f.ToArray(), s11.Select(z => z.Real).ToArray());
        var im = LinearSpline.InterpolateSorted(f.ToArray(), s11.Select(z => z.Imaginary).ToArray());
        return new Complex(re.Interpolate(at), im.Interpolate(at));
    }

    /// <summary>Beam, HPBW and peak sidelobe of a sampled cut (angles rad, levels dB).</summary>
    public static CutFigures Figures(IReadOnlyList<double> angles, IReadOnlyList<double> levelsDb)
    {
        ArgumentNullException.ThrowIfNull(angles);
        ArgumentNullException.ThrowIfNull(levelsDb);
        double lo = angles[0], hi = angles[^1];
        int count = Math.Max(3, (int)Math.Round((hi - lo) / (0.02 * Math.PI / 180)) + 1);
        var grid = AngleGrid.UniformInTheta(lo, hi, count);
        var amp = LinearSpline.InterpolateSorted(angles.ToArray(), levelsDb.Select(d => Math.Pow(10, d / 20)).ToArray());
        var field = grid.Theta.Select(t => (Complex)Math.Max(0, amp.Interpolate(t))).ToImmutableArray();
        var m = PatternMetrics.Measure(new Pattern(grid, field));
        return new CutFigures(m.BeamDirection.Degrees, m.HalfPowerBeamwidth.Degrees, m.PeakSidelobeDb ?? double.NaN);
    }

    /// <summary>The predicted cut of a design's network solution at the cut's angles, in dB relative to its peak.</summary>
    public static double[] PredictedLevels(ArrayDesign design, IReadOnlyList<Complex> excitations, Frequency f, IReadOnlyList<double> angles)
    {
        var field = PrototypeModel.Field(design, excitations, f, angles);
        double peak = field.Max(z => z.Magnitude);
        return field.Select(z => 20 * Math.Log10(Math.Max(z.Magnitude / peak, 1e-15))).ToArray();
    }

    private static double Db(Complex z) => 20 * Math.Log10(Math.Max(z.Magnitude, 1e-15));
}
