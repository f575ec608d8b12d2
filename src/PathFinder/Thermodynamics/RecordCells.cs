using CsvHelper;
using PathFinder.Diagnostics;

namespace PathFinder.Thermodynamics;

/// <summary>The fields of one CSV record with the line and column where each field starts, for located diagnostics.</summary>
/// <remarks>
/// CsvHelper reports the physical line where a record ends (<c>RawRow</c>) and the raw text; the start line and the
/// 1-based column of each field are recovered by scanning the raw text with the same quoting rules (RFC 4180).
/// A field that is absent from a short record is placed just after the end of the record.
/// </remarks>
internal sealed class RecordCells
{
    private readonly string[] _fields;
    private readonly (int Line, int Column)[] _starts;
    private readonly (int Line, int Column) _end;
    private readonly string _fileName;

    private RecordCells(string fileName, string[] fields, (int Line, int Column)[] starts, (int Line, int Column) end, int firstLine)
    {
        _fileName = fileName;
        _fields = fields;
        _starts = starts;
        _end = end;
        FirstLine = firstLine;
    }

    /// <summary>The physical line (1-based) where the record starts.</summary>
    public int FirstLine { get; }

    /// <summary>The number of fields present.</summary>
    public int Count => _fields.Length;

    /// <summary>Captures the parser's current record.</summary>
    public static RecordCells From(CsvParser parser, string fileName)
    {
        string[] fields = parser.Record ?? [];
        string raw = parser.RawRecord;
        string body = raw.TrimEnd('\r', '\n');
        int innerBreaks = CountLineBreaks(body);
        int firstLine = Math.Max(1, parser.RawRow - innerBreaks);

        var starts = new List<(int Line, int Column)>(fields.Length);
        int line = firstLine;
        int lineStart = 0;
        bool quoted = false;
        starts.Add((line, 1));
        for (int i = 0; i < body.Length; i++)
        {
            char c = body[i];
            if (c == '"')
            {
                quoted = !quoted; // a doubled quote toggles twice, which leaves the state unchanged
            }
            else if (c == '\r' || c == '\n')
            {
                if (c == '\r' && i + 1 < body.Length && body[i + 1] == '\n')
                {
                    i++;
                }

                line++;
                lineStart = i + 1;
            }
            else if (c == ',' && !quoted)
            {
                starts.Add((line, i + 1 - lineStart + 1));
            }
        }

        return new RecordCells(fileName, fields, [.. starts], (line, body.Length - lineStart + 1), firstLine);
    }

    /// <summary>The text of field <paramref name="index"/>, or the empty string when the record is shorter.</summary>
    public string Text(int index) => index < _fields.Length ? _fields[index] : string.Empty;

    /// <summary>Where field <paramref name="index"/> starts, naming the column <paramref name="field"/>.</summary>
    public SourceLocation Location(int index, string field)
    {
        (int line, int column) = index < _starts.Length ? _starts[index] : _end;
        return new SourceLocation(_fileName, line, column, field);
    }

    private static int CountLineBreaks(string text)
    {
        int count = 0;
        for (int i = 0; i < text.Length; i++)
        {
            if (text[i] == '\n' || (text[i] == '\r' && (i + 1 >= text.Length || text[i + 1] != '\n')))
            {
                count++;
            }
        }

        return count;
    }
}
