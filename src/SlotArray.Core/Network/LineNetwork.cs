using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Network;

/// <summary>
/// The guide as a transmission line loaded by shunt admittances, solved by cascading wave amplitudes from each
/// termination toward the feed. Normalised units: Z0 = Z_TE = 1.
/// </summary>
/// <remarks>
/// <para>Line sections: V(ℓ) = A e^{γℓ} + B e^{−γℓ}, I(ℓ) = A e^{γℓ} − B e^{−γℓ} with ℓ the distance back from the
/// termination, A the wave travelling toward the termination and γ = α + jβ the TE10 propagation constant with wall
/// loss (<see cref="RectangularWaveguide.PropagationConstant"/>). D. M. Pozar, <i>Microwave Engineering</i>, 4th ed.,
/// Wiley 2012, Secs. 2.1 and 2.7 (lossy line), from memory. The characteristic impedance is taken real (Z0 = Z_TE):
/// the usual low-loss approximation of a guide with good-conductor walls (perturbation method, Pozar Sec. 2.7);
/// with it the line is a distortionless line (R = αZ0, G = α/Z0), whose loss per unit length is ½α(|V|² + |I|²),
/// and a section of length ℓ dissipates ½|A|²(e^{2αℓ} − 1) + ½|B|²(1 − e^{−2αℓ}) (A, B at its termination side;
/// integral derived here).</para>
/// <para>Shunt element y at a plane: V continuous, the current toward the feed gains yV; it absorbs ½ Re(y)|V|².</para>
/// <para>Centre feed: an ideal series junction (see <c>StandingWaveDesigner</c> (Core/Design)): both halves carry the
/// junction current, z_s = z_left + z_right, and an ideal transformer gives z_feed = z_s/n² (n² the design's junction ratio); the mode voltage of the far half is reported with its sign reversed so
/// that all voltages share one E_y polarity (the series junction reverses E_y across it).</para>
/// </remarks>
internal sealed class LineNetwork
{
    private readonly RectangularWaveguide guide;
    private readonly double[] position;
    private readonly Termination near;
    private readonly Termination? far;
    private readonly double feedPlane;
    private readonly int leftCount;
    private readonly double junctionRatio;

    /// <summary>A line with slots at the given positions (ascending), the near termination at z = position[0] − near.Distance.</summary>
    public LineNetwork(RectangularWaveguide guide, IReadOnlyList<double> positions, Termination near, Termination? far, double feedPlane,
        double junctionRatio = 1)
    {
        if (!(junctionRatio > 0)) throw new ArgumentOutOfRangeException(nameof(junctionRatio), junctionRatio, "the junction ratio must be positive");
        this.junctionRatio = junctionRatio;
        this.guide = guide;
        position = positions.ToArray();
        this.near = near;
        this.far = far;
        this.feedPlane = feedPlane;
        for (int i = 1; i < position.Length; i++)
            if (!(position[i] > position[i - 1]))
                throw new ArgumentException($"slot positions must increase with the index: slot {i + 1} is not beyond slot {i}", nameof(positions));
        leftCount = far is null ? position.Length : position.Count(z => z < feedPlane);
        if (far is null && feedPlane < position[^1])
            throw new ArgumentException("the feed plane of an end-fed line must not lie before its last slot", nameof(feedPlane));
        if (far is not null && (leftCount == 0 || leftCount == position.Length))
            throw new ArgumentException("the series junction of a centre-fed line must lie between two slots", nameof(feedPlane));
    }

    /// <summary>Number of slots.</summary>
    public int Count => position.Length;

