using System.CommandLine;
using SlotArray.Cli.Commands;
using SlotArray.Core;

namespace SlotArray.Cli;

/// <summary>The command tree. Each command lives in its own file under Commands/ and only delegates.</summary>
public static class CommandLine
{
    /// <summary>Shows the stack trace of an internal error.</summary>
    public static readonly Option<bool> Verbose = new("--verbose") { Description = "Show the stack trace of an internal error", Recursive = true };

    /// <summary>No progress bar (it shows only on a terminal anyway).</summary>
    public static readonly Option<bool> Quiet = new("--quiet", "-q") { Description = "Show no progress bar", Recursive = true };

    /// <summary>Cancelled by Ctrl-C while <see cref="Run"/> runs (never in-process callers that pass none).</summary>
    internal static CancellationToken Cancellation => s_cancellation.Value;

    private static readonly AsyncLocal<CancellationToken> s_cancellation = new();

    /// <summary>Builds the root command with every sub-command, writing to the given writers.</summary>
    public static RootCommand Build(TextWriter output, TextWriter error)
    {
        var root = new RootCommand("SlotArray: design slotted-waveguide antenna arrays from a YAML spec to a cut list.")
        {
            Verbose,
            Quiet,
            GuidesCommand.Build(output, error),
            CheckCommand.Build(output, error),
            SlotCommand.Build(output, error),
            TaperCommand.Build(output, error),
            DesignCommand.Build(output, error),
            SweepCommand.Build(output, error),
            ToleranceCommand.Build(output, error),
            SchemaCommand.Build(output, error),
            InitCommand.Build(output, error),
        };
        return root;
    }

    /// <summary>The exception a user can act on: the cause inside a parallel failure, else the exception itself.</summary>
    private static Exception Actionable(Exception e) => e is AggregateException a ? ParallelFailures.Cause(a) : e;

    /// <summary>Parses and runs; maps exceptions to the architecture's exit codes (130 when <paramref name="cancel"/> stops the run).</summary>
    public static int Run(string[] args, TextWriter output, TextWriter error, CancellationToken cancel = default)
    {
        s_cancellation.Value = cancel;
        var root = Build(output, error);
        var parse = root.Parse(args);
        try
        {
            int code = parse.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false });
            // System.CommandLine reports a parse error as 1; our contract says bad input is 2.
            return parse.Errors.Count > 0 ? ExitCodes.BadInput : code;
        }
        catch (Exception e) when (Actionable(e) is InfeasibleDesignException or ConvergenceException)
        {
            // A solver that does not converge is exit 1 too: the message names the slot or stage, and the spec can be changed.
            var cause = Actionable(e);
            error.WriteLine($"{(cause is InfeasibleDesignException ? "infeasible" : "not converged")}: {cause.Message}");
            return ExitCodes.Infeasible;
        }
        catch (Core.Slots.Tables.SlotTableException e)
        {
            error.WriteLine(e.Line > 0 ? $"slot table, line {e.Line}: {e.Message}" : $"slot table: {e.Message}");
            return ExitCodes.BadInput;
        }
        catch (Exception e) when (cancel.IsCancellationRequested && IsCancellation(e))
        {
            error.WriteLine("interrupted: nothing written");
            return ExitCodes.Interrupted;
        }
        catch (UserInputException e)
        {
            error.WriteLine(e.Message);
            return ExitCodes.BadInput;
        }
        catch (Exception e)
        {
            error.WriteLine($"internal error: {e.GetType().Name}: {e.Message}. This is a bug: please report it with the spec you ran.");
            if (parse.GetValue(Verbose)) error.WriteLine(e.ToString());
            return ExitCodes.InternalError;
        }
    }

    private static bool IsCancellation(Exception e) => e is OperationCanceledException
        || (e is AggregateException a && a.Flatten().InnerExceptions.All(i => i is OperationCanceledException));
}

/// <summary>Bad input found by a command (not by the parser): printed as one line, exit code 2.</summary>
public sealed class UserInputException(string message) : Exception(message);
