using System.Security.Cryptography;
using System.Text;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.IO;

namespace PathFinder.Curation;

/// <summary>Reads and writes the curation file: CSV with the header <c>id,action,reason,date</c>, one decision per row.</summary>
/// <remarks>
/// <para><c>action</c> is <c>exclude</c> or <c>include</c> (case-insensitive); an exclusion needs a reason; <c>date</c> is
/// ISO 8601 (<c>2024-05-17</c>) when PathFinder writes it, and common spellings are read (<see cref="CurationDate"/>).
/// Rows are decisions in the order they were made: the last one about an id wins. Lines starting with <c>#</c> are
/// comments. The file sits beside the data (<see cref="PathFor"/>).</para>
/// <para>The file is never rewritten from what was understood of it: <see cref="Save"/> keeps every byte already there
/// (comments, rows it cannot use, other people's decisions) and adds the new rows after them. A row that is not a usable
/// decision is a warning (kept, shown, not applied); only a file that cannot be read as a table is an error.</para>
/// <para>Writing is atomic (<see cref="AtomicFile"/>): a reader sees the old file or the new one, never a part.</para>
/// </remarks>
public static class CurationFile
{
    /// <summary>The word for <see cref="CurationAction.Exclude"/>.</summary>
    public const string ExcludeWord = "exclude";

    /// <summary>The word for <see cref="CurationAction.Include"/>.</summary>
    public const string IncludeWord = "include";

    private const string HeaderComment = "# PathFinder curation decisions: the last row about an id is the one in force.";

    /// <summary>The header written, in order.</summary>
    public static IReadOnlyList<string> Columns { get; } = ["id", "action", "reason", "date"];

    /// <summary>The curation file of a network: <c>folder/curation.csv</c>, or <c>lab.curation.csv</c> beside <c>lab.csv</c>.</summary>
    public static string PathFor(string networkPath) => NetworkFiles.Companion(networkPath, NetworkFiles.CurationFileName);

    /// <summary>Reads a curation file; a missing file is an empty set without diagnostics.</summary>
    public static CurationReadResult Read(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (!File.Exists(path))
        {
            return new CurationReadResult(CurationSet.Empty, []);
        }

        byte[] bytes;
        try
        {
            bytes = File.ReadAllBytes(path);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            return new CurationReadResult(CurationSet.Empty, [Diagnostic.Error("unreadable-file", new SourceLocation(path), $"cannot read the file: {exception.Message}", "check the path and permissions")]);
        }

        return Parse(bytes, path);
    }

    /// <summary>Reads curation content already in memory; <paramref name="path"/> names it in diagnostics.</summary>
    public static CurationReadResult Parse(byte[] bytes, string path)
    {
        ArgumentNullException.ThrowIfNull(bytes);
        ArgumentNullException.ThrowIfNull(path);
        string fingerprint = Fingerprint(bytes);
        var diagnostics = new List<Diagnostic>();
        CsvTable? table = CsvTable.Parse(bytes, path, diagnostics, string.Join(",", Columns));
        if (table is null)
        {
            // A file of blanks and comments only holds no decisions; that is not a problem.
            bool empty = diagnostics.All(diagnostic => diagnostic.Code == "empty-file");
            return new CurationReadResult(CurationSet.Empty, empty ? [] : diagnostics) { Fingerprint = fingerprint };
        }

        int[] indexes = Columns.Select(table.IndexOf).ToArray();
        string[] missing = Columns.Where((_, i) => indexes[i] < 0).ToArray();
        if (missing.Length > 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-column", new SourceLocation(path, table.HeaderLine, 1), $"missing curation column(s): {string.Join(", ", missing)}", "the header must be id,action,reason,date"));
            return new CurationReadResult(CurationSet.Empty, diagnostics) { Fingerprint = fingerprint };
        }

        var decisions = new List<CurationDecision>();
        var unapplied = new List<UnappliedCurationRow>();
        string[]? lines = null;
        foreach (CsvRow row in table.Rows)
        {
            int before = diagnostics.Count;
            CurationDecision? decision = ReadRow(row, indexes[0], indexes[1], indexes[2], indexes[3], diagnostics);
            if (decision is not null)
            {
                decisions.Add(decision);
                continue;
            }

            lines ??= Text(bytes).Split('\n');
            string text = row.Line >= 1 && row.Line <= lines.Length ? lines[row.Line - 1].TrimEnd('\r') : "";
            unapplied.Add(new UnappliedCurationRow(row.LocationOf(0), text, string.Join("; ", diagnostics.Skip(before).Select(d => d.Message))));
        }

        return new CurationReadResult(new CurationSet(decisions), diagnostics)
        {
            Unapplied = unapplied,
            Fingerprint = fingerprint,
            Layout = new CurationLayout(table.Header, table.Delimiter, Text(bytes).Contains("\r\n", StringComparison.Ordinal) ? "\r\n" : "\n"),
        };
    }

