using System.Collections.Immutable;

namespace SlotArray.Core.Tapers;

/// <summary>
/// Element amplitudes of an aperture taper, normalised so that max |a_n| = 1, element 0 at the −z end.
/// </summary>
/// <param name="Method">Name of the published method used, for reports.</param>
/// <param name="Weights">Amplitude of each element (real; a difference taper has both signs).</param>
/// <param name="IsDifference">True for an odd (difference, monopulse) taper.</param>
/// <param name="Warnings">Validity limits met while synthesising, as data.</param>
internal sealed record TaperResult(string Method, ImmutableArray<double> Weights, bool IsDifference, IReadOnlyList<DesignWarning> Warnings)
{
    /// <summary>Number of elements.</summary>
    public int Count => Weights.Length;
}
