using SlotArray.Spec.Yaml;
using YamlDotNet.Core;

namespace SlotArray.Spec;

/// <summary>
/// Reads a YAML spec (version 1, architecture.md "Spec") into a validated <see cref="Core.Design.ArrayRequest"/>,
/// collecting every error and warning with its line and column in one pass. Never throws for bad input: a YAML
/// syntax error, and any unexpected failure inside, become positioned errors.
/// </summary>
/// <remarks>
/// Defaults (each stated in the README): band = design frequency ± 2 % (warning); metal = aluminium when neither
/// <c>metal</c> nor <c>conductivity</c> is given (warning); taper = uniform when absent (warning);
/// guide permittivity 1, roughness 0; slots.model moment-method; feed.spacing 0.5 guide-wavelength for
/// standing-wave (travelling-wave must give it); feed.position end; feed.short 0.25 guide-wavelength;
/// feed.load 5 % (travelling-wave); taper nbar 4, cosine-pedestal exponent 2; coupling none; tolerance entries
/// absent = no error, systematic 0, trials 1000, seed 1. No default for the wall thickness: it changes the design.
/// </remarks>
internal static class SpecLoader
{
    /// <summary>Reads and validates a spec file; an unreadable file is an error at 1:1.</summary>
    public static SpecResult LoadFile(string path)
    {
        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return new SpecResult(null, [new SpecError(path, 1, 1, $"cannot read the spec: {e.Message}")], []);
        }
        return Parse(text, path);
    }

    /// <summary>Reads and validates spec text; <paramref name="fileName"/> is used in messages.</summary>
    public static SpecResult Parse(string yamlText, string fileName)
    {
        var d = new Diagnostics(fileName);
        SpecNode? root;
        try
        {
            root = SpecYamlReader.Read(yamlText);
        }
        catch (YamlException e)
        {
            string reason = e.InnerException is YamlException inner ? inner.Message : e.Message;
            int cut = reason.IndexOf("): ", StringComparison.Ordinal);   // drop YamlDotNet's "(Line: .., Col: ..) - (..): " prefix
            if (reason.StartsWith("(Line:", StringComparison.Ordinal) && cut > 0) reason = reason[(cut + 3)..];
            var (line, column) = (e.Start.Line, e.Start.Column);
            if (reason.Contains("tab", StringComparison.OrdinalIgnoreCase) && FirstIndentingTab(yamlText) is { } tab)
                (line, column) = tab;   // the parser reports the enclosing block; the tab itself is more useful
            d.Error(line, column, $"YAML syntax: {Trim(reason)}; check indentation (spaces, never tabs), colons and quotes on this line");
            return new SpecResult(null, d.Errors, d.Warnings);
        }
        var builder = new SpecBuilder(d);
        try
        {
            var request = builder.Build(root);
            return new SpecResult(d.ErrorCount == 0 ? request : null, d.Errors, d.Warnings);
        }
        catch (Exception e)
        {
            var at = builder.Current;
            d.Error(at?.Line ?? 1, at?.Column ?? 1, $"could not read this value ({e.GetType().Name}: {e.Message}); please report it with the spec");
            return new SpecResult(null, d.Errors, d.Warnings);
        }
    }

    /// <summary>Line and column (1-based) of the first tab used in a line's indentation, or null.</summary>
    private static (long, long)? FirstIndentingTab(string text)
    {
        string[] lines = text.Split('\n');
        for (int i = 0; i < lines.Length; i++)
        {
            string indent = new(lines[i].TakeWhile(c => c is ' ' or '\t').ToArray());
            int t = indent.IndexOf('\t');
            if (t >= 0) return (i + 1, t + 1);
        }
        return null;
    }

    private static string Trim(string m) => m.TrimEnd('.', ' ');
}
