using SlotArray.Spec;

namespace SlotArray;

/// <summary>
/// A spec that cannot be designed as written: the file is missing or unreadable, or the YAML has errors. Each error
/// carries its file, line and column and says what to change.
/// </summary>
public sealed class InvalidSpecException : Exception
{
    /// <summary>The positioned errors (empty when the file itself could not be read).</summary>
    public IReadOnlyList<SpecError> Errors { get; }

    /// <summary>Creates the exception.</summary>
    /// <param name="message">One line: which spec and how many errors.</param>
    /// <param name="errors">The positioned errors.</param>
    public InvalidSpecException(string message, IReadOnlyList<SpecError> errors)
        : base(errors.Count == 0 ? message : message + Environment.NewLine + string.Join(Environment.NewLine, errors)) => Errors = errors;
}
