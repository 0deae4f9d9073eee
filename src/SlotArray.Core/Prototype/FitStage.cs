namespace SlotArray.Core.Prototype;

/// <summary>One stage of the diagnosis: what was fitted, to what, how well, and whether the result was kept.</summary>
/// <param name="Name">The stage, in words ("a: uniform slot-length scale").</param>
/// <param name="Values">The fitted values with their confidence intervals.</param>
/// <param name="ResidualRms">RMS of the weighted residual (≈ 1 when the model explains the data to its noise).</param>
/// <param name="NoiseScale">√(χ²/(m − p)) in units of the noise estimated from the data.</param>
/// <param name="ConditionNumber">Condition number of the stage's Jacobian.</param>
/// <param name="Adopted">Whether the stage's values were kept (false when the data could not separate its parameters).</param>
/// <param name="Notes">What the stage found out about itself (inseparable parameters, unseen slots).</param>
internal sealed record FitStage(string Name, IReadOnlyList<FittedValue> Values, double ResidualRms, double NoiseScale,
    double ConditionNumber, bool Adopted, IReadOnlyList<string> Notes);
