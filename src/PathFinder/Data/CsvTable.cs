using System.Globalization;
using System.Runtime.CompilerServices;
using System.Text;
using CsvHelper;
using CsvHelper.Configuration;
using PathFinder.Diagnostics;

namespace PathFinder.Data;

/// <summary>A CSV file read with CsvHelper: a header, rows with field locations, the dialect found, and problems.</summary>
/// <remarks>
/// RFC 4180 quoting, UTF-8 with or without BOM, lines starting with <c>#</c> are comments. A file saved by a
/// spreadsheet in a comma-decimal locale (semicolon separators) is detected from its header and read with
/// decimal commas; the caller is told so it can say it once.
/// </remarks>
public sealed class CsvTable
{
    private CsvTable(string file, IReadOnlyList<string> header, int headerLine, IReadOnlyList<int> headerColumns, IReadOnlyList<CsvRow> rows, char delimiter)
    {
        File = file;
        Header = header;
        HeaderLine = headerLine;
        HeaderColumns = headerColumns;
        Rows = rows;
        Delimiter = delimiter;
    }

    /// <summary>The file path as given.</summary>
    public string File { get; }

    /// <summary>The header names as written (trimmed).</summary>
    public IReadOnlyList<string> Header { get; }

    /// <summary>1-based line of the header.</summary>
    public int HeaderLine { get; }

    /// <summary>1-based columns of the header names.</summary>
    public IReadOnlyList<int> HeaderColumns { get; }

    /// <summary>The data rows.</summary>
    public IReadOnlyList<CsvRow> Rows { get; }

    /// <summary>The field separator found: ',' normally, ';' for a comma-decimal spreadsheet export, or a tab.</summary>
    public char Delimiter { get; }

    /// <summary>Whether numbers in this file use a decimal comma (semicolon-separated files).</summary>
    public bool DecimalComma => Delimiter == ';';

    /// <summary>The index of a header name (case-insensitive), or -1.</summary>
    public int IndexOf(string name)
    {
        for (int i = 0; i < Header.Count; i++)
        {
            if (string.Equals(Header[i], name, StringComparison.OrdinalIgnoreCase))
            {
                return i;
            }
        }

        return -1;
    }

    /// <summary>Adds an error, located at the second, for every header name written twice (case-insensitive; blank names aside).</summary>
    /// <returns>Whether any name was repeated: which of the two columns is meant cannot be told, so the table should not be read.</returns>
    public bool ReportDuplicateColumns(ICollection<Diagnostic> diagnostics)
    {
        ArgumentNullException.ThrowIfNull(diagnostics);
        var first = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        bool found = false;
        for (int i = 0; i < Header.Count; i++)
        {
            if (Header[i].Length == 0)
            {
                continue;
            }

            if (!first.TryAdd(Header[i], i))
            {
                int column = HeaderColumns.Count > i ? HeaderColumns[i] : 1;
                int earlier = HeaderColumns.Count > first[Header[i]] ? HeaderColumns[first[Header[i]]] : 1;
                diagnostics.Add(Diagnostic.Error("duplicate-column", new SourceLocation(File, HeaderLine, column), $"the column '{DiagnosticText.Excerpt(Header[i])}' appears twice (first at column {earlier}): the file is not read", "keep one of them, or rename the other (a note column may have any other name)"));
                found = true;
            }
        }

        return found;
    }

    /// <summary>The measurement header, named by the hint for an empty file unless a table says otherwise.</summary>
    public const string MeasurementHeader = "id,equation,property,value,uncertainty,unit,temperature,source";

    /// <summary>Reads a CSV file; problems that make the file unreadable are added to <paramref name="diagnostics"/> and null is returned.</summary>
    /// <param name="path">The file.</param>
    /// <param name="displayPath">The file name used in diagnostics.</param>
    /// <param name="diagnostics">Where problems are added.</param>
    /// <param name="expectedHeader">The header this kind of table has, named in the hint for an empty file.</param>
    public static CsvTable? Read(string path, string displayPath, ICollection<Diagnostic> diagnostics, string expectedHeader = MeasurementHeader)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(diagnostics);
        byte[] bytes;
        try
        {
            bytes = System.IO.File.ReadAllBytes(path);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            diagnostics.Add(Diagnostic.Error("unreadable-file", new SourceLocation(displayPath), $"cannot read the file: {exception.Message}", "check the path and permissions"));
            return null;
        }