    /// <summary>Solves the line at frequency f with the given slot admittances; <paramref name="couplingSigns"/> give the slots' sides.</summary>
    /// <param name="f">Frequency.</param>
    /// <param name="y">Slot admittances y_n = Y_n/G0.</param>
    /// <param name="couplingSigns">Sign of each slot's coupling (its side).</param>
    /// <param name="peakVoltage">Whether to search the sections for the peak line voltage (breakdown); false leaves it 0
    /// and every other figure unchanged (the tolerance trials do not need it).</param>
    public NetworkSolution Solve(Frequency f, Complex[] y, double[] couplingSigns, bool peakVoltage = true)
    {
        if (y.Length != position.Length) throw new ArgumentException("one admittance per slot is needed", nameof(y));
        var gamma = guide.PropagationConstant(f);
        var v = new Complex[y.Length];
        if (far is null)
        {
            var arm = SolveArm(gamma, near, LeftDistances(), y, 0, v, feedPlane - position[0] + near.Distance.Meters, peakVoltage);
            // Feed: incident V+ = (V + I)/2 at the feed plane; scale the arm to V+ = 1.
            Complex vPlus = (arm.V + arm.I) / 2;
            Complex s11 = (arm.V - arm.I) / (arm.V + arm.I);
            double zTerm = position[0] - near.Distance.Meters;
            var peak = new Peak(arm.PeakVoltage, zTerm + arm.PeakDistance);
            return Finish(f, s11, y, v, couplingSigns, 1 / vPlus, arm.WallLoss, arm.LoadPower, peak);
        }
        else
        {
            var left = SolveArm(gamma, near, LeftDistances(), y, 0, v, feedPlane - position[0] + near.Distance.Meters, peakVoltage);
            var right = SolveArm(gamma, far, RightDistances(), y, leftCount, v, position[^1] + far.Distance.Meters - feedPlane, peakVoltage);
            // Series junction: the same current through both halves. Scale each half to unit junction current.
            Complex kl = 1 / left.I, kr = 1 / right.I;
            for (int i = 0; i < leftCount; i++) v[i] *= kl;
            for (int i = leftCount; i < v.Length; i++) v[i] *= -kr;   // one E_y polarity (see remarks)
            // Ideal transformer n² to the feed: V_feed = z_s/n, I_feed = n (junction current 1).
            Complex zs = left.V * kl + right.V * kr;
            double nRatio = Math.Sqrt(junctionRatio);
            Complex vPlus = (zs / nRatio + nRatio) / 2;
            Complex zin = zs / junctionRatio;
            Complex s11 = (zin - 1) / (zin + 1);
            var wall = left.WallLoss * Sq(kl) + right.WallLoss * Sq(kr);
            var load = left.LoadPower * Sq(kl) + right.LoadPower * Sq(kr);
            double pl = left.PeakVoltage * kl.Magnitude, pr = right.PeakVoltage * kr.Magnitude;
            var peak = pl >= pr
                ? new Peak(pl, position[0] - near.Distance.Meters + left.PeakDistance)
                : new Peak(pr, position[^1] + far.Distance.Meters - right.PeakDistance);
            return Finish(f, s11, y, v, couplingSigns, 1 / vPlus, wall, load, peak);
        }
    }

    private static double Sq(Complex c) => c.Real * c.Real + c.Imaginary * c.Imaginary;

    private double[] LeftDistances()
    {
        var d = new double[leftCount];
        double z0 = position[0] - near.Distance.Meters;
        for (int i = 0; i < leftCount; i++) d[i] = position[i] - z0;
        return d;
    }

    private double[] RightDistances()
    {
        int n = position.Length - leftCount;
        var d = new double[n];
        double zEnd = position[^1] + far!.Distance.Meters;
        for (int i = 0; i < n; i++) d[i] = zEnd - position[leftCount + i];
        return d;
    }

    private readonly record struct ArmResult(Complex V, Complex I, double WallLoss, double LoadPower, double PeakVoltage, double PeakDistance);

    private readonly record struct Peak(double Voltage, double Position);

