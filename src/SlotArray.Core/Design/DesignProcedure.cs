namespace SlotArray.Core.Design;

/// <summary>
/// How an <see cref="ArrayResult"/>'s design was made, with what that procedure alone reports; consumers switch on the
/// case: <see cref="StandingWaveProcedure"/>, <see cref="TravellingWaveProcedure"/>, <see cref="ElliottProcedure"/>,
/// <see cref="CoupledTravellingWaveProcedure"/>.
/// </summary>
internal abstract record DesignProcedure
{
    private protected DesignProcedure()
    {
    }
}

/// <summary>Isolated-slot standing-wave design (<see cref="StandingWaveDesigner"/>, <c>coupling: none</c>).</summary>
internal sealed record StandingWaveProcedure : DesignProcedure;

/// <summary>Isolated-slot travelling-wave design (<see cref="TravellingWaveDesigner"/>, <c>coupling: none</c>).</summary>
/// <param name="TravellingWave">The designer's figures: targets, refinement, squint, scan rate.</param>
internal sealed record TravellingWaveProcedure(TravellingWaveDesign TravellingWave) : DesignProcedure;

/// <summary>
/// Elliott's standing-wave design with mutual coupling (<see cref="ElliottDesigner"/>, <c>coupling: mutual</c>): the
/// result's design is the coupled one and its sweep, figures and bands come from the coupled analysis.
/// </summary>
/// <param name="Comparison">Elliott's design with its iteration history, and the coupled and isolated-slot designs side by side under the coupled analysis.</param>
internal sealed record ElliottProcedure(ElliottComparison Comparison) : DesignProcedure;

/// <summary>
/// Travelling-wave design with mutual coupling (<see cref="CoupledTravellingWaveDesigner"/>, <c>coupling: mutual</c>): the
/// result's design is the coupled one and its sweep, figures and bands come from the coupled analysis.
/// </summary>
/// <param name="TravellingWave">The isolated-slot designer's layout figures (targets, squint, scan rate) with its design replaced by the coupled one.</param>
/// <param name="Comparison">The coupled and isolated-slot designs side by side under the coupled analysis.</param>
internal sealed record CoupledTravellingWaveProcedure(TravellingWaveDesign TravellingWave, CoupledTravellingWaveComparison Comparison) : DesignProcedure;
