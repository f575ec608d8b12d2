using System.Globalization;
using System.Text;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.IO;

namespace PathFinder.Curation;

/// <summary>Reads and writes the curation file: CSV with the header <c>id,action,reason,date</c>, one decision per row.</summary>
/// <remarks>
/// <para><c>action</c> is <c>exclude</c> or <c>include</c> (case-insensitive); <c>date</c> is ISO 8601 (<c>2024-05-17</c>);
/// an exclusion needs a reason. Rows are decisions in the order they were made: the last one about an id wins.
/// Lines starting with <c>#</c> are comments. The file sits beside the data (<see cref="PathFor"/>).</para>
/// <para>Writing is atomic (<see cref="AtomicFile"/>): a reader sees the old file or the new one, never a part.</para>
/// </remarks>
public static class CurationFile
{
    /// <summary>The word for <see cref="CurationAction.Exclude"/>.</summary>
    public const string ExcludeWord = "exclude";

    /// <summary>The word for <see cref="CurationAction.Include"/>.</summary>
    public const string IncludeWord = "include";

    /// <summary>The header written, in order.</summary>
    public static IReadOnlyList<string> Columns { get; } = ["id", "action", "reason", "date"];

    /// <summary>The curation file of a network: <c>folder/curation.csv</c>, or <c>lab.curation.csv</c> beside <c>lab.csv</c>.</summary>
    public static string PathFor(string networkPath) => NetworkFiles.Companion(networkPath, NetworkFiles.CurationFileName);

    /// <summary>Reads a curation file; a missing file is an empty set without diagnostics.</summary>
    public static CurationReadResult Read(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var diagnostics = new List<Diagnostic>();
        if (!File.Exists(path))
        {
            return new CurationReadResult(CurationSet.Empty, diagnostics);
        }

        CsvTable? table = CsvTable.Read(path, path, diagnostics);
        if (table is null)
        {
            return new CurationReadResult(CurationSet.Empty, diagnostics);
        }

        int[] indexes = Columns.Select(table.IndexOf).ToArray();
        string[] missing = Columns.Where((_, i) => indexes[i] < 0).ToArray();
        if (missing.Length > 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-column", new SourceLocation(path, table.HeaderLine, 1), $"missing curation column(s): {string.Join(", ", missing)}", "the header must be id,action,reason,date"));
            return new CurationReadResult(CurationSet.Empty, diagnostics);
        }

        var decisions = new List<CurationDecision>();
        foreach (CsvRow row in table.Rows)
        {
            CurationDecision? decision = ReadRow(row, indexes[0], indexes[1], indexes[2], indexes[3], diagnostics);
            if (decision is not null)
            {
                decisions.Add(decision);
            }
        }

        return new CurationReadResult(new CurationSet(decisions), diagnostics);
    }

    /// <summary>Writes the decisions to <paramref name="path"/> atomically.</summary>
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
        text.Append("# PathFinder curation decisions: the last row about an id is the one in force.\n");
        text.Append(string.Join(",", Columns)).Append('\n');
        foreach (CurationDecision decision in set.Decisions)
        {
            text.Append(Quote(decision.MeasurementId)).Append(',')
                .Append(decision.ActionText).Append(',')
                .Append(Quote(decision.Reason)).Append(',')
                .Append(decision.DateText).Append('\n');
        }

        return text.ToString();
    }

    private static CurationDecision? ReadRow(CsvRow row, int idColumn, int actionColumn, int reasonColumn, int dateColumn, List<Diagnostic> diagnostics)
    {
        int before = diagnostics.Count;
        string id = row.FieldOrEmpty(idColumn);
        if (id.Length == 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-id", row.LocationOf(idColumn, "id"), "the decision names no measurement id", "write the id of the measurement as in the data, such as C03"));
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
            diagnostics.Add(Diagnostic.Error("unknown-action", row.LocationOf(actionColumn, "action"), $"unknown curation action '{actionText}'", $"write {ExcludeWord} or {IncludeWord}"));
        }

        string reason = row.FieldOrEmpty(reasonColumn);
        if (reason.Length == 0 && action == CurationAction.Exclude && diagnostics.Count == before)
        {
            diagnostics.Add(Diagnostic.Error("missing-reason", row.LocationOf(reasonColumn, "reason"), "an exclusion needs a reason", "say why the measurement is left out, such as 'transcription error in notebook'"));
        }

        string dateText = row.FieldOrEmpty(dateColumn);
        if (!DateOnly.TryParseExact(dateText, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out DateOnly date))
        {
            diagnostics.Add(Diagnostic.Error("bad-date", row.LocationOf(dateColumn, "date"), $"the date '{dateText}' is not an ISO date", "write the date as yyyy-MM-dd, such as 2024-05-17"));
        }

        return diagnostics.Count > before
            ? null
            : new CurationDecision(id, action, reason, date) { Location = row.LocationOf(idColumn, "id") };
    }

    private static string Quote(string field) =>
        field.IndexOfAny([',', '"', '\n', '\r']) >= 0 || field.StartsWith('#') || field != field.Trim()
            ? "\"" + field.Replace("\"", "\"\"", StringComparison.Ordinal) + "\""
            : field;
}
