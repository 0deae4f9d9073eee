using System.Runtime.InteropServices;

namespace SlotArray.Cli.Commands;

/// <summary>
/// The full-wave commands' stop: Ctrl-C (the command line's own <see cref="CommandLine.Cancellation"/>) or SIGTERM,
/// so a stopped command ends its engine processes too and the finished runs stay cached.
/// </summary>
internal sealed class StopSignal : IDisposable
{
    /// <summary>Exit code of a command stopped by a signal (the shell's 128 + SIGINT convention).</summary>
    public const int ExitCode = 130;

    private readonly CancellationTokenSource _cts = CancellationTokenSource.CreateLinkedTokenSource(CommandLine.Cancellation);
    private readonly PosixSignalRegistration _term;

    public StopSignal() => _term = PosixSignalRegistration.Create(PosixSignal.SIGTERM, Stop);

    /// <summary>Cancelled when a stop signal arrives.</summary>
    public CancellationToken Token => _cts.Token;

    private void Stop(PosixSignalContext c)
    {
        c.Cancel = true;
        _cts.Cancel();
    }

    public void Dispose()
    {
        _term.Dispose();
        _cts.Dispose();
    }
}
