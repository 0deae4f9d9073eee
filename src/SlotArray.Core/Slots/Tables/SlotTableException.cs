namespace SlotArray.Core.Slots.Tables;

/// <summary>A slot table that cannot be used as it stands; the message says what to change. The CLI reports it as bad input (exit 2).</summary>
/// <param name="message">What is wrong and what to change.</param>
/// <param name="line">1-based line of the file the problem is on, or 0 when it concerns the whole table.</param>
/// <param name="column">1-based column of the cell the problem is in, or 0.</param>
internal sealed class SlotTableException(string message, int line = 0, int column = 0) : Exception(message)
{
    /// <summary>1-based line of the file the problem is on, or 0 when it concerns the whole table.</summary>
    public int Line { get; } = line;

    /// <summary>1-based column of the cell the problem is in, or 0.</summary>
    public int Column { get; } = column;
}
