using System.Text.Json;
using SlotArray.Cli;

namespace SlotArray.Cli.Tests;

/// <summary><c>slotarray schema</c> prints the spec's JSON Schema (draft 2020-12) on stdout and nothing on stderr.</summary>
public class SchemaCommandTests
{
    [Fact]
    public void Schema_prints_the_draft_2020_12_schema_of_the_spec()
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = CommandLine.Run(["schema"], o, e);
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Equal("", e.ToString());
        var root = JsonDocument.Parse(o.ToString()).RootElement;
        // JSON Schema 2020-12 (json-schema.org, 2022), Core section 8.1.1: the $schema keyword names the dialect.
        Assert.Equal("https://json-schema.org/draft/2020-12/schema", root.GetProperty("$schema").GetString());
        Assert.False(root.GetProperty("additionalProperties").GetBoolean());
        Assert.True(root.GetProperty("properties").TryGetProperty("frequency", out _));
    }

    [Fact]
    public void Schema_of_an_unknown_file_kind_is_bad_input()
    {
        int code = CommandLine.Run(["schema", "--output", "nonsense"], new StringWriter(), new StringWriter());
        Assert.Equal(ExitCodes.BadInput, code);
    }
}
