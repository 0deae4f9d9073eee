using System.Text.Json;
using Json.Schema;
using SlotArray.Spec.Schema;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// <c>slotarray schema --output design</c> is a valid JSON Schema (draft 2020-12, json-schema.org, 2022) and the
/// design.json of standing-wave, centre-fed, edge-slot travelling-wave and Elliott-coupled designs validates against it,
/// checked with an independent validator (JsonSchema.Net 8.0.5). Unknown keys are refused, so a key the writer gains
/// without the schema fails here.
/// </summary>
public class DesignJsonSchemaTests
{
    /// <summary>Built once: the validator registers a schema under its $id and refuses a second registration.</summary>
    private static readonly Lazy<JsonSchema> Schema = new(() => JsonSchema.FromText(SchemaText()));

    private static string SchemaText()
    {
        var (code, output, err) = DesignRuns.Run("schema", "--output", "design");
        Assert.True(code == ExitCodes.Ok, err);
        return output;
    }

    [Fact]
    public void Design_schema_is_a_valid_draft_2020_12_schema()
    {
        using var json = JsonDocument.Parse(SchemaText());
        Assert.True(MetaSchemas.Draft202012.Evaluate(json.RootElement).IsValid);
        Assert.False(json.RootElement.GetProperty("additionalProperties").GetBoolean());
    }

    [Theory]
    [InlineData("demo")]
    [InlineData("tube")]
    [InlineData("edge")]
    [InlineData("mutual")]
    public void Design_json_validates_against_the_design_schema(string which)
    {
        string work = DesignRuns.TempFolder("design-schema-" + which);
        string spec = which switch
        {
            "demo" => RepoFiles.Demo,
            "tube" => RepoFiles.Tube,
            "edge" => DesignRuns.Spec("edge", StarterSpec.Text(StarterKind.Edge)),
            _ => DesignRuns.Spec("mutual", File.ReadAllText(RepoFiles.Demo).Replace("coupling: none", "coupling: mutual")
                .Replace("tolerance:", "tolerance_off:").Split("tolerance_off:")[0]),
        };
        string outDir = Path.Combine(work, "out");
        var (code, _, err) = DesignRuns.Run("design", spec, "-o", outDir, "--cache-dir", Path.Combine(work, "cache"));
        Assert.True(code == ExitCodes.Ok, err);
        var schema = Schema.Value;
        using var doc = JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, "design.json")));
        var result = schema.Evaluate(doc.RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });
        string why = string.Join("; ", (result.Details ?? []).Where(d => d.Errors is { Count: > 0 })
            .Select(d => $"{d.InstanceLocation}: {string.Join(", ", d.Errors!.Values)}").Take(8));
        Assert.True(result.IsValid, $"{which}: {why}");
    }
}
