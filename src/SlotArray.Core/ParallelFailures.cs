namespace SlotArray.Core;

/// <summary>
/// The failure to report when work run in parallel (<see cref="Parallel.For(int, int, Action{int})"/>) fails: the task
/// library wraps each failure in an <see cref="AggregateException"/>, which would hide the user-actionable
/// <see cref="InfeasibleDesignException"/> or <see cref="ConvergenceException"/> inside it.
/// </summary>
internal static class ParallelFailures
{
    /// <summary>
    /// The cause of <paramref name="failure"/>: among its (flattened) inner exceptions the first infeasible design, else the
    /// first solver that did not converge, else the first exception; the failure itself when it wraps nothing.
    /// </summary>
    /// <param name="failure">The aggregate thrown by the parallel work.</param>
    public static Exception Cause(AggregateException failure)
    {
        ArgumentNullException.ThrowIfNull(failure);
        var inner = failure.Flatten().InnerExceptions;
        return inner.FirstOrDefault(e => e is InfeasibleDesignException)
            ?? inner.FirstOrDefault(e => e is ConvergenceException)
            ?? inner.FirstOrDefault()
            ?? failure;
    }

    /// <summary>Runs <paramref name="work"/>, rethrowing a parallel failure as its <see cref="Cause"/> (stack trace kept).</summary>
    /// <typeparam name="T">The result type.</typeparam>
    /// <param name="work">The work.</param>
    public static T Unwrapped<T>(Func<T> work)
    {
        ArgumentNullException.ThrowIfNull(work);
        try
        {
            return work();
        }
        catch (AggregateException e)
        {
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Throw(Cause(e));
            throw;   // not reached: Throw never returns
        }
    }
}
