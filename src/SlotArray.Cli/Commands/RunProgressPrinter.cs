using System.Globalization;
using SlotArray.FullWave.Runs;

namespace SlotArray.Cli.Commands;

/// <summary>
/// Shows full-wave run progress on stderr: on a terminal one line rewritten in place ("runs 3/16 done, about 4 min
/// left"); otherwise one line per finished run (logs stay readable).
/// </summary>
internal sealed class RunProgressPrinter(TextWriter error, bool interactive) : IProgress<RunProgress>
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>True when stderr is a terminal (the real console, not redirected).</summary>
    public static bool StderrIsTerminal(TextWriter error) => ReferenceEquals(error, Console.Error) && !Console.IsErrorRedirected;

    public void Report(RunProgress p)
    {
        string left = p.SecondsLeft is double s ? ", about " + Duration(s) + " left" : "";
        string last = p.Last is { } o && !o.FromCache
            ? string.Format(Inv, " (last: {0}, {1:0} s, {2:0.0} Mcells)", o.Request.Label, o.Stats.Seconds, o.Stats.Cells / 1e6) : "";
        string line = string.Format(Inv, "runs {0}/{1} done{2}", p.Done, p.Total, left);
        if (interactive)
        {
            error.Write("\r" + line.PadRight(60));
            if (p.Done == p.Total) error.WriteLine();
        }
        else error.WriteLine(line + last);
    }

    /// <summary>"45 s", "12 min", "2.3 h".</summary>
    public static string Duration(double seconds) => seconds switch
    {
        < 90 => string.Format(Inv, "{0:0} s", seconds),
        < 5400 => string.Format(Inv, "{0:0} min", seconds / 60),
        _ => string.Format(Inv, "{0:0.0} h", seconds / 3600),
    };
}
