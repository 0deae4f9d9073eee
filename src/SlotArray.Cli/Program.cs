namespace SlotArray.Cli;

/// <summary>Process entry point: builds the command tree and runs it.</summary>
public static class Program
{
    /// <summary>Runs the command line; the return value is the process exit code (see <see cref="ExitCodes"/>).</summary>
    public static int Main(string[] args) => CommandLine.Run(args, Console.Out, Console.Error);
}
