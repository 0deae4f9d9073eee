using System.CommandLine;
using SlotArray.Spec.Schema;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray schema [--output spec|design]</c>: prints the JSON Schema (draft 2020-12) of a file the tool reads or
/// writes: <c>spec</c> (the default) is the YAML spec, written from the same key definitions the parser uses;
/// <c>design</c> is <c>design.json</c>. Point an editor at
/// it with the modeline <c># yaml-language-server: $schema=slotarray-spec.schema.json</c> for completion and validation.
/// </summary>
internal static class SchemaCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var what = new Option<string>("--output") { Description = "Which file's schema: spec (the YAML spec) or design (design.json)", DefaultValueFactory = _ => "spec" };
        what.AcceptOnlyFromAmong("spec", "design");
        var cmd = new Command("schema", "Print the JSON Schema (draft 2020-12) of the YAML spec (or of design.json), for editors and other tools") { what };
        cmd.SetAction(pr =>
        {
            output.Write(pr.GetValue(what) == "design" ? Reports.DesignJsonSchema.Text() : SpecJsonSchema.Text());
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
