using Xunit.Sdk;

namespace SlotArray.Tests.Shared;

/// <summary>
/// The one assertion helper for reference values: expected first, and a failure prints expected, actual,
/// the tolerance and where the reference value came from.
/// </summary>
internal static class Check
{
    /// <summary>|actual − expected| ≤ tolerance·|expected| (relative).</summary>
    public static void Relative(double expected, double actual, double tolerance, string source)
    {
        double err = Math.Abs(actual - expected), allowed = tolerance * Math.Abs(expected);
        if (!(err <= allowed))
            throw new XunitException($"expected {expected:R}, actual {actual:R}: relative error {err / Math.Abs(expected):G3} > {tolerance:G3} (source: {source})");
    }

    /// <summary>|actual − expected| ≤ tolerance (absolute, in the quantity's own unit).</summary>
    public static void Absolute(double expected, double actual, double tolerance, string source)
    {
        double err = Math.Abs(actual - expected);
        if (!(err <= tolerance))
            throw new XunitException($"expected {expected:R}, actual {actual:R}: error {err:G3} > {tolerance:G3} (source: {source})");
    }
}
