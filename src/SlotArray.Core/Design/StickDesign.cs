using SlotArray.Core.Stick;

namespace SlotArray.Core.Design;

/// <summary>
/// What every stick designer returns: the designed stick (<see cref="Design"/>) and, in the derived record, the designer's
/// own account of it. The cases: <see cref="StandingWaveDesign"/> (<see cref="StandingWaveDesigner"/>),
/// <see cref="TravellingWaveDesign"/> (<see cref="TravellingWaveDesigner"/>), <see cref="ElliottResult"/>
/// (<see cref="ElliottDesigner"/>) and <see cref="CoupledTravellingWaveDesign"/> (<see cref="CoupledTravellingWaveDesigner"/>);
/// <see cref="ArrayPipeline.DesignStick"/> picks the designer.
/// </summary>
/// <param name="Design">The designed stick: slots, feed and terminations.</param>
internal abstract record StickDesign(ArrayDesign Design);

/// <summary>An isolated-slot standing-wave design (<see cref="StandingWaveDesigner"/>): the stick is all it has to say.</summary>
/// <param name="Design">The designed stick.</param>
internal sealed record StandingWaveDesign(ArrayDesign Design) : StickDesign(Design);
