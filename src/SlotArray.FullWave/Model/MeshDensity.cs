namespace SlotArray.FullWave.Model;

/// <summary>How fine the FDTD mesh is (cells per wavelength, cells across the slot and through the wall).</summary>
internal enum MeshDensity
{
    /// <summary>λ/15 largest cell, 2 cells across the slot and through the wall: quick, for checks and tests.</summary>
    Coarse,

    /// <summary>λ/20, 3 cells across the slot and the wall.</summary>
    Normal,

    /// <summary>λ/30, 4 cells across the slot and the wall.</summary>
    Fine,
}

/// <summary>The numbers behind a <see cref="MeshDensity"/> and the stop rule that goes with it.</summary>
/// <param name="CellsPerWavelength">Free-space wavelength at the highest excited frequency ÷ largest cell.</param>
/// <param name="CellsAcrossSlot">Cells across the slot width (and along its ends).</param>
/// <param name="CellsThroughWall">Cells through the wall thickness.</param>
/// <param name="EndCriterion">Energy fraction at which the run stops.</param>
internal sealed record MeshSettings(int CellsPerWavelength, int CellsAcrossSlot, int CellsThroughWall, double EndCriterion)
{
    /// <summary>The settings of a density.</summary>
    public static MeshSettings Of(MeshDensity density) => density switch
    {
        MeshDensity.Coarse => new MeshSettings(15, 2, 2, 1e-5),
        MeshDensity.Normal => new MeshSettings(20, 3, 3, 1e-5),
        MeshDensity.Fine => new MeshSettings(30, 4, 4, 1e-5),
        _ => throw new ArgumentOutOfRangeException(nameof(density), density, "unknown mesh density"),
    };
}
