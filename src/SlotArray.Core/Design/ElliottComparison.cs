using SlotArray.Core.Network;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Design;

/// <summary>Figures of one design under the coupled analysis (<see cref="CoupledArrayNetwork"/>).</summary>
/// <param name="AtDesign">The coupled network solution at the design frequency.</param>
/// <param name="BestMatch">The coupled solution at the frequency of smallest |S11| in the analysis band.</param>
/// <param name="PeakSidelobeDb">Peak sidelobe of the coupled pattern at the design frequency (dB below the beam peak, negative), or null.</param>
internal sealed record CoupledFigures(NetworkSolution AtDesign, NetworkSolution BestMatch, double? PeakSidelobeDb)
{
    /// <summary>|S11| at the design frequency in dB (20 log10).</summary>
    public double S11Db => 20 * Math.Log10(AtDesign.S11.Magnitude);

    /// <summary>Relative shift of the best-match frequency from the design frequency, (f_best − f0)/f0.</summary>
    public double BestMatchShift => BestMatch.Frequency.Hertz / AtDesign.Frequency.Hertz - 1;
}

/// <summary>
/// What Elliott's correction bought (<c>coupling: mutual</c>): the coupled design and the isolated-slot design of the
/// same request, both analysed with the mutual coupling included.
/// </summary>
/// <param name="Elliott">The iterated design, its history and the isolated-slot design it started from.</param>
/// <param name="Coupled">The coupled design under the coupled analysis.</param>
/// <param name="Uncoupled">The isolated-slot design under the coupled analysis.</param>
internal sealed record ElliottComparison(ElliottResult Elliott, CoupledFigures Coupled, CoupledFigures Uncoupled)
{
    /// <summary>Sample count of the best-match search across the analysis band (then refined by golden section).</summary>
    public const int BestMatchSamples = 41;

    /// <summary>Analyses both designs of <paramref name="elliott"/> over [low, high] with the coupled network.</summary>
    /// <param name="elliott">The coupled design and the isolated-slot design it started from.</param>
    /// <param name="coupledSlot">The slot model evaluated for the coupled design (e.g. frequency-interpolated on its slots).</param>
    /// <param name="uncoupledSlot">The slot model evaluated for the isolated-slot design.</param>
    /// <param name="low">Lower edge of the best-match search.</param>
    /// <param name="high">Upper edge of the best-match search.</param>
    public static ElliottComparison Of(ElliottResult elliott, IShuntSlotModel coupledSlot, IShuntSlotModel uncoupledSlot,
        Quantities.Frequency low, Quantities.Frequency high)
    {
        ArgumentNullException.ThrowIfNull(elliott);
        return new ElliottComparison(elliott, Figures(elliott.Design, coupledSlot, low, high), Figures(elliott.Uncoupled, uncoupledSlot, low, high));
    }

    /// <summary>One design's figures under the coupled analysis: at the design frequency, at best match in [low, high], peak sidelobe.</summary>
    internal static CoupledFigures Figures(ArrayDesign d, IShuntSlotModel slot, Quantities.Frequency low, Quantities.Frequency high,
        MutualImpedanceModel? coupling = null)
    {
        var at = CoupledArrayNetwork.Solve(d, slot, d.DesignFrequency, coupling);
        var best = CoupledArrayNetwork.BestMatch(d, slot, low, high, BestMatchSamples, coupling);
        return new CoupledFigures(at, best, ArrayFigures.At(d, at).Metrics.PeakSidelobeDb);
    }
}

/// <summary>
/// What the coupled travelling-wave design bought (<c>coupling: mutual</c> with a travelling-wave feed): the coupled and
/// isolated-slot designs of the same request, both analysed with the mutual coupling included.
/// </summary>
/// <param name="Result">The coupled design, its iteration history and the isolated-slot design it started from.</param>
/// <param name="Coupled">The coupled design under the coupled analysis.</param>
/// <param name="Uncoupled">The isolated-slot design under the coupled analysis.</param>
internal sealed record CoupledTravellingWaveComparison(CoupledTravellingWaveDesign Result, CoupledFigures Coupled, CoupledFigures Uncoupled)
{
    /// <summary>Analyses both designs of <paramref name="result"/> over [low, high] with the coupled network.</summary>
    /// <param name="result">The coupled design and the isolated-slot design it started from.</param>
    /// <param name="coupledSlot">The slot model evaluated for the coupled design.</param>
    /// <param name="uncoupledSlot">The slot model evaluated for the isolated-slot design.</param>
    /// <param name="low">Lower edge of the best-match search.</param>
    /// <param name="high">Upper edge of the best-match search.</param>
    public static CoupledTravellingWaveComparison Of(CoupledTravellingWaveDesign result, IShuntSlotModel coupledSlot, IShuntSlotModel uncoupledSlot,
        Quantities.Frequency low, Quantities.Frequency high)
    {
        ArgumentNullException.ThrowIfNull(result);
        return new CoupledTravellingWaveComparison(result, ElliottComparison.Figures(result.Design, coupledSlot, low, high),
            ElliottComparison.Figures(result.Uncoupled.Design, uncoupledSlot, low, high));
    }
}
