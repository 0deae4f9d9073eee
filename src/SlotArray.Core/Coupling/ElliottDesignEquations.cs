using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Coupling;

/// <summary>
/// The pieces of Elliott's design procedure for arrays of longitudinal broad-wall shunt slots with mutual coupling:
/// the coupling function f(x, l), the constant Γ0 and the active-admittance equation (E2) as a pure function.
/// </summary>
/// <remarks>
/// <para>Structure from R. S. Elliott and L. A. Kurtz, "The design of small slot arrays", IEEE Trans. AP-26,
/// 214–219, 1978, and R. S. Elliott, "An improved design procedure for small arrays of shunt slots", IEEE Trans.
/// AP-31, 48–53, 1983 (also Elliott, <i>Antenna Theory and Design</i>, Prentice-Hall 1981, Ch. 8), as
/// remembered [M]. <b>The constants are not the published ones:</b> they are derived here [D] by calibrating the equations against Stevenson's resonant conductance (A. F. Stevenson,
/// "Theory of slots in rectangular wave-guides", J. Appl. Phys. 19, 24–38, 1948), the way the published constants
/// arise. They must be checked against the papers when available; published constants must give identical results
/// when both use the same normalisation of f.</para>
/// <para>Stevenson's constants η_S = 120π Ω and R_d = 73 Ω are used in Γ0 (as in the 2.09 of Stevenson's formula),
/// while mutual impedances come from <see cref="DipoleMutualImpedance"/> with η0.</para>
/// </remarks>
internal static class ElliottDesignEquations
{
    /// <summary>
    /// Elliott's coupling function for the assumed aperture distribution cos(πz/(2l)) (zero at the slot ends):
    /// f(x, l) = [(π/(2kl)) cos(βl) / ((π/(2kl))² − (β/k)²)] · sin(πx/a) (form after
    /// Elliott 1983 [M], derivation [D]). The removable point βl = π/2 is evaluated by its limit. At kl = π/2 it is
    /// f_r = cos(πλ/(2λg)) (2a/λ)² sin(πx/a). Signed: it follows the sign of the offset x.
    /// </summary>
    /// <param name="guide">The guide (broad wall a; β of TE10).</param>
    /// <param name="frequency">Frequency; k is the free-space wavenumber (the slot radiates into free space).</param>
    /// <param name="offset">Signed offset x of the slot centre line from the broad-wall centre line.</param>
    /// <param name="halfLength">Half length l of the slot (&gt; 0).</param>
    public static double CouplingFunction(RectangularWaveguide guide, Frequency frequency, Length offset, Length halfLength)
    {
        ArgumentNullException.ThrowIfNull(guide);
        double l = RequireHalfLength(halfLength);
        double k = frequency.FreeSpaceWavenumber, beta = guide.PhaseConstant(frequency);
        double kl = k * l, t = beta * l;
        // q cos t/(q² − b²) with q = π/(2kl), b = β/k equals q (kl)² cos t/(π²/4 − t²);
        // with ε = π/2 − t: cos t/(π²/4 − t²) = (sin ε/ε)/(π − ε), smooth through ε = 0.
        double eps = Math.PI / 2 - t;
        double ratio = Sinc(eps) / (Math.PI - eps);
        double q = Math.PI / (2 * kl);
        return q * kl * kl * ratio * OffsetFactor(guide, offset);
    }

    /// <summary>
    /// The coupling function for a dipole-like aperture distribution sin(k(l − |z|)):
    /// f(x, l) = [(cos βl − cos kl) / ((1 − (β/k)²) sin kl)] · sin(πx/a) (derived here [D] as for Elliott 1983). Equal to
    /// <see cref="CouplingFunction"/> at kl = π/2. Requires 0 &lt; kl &lt; π (the distribution's loop must exist).
    /// </summary>
    /// <param name="guide">The guide (broad wall a; β of TE10).</param>
    /// <param name="frequency">Frequency; k is the free-space wavenumber.</param>
    /// <param name="offset">Signed offset x from the broad-wall centre line.</param>
    /// <param name="halfLength">Half length l, with 0 &lt; kl &lt; π.</param>
    public static double CouplingFunctionDipoleForm(RectangularWaveguide guide, Frequency frequency, Length offset, Length halfLength)
    {
        ArgumentNullException.ThrowIfNull(guide);
        double l = RequireHalfLength(halfLength);
        double k = frequency.FreeSpaceWavenumber, beta = guide.PhaseConstant(frequency);
        double kl = k * l, b = beta / k;
        if (!(kl < Math.PI * (1 - 1e-9)))
            throw new ArgumentOutOfRangeException(nameof(halfLength), halfLength.ToString(),
                $"the dipole-form coupling function needs kl < π (half length below λ/2 = {frequency.FreeSpaceWavelength.Millimeters / 2:0.###} mm)");
        return (Math.Cos(beta * l) - Math.Cos(kl)) / ((1 - b * b) * Math.Sin(kl)) * OffsetFactor(guide, offset);
    }

