using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using Json.Schema;
using SlotArray.Spec.Schema;
using SlotArray.Tests.Shared;

namespace SlotArray.Spec.Tests.Schema;

/// <summary>
/// The spec's JSON Schema checked with an independent validator, JsonSchema.Net 8.0.5 (an implementation of
/// JSON Schema draft 2020-12, json-schema.org, 2022): it is a valid draft 2020-12 schema; every bundled spec
/// validates; for hundreds of mutated specs it never refuses one that <c>check</c> accepts, and it refuses the
/// structural errors <c>check</c> refuses (unknown or misspelt key, wrong type, unknown word, a number without its
/// unit, a count out of range).
/// </summary>
public class SpecSchemaTests
{
    private static readonly Lazy<JsonSchema> Schema = new(() => JsonSchema.FromText(SpecJsonSchema.Text()));

    internal static bool SchemaAccepts(JsonNode? doc, out string detail)
    {
        using var json = JsonDocument.Parse(doc?.ToJsonString() ?? "null");
        var result = Schema.Value.Evaluate(json.RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });
        detail = result.IsValid ? "" : string.Join("; ", (result.Details ?? []).Where(d => d.Errors is { Count: > 0 })
            .Select(d => $"{d.InstanceLocation}: {string.Join(", ", d.Errors!.Values)}").Take(6));
        return result.IsValid;
    }

    private static bool CheckAccepts(JsonNode doc) => SpecLoader.Parse(doc.ToJsonString(), "mutant.yaml").IsValid;

    /// <summary>The bundled specs and the starter spec of each kind.</summary>
    private static IReadOnlyList<(string Name, JsonNode Doc)> Bases =>
    [
        .. RepoFiles.Examples.Select(p => (Path.GetFileName(p), YamlToJson.Convert(File.ReadAllText(p))!)),
        .. StarterSpec.Kinds.Select(k => ($"init --kind {k.Key}", YamlToJson.Convert(StarterSpec.Text(k.Value))!)),
    ];

    [Fact]
    public void Every_starter_spec_passes_check_and_validates()
    {
        foreach (var (word, kind) in StarterSpec.Kinds)
        {
            string text = StarterSpec.Text(kind);
            var r = SpecLoader.Parse(text, word + ".yaml");
            Assert.True(r.IsValid, string.Join("\n", r.Errors));
            Assert.Empty(r.Warnings);
            Assert.True(SchemaAccepts(YamlToJson.Convert(text), out string why), $"init --kind {word}: {why}");
            Assert.StartsWith(SpecJsonSchema.Modeline(SpecJsonSchema.FileName) + "\n", text);
        }
    }

    [Fact]
    public void Schema_is_a_valid_draft_2020_12_schema()
    {
        using var json = JsonDocument.Parse(SpecJsonSchema.Text());
        var result = MetaSchemas.Draft202012.Evaluate(json.RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });
        Assert.True(result.IsValid, "the schema does not validate against the draft 2020-12 meta-schema");
        Assert.Equal("https://json-schema.org/draft/2020-12/schema", json.RootElement.GetProperty("$schema").GetString());
    }

    [Fact]
    public void Schema_text_is_deterministic_and_the_committed_copy_is_current()
    {
        Assert.Equal(SpecJsonSchema.Text(), SpecJsonSchema.Text());
        string committed = Path.Combine(RepoFiles.Root, "schema", SpecJsonSchema.FileName);
        Assert.True(File.Exists(committed) && File.ReadAllText(committed) == SpecJsonSchema.Text(),
            $"schema/{SpecJsonSchema.FileName} is stale: run `dotnet run --project src/SlotArray.Cli -- schema > schema/{SpecJsonSchema.FileName}`");
    }

    [Fact]
    public void Every_bundled_spec_validates_and_names_the_schema_in_its_modeline()
    {
        Assert.NotEmpty(RepoFiles.Examples);
        foreach (string path in RepoFiles.Examples)
        {
            string text = File.ReadAllText(path);
            Assert.True(SpecLoader.Parse(text, path).IsValid, $"{path} does not pass check");
            Assert.True(SchemaAccepts(YamlToJson.Convert(text), out string why), $"{path}: {why}");
            Assert.StartsWith(SpecJsonSchema.Modeline("../schema/" + SpecJsonSchema.FileName) + "\n", text.ReplaceLineEndings("\n"));
        }
    }

    [Fact]
    public void Every_key_of_the_catalogue_has_a_description_and_a_schema_property()
    {
        var schema = JsonNode.Parse(SpecJsonSchema.Text())!;
        foreach (var key in SpecKeys.Root.Keys)
        {
            var p = schema["properties"]![key.Name];
            Assert.NotNull(p);
            Assert.False(string.IsNullOrWhiteSpace(p!["description"]?.GetValue<string>()), key.Name);
        }
        Assert.False(schema["additionalProperties"]!.GetValue<bool>());
    }

    [Fact]
    public void Schema_never_refuses_a_mutated_spec_that_check_accepts()
    {
        var rng = new Random(20261205);
        int accepted = 0, tried = 0;
        var bases = Bases;
        while (accepted < 300 && tried < 3000)
        {
            tried++;
            var (name, original) = bases[rng.Next(bases.Count)];
            var doc = original.DeepClone();
            int edits = 1 + rng.Next(3);
            for (int k = 0; k < edits; k++) SpecMutations.Benign(doc.AsObject(), rng);
            if (!CheckAccepts(doc)) continue;
            accepted++;
            Assert.True(SchemaAccepts(doc, out string why), $"check accepts but the schema refuses (from {name}): {why}\n{doc.ToJsonString()}");
        }
        Assert.True(accepted >= 300, $"only {accepted} of {tried} mutated specs passed check");
    }

    [Theory]
    [InlineData(SpecMutations.Structural.UnknownKey)]
    [InlineData(SpecMutations.Structural.MisspeltKey)]
    [InlineData(SpecMutations.Structural.WrongType)]
    [InlineData(SpecMutations.Structural.UnknownWord)]
    [InlineData(SpecMutations.Structural.NumberWithoutUnit)]
    [InlineData(SpecMutations.Structural.CountOutOfRange)]
    public void Schema_refuses_the_structural_errors_check_refuses(SpecMutations.Structural kind)
    {
        var rng = new Random(7 + (int)kind);
        var bases = Bases;
        int refusedByCheck = 0, refusedBySchema = 0;
        var missed = new List<string>();
        for (int i = 0; i < 60; i++)
        {
            var (name, original) = bases[i % bases.Count];
            var doc = original.DeepClone();
            string what = SpecMutations.Break(doc.AsObject(), kind, rng);
            Assert.False(CheckAccepts(doc), $"check accepts a {kind} mutation ({what}) of {name}: the mutation is not an error");
            refusedByCheck++;
            if (SchemaAccepts(doc, out _)) missed.Add($"{name}: {what}");
            else refusedBySchema++;
        }
        Assert.True(missed.Count == 0, $"{kind}: the schema accepts {missed.Count} of {refusedByCheck} broken specs:\n{string.Join("\n", missed)}");
        Assert.Equal(refusedByCheck, refusedBySchema);
    }
}
