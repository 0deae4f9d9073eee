using System.Text;
using Xunit.Sdk;

namespace SlotArray.Reports.Tests;

/// <summary>
/// A small strict RFC 4180 reader (IETF RFC 4180, 2005, §2): records end in CRLF, fields are either plain (no comma,
/// quote, CR or LF) or enclosed in double quotes with inner quotes doubled; anything else throws. Also checks that
/// every record has the same number of fields (§2.4).
/// </summary>
internal static class StrictCsv
{
    public static List<string[]> Parse(string text)
    {
        var records = new List<string[]>();
        var fields = new List<string>();
        var field = new StringBuilder();
        int i = 0;
        while (i < text.Length)
        {
            if (text[i] == '"')
            {
                i++;
                while (true)
                {
                    if (i >= text.Length) throw new XunitException("unterminated quoted field");
                    if (text[i] == '"')
                    {
                        if (i + 1 < text.Length && text[i + 1] == '"') { field.Append('"'); i += 2; continue; }
                        i++;
                        break;
                    }
                    field.Append(text[i++]);
                }
                if (i < text.Length && text[i] != ',' && text[i] != '\r')
                    throw new XunitException($"character '{text[i]}' after a closing quote at {i}");
            }
            else
            {
                while (i < text.Length && text[i] != ',' && text[i] != '\r')
                {
                    if (text[i] is '"' or '\n') throw new XunitException($"bare '{text[i]}' in an unquoted field at {i}");
                    field.Append(text[i++]);
                }
            }
            fields.Add(field.ToString());
            field.Clear();
            if (i >= text.Length) throw new XunitException("last record does not end in CRLF");
            if (text[i] == ',') { i++; continue; }
            if (i + 1 >= text.Length || text[i + 1] != '\n') throw new XunitException($"CR without LF at {i}");
            i += 2;
            records.Add([.. fields]);
            fields.Clear();
        }
        if (records.Count > 0 && records.Any(r => r.Length != records[0].Length))
            throw new XunitException("records differ in field count (RFC 4180 §2.4)");
        return records;
    }
}
