using System.Text;

namespace SlotArray.Cli;

/// <summary>
/// A text writer that passes everything on to another and remembers whether anything was written and the last
/// non-empty line: how <see cref="CommandLine.Run"/> knows whether a <c>--json</c> command already printed its
/// document, and what a command that returned a failure code said last.
/// </summary>
/// <param name="inner">The writer that receives the text.</param>
internal sealed class RecordingWriter(TextWriter inner) : TextWriter
{
    private readonly StringBuilder _line = new();

    /// <summary>True once any character was written.</summary>
    public bool Wrote { get; private set; }

    /// <summary>The last complete non-empty line written, or null.</summary>
    public string? LastLine { get; private set; }

    /// <inheritdoc />
    public override Encoding Encoding => inner.Encoding;

    /// <inheritdoc />
    public override void Write(char value)
    {
        inner.Write(value);
        Note(value);
    }

    /// <inheritdoc />
    public override void Write(string? value)
    {
        if (string.IsNullOrEmpty(value)) return;
        inner.Write(value);
        foreach (char c in value) Note(c);
    }

    /// <inheritdoc />
    public override void Flush() => inner.Flush();

    private void Note(char c)
    {
        Wrote = true;
        if (c == '\n')
        {
            string line = _line.ToString().TrimEnd('\r');
            if (line.Length > 0) LastLine = line;
            _line.Clear();
        }
        else if (_line.Length < 4096) _line.Append(c);
    }
}
