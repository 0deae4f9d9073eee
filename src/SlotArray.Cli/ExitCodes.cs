namespace SlotArray.Cli;

/// <summary>Process exit codes, fixed by the architecture.</summary>
internal static class ExitCodes
{
    /// <summary>Success.</summary>
    public const int Ok = 0;
    /// <summary>The design is infeasible (the reason is printed).</summary>
    public const int Infeasible = 1;
    /// <summary>Bad input: a spec error, a bad option.</summary>
    public const int BadInput = 2;
    /// <summary>An internal error (a bug): one line, and the stack trace with --verbose.</summary>
    public const int InternalError = 3;
    /// <summary>The design was made and written, but a stated requirement (sidelobes, cross-polar level, VSWR, power
    /// handling) is not met: the FAIL lines on stdout and in summary.md say which.</summary>
    public const int RequirementsNotMet = 4;
    /// <summary>Interrupted (Ctrl-C): nothing written; 128 + SIGINT, as shells report it.</summary>
    public const int Interrupted = 130;
}
