using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// The slot-admittance port (architecture.md, "Slot data is a port"): the normalised admittance y = Y/G0 of one slot
/// against its coupling (offset or tilt), its length and the frequency, and the range over which the source knows it.
/// Behind it: the built-in models, or a user's table (<c>slots.data</c>). Resonance and the inverse
/// (coupling for a conductance) are found from it by <see cref="SlotResonanceSolver"/>.
/// </summary>
internal interface ISlotAdmittance
{
    /// <summary>The guide the slot is cut in (dimensions, wall thickness).</summary>
    RectangularWaveguide Guide { get; }

    /// <summary>Slot width (across its length).</summary>
    Length Width { get; }

    /// <summary>Whether the coupling parameter is an offset (m) or a tilt (rad).</summary>
    SlotCouplingKind CouplingKind { get; }

    /// <summary>Short name of the source for reports, e.g. "moment-method" or "table my-slots.csv".</summary>
    string Name { get; }

    /// <summary>Where the source's admittances are known (outside it they are extrapolated or refused).</summary>
    SlotDataRange Range { get; }

    /// <summary>Normalised shunt admittance y = Y/G0 of a slot of the given coupling and length at frequency f.</summary>
    Complex Admittance(double coupling, Length length, Frequency f);

    /// <summary>Validity limits met at the given coupling and frequency (empty when none).</summary>
    IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f);
}

/// <summary>
/// The range of a slot-admittance source: |coupling| (m or rad, as <see cref="ISlotAdmittance.CouplingKind"/> says),
/// length as a fraction of the resonant length, and frequency. A built-in model's range is its coupling limit with
/// unbounded length and frequency; a table's is what it tabulates.
/// </summary>
/// <param name="CouplingLow">Smallest |coupling| known (0 for a model).</param>
/// <param name="CouplingHigh">Largest |coupling| known.</param>
/// <param name="LengthRatioLow">Smallest L/L_r known (0 for a model).</param>
/// <param name="LengthRatioHigh">Largest L/L_r known (+∞ for a model).</param>
/// <param name="FrequencyLow">Lowest frequency known, Hz (0 for a model).</param>
/// <param name="FrequencyHigh">Highest frequency known, Hz (+∞ for a model).</param>
internal sealed record SlotDataRange(double CouplingLow, double CouplingHigh, double LengthRatioLow, double LengthRatioHigh,
    double FrequencyLow, double FrequencyHigh)
{
    /// <summary>A model's range: |coupling| up to <paramref name="maximumCoupling"/>, any length and frequency.</summary>
    public static SlotDataRange UpTo(double maximumCoupling) => new(0, maximumCoupling, 0, double.PositiveInfinity, 0, double.PositiveInfinity);

    /// <summary>Whether |coupling| lies inside [<see cref="CouplingLow"/>, <see cref="CouplingHigh"/>] (with a relative slack of 1e-9).</summary>
    public bool CoversCoupling(double coupling)
    {
        double c = Math.Abs(coupling), slack = 1e-9 * CouplingHigh;
        return c >= CouplingLow - slack && c <= CouplingHigh + slack;
    }
}
