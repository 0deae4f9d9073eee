using System.Text.Encodings.Web;
using System.Text.Json;
using SlotArray.Spec;

namespace SlotArray.Cli;

/// <summary>
/// The JSON object a <c>--json</c> command prints on stdout when it fails (the readable message still goes to stderr):
/// <c>{"error": {"exit_code": 2, "kind": "bad-input", "message": "...", "errors": [{"file", "line", "column", "message"}]}}</c>;
/// <c>errors</c> lists a spec's positioned errors and is empty otherwise.
/// </summary>
internal static class JsonError
{
    /// <summary>Kind of exit code 1.</summary>
    public const string Infeasible = "infeasible";
    /// <summary>Kind of exit code 2.</summary>
    public const string BadInput = "bad-input";
    /// <summary>Kind of exit code 3.</summary>
    public const string Internal = "internal-error";

    /// <summary>The kind that goes with an exit code.</summary>
    public static string KindOf(int exitCode) => exitCode switch
    {
        ExitCodes.Infeasible => Infeasible,
        ExitCodes.BadInput => BadInput,
        _ => Internal,
    };

    /// <summary>The error object as indented JSON text.</summary>
    /// <param name="exitCode">The process exit code.</param>
    /// <param name="kind">One of the kinds above.</param>
    /// <param name="message">The message printed on stderr.</param>
    /// <param name="errors">A spec's positioned errors, or null.</param>
    public static string Text(int exitCode, string kind, string message, IReadOnlyList<SpecError>? errors)
    {
        var doc = new Dictionary<string, object>
        {
            ["error"] = new Dictionary<string, object>
            {
                ["exit_code"] = exitCode,
                ["kind"] = kind,
                ["message"] = message,
                ["errors"] = (errors ?? []).Select(e => new Dictionary<string, object>
                {
                    ["file"] = e.File,
                    ["line"] = e.Line,
                    ["column"] = e.Column,
                    ["message"] = e.Message,
                }).ToArray(),
            },
        };
        return JsonSerializer.Serialize(doc, new JsonSerializerOptions { WriteIndented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
    }
}
