using SlotArray.Core;
using Spectre.Console;

namespace SlotArray.Cli;

/// <summary>
/// A progress bar on stderr (step, count, percentage, time left) for work that can take more than about a second,
/// shown only when stderr is a terminal and neither <c>--json</c> nor <c>--quiet</c> was given. Otherwise nothing at
/// all is written for it (no carriage return, no escape sequence), and the work gets no progress sink.
/// </summary>
internal static class ProgressDisplay
{
    /// <summary>Whether a bar may be drawn on <paramref name="error"/>: it is the process's stderr, a terminal, and the run is not quiet.</summary>
    public static bool Allowed(TextWriter error, bool quietOrJson)
        => !quietOrJson && ReferenceEquals(error, Console.Error) && !Console.IsErrorRedirected;

    /// <summary>Runs <paramref name="work"/>, drawing its reports when <paramref name="show"/>; the bar is cleared when the work ends.</summary>
    public static T Run<T>(bool show, Func<IProgress<WorkProgress>?, T> work)
    {
        if (!show) return work(null);
        var console = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(Console.Error) });
        T result = default!;
        console.Progress()
            .AutoClear(true)
            .Columns(new TaskDescriptionColumn { Alignment = Justify.Left }, new ProgressBarColumn(), new PercentageColumn(),
                new RemainingTimeColumn(), new SpinnerColumn())
            .Start(ctx => result = work(new Sink(ctx)));
        return result;
    }

    /// <summary>One bar per step, updated synchronously from any thread.</summary>
    private sealed class Sink(ProgressContext context) : IProgress<WorkProgress>
    {
        private readonly Dictionary<string, ProgressTask> _tasks = new(StringComparer.Ordinal);
        private readonly Lock _gate = new();

        public void Report(WorkProgress value)
        {
            lock (_gate)
            {
                if (!_tasks.TryGetValue(value.Step, out var task))
                    _tasks[value.Step] = task = context.AddTask(Markup.Escape(value.Step), maxValue: Math.Max(1, value.Total));
                task.MaxValue = Math.Max(1, value.Total);
                task.Value = Math.Max(task.Value, value.Done);
                task.Description = Markup.Escape($"{value.Step} {Math.Max((int)task.Value, value.Done)}/{value.Total}");
            }
        }
    }
}