        return Parse(bytes, displayPath, diagnostics, expectedHeader);
    }

    /// <summary>Parses CSV content already in memory (see <see cref="Read"/>).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static CsvTable? Parse(byte[] bytes, string displayPath, ICollection<Diagnostic> diagnostics, string expectedHeader = MeasurementHeader)
    {
        ArgumentNullException.ThrowIfNull(bytes);
        var fileLocation = new SourceLocation(displayPath);
        if (Array.IndexOf(bytes, (byte)0) >= 0)
        {
            diagnostics.Add(Diagnostic.Error("binary-file", fileLocation, "the file contains NUL bytes: it is not a text CSV file", "export the sheet as CSV (UTF-8)"));
            return null;
        }

        string text;
        try
        {
            text = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true).GetString(bytes);
        }
        catch (DecoderFallbackException)
        {
            diagnostics.Add(Diagnostic.Error("not-utf8", fileLocation, "the file is not valid UTF-8 text", "save the CSV as UTF-8 (in a spreadsheet: 'CSV UTF-8')"));
            return null;
        }

        if (text.Length > 0 && text[0] == '\uFEFF')
        {
            text = text[1..];
        }

        // CsvHelper only knows comments that start in the first column; blank indented ones too, keeping line numbers.
        // Files rarely have them, so the text is only split and rebuilt when one is there.
        string? headerText = null;
        bool indentedComment = false;
        foreach (Range range in text.AsSpan().Split('\n'))
        {
            ReadOnlySpan<char> line = text.AsSpan(range);
            ReadOnlySpan<char> content = line.TrimStart();
            if (content.StartsWith('#'))
            {
                if (!line.StartsWith('#'))
                {
                    indentedComment = true;
                    break;
                }
            }
            else if (headerText is null && line.Trim().Length > 0)
            {
                headerText = line.ToString();
            }
        }

        if (indentedComment)
        {
            string[] lines = text.Split('\n');
            for (int i = 0; i < lines.Length; i++)
            {
                if (lines[i].TrimStart().StartsWith('#') && !lines[i].StartsWith('#'))
                {
                    lines[i] = lines[i].EndsWith('\r') ? "\r" : "";
                }
            }

            text = string.Join('\n', lines);
            int firstIndex = Array.FindIndex(lines, line => line.Trim().Length > 0 && !line.TrimStart().StartsWith('#'));
            headerText = firstIndex < 0 ? null : lines[firstIndex];
        }

        if (headerText is null)
        {
            diagnostics.Add(Diagnostic.Error("empty-file", fileLocation, "the file has no header and no data", $"the first non-comment line must be the header: {expectedHeader}"));
            return null;
        }

        char delimiter = DetectDelimiter(headerText);
        var badRows = new HashSet<int>();
        var configuration = new CsvConfiguration(CultureInfo.InvariantCulture)
        {
            Delimiter = delimiter.ToString(),
            AllowComments = true,
            Comment = '#',
            IgnoreBlankLines = true,
            DetectColumnCountChanges = false,
            BadDataFound = args =>
            {
                // A quote in the middle of an unquoted field, or one never closed, makes the row's fields unreliable.
                int rawRow = args.Context?.Parser?.RawRow ?? 0;
                if (badRows.Add(rawRow))
                {
                    diagnostics.Add(BadQuote(args.RawRecord ?? "", rawRow, delimiter, displayPath));
                }
            },
            TrimOptions = TrimOptions.None,
        };

        var rows = new List<CsvRow>();
        IReadOnlyList<string>? header = null;
        IReadOnlyList<int> headerColumns = [];
        int headerLine = 0;
        using var reader = new StringReader(text);
        using var parser = new CsvParser(reader, configuration);
        try
        {
            while (parser.Read())
            {
                string[] fields = parser.Record ?? [];
                string raw = parser.RawRecord;
                int line = parser.RawRow - CountLineBreaks(raw);
                if (fields.All(field => field.Trim().Length == 0))
                {
                    continue;
                }

                int[] columns = FieldColumns(raw, delimiter, fields.Length);
                if (header is null)
                {
                    header = fields.Select(field => field.Trim()).ToArray();
                    headerColumns = columns;
                    headerLine = line;
                    continue;
                }

                if (badRows.Contains(parser.RawRow))
                {
                    continue;
                }

                rows.Add(new CsvRow(displayPath, line, fields, columns));
            }
        }
        catch (CsvHelperException exception)
        {
            int line = exception.Context?.Parser?.RawRow ?? 0;
            diagnostics.Add(Diagnostic.Error("bad-csv", new SourceLocation(displayPath, line), $"the CSV cannot be read here: {FirstLine(exception.Message)}", "check quotes: a field with a comma or quote must be enclosed in double quotes, and quotes inside it doubled"));
            return null;
        }

        if (header is null)
        {
            diagnostics.Add(Diagnostic.Error("empty-file", fileLocation, "the file has no header and no data", "the first non-comment line must be the header"));
            return null;
        }

        return new CsvTable(displayPath, header, headerLine, headerColumns, rows, delimiter);
    }

    /// <summary>The error for a record with a bad quote, located at the quote: one never closed, or a stray one inside an unquoted field.</summary>
    /// <param name="raw">The raw record as the parser read it.</param>
    /// <param name="rawRow">The parser's line count after the record (every line break it consumed).</param>
    /// <param name="delimiter">The field separator.</param>
    /// <param name="displayPath">The file name for the location.</param>
    private static Diagnostic BadQuote(string raw, int rawRow, char delimiter, string displayPath)
    {
        (int index, bool unclosed) = FindBadQuote(raw, delimiter);

        // An unclosed quote swallows every line break to the end of the file, the trailing one included.
        int startLine = rawRow - (unclosed ? raw.AsSpan().Count('\n') : CountLineBreaks(raw));
        if (index < 0)
        {
            return Diagnostic.Error("bad-csv", new SourceLocation(displayPath, Math.Max(startLine, 1)), $"a field holds a stray quote: '{DiagnosticText.Excerpt(raw.TrimEnd('\r', '\n'))}'", StrayQuoteHint);
        }

        int lineStart = raw.LastIndexOf('\n', Math.Max(index - 1, 0)) + 1;
        if (index == 0)
        {
            lineStart = 0;
        }

        var location = new SourceLocation(displayPath, startLine + raw.AsSpan(0, index).Count('\n'), index - lineStart + 1);
        if (unclosed)
        {
            int lines = raw.AsSpan(index).TrimEnd("\r\n").Count('\n') + 1;
            return Diagnostic.Error("bad-csv", location, string.Create(CultureInfo.InvariantCulture, $"the quote opened here is never closed: the rest of the file ({lines} line(s)) reads as one field"), "close the quote at the end of the field, and double every quote inside it (\"\")");
        }

        int end = raw.IndexOfAny(['\r', '\n'], index);
        string line = raw[lineStart..(end < 0 ? raw.Length : end)];
        return Diagnostic.Error("bad-csv", location, $"a field holds a stray quote: '{DiagnosticText.Excerpt(line)}'", StrayQuoteHint);
    }

    private const string StrayQuoteHint = "enclose a field that contains quotes in double quotes and double each quote inside it (\"\"), or remove the quote";

    /// <summary>The offset of the first bad quote in a raw record (RFC 4180) and whether it opens a field that is never closed; -1 when none is found.</summary>
    private static (int Index, bool Unclosed) FindBadQuote(string raw, char delimiter)
    {
        int i = 0;
        while (i < raw.Length)
        {
            // At the start of a field: spaces, then a quote opens a quoted field.
            int start = i;
            while (i < raw.Length && raw[i] == ' ')
            {
                i++;
            }

            if (i < raw.Length && raw[i] == '"')
            {
                int open = i++;
                while (true)
                {
                    if (i >= raw.Length)
                    {
                        return (open, true);
                    }

                    if (raw[i] == '"')
                    {
                        if (i + 1 < raw.Length && raw[i + 1] == '"')
                        {
                            i += 2;
                            continue;
                        }

                        i++;
                        break;
                    }

                    i++;
                }
            }
            else
            {
                i = start;
            }

            while (i < raw.Length && raw[i] != delimiter && raw[i] != '\n' && raw[i] != '\r')
            {
                if (raw[i] == '"')
                {
                    return (i, false);
                }

                i++;
            }

            if (i < raw.Length && raw[i] != delimiter)
            {
                break;
            }

            i++;
        }

        return (-1, false);
    }

    private static string FirstLine(string message)
    {
        int end = message.IndexOfAny(['\r', '\n']);
        return end < 0 ? message : message[..end];
    }

    private static char DetectDelimiter(string headerLine)
    {
        int commas = headerLine.Count(ch => ch == ',');
        int semicolons = headerLine.Count(ch => ch == ';');
        int tabs = headerLine.Count(ch => ch == '\t');
        if (semicolons > commas && semicolons >= tabs)
        {
            return ';';
        }

        return tabs > commas ? '\t' : ',';
    }

    private static int CountLineBreaks(string raw)
    {
        return raw.AsSpan().TrimEnd("\r\n").Count('\n');
    }

    /// <summary>Where each field's content starts in the raw record (1-based), honouring RFC 4180 quotes.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int[] FieldColumns(string raw, char delimiter, int count)
    {
        var columns = new int[count];
        int field = 0;
        int position = 0;
        while (field < count)
        {
            int start = position;
            while (start < raw.Length && raw[start] == ' ')
            {
                start++;
            }

            bool quoted = start < raw.Length && raw[start] == '"';
            columns[field] = (quoted ? start + 1 : position) + 1;
            int i = quoted ? start + 1 : position;
            if (quoted)
            {
                while (i < raw.Length)
                {
                    if (raw[i] == '"')
                    {
                        if (i + 1 < raw.Length && raw[i + 1] == '"')
                        {
                            i += 2;
                            continue;
                        }

                        i++;
                        break;
                    }

                    i++;
                }
            }

            while (i < raw.Length && raw[i] != delimiter && raw[i] != '\n' && raw[i] != '\r')
            {
                i++;
            }

            position = i + 1;
            field++;
        }

        return columns;
    }
}
