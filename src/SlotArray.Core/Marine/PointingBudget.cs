using MathNet.Numerics.Interpolation;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Marine;

/// <summary>The operating range the pointing budget covers: the metal's temperature span and the transmitter's frequency tolerance.</summary>
/// <param name="LowCelsius">Lowest operating temperature, °C.</param>
/// <param name="HighCelsius">Highest operating temperature, °C (≥ low).</param>
/// <param name="FrequencyTolerance">± tolerance of the transmitter's frequency about the design frequency.</param>
public sealed record OperatingRange(double LowCelsius, double HighCelsius, Frequency FrequencyTolerance);

/// <summary>One corner (or centre) of the operating range and where the beam points there.</summary>
/// <param name="TemperatureCelsius">Temperature of the guide, °C.</param>
/// <param name="Transmit">Transmitter frequency.</param>
/// <param name="Equivalent">The frequency at which the antenna as built (20 °C) behaves as it does at this temperature, f (1 + αΔT).</param>
/// <param name="Beam">Main-beam direction.</param>
/// <param name="ErrorDegrees">Beam minus the nominal beam (design frequency, 20 °C), degrees.</param>
/// <param name="FromSweep">True when the beam comes from the analysed band sweep; false: from the phase condition (outside the band).</param>
internal sealed record PointingCase(double TemperatureCelsius, Frequency Transmit, Frequency Equivalent, Angle Beam, double ErrorDegrees, bool FromSweep);

/// <summary>The beam's direction over the operating range and the worst bearing error.</summary>
/// <param name="Range">The operating range.</param>
/// <param name="Expansion">The wall metal's expansion coefficient and its source; null when the metal is not known (temperature then ignored).</param>
/// <param name="Nominal">The beam at the design frequency and 20 °C.</param>
/// <param name="Cases">Every combination of {low, 20 °C, high} × {f0 − tol, f0, f0 + tol} (20 °C only when the range excludes it is still listed as the reference).</param>
/// <param name="WorstErrorDegrees">Largest |error| over the cases, degrees.</param>
/// <param name="DegreesPerKelvin">Beam drift per kelvin at the design frequency, degrees.</param>
/// <param name="DegreesPerMegahertz">Beam drift per MHz at 20 °C, degrees.</param>
internal sealed record PointingBudget(OperatingRange Range, ThermalExpansion? Expansion, Angle Nominal, IReadOnlyList<PointingCase> Cases,
    double WorstErrorDegrees, double DegreesPerKelvin, double DegreesPerMegahertz)
{
    /// <summary>
    /// The budget of an analysed design. Temperature enters by electromagnetic similitude: every dimension of an all-metal,
    /// air-filled antenna grows by the factor 1 + αΔT (linear expansion, α from <see cref="ThermalExpansion"/>), and a
    /// structure scaled by s behaves at f/s as the original does at f (G. Sinclair, "Theory of models of electromagnetic
    /// systems", Proc. IRE 36, 1364–1370, 1948, the geometric model with unchanged materials; from memory), so at
    /// temperature T and frequency f the beam points where the antenna as built points at f (1 + αΔT). The wall
    /// conductivity's own change moves the loss, not the phase, and is ignored. The beam at each equivalent frequency is
    /// read off the analysed sweep (linear interpolation, MathNet.Numerics) — the network's own beam, not only the phase
    /// condition — and from the phase condition sin θ = λ/λg − λ/(2d), offset to the nominal beam, outside the band.
    /// </summary>
    /// <param name="range">The operating range.</param>
    /// <param name="design">The analysed design (guide, spacing, design frequency).</param>
    /// <param name="atDesign">Figures at the design frequency.</param>
    /// <param name="sweep">Figures across the band.</param>
    /// <param name="phaseCondition">The phase condition's beam at a frequency (outside the band), or null where it has none.</param>
    public static PointingBudget Of(OperatingRange range, ArrayDesign design, FrequencyFigures atDesign, IReadOnlyList<FrequencyFigures> sweep,
        Func<Frequency, Angle?> phaseCondition)
    {
        ArgumentNullException.ThrowIfNull(phaseCondition);
        ArgumentNullException.ThrowIfNull(range);
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(atDesign);
        ArgumentNullException.ThrowIfNull(sweep);
        var expansion = ThermalExpansion.For(design.Guide.MetalName);
        double alpha = expansion?.Coefficient ?? 0;
        var f0 = design.DesignFrequency;
        var nominal = atDesign.Metrics.BeamDirection;
        var points = sweep.Append(atDesign).DistinctBy(p => p.Frequency.Hertz).OrderBy(p => p.Frequency.Hertz).ToArray();
        IInterpolation? spline = points.Length >= 2
            ? LinearSpline.InterpolateSorted([.. points.Select(p => p.Frequency.Hertz)], [.. points.Select(p => p.Metrics.BeamDirection.Degrees)])
            : null;
        double lo = points.Length > 0 ? points[0].Frequency.Hertz : f0.Hertz, hi = points.Length > 0 ? points[^1].Frequency.Hertz : f0.Hertz;
        double formulaOffset = nominal.Degrees - (phaseCondition(f0)?.Degrees ?? nominal.Degrees);
        (Angle Beam, bool FromSweep) BeamAt(double hz)
        {
            if (spline is not null && hz >= lo && hz <= hi) return (Angle.FromDegrees(spline.Interpolate(hz)), true);
            var formula = phaseCondition(Frequency.FromHertz(hz));
            return (Angle.FromDegrees((formula?.Degrees ?? double.NaN) + formulaOffset), false);
        }
        double reference = ThermalExpansion.ReferenceTemperatureCelsius;
        var temperatures = new[] { range.LowCelsius, reference, range.HighCelsius }.Distinct().Order().ToArray();
        double tol = range.FrequencyTolerance.Hertz;
        var frequencies = new[] { f0.Hertz - tol, f0.Hertz, f0.Hertz + tol }.Distinct().ToArray();
        var cases = new List<PointingCase>();
        foreach (double t in temperatures)
            foreach (double f in frequencies)
            {
                double equivalent = f * (1 + alpha * (t - reference));
                var (beam, fromSweep) = BeamAt(equivalent);
                cases.Add(new PointingCase(t, Frequency.FromHertz(f), Frequency.FromHertz(equivalent), beam, beam.Degrees - nominal.Degrees, fromSweep));
            }
        double worst = cases.Max(c => Math.Abs(c.ErrorDegrees));
        double perHz = (BeamAt(f0.Hertz * (1 + 1e-4)).Beam.Degrees - BeamAt(f0.Hertz * (1 - 1e-4)).Beam.Degrees) / (2e-4 * f0.Hertz);
        return new PointingBudget(range, expansion, nominal, cases.AsReadOnly(), worst, perHz * f0.Hertz * alpha, perHz * 1e6);
    }
}
