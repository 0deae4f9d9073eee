using System.CommandLine;
using System.CommandLine.Parsing;
using SlotArray.Cli.Commands;
using SlotArray.Core;
using SlotArray.Reports;
using SlotArray.Spec;

namespace SlotArray.Cli;

/// <summary>The command tree. Each command lives in its own file under Commands/ and only delegates.</summary>
internal static class CommandLine
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
            CharacteriseCommand.Build(output, error),
            CalibrateEdgeCommand.Build(output, error),
            VerifyEdgeCommand.Build(output, error),
            VerifyCommand.Build(output, error),
            CompareCommand.Build(output, error),
            SynthesiseCommand.Build(output, error),
        };
        return root;
    }

    /// <summary>The exception a user can act on: the cause inside a parallel failure, else the exception itself.</summary>
    private static Exception Actionable(Exception e) => e is AggregateException a ? ParallelFailures.Cause(a) : e;

    /// <summary>
    /// Parses and runs; maps exceptions to the architecture's exit codes (130 when <paramref name="cancel"/> stops the
    /// run). A failure always prints a readable message on <paramref name="error"/>; when the command was given
    /// <c>--json</c> and wrote nothing on <paramref name="output"/>, it also prints one JSON error object there
    /// (<see cref="JsonError"/>), so a script reading stdout always gets JSON.
    /// </summary>
    public static int Run(string[] args, TextWriter output, TextWriter error, CancellationToken cancel = default)
    {
        s_cancellation.Value = cancel;
        var stdout = new RecordingWriter(output);
        var stderr = new RecordingWriter(error);
        var root = Build(stdout, stderr);
        var parse = root.Parse(args);
        bool json = WantsJson(parse);
        int Fail(int code, string kind, string message, IReadOnlyList<SpecError>? errors = null)
        {
            if (json && !stdout.Wrote) output.WriteLine(JsonError.Text(code, kind, message, errors));
            return code;
        }
        if (json && parse.Errors.Count > 0)
        {
            // Not invoked: the parser's own error action would print the help on stdout, which must carry JSON only.
            foreach (var e in parse.Errors) error.WriteLine(e.Message);
            return Fail(ExitCodes.BadInput, JsonError.BadInput, string.Join(" ", parse.Errors.Select(e => e.Message)));
        }
        try
        {
            int code = parse.Invoke(new InvocationConfiguration { Output = stdout, Error = stderr, EnableDefaultExceptionHandler = false });
            // System.CommandLine reports a parse error as 1; our contract says bad input is 2.
            if (parse.Errors.Count > 0) return Fail(ExitCodes.BadInput, JsonError.BadInput, string.Join(" ", parse.Errors.Select(e => e.Message)));
            return code is ExitCodes.Ok or ExitCodes.RequirementsNotMet ? code : Fail(code, JsonError.KindOf(code), stderr.LastLine ?? "failed");
        }
        catch (Exception e) when (Actionable(e) is InfeasibleDesignException or ConvergenceException)
        {
            // A solver that does not converge is exit 1 too: the message names the slot or stage, and the spec can be changed.
            var cause = Actionable(e);
            error.WriteLine($"{(cause is InfeasibleDesignException ? "infeasible" : "not converged")}: {cause.Message}");
            return Fail(ExitCodes.Infeasible, JsonError.Infeasible, cause.Message);
        }
        catch (SpecErrorsException e)
        {
            foreach (var x in e.Errors) error.WriteLine(x);
            error.WriteLine(e.Message);
            return Fail(ExitCodes.BadInput, JsonError.BadInput, e.Message, e.Errors);
        }
        catch (Core.Slots.Tables.SlotTableException e)
        {
            string message = e.Line > 0 ? $"slot table, line {e.Line}: {e.Message}" : $"slot table: {e.Message}";
            error.WriteLine(message);
            return Fail(ExitCodes.BadInput, JsonError.BadInput, message);
        }
        catch (Exception e) when (cancel.IsCancellationRequested && IsCancellation(e))
        {
            error.WriteLine("interrupted: nothing written");
            return ExitCodes.Interrupted;
        }
        catch (Exception e) when (e is UserInputException or OutputFolderException)
        {
            error.WriteLine(e.Message);
            return Fail(ExitCodes.BadInput, JsonError.BadInput, e.Message);
        }
        catch (Exception e)
        {
            string message = $"internal error: {e.GetType().Name}: {e.Message}. This is a bug: please report it with the spec you ran.";
            error.WriteLine(message);
            if (parse.GetValue(Verbose)) error.WriteLine(e.ToString());
            return Fail(ExitCodes.InternalError, JsonError.Internal, message);
        }
    }

    /// <summary>Whether the command run has a <c>--json</c> option and it was given.</summary>
    private static bool WantsJson(ParseResult parse) =>
        parse.CommandResult.Command.Options.Any(o => o.Name == "--json")
        && parse.Tokens.Any(t => t.Type == TokenType.Option && t.Value == "--json");

    private static bool IsCancellation(Exception e) => e is OperationCanceledException
        || (e is AggregateException a && a.Flatten().InnerExceptions.All(i => i is OperationCanceledException));
}

/// <summary>Bad input found by a command (not by the parser): printed as one line, exit code 2.</summary>
internal class UserInputException(string message) : Exception(message);

/// <summary>A spec with positioned errors: each error is printed as <c>file:line:column: message</c>, then the message; exit code 2.</summary>
/// <param name="message">The closing line, e.g. "spec.yaml: 2 error(s); nothing designed".</param>
/// <param name="errors">The positioned errors.</param>
internal sealed class SpecErrorsException(string message, IReadOnlyList<SpecError> errors) : UserInputException(message)
{
    /// <summary>The positioned errors, ordered by line and column.</summary>
    public IReadOnlyList<SpecError> Errors { get; } = errors;
}
