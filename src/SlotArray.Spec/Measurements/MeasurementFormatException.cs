namespace SlotArray.Spec.Measurements;

/// <summary>A malformed measurement file, at a 1-based line; printed as <c>file:line: message</c>.</summary>
/// <param name="file">File name as given.</param>
/// <param name="line">1-based line (0 when the problem is the file as a whole).</param>
/// <param name="reason">What is wrong and what to write instead.</param>
internal sealed class MeasurementFormatException(string file, int line, string reason)
    : Exception(line > 0 ? FormattableString.Invariant($"{file}:{line}: {reason}") : $"{file}: {reason}")
{
    /// <summary>File name.</summary>
    public string File { get; } = file;

    /// <summary>1-based line, 0 for the whole file.</summary>
    public int Line { get; } = line;

    /// <summary>The reason.</summary>
    public string Reason { get; } = reason;
}
