using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Prototype;

/// <summary>
/// A measured network response of a prototype, as read from a Touchstone file: the input reflection S11 at each
/// frequency and, for a two-port (a travelling-wave array measured into its load port), the transmission S21 to
/// the load. S-parameters are taken as referred to the guide's own TE10 wave impedance (a waveguide calibration);
/// the file's reference resistance is shown to the user, not used to renormalise.
/// </summary>
/// <param name="Source">Where the data came from (file name), for messages.</param>
/// <param name="Frequencies">Frequencies, Hz, strictly increasing.</param>
/// <param name="S11">Input reflection at each frequency.</param>
/// <param name="S21">Transmission to port 2 at each frequency (two-port files), or null.</param>
/// <param name="PortCount">1 or 2.</param>
internal sealed record MeasuredNetwork(string Source, IReadOnlyList<double> Frequencies, IReadOnlyList<Complex> S11,
    IReadOnlyList<Complex>? S21, int PortCount)
{
    /// <summary>Lowest measured frequency.</summary>
    public Frequency Low => Frequency.FromHertz(Frequencies[0]);

    /// <summary>Highest measured frequency.</summary>
    public Frequency High => Frequency.FromHertz(Frequencies[^1]);
}

/// <summary>
/// A measured far-field cut in the plane that contains the guide axis, co-polarised, at one frequency. Angles are
/// from broadside with the tool's sign (θ &gt; 0 toward the datum end: the end short or load); levels in dB on any
/// reference (the fit carries a free overall scale); the phase, when measured, on any reference (the fit carries a
/// free constant and a free linear-in-sin θ phase for the turntable's rotation centre).
/// </summary>
/// <param name="Source">File name, for messages.</param>
/// <param name="Frequency">Measurement frequency.</param>
/// <param name="Angles">Angles θ, rad, strictly increasing, within ±90°.</param>
/// <param name="LevelsDb">Measured level at each angle, dB.</param>
/// <param name="PhasesRad">Measured phase at each angle, rad, or null for an amplitude-only cut.</param>
internal sealed record MeasuredCut(string Source, Frequency Frequency, IReadOnlyList<double> Angles, IReadOnlyList<double> LevelsDb,
    IReadOnlyList<double>? PhasesRad)
{
    /// <summary>Whether the cut carries phase.</summary>
    public bool HasPhase => PhasesRad is not null;
}

/// <summary>Everything measured on one prototype: at most one network file and any number of pattern cuts.</summary>
/// <param name="Network">The S-parameter file, or null when only cuts were measured.</param>
/// <param name="Cuts">Pattern cuts (may be empty).</param>
internal sealed record PrototypeMeasurements(MeasuredNetwork? Network, IReadOnlyList<MeasuredCut> Cuts);