    /// <summary>Adds <paramref name="added"/> to the file at <paramref name="path"/>, keeping everything already in it, atomically.</summary>
    /// <param name="path">The curation file (created when missing).</param>
    /// <param name="loaded">The file as read when the session began (or last saved); its fingerprint tells whether others wrote to it since.</param>
    /// <param name="added">The decisions made since, oldest first.</param>
    /// <remarks>
    /// <para>Merge rule: whatever the file holds now stays byte for byte (decisions others added or changed, comments, rows
    /// PathFinder cannot use), and the new decisions are appended after it in the file's own column order, separator and
    /// line ends. Decisions about different ids therefore all survive. When an id decided here was also decided differently
    /// in the file meanwhile, both rows are in the file, this session's last (so it is in force), and the id is reported as
    /// a conflict for the curator to review.</para>
    /// <para>The file is read again just before it is replaced; a write by someone else in between those two moments (a few
    /// milliseconds) would still be lost; PathFinder takes no lock.</para>
    /// </remarks>
    /// <returns>The file as written and what others had changed meanwhile; with nothing to add, the file as it is now (nothing is written).</returns>
    /// <exception cref="IOException">The file cannot be read or written, or it is not a curation table that rows can be added to (it says why; nothing is written).</exception>
    public static CurationSaveResult Save(string path, CurationReadResult loaded, IReadOnlyList<CurationDecision> added)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(loaded);
        ArgumentNullException.ThrowIfNull(added);
        byte[]? current = File.Exists(path) ? File.ReadAllBytes(path) : null;
        CurationReadResult now = current is null ? new CurationReadResult(CurationSet.Empty, []) : Parse(current, path);
        bool changed = !string.Equals(now.Fingerprint, loaded.Fingerprint, StringComparison.Ordinal);
        IReadOnlyList<CurationDecision> theirs = changed ? NotIn(now.Set.Decisions, loaded.Set.Decisions) : [];
        string[] conflicts = changed
            ? added.Select(decision => decision.MeasurementId)
                .Distinct(StringComparer.Ordinal)
                .Where(id => !Same(now.Set.CurrentDecision(id), loaded.Set.CurrentDecision(id)))
                .ToArray()
            : [];
        if (added.Count == 0)
        {
            return new CurationSaveResult(now, changed, theirs, []);
        }

        if (now.HasErrors)
        {
            Diagnostic first = now.Diagnostics.First(diagnostic => diagnostic.Severity == Severity.Error);
            throw new IOException($"{path} is not a curation table rows can be added to ({first.Message}); nothing was written. Fix its header (id,action,reason,date) and save again");
        }

