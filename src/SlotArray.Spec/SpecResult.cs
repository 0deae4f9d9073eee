using SlotArray.Core.Design;

namespace SlotArray.Spec;

/// <summary>An error in a spec, at a 1-based line and column; printed as <c>file:line:column: message</c>.</summary>
/// <param name="File">File name as given by the caller.</param>
/// <param name="Line">1-based line.</param>
/// <param name="Column">1-based column.</param>
/// <param name="Message">What is wrong and what to write instead.</param>
public sealed record SpecError(string File, long Line, long Column, string Message)
{
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{File}:{Line}:{Column}: {Message}");
}

/// <summary>A warning about a spec (a default taken, a frequency outside a guide's recommended band).</summary>
/// <param name="File">File name as given by the caller.</param>
/// <param name="Line">1-based line.</param>
/// <param name="Column">1-based column.</param>
/// <param name="Message">What was noticed and what it means.</param>
public sealed record SpecWarning(string File, long Line, long Column, string Message)
{
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{File}:{Line}:{Column}: warning: {Message}");
}

/// <summary>The outcome of reading a spec: the request when there is no error, and every error and warning found.</summary>
/// <param name="Request">The validated request, or null when <paramref name="Errors"/> is not empty.</param>
/// <param name="Errors">All errors, ordered by line and column.</param>
/// <param name="Warnings">All warnings, ordered by line and column.</param>
internal sealed record SpecResult(ArrayRequest? Request, IReadOnlyList<SpecError> Errors, IReadOnlyList<SpecWarning> Warnings)
{
    /// <summary>Whether the spec is valid (a request was built).</summary>
    public bool IsValid => Request is not null && Errors.Count == 0;
}
