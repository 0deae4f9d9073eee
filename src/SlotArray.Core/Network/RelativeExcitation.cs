using SlotArray.Core.Stick;

namespace SlotArray.Core.Network;

/// <summary>
/// One slot's excitation as the slot table shows it: the amplitude asked of it and the amplitude and phase the network
/// gives it, each relative to the array (amplitudes normalised so that their largest magnitude is 1; the phase relative
/// to the slot of largest achieved amplitude).
/// </summary>
/// <param name="TargetAmplitude">The taper weight asked of the slot over the largest |weight| (signed).</param>
/// <param name="AchievedAmplitude">|e_n| over the largest |e_m| of the network's slot excitations.</param>
/// <param name="AchievedPhaseDegrees">arg e_n − arg e_ref, degrees in [−180, 180], ref the slot of largest |e|.</param>
internal sealed record RelativeExcitation(double TargetAmplitude, double AchievedAmplitude, double AchievedPhaseDegrees)
{
    /// <summary>
    /// The relative excitation of every slot of <paramref name="design"/> under <paramref name="network"/> (its
    /// <see cref="NetworkSolution.Excitations"/>, by slot index); the first slot of largest |e| is the phase reference.
    /// </summary>
    /// <param name="design">The designed stick (its target amplitudes).</param>
    /// <param name="network">A network solution of that stick, e.g. at the design frequency.</param>
    public static IReadOnlyList<RelativeExcitation> Of(ArrayDesign design, NetworkSolution network)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(network);
        var e = network.Excitations;
        double targetPeak = design.Slots.Max(s => Math.Abs(s.TargetAmplitude));
        double achievedPeak = e.Max(x => x.Magnitude);
        int reference = Enumerable.Range(0, e.Count).First(i => e[i].Magnitude == achievedPeak);
        double phase0 = e[reference].Phase;
        var list = new RelativeExcitation[design.Count];
        for (int i = 0; i < list.Length; i++)
        {
            double phase = (e[i].Phase - phase0) * 180 / Math.PI;
            list[i] = new RelativeExcitation(design.Slots[i].TargetAmplitude / targetPeak, e[i].Magnitude / achievedPeak,
                Math.IEEERemainder(phase, 360));
        }
        return Array.AsReadOnly(list);
    }
}
