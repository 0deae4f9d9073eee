namespace SlotArray.Core;

/// <summary>
/// How far one step of a long computation has got (Monte Carlo trials, Elliott's iterations, a band sweep), for a
/// progress display. Reported through an <see cref="IProgress{T}"/> given in the options; the computation itself stays pure.
/// </summary>
/// <param name="Step">What is being done, e.g. "band sweep".</param>
/// <param name="Done">Items done so far.</param>
/// <param name="Total">Items in all (for an iteration, the most it may take).</param>
public readonly record struct WorkProgress(string Step, int Done, int Total);
