namespace SlotArray.Core.Tapers;

/// <summary>Uniform illumination: every element at amplitude 1 (the maximum-directivity taper of a broadside array).</summary>
internal static class UniformTaper
{
    /// <summary>N amplitudes equal to 1.</summary>
    /// <param name="count">Number of elements, 2 … 100,000.</param>
    public static double[] Weights(int count)
    {
        TaperMath.CheckCount(count);
        return Enumerable.Repeat(1.0, count).ToArray();
    }
}
