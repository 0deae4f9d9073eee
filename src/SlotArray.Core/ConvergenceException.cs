namespace SlotArray.Core;

/// <summary>An iterative solver did not converge: carries the iteration count and the last residual.</summary>
public sealed class ConvergenceException(string message, int iterations, double residual)
    : Exception($"{message} (after {iterations} iterations, residual {residual:G3})")
{
    /// <summary>Iterations performed.</summary>
    public int Iterations { get; } = iterations;
    /// <summary>Last residual of the solver (its own units, stated in the message).</summary>
    public double Residual { get; } = residual;
}
