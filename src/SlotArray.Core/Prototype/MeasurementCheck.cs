using SlotArray.Core.Design;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Prototype;

/// <summary>A measurement that does not belong to the design it was compared with; the message says why.</summary>
/// <param name="message">The reason, with the numbers.</param>
internal sealed class MeasurementMismatchException(string message) : Exception(message);

/// <summary>
/// Refuses measurements that cannot be of this design: a network file whose frequencies miss the design frequency
/// or leave the guide's single-mode band, a port count the feed cannot have, a cut at a frequency far from the design.
/// </summary>
internal static class MeasurementCheck
{
    /// <summary>Largest distance of a pattern cut's frequency from the design frequency: 10 %.</summary>
    public const double CutFrequencyWindow = 0.10;

    /// <summary>Throws <see cref="MeasurementMismatchException"/> when the measurements cannot be of <paramref name="design"/>.</summary>
    /// <param name="design">The design as cut.</param>
    /// <param name="isTravellingWave">Whether the array is fed as a travelling wave (a load at the far end: two ports possible).</param>
    /// <param name="data">The measurements.</param>
    public static void Check(ArrayDesign design, bool isTravellingWave, PrototypeMeasurements data)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(data);
        if (data.Network is null && data.Cuts.Count == 0) throw new MeasurementMismatchException("nothing to compare: give a Touchstone file (.s1p/.s2p) and/or pattern cuts (.csv)");
        var f0 = design.DesignFrequency;
        var (cut, high) = design.Guide.SingleModeBand;
        if (data.Network is { } n)
        {
            if (n.PortCount == 2 && !isTravellingWave)
                throw new MeasurementMismatchException($"{n.Source}: a two-port file, but '{design.Name}' is a standing-wave array with one port (the far end is a short): give the one-port S11 (.s1p) of this array, or check that the file is of this design");
            if (n.PortCount > 2) throw new MeasurementMismatchException($"{n.Source}: {n.PortCount} ports; an array has one port (standing wave) or two (travelling wave into a load port)");
            if (!(n.Low <= f0 && n.High >= f0))
                throw new MeasurementMismatchException($"{n.Source}: measured from {n.Low} to {n.High}, which does not contain the design frequency {f0} of '{design.Name}': this file is of another design or another band; measure across the design frequency");
            if (n.Low <= cut || n.High >= high)
                throw new MeasurementMismatchException($"{n.Source}: measured from {n.Low} to {n.High}, beyond the single-mode band {cut} – {high} of this guide: the file is of another guide or another design; keep the sweep inside the band");
            if (n.Frequencies.Count < 5) throw new MeasurementMismatchException($"{n.Source}: {n.Frequencies.Count} frequencies; a fit needs at least 5 across the design frequency");
        }
        foreach (var c in data.Cuts)
        {
            if (Math.Abs(c.Frequency.Hertz / f0.Hertz - 1) > CutFrequencyWindow)
                throw new MeasurementMismatchException($"{c.Source}: cut at {c.Frequency}, more than {CutFrequencyWindow * 100:0} % from the design frequency {f0} of '{design.Name}': this cut is of another design; give its frequency with '# frequency:' if it was mislabelled");
            if (c.Angles.Count < 2 * design.Count)
                throw new MeasurementMismatchException($"{c.Source}: {c.Angles.Count} angles; reconstructing {design.Count} slot excitations needs at least {2 * design.Count} (two per slot), over the visible lobes");
        }
    }
}
