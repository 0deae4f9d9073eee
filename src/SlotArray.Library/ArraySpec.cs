using SlotArray.Core.Design;
using SlotArray.Spec;

namespace SlotArray;

/// <summary>
/// A validated array spec: the request the designers take (SI units throughout), with the YAML text it came from and the
/// spec's warnings. Made by <see cref="SlotArrayDesigner.LoadSpec"/> or <see cref="SlotArrayDesigner.ParseSpec"/>, or
/// from a request built in code with <see cref="FromRequest"/>.
/// </summary>
public sealed record ArraySpec
{
    /// <summary>What to design: guide, frequency, band, slots, taper, feed and requirements, in SI units.</summary>
    public required ArrayRequest Request { get; init; }

    /// <summary>The YAML text of the spec, copied into the output folder as <c>spec.yaml</c>; null for a request built in code.</summary>
    public string? Text { get; init; }

    /// <summary>Where the text came from (a file path or the name given to <see cref="SlotArrayDesigner.ParseSpec"/>); null for a request built in code.</summary>
    public string? Source { get; init; }

    /// <summary>Warnings of the spec (file:line:column: message); the spec is valid with them.</summary>
    public IReadOnlyList<SpecWarning> Warnings { get; init; } = [];

    /// <summary>SHA-256 of the spec file's bytes (lower-case hex), printed on the fabrication documents; null without a file.</summary>
    internal string? Sha256 { get; init; }

    /// <summary>The spec's name: the output folder and document titles use it.</summary>
    public string Name => Request.Name;

    /// <summary>A spec for a request built in code (no YAML text; the output folder's <c>spec.yaml</c> says so).</summary>
    /// <param name="request">The request.</param>
    public static ArraySpec FromRequest(ArrayRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        return new ArraySpec { Request = request };
    }
}
