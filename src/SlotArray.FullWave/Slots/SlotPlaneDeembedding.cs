using System.Numerics;

namespace SlotArray.FullWave.Slots;

/// <summary>
/// Moves a single-slot two-port from the port planes to the slot's centre plane with a plain-guide calibration
/// run on the same mesh (ports symmetric at ±d about the slot centre). The plain guide's transmission
/// S21,cal = e^{−jβ·2d} carries the engine's own numerical phase constant, so no analytic β enters:
/// S11 = (S11,m − S11,cal)/S21,cal (the round trip to the slot and back is 2d), S21 = S21,m/S21,cal
/// (line shifts of a two-port: D. M. Pozar, Microwave Engineering, 4th ed., Wiley 2012, section 4.3, eq. 4.66,
/// from memory; subtracting the calibration's own reflection removes the ports' residual mismatch to first order).
/// A longitudinal or edge slot is a shunt element (A. F. Stevenson, "Theory of slots in rectangular wave-guides",
/// J. Appl. Phys. 19, 1948): y = Y/G0 = −2 S11/(1 + S11) (Pozar 2012, Table 4.2, from memory).
/// </summary>
internal static class SlotPlaneDeembedding
{
    /// <summary>S11 and S21 at the slot plane from the measured and calibration responses at one frequency.</summary>
    public static (Complex S11, Complex S21) ToSlotPlane(Complex s11Measured, Complex s21Measured, Complex s11Calibration, Complex s21Calibration)
    {
        if (s21Calibration.Magnitude < 1e-6) throw new ArgumentException("the calibration run did not transmit: check the plain-guide run", nameof(s21Calibration));
        return ((s11Measured - s11Calibration) / s21Calibration, s21Measured / s21Calibration);
    }

    /// <summary>The normalised shunt admittance y = −2 S11/(1 + S11) of a slot whose S11 is referred to its centre plane.</summary>
    public static Complex ShuntAdmittance(Complex s11) => -2 * s11 / (1 + s11);

    /// <summary>How far the two-port is from a pure shunt element: |1 + S11 − S21| (0 for a pure shunt).</summary>
    public static double ShuntResidual(Complex s11, Complex s21) => (1 + s11 - s21).Magnitude;
}
