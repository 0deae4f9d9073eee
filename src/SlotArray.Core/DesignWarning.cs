namespace SlotArray.Core;

/// <summary>
/// A validity limit or caution returned as data (never printed by Core). The CLI and the reports decide
/// how to show it.
/// </summary>
/// <param name="Code">Stable short identifier, kebab-case (e.g. "stevenson-offset-range").</param>
/// <param name="Message">One sentence a user can act on, units stated.</param>
public sealed record DesignWarning(string Code, string Message)
{
    /// <inheritdoc />
    public override string ToString() => Message;
}
