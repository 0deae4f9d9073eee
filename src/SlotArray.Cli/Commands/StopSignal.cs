using System.Runtime.InteropServices;

namespace SlotArray.Cli.Commands;

/// <summary>
/// Turns SIGINT (Ctrl-C) and SIGTERM into a cancellation for the full-wave commands, so a stopped command ends its
/// engine processes too (not only the process group's foreground job) and the finished runs stay cached.
/// </summary>
internal sealed class StopSignal : IDisposable
{
    /// <summary>Exit code of a command stopped by a signal (the shell's 128 + SIGINT convention).</summary>
    public const int ExitCode = 130;

    private readonly CancellationTokenSource _cts = new();
    private readonly PosixSignalRegistration _int, _term;

    public StopSignal()
    {
        _int = PosixSignalRegistration.Create(PosixSignal.SIGINT, Stop);
        _term = PosixSignalRegistration.Create(PosixSignal.SIGTERM, Stop);
    }

    /// <summary>Cancelled when a stop signal arrives.</summary>
    public CancellationToken Token => _cts.Token;

    private void Stop(PosixSignalContext c)
    {
        c.Cancel = true;
        _cts.Cancel();
    }

    public void Dispose()
    {
        _int.Dispose();
        _term.Dispose();
        _cts.Dispose();
    }
}
