using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// What one Monte Carlo trial hands to the pattern analysis: where the slots are and how they radiate. Positions are
/// slot centres z_n from the datum (m), excitations the far-field amplitudes of the network
/// (<see cref="Network.NetworkSolution.Excitations"/>), S11 at the feed plane, and the radiated fraction of the incident power.
/// </summary>
/// <param name="Positions">z_n, m.</param>
/// <param name="Excitations">e_n, complex, any common scale.</param>
/// <param name="S11">Reflection at the feed, referred to the nominal guide's wave impedance.</param>
/// <param name="RadiatedPower">Σ P_n / P_inc.</param>
/// <param name="CrossExcitations">Edge (tilted) slots: the cross-polarised sources e_n sin θ_n, with
/// <paramref name="Excitations"/> then the co-polarised sources e_n cos θ_n (<see cref="Patterns.CrossPolarPattern"/>,
/// as <see cref="Network.ArrayFigures"/> splits them); null for untilted slots.</param>
internal sealed record TrialNetwork(double[] Positions, Complex[] Excitations, Complex S11, double RadiatedPower, Complex[]? CrossExcitations = null);

/// <summary>
/// A source of Monte Carlo trials: the nominal network and, for a random stream, one perturbed network. The array
/// model (<see cref="ArrayTrialModel"/>) reruns the slot model and the line network; tests may perturb excitations
/// directly to check the statistics alone.
/// </summary>
internal interface IToleranceTrialModel
{
    /// <summary>The analysis frequency (the design frequency).</summary>
    Frequency Frequency { get; }

    /// <summary>The unperturbed network.</summary>
    TrialNetwork Nominal { get; }

    /// <summary>One perturbed network; a pure function of the stream's state (thread-safe).</summary>
    /// <param name="random">The trial's random stream.</param>
    TrialNetwork Trial(ref TrialRandom random);
}
