namespace SlotArray.Core.Tapers;

/// <summary>Aperture taper families.</summary>
public enum TaperType
{
    /// <summary>Equal amplitudes.</summary>
    Uniform,
    /// <summary>Dolph-Chebyshev equal-ripple sidelobes.</summary>
    Chebyshev,
    /// <summary>Taylor n̄ line source, sampled.</summary>
    Taylor,
    /// <summary>Villeneuve n̄ for discrete arrays.</summary>
    Villeneuve,
    /// <summary>Taylor one-parameter (B).</summary>
    TaylorOneParameter,
    /// <summary>cos^q on a pedestal.</summary>
    CosinePedestal,
    /// <summary>Bayliss difference pattern.</summary>
    Bayliss,
    /// <summary>User-given weights.</summary>
    Given,
}

/// <summary>The aperture taper.</summary>
/// <param name="Type">Taper family.</param>
/// <param name="SidelobeLevelDb">Design sidelobe level, dB, negative (e.g. −26); ignored by uniform and given.</param>
/// <param name="Nbar">n̄ for Taylor, Villeneuve and Bayliss (≥ 2).</param>
/// <param name="EdgeLevelDb">cosine-pedestal: edge level, dB, negative (e.g. −20).</param>
/// <param name="Exponent">cosine-pedestal: exponent q ≥ 1 (default 2).</param>
/// <param name="Weights">given: the weights, any signs; null otherwise.</param>
public sealed record TaperRequest(TaperType Type, double SidelobeLevelDb, int Nbar, double EdgeLevelDb, double Exponent,
    IReadOnlyList<double>? Weights)
{
    /// <summary>A uniform taper.</summary>
    public static TaperRequest Uniform { get; } = new(TaperType.Uniform, -13.26, 4, -20, 2, null);
}
