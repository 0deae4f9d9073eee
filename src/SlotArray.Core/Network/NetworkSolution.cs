using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Network;

/// <summary>
/// The array's network at one frequency, for an incident TE10 wave of unit power at the feed plane. Voltages are
/// TE10 mode voltages in units of the incident wave's voltage at the feed plane, all referred to one E_y polarity
/// along the whole guide; admittances are normalised to the guide's TE10 admittance G0 = 1/Z_TE; powers are
/// fractions of the incident power.
/// </summary>
/// <param name="Frequency">Analysis frequency.</param>
/// <param name="S11">Reflection coefficient at the feed plane, normalised to the TE10 wave impedance Z_TE.</param>
/// <param name="SlotAdmittances">y_n = Y_n/G0 of each slot at this frequency, at its actual coupling and length.</param>
/// <param name="ModeVoltages">V_n: the mode voltage at each slot centre.</param>
/// <param name="RadiatedPowers">P_n = ½ Re(y_n)|V_n|² / P_inc, each slot's radiated power.</param>
/// <param name="Excitations">
/// e_n = sign(c_n) √P_n e^{j arg(y_n V_n)}: the far-field amplitude of slot n for the pattern (c_n its signed
/// coupling). See <see cref="ArrayNetwork"/> for its definition and source.
/// </param>
/// <param name="WallLoss">Ohmic loss in the guide walls between the feed and the terminations.</param>
/// <param name="LoadPower">Power delivered into the terminations (0 for shorts).</param>
/// <param name="PeakModeVoltage">
/// Largest |V(z)| anywhere on the line between the terminations and the feed plane, in units of the incident wave's
/// voltage: the peak E field inside the guide is this factor times the peak field of the incident wave alone (a matched
/// line of the same wave impedance carrying the same incident power), the standing-wave factor for power-handling checks
/// (common practice [C], see <c>PowerHandling</c>). Centre feed: each half carries part of the power, so the factor is about 1/√2 at resonance.
/// </param>
/// <param name="PeakPosition">z (from the datum) where that peak occurs.</param>
internal sealed record NetworkSolution(
    Frequency Frequency,
    Complex S11,
    IReadOnlyList<Complex> SlotAdmittances,
    IReadOnlyList<Complex> ModeVoltages,
    IReadOnlyList<double> RadiatedPowers,
    IReadOnlyList<Complex> Excitations,
    double WallLoss,
    double LoadPower,
    double PeakModeVoltage,
    Length PeakPosition)
{
    /// <summary>Reflected power |S11|².</summary>
    public double ReflectedPower => S11.Magnitude * S11.Magnitude;

    /// <summary>Σ P_n, the power radiated by all slots.</summary>
    public double RadiatedPower => RadiatedPowers.Sum();

    /// <summary>Power accepted by the array, 1 − |S11|².</summary>
    public double AcceptedPower => 1 - ReflectedPower;

    /// <summary>Radiation efficiency: radiated / accepted power (wall loss and load power are the rest).</summary>
    public double RadiationEfficiency => RadiatedPower / AcceptedPower;

    /// <summary>Voltage standing-wave ratio (1 + |S11|)/(1 − |S11|); +∞ for total reflection.</summary>
    public double Vswr => ArrayNetwork.VswrOf(S11.Magnitude);

    /// <summary>Return loss −20 log10 |S11| in dB (positive for a passive load).</summary>
    public double ReturnLossDb => -20 * Math.Log10(S11.Magnitude);

    /// <summary>Power balance residual: radiated + wall loss + load + reflected − 1 (0 up to rounding).</summary>
    public double PowerBalanceError => RadiatedPower + WallLoss + LoadPower + ReflectedPower - 1;
}