    /// <summary>
    /// Γ0 = (30 Ω/(π R_d)) λ³ λg/(a³ b) (dimensionless), Stevenson's resonant conductance divided by f_r²
    /// (derived here [D] from Stevenson 1948; R_d = 73 Ω, 30 Ω = η_S/(4π)). WR-90 at 9.375 GHz: 1.57688 [N].
    /// </summary>
    public static double Gamma0(RectangularWaveguide guide, Frequency frequency)
    {
        ArgumentNullException.ThrowIfNull(guide);
        double lambda = frequency.FreeSpaceWavelength.Meters, lg = guide.GuideWavelength(frequency).Meters;
        double a = guide.BroadWall.Meters, b = guide.NarrowWall.Meters;
        return 30.0 / (Math.PI * PhysicalConstants.HalfWaveDipoleResistance) * lambda * lambda * lambda * lg / (a * a * a * b);
    }

    /// <summary>
    /// The active admittances of (E2) ([D; structure Elliott 1983 [M]]):
    /// Y_n^a/G0 = f_n² / [ f_n²/(Y_n/G0) + (1/Γ0) Σ_{m≠n} (V_m^s/V_n^s) Z_mn/R_d ],
    /// evaluated in the equivalent form y_n/(1 + y_n C_n/f_n²), C_n the coupling sum, so that it is defined for
    /// y_n = 0 and returns exactly y_n when there is no coupling (Z_mn = 0).
    /// </summary>
    /// <param name="selfAdmittances">Isolated-slot admittances y_n = Y_n/G0 at the current offsets and lengths.</param>
    /// <param name="couplingFunctions">f_n = f(x_n, l_n) (<see cref="CouplingFunction"/>); must not be zero.</param>
    /// <param name="slotVoltages">Slot voltages V_n^s (any common scale and phase); must not be zero.</param>
    /// <param name="mutualImpedances">
    /// Z_mn (Ω) of the equivalent dipoles referred to the loop currents (Carter 1932 induced EMF), as (E2) needs them
    /// (<see cref="SlotMutualCoupling.EquivalentDipoleImpedances"/>); the diagonal is not used. Note for the designer:
    /// V^s is the slot voltage at the slot centre, where a sinusoidal distribution of half-length l has
    /// sin(kl) times its loop value; referred to centre values Z_mn would be Z_mn/(sin kl_m sin kl_n), about 2 %
    /// larger for resonant slots (2l ≈ 0.46 λ). Which reference the published constants pair with must be checked.
    /// </param>
    /// <param name="gamma0">Γ0 of the guide (<see cref="Gamma0"/>).</param>
    /// <returns>Y_n^a/G0 for every slot.</returns>
    public static Complex[] ActiveAdmittances(IReadOnlyList<Complex> selfAdmittances, IReadOnlyList<double> couplingFunctions,
        IReadOnlyList<Complex> slotVoltages, CouplingMatrix mutualImpedances, double gamma0)
    {
        ArgumentNullException.ThrowIfNull(selfAdmittances);
        ArgumentNullException.ThrowIfNull(couplingFunctions);
        ArgumentNullException.ThrowIfNull(slotVoltages);
        ArgumentNullException.ThrowIfNull(mutualImpedances);
        int n = selfAdmittances.Count;
        if (couplingFunctions.Count != n || slotVoltages.Count != n || mutualImpedances.Count != n)
            throw new ArgumentException(
                $"sizes differ: {n} admittances, {couplingFunctions.Count} coupling functions, {slotVoltages.Count} slot voltages, " +
                $"{mutualImpedances.Count} × {mutualImpedances.Count} mutual impedances");
        if (!(gamma0 > 0) || !double.IsFinite(gamma0)) throw new ArgumentOutOfRangeException(nameof(gamma0), gamma0, "Γ0 must be positive");
        double scale = 1 / (gamma0 * PhysicalConstants.HalfWaveDipoleResistance);
        var result = new Complex[n];
        for (int i = 0; i < n; i++)
        {
            double f = couplingFunctions[i];
            if (f == 0 || !double.IsFinite(f))
                throw new ArgumentException($"slot {i + 1}: the coupling function is {f:G6}; a slot on the centre line does not couple", nameof(couplingFunctions));
            var vn = slotVoltages[i];
            if (vn == Complex.Zero)
                throw new ArgumentException($"slot {i + 1}: the slot voltage is zero; (E2) needs the ratios V_m/V_n", nameof(slotVoltages));
            var sum = Complex.Zero;
            for (int m = 0; m < n; m++)
                if (m != i) sum += slotVoltages[m] / vn * mutualImpedances[i, m];
            var y = selfAdmittances[i];
            result[i] = y / (1 + y * (scale * sum) / (f * f));
        }
        return result;
    }

    private static double OffsetFactor(RectangularWaveguide guide, Length offset) => Math.Sin(Math.PI * offset.Meters / guide.BroadWall.Meters);

    private static double RequireHalfLength(Length halfLength)
    {
        if (!(halfLength.Meters > 0) || !double.IsFinite(halfLength.Meters))
            throw new ArgumentOutOfRangeException(nameof(halfLength), halfLength.ToString(), "the half length must be positive");
        return halfLength.Meters;
    }

    private static double Sinc(double e) => Math.Abs(e) < 1e-4 ? 1 - e * e / 6 : Math.Sin(e) / e;
}