    /// <summary>
    /// One arm from its termination to its input plane at distance <paramref name="inputDistance"/>; element k of the
    /// arm sits at distances[k] from the termination (ascending for the near arm, listed from the input for the far
    /// arm: the far arm's element order is reversed). Writes unscaled mode voltages into v.
    /// </summary>
    private static ArmResult SolveArm(Complex gamma, Termination t, double[] distances, Complex[] y, int offset, Complex[] v,
        double inputDistance, bool peakVoltage)
    {
        int n = distances.Length;
        bool reversed = offset > 0;
        Complex vv, ii;
        double load;
        switch (t.Kind)
        {
            case TerminationKind.Short: vv = 0; ii = 1; load = 0; break;
            case TerminationKind.MatchedLoad: vv = 1; ii = 1; load = 0.5; break;
            default: vv = 1; ii = t.LoadAdmittance; load = 0.5 * t.LoadAdmittance.Real; break;
        }
        double wall = 0, at = 0, peak = vv.Magnitude, peakAt = 0;
        for (int step = 0; step <= n; step++)
        {
            int k = reversed ? n - 1 - step : step;              // element index within the arm, nearest the termination first
            double next = step < n ? distances[k] : inputDistance;
            if (peakVoltage) SectionPeak(gamma, vv, ii, next - at, at, ref peak, ref peakAt);
            Propagate(gamma, next - at, ref vv, ref ii, ref wall);
            at = next;
            if (step == n) break;
            int j = offset + k;
            v[j] = vv;
            ii += y[j] * vv;
        }
        return new ArmResult(vv, ii, wall, load, peak, peakAt);
    }

    /// <summary>
    /// Largest |V| on a section of length L starting (at distance <paramref name="start"/> from the termination) with
    /// (V, I): |V(ℓ)|² = |A|²e^{2αℓ} + |B|²e^{−2αℓ} + 2 Re(A B* e^{2jβℓ}) peaks where 2βℓ + arg(A B*) ≡ 0 (mod 2π) to first
    /// order in α; the candidates are those points and the section's ends.
    /// </summary>
    private static void SectionPeak(Complex gamma, Complex vv, Complex ii, double length, double start, ref double peak, ref double peakAt)
    {
        if (length <= 0) return;
        Complex a = (vv + ii) / 2, b = (vv - ii) / 2;
        double beta = gamma.Imaginary;
        double phi = (a * Complex.Conjugate(b)).Phase;
        double first = -phi / (2 * beta);
        double period = Math.PI / beta;
        first -= Math.Floor(first / period) * period;             // smallest non-negative candidate
        for (double l = first; ; l += period)
        {
            bool last = l >= length;
            if (last) l = length;
            Complex e = Complex.Exp(gamma * l);
            double m = (a * e + b / e).Magnitude;
            if (m > peak) { peak = m; peakAt = start + l; }
            if (last) break;
        }
    }

    private static void Propagate(Complex gamma, double length, ref Complex vv, ref Complex ii, ref double wall)
    {
        if (length == 0) return;
        Complex a = (vv + ii) / 2, b = (vv - ii) / 2;
        double alpha = gamma.Real;
        double grow = Math.Exp(2 * alpha * length);
        wall += 0.5 * Sq(a) * (grow - 1) + 0.5 * Sq(b) * (1 - 1 / grow);
        Complex e = Complex.Exp(gamma * length);
        a *= e;
        b /= e;
        vv = a + b;
        ii = a - b;
    }

    private static NetworkSolution Finish(Frequency f, Complex s11, Complex[] y, Complex[] v, double[] signs, Complex scale,
        double wallUnscaled, double loadUnscaled, Peak peak)
    {
        double p2 = Sq(scale);
        var p = new double[y.Length];
        var e = new Complex[y.Length];
        for (int i = 0; i < y.Length; i++)
        {
            v[i] *= scale;
            // Powers in units of P_inc = ½|V+|² = ½: P_n = ½ Re(y)|V|² / ½.
            p[i] = y[i].Real * Sq(v[i]);
            Complex yv = y[i] * v[i];
            double mag = Math.Sqrt(Math.Max(p[i], 0));
            e[i] = yv == Complex.Zero ? Complex.Zero : Math.Sign(signs[i]) * mag * yv / yv.Magnitude;
        }
        // Wall and load powers were accumulated as ½|·|² of unscaled amplitudes: × |scale|² / P_inc.
        return new NetworkSolution(f, s11, Array.AsReadOnly(y), Array.AsReadOnly(v), Array.AsReadOnly(p), Array.AsReadOnly(e),
            2 * wallUnscaled * p2, 2 * loadUnscaled * p2, peak.Voltage * scale.Magnitude, Length.FromMeters(peak.Position));
    }
}
