namespace SlotArray.Core.Tapers;

/// <summary>Weights given by the user (the spec's <c>weights:</c> list), any signs, normalised to max |a| = 1.</summary>
internal static class GivenWeights
{
    /// <summary>Checks and normalises the given weights.</summary>
    /// <param name="weights">One finite weight per element, not all zero.</param>
    /// <param name="count">Number of elements; must equal the number of weights.</param>
    public static double[] Weights(IReadOnlyList<double>? weights, int count)
    {
        TaperMath.CheckCount(count);
        if (weights is null)
            throw new ArgumentException("A given taper needs its weights: list one weight per element.", nameof(weights));
        if (weights.Count != count)
            throw new ArgumentException($"{weights.Count} weights were given for {count} elements: give exactly one weight per element.", nameof(weights));
        for (int i = 0; i < count; i++)
            if (!double.IsFinite(weights[i]))
                throw new ArgumentException($"Weight {i + 1} is not a finite number ({weights[i]}).", nameof(weights));
        if (weights.All(w => w == 0)) throw new ArgumentException("All given weights are zero: give at least one non-zero weight.", nameof(weights));
        return TaperMath.NormalizeToPeak(weights.ToArray());
    }
}
