namespace SlotArray.Core.Patterns;

/// <summary>Ready-made element field patterns, functions of θ from broadside (rad) in the array-axis plane.</summary>
internal static class ElementPatterns
{
    /// <summary>An isotropic element: 1 at every angle.</summary>
    public static Func<double, double> Isotropic { get; } = _ => 1.0;

    /// <summary>
    /// Half-wave slot in an infinite ground plane, H-plane cut (the plane of the slot axis and the normal, i.e. the
    /// array-axis plane of collinear longitudinal slots): E(θ) = cos((π/2) sin θ) / cos θ, θ from the normal.
    /// Source: the dual of the half-wave dipole (C. A. Balanis, <i>Antenna Theory</i>,
    /// 3rd ed., Wiley 2005, slot antennas via Babinet's principle, and eq. 4-84 for the dipole). Its limit at
    /// θ = ±90° is 0, returned there.
    /// </summary>
    public static Func<double, double> HalfWaveSlotHPlane { get; } = HalfWaveSlot;

    private static double HalfWaveSlot(double theta)
    {
        double c = Math.Cos(theta);
        if (Math.Abs(c) < 1e-9) return 0.0;
        return Math.Cos(Math.PI / 2 * Math.Sin(theta)) / c;
    }
}
