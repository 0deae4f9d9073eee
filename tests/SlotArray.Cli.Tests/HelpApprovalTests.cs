using System.CommandLine;
using System.CommandLine.Help;

namespace SlotArray.Cli.Tests;

/// <summary>
/// The <c>--help</c> text of every command is frozen in Approved/help/&lt;command&gt;.approved.txt, so that a change of
/// the command line (a new option, a renamed one, a changed description) shows up as a visible diff.
/// </summary>
public class HelpApprovalTests
{
    /// <summary>Width the help is wrapped to here, whatever the terminal: 100 columns.</summary>
    private const int Width = 100;

    /// <summary>Every command path of the tree: [] for the root, ["design"], ... (sub-sub-commands included).</summary>
    private static List<string[]> CommandPaths()
    {
        var paths = new List<string[]> { Array.Empty<string>() };
        void Walk(Command c, string[] path)
        {
            foreach (var sub in c.Subcommands)
            {
                string[] p = [.. path, sub.Name];
                paths.Add(p);
                Walk(sub, p);
            }
        }
        Walk(CommandLine.Build(TextWriter.Null, TextWriter.Null), []);
        return paths;
    }

    public static TheoryData<string> Commands()
    {
        var data = new TheoryData<string>();
        foreach (var p in CommandPaths()) data.Add(string.Join(' ', p));
        return data;
    }

    private static string FileName(string command) => $"help/{(command.Length == 0 ? "slotarray" : command.Replace(' ', '-'))}.approved.txt";

    /// <summary>The help of one command as the user sees it, wrapped at <see cref="Width"/>, under the program's own name.</summary>
    private static string Help(string command)
    {
        var output = new StringWriter();
        var root = CommandLine.Build(output, TextWriter.Null);
        foreach (var help in root.Options.OfType<HelpOption>())
            if (help.Action is HelpAction action) action.MaxWidth = Width;
        string[] args = [.. command.Split(' ', StringSplitOptions.RemoveEmptyEntries), "--help"];
        int code = root.Parse(args).Invoke(new InvocationConfiguration { Output = output, Error = TextWriter.Null });
        Assert.Equal(0, code);
        // The root command is named after the executable: the test host here, slotarray for users.
        return output.ToString().Replace(root.Name, "slotarray", StringComparison.Ordinal).ReplaceLineEndings("\n");
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public void Help_matches_the_approved_file(string command) => Approval.Verify(FileName(command), Help(command));

    [Fact]
    public void Every_approved_help_file_belongs_to_a_command()
    {
        string folder = Path.Combine(Approval.Folder(), "help");
        var expected = CommandPaths().Select(p => Path.GetFileName(FileName(string.Join(' ', p)))).Order(StringComparer.Ordinal).ToList();
        var present = Directory.Exists(folder)
            ? Directory.GetFiles(folder, "*.approved.txt").Select(Path.GetFileName).Order(StringComparer.Ordinal).ToList()
            : [];
        Assert.True(expected.SequenceEqual(present!), "approved help files without a command (delete them): "
            + string.Join(", ", present.Except(expected)) + "; commands without one: " + string.Join(", ", expected.Except(present)));
    }
}
