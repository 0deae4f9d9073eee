namespace SlotArray.Cli;

/// <summary>Process entry point: builds the command tree and runs it.</summary>
internal static class Program
{
    /// <summary>Runs the command line; the return value is the process exit code (see <see cref="ExitCodes"/>).</summary>
    /// <remarks>
    /// The first Ctrl-C asks the running computation to stop (it ends with exit 130 and writes nothing); a second one
    /// ends the process at once.
    /// </remarks>
    public static int Main(string[] args)
    {
        using var interrupt = new CancellationTokenSource();
        Console.CancelKeyPress += (_, e) =>
        {
            if (interrupt.IsCancellationRequested) return;
            e.Cancel = true;
            interrupt.Cancel();
        };
        return CommandLine.Run(args, Console.Out, Console.Error, interrupt.Token);
    }
}
