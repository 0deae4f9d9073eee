using System.CommandLine;
using SlotArray.Reports;
using SlotArray.Spec.Schema;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray init [--kind standing-wave|travelling-wave|edge] [--force] [FILE]</c>: writes a commented starter spec
/// (every key with its unit, default and what it does; an invented scenario that designs as written) to FILE, or to
/// stdout without FILE. An existing FILE is left untouched (exit 2) unless <c>--force</c>. Beside FILE it also writes
/// the editor schema its modeline names (<c>slotarray-spec.schema.json</c>) when that file is absent or is ours.
/// </summary>
internal static class InitCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var file = new Argument<string?>("file") { Description = "Where to write the spec (default: print it)", Arity = ArgumentArity.ZeroOrOne };
        var kind = new Option<string>("--kind") { Description = "What to start from", DefaultValueFactory = _ => StarterSpec.Kinds[0].Key };
        kind.AcceptOnlyFromAmong([.. StarterSpec.Kinds.Select(k => k.Key)]);
        var force = new Option<bool>("--force") { Description = "Replace FILE if it exists" };
        var cmd = new Command("init", "Write a commented starter spec that designs as written (every key with its unit and default)") { file, kind, force };
        cmd.SetAction(pr => Run(pr.GetValue(file), pr.GetValue(kind)!, pr.GetValue(force), output, error));
        return cmd;
    }

    private static int Run(string? path, string kindWord, bool force, TextWriter output, TextWriter error)
    {
        var kind = StarterSpec.Kinds.First(k => k.Key == kindWord).Value;
        string text = StarterSpec.Text(kind);
        if (path is null)
        {
            output.Write(text);
            return ExitCodes.Ok;
        }
        if (Directory.Exists(path)) throw new UserInputException($"{path} is a folder: give a file name such as {Path.Combine(path, "array.yaml")}");
        if (File.Exists(path) && !force)
            throw new UserInputException($"{path} exists and was left untouched; choose another name or add --force to replace it");
        AtomicFile.WriteText(path, text);
        error.WriteLine($"wrote {path} ({kindWord}); design it with: slotarray design {path}");
        string schema = Path.Combine(Path.GetDirectoryName(Path.GetFullPath(path))!, SpecJsonSchema.FileName);
        if (!File.Exists(schema) || File.ReadAllText(schema).Contains(SpecJsonSchema.Id, StringComparison.Ordinal))
        {
            AtomicFile.WriteText(schema, SpecJsonSchema.Text());
            error.WriteLine($"wrote {schema} (the schema its first line names, for completion and checks in YAML editors)");
        }
        return ExitCodes.Ok;
    }
}