        byte[] content = Compose(current, now.Layout, added);
        AtomicFile.Write(path, stream => stream.Write(content, 0, content.Length));
        return new CurationSaveResult(Parse(content, path), changed, theirs, conflicts);
    }

    /// <summary>Writes the decisions to <paramref name="path"/> atomically, replacing the file (for a new file; to add to an existing one use <see cref="Save"/>).</summary>
    public static void Write(string path, CurationSet set)
    {
        ArgumentNullException.ThrowIfNull(path);
        AtomicFile.WriteAllText(path, Format(set));
    }

    /// <summary>The file content for <paramref name="set"/>: a comment, the header and one row per decision.</summary>
    public static string Format(CurationSet set)
    {
        ArgumentNullException.ThrowIfNull(set);
        var text = new StringBuilder();
        text.Append(HeaderComment).Append('\n');
        text.Append(string.Join(",", Columns)).Append('\n');
        foreach (CurationDecision decision in set.Decisions)
        {
            AppendRow(text, decision, Columns, ',', "\n");
        }

        return text.ToString();
    }

    /// <summary>A SHA-256 of <paramref name="bytes"/> as lower-case hex.</summary>
    internal static string Fingerprint(byte[] bytes) => Convert.ToHexStringLower(SHA256.HashData(bytes));

    private static byte[] Compose(byte[]? current, CurationLayout? layout, IReadOnlyList<CurationDecision> added)
    {
        var text = new StringBuilder();
        string newLine = layout?.NewLine ?? "\n";
        if (current is not null && current.Length > 0 && current[^1] != (byte)'\n')
        {
            // The last line had no line end; the first new row must not continue it.
            text.Append(newLine);
        }

        if (layout is null)
        {
            // No file, or one with comments and blanks only: those stay, and the header follows them.
            if (current is null || current.Length == 0)
            {
                text.Append(HeaderComment).Append(newLine);
            }

            text.Append(string.Join(",", Columns)).Append(newLine);
        }

        IReadOnlyList<string> header = layout?.Header ?? Columns;
        char delimiter = layout?.Delimiter ?? ',';
        foreach (CurationDecision decision in added)
        {
            AppendRow(text, decision, header, delimiter, newLine);
        }

        byte[] tail = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text.ToString());
        return current is null ? tail : [.. current, .. tail];
    }

    private static void AppendRow(StringBuilder text, CurationDecision decision, IReadOnlyList<string> header, char delimiter, string newLine)
    {
        for (int i = 0; i < header.Count; i++)
        {
            if (i > 0)
            {
                text.Append(delimiter);
            }

            string field = header[i].ToLowerInvariant() switch
            {
                "id" => decision.MeasurementId,
                "action" => decision.ActionText,
                "reason" => decision.Reason,
                "date" => decision.DateText,
                _ => "",
            };
            text.Append(Quote(field, delimiter));
        }

        text.Append(newLine);
    }

    private static bool Same(CurationDecision? a, CurationDecision? b) => a is null ? b is null : a.SaysTheSameAs(b);

    /// <summary>The decisions of <paramref name="now"/> not matched one for one by a decision of <paramref name="before"/>.</summary>
    private static CurationDecision[] NotIn(IReadOnlyList<CurationDecision> now, IReadOnlyList<CurationDecision> before)
    {
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (CurationDecision decision in before)
        {
            counts[Key(decision)] = counts.GetValueOrDefault(Key(decision)) + 1;
        }

        var result = new List<CurationDecision>();
        foreach (CurationDecision decision in now)
        {
            if (counts.TryGetValue(Key(decision), out int count) && count > 0)
            {
                counts[Key(decision)] = count - 1;
            }
            else
            {
                result.Add(decision);
            }
        }

        return [.. result];
    }

    private static string Key(CurationDecision decision) => string.Join('\u001f', decision.MeasurementId, decision.ActionText, decision.Reason, decision.DateText);

    private static string Text(byte[] bytes) => Encoding.UTF8.GetString(bytes).TrimStart('\uFEFF');

    private static CurationDecision? ReadRow(CsvRow row, int idColumn, int actionColumn, int reasonColumn, int dateColumn, List<Diagnostic> diagnostics)
    {
        const string NotApplied = "; the row is kept in the file as written and not applied";
        int before = diagnostics.Count;
        string id = row.FieldOrEmpty(idColumn);
        if (id.Length == 0)
        {
            diagnostics.Add(Diagnostic.Warning("missing-id", row.LocationOf(idColumn, "id"), "the decision names no measurement id" + NotApplied, "write the id of the measurement as in the data, such as C03"));
        }

        string actionText = row.FieldOrEmpty(actionColumn);
        CurationAction action = CurationAction.Exclude;
        if (actionText.Equals(ExcludeWord, StringComparison.OrdinalIgnoreCase))
        {
            action = CurationAction.Exclude;
        }
        else if (actionText.Equals(IncludeWord, StringComparison.OrdinalIgnoreCase))
        {
            action = CurationAction.Include;
        }
        else
        {
            diagnostics.Add(Diagnostic.Warning("unknown-action", row.LocationOf(actionColumn, "action"), $"unknown curation action '{Shorten(actionText)}'" + NotApplied, $"write {ExcludeWord} or {IncludeWord}"));
        }

        string reason = row.FieldOrEmpty(reasonColumn);
        if (reason.Length == 0 && action == CurationAction.Exclude && diagnostics.Count == before)
        {
            diagnostics.Add(Diagnostic.Warning("missing-reason", row.LocationOf(reasonColumn, "reason"), "an exclusion needs a reason" + NotApplied, "say why the measurement is left out, such as 'transcription error in notebook'"));
        }

        if (diagnostics.Count > before)
        {
            return null;
        }

        // The date only records when the decision was made: one PathFinder cannot be sure of is kept as written, and the decision applies.
        string dateText = row.FieldOrEmpty(dateColumn);
        if (CurationDate.TryRead(dateText, out DateOnly date, out string problem))
        {
            return new CurationDecision(id, action, reason, date) { Location = row.LocationOf(idColumn, "id") };
        }

        diagnostics.Add(Diagnostic.Warning("bad-date", row.LocationOf(dateColumn, "date"), $"{problem}; the decision applies and the date is kept as written", "write the date as yyyy-MM-dd, such as 2024-05-17"));
        return new CurationDecision(id, action, reason, null) { Location = row.LocationOf(idColumn, "id"), DateAsWritten = dateText };
    }

    private static string Shorten(string text) => text.Length <= 40 ? text : string.Concat(text.AsSpan(0, 39), "…");

    private static string Quote(string field, char delimiter) =>
        field.IndexOfAny([delimiter, '"', '\n', '\r']) >= 0 || field.StartsWith('#') || field != field.Trim()
            ? "\"" + field.Replace("\"", "\"\"", StringComparison.Ordinal) + "\""
            : field;
}
