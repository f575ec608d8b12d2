using System.Globalization;
using PathFinder.Curation;
using PathFinder.Diagnostics;

namespace PathFinder.Tests.Curation;

public sealed class CurationFileTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "pf-curation-" + Guid.NewGuid().ToString("N"));

    public CurationFileTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public void Write_then_Read_round_trips_every_decision_including_commas_and_quotes_in_reasons()
    {
        // Given a set with awkward reasons
        CurationSet set = CurationSet.Empty
            .Exclude("C03", "slipped digit, see notebook p. 12", new DateOnly(2024, 5, 17))
            .Exclude("A07", "said \"suspicious\" by reviewer", new DateOnly(2024, 5, 18))
            .Include("C03", "re-measured", new DateOnly(2024, 6, 1));
        string path = Path.Combine(_folder, "curation.csv");

        // When it is written and read back
        CurationFile.Write(path, set);
        CurationReadResult read = CurationFile.Read(path);

        // Then the same decisions come back, in order, without diagnostics
        Assert.Empty(read.Diagnostics);
        Assert.Equal(
            set.Decisions.Select(d => (d.MeasurementId, d.Action, d.Reason, d.Date)),
            read.Set.Decisions.Select(d => (d.MeasurementId, d.Action, d.Reason, d.Date)));
        Assert.Equal(["A07"], read.Set.ExcludedIds);
    }

    [Fact]
    public void Read_keeps_rows_it_cannot_use_as_located_warnings_and_applies_the_rest()
    {
        // Given a file with a bad action (line 3), a day-first date (line 4) and an exclusion without reason (line 5)
        string path = Path.Combine(_folder, "curation.csv");
        File.WriteAllText(path, "id,action,reason,date\nA01,exclude,ok,2024-01-02\nA02,drop,x,2024-01-02\nA03,exclude,x,17/05/2024\nA04,exclude,,2024-01-02\n");

        // When it is read
        CurationReadResult read = CurationFile.Read(path);

        // Then the good rows apply (17/05/2024 can only be 17 May), the others are kept as written, and each problem is located
        Assert.Equal(["A01", "A03"], read.Set.ExcludedIds);
        Assert.Equal(new DateOnly(2024, 5, 17), read.Set.CurrentDecision("A03")!.Date);
        Assert.False(read.HasErrors);
        Diagnostic action = Assert.Single(read.Diagnostics, d => d.Code == "unknown-action");
        Assert.Equal((Severity.Warning, 3, 5), (action.Severity, action.Location.Line, action.Location.Column));
        Diagnostic reason = Assert.Single(read.Diagnostics, d => d.Code == "missing-reason");
        Assert.Equal(5, reason.Location.Line);
        Assert.Equal(path, reason.Location.File);
        Assert.Equal(["A02,drop,x,2024-01-02", "A04,exclude,,2024-01-02"], read.Unapplied.Select(row => row.Text));
        Assert.Equal([3, 5], read.Unapplied.Select(row => row.Location.Line));
    }

    [Fact]
    public void An_ambiguous_date_is_kept_as_written_and_the_decision_still_applies()
    {
        string path = Path.Combine(_folder, "curation.csv");
        File.WriteAllText(path, "id,action,reason,date\nA01,exclude,ok,05/06/2024\n");

        CurationReadResult read = CurationFile.Read(path);

        CurationDecision decision = Assert.Single(read.Set.Decisions);
        Assert.Null(decision.Date);
        Assert.Equal("05/06/2024", decision.DateText);
        Assert.Equal(["A01"], read.Set.ExcludedIds);
        Diagnostic date = Assert.Single(read.Diagnostics);
        Assert.Equal(("bad-date", Severity.Warning, 2, 16), (date.Code, date.Severity, date.Location.Line, date.Location.Column));
    }

    [Theory]
    [InlineData("2024-05-17", 2024, 5, 17)]
    [InlineData("2024-05-17T10:30", 2024, 5, 17)]
    [InlineData("2024/5/17", 2024, 5, 17)]
    [InlineData("17/05/2024", 2024, 5, 17)]
    [InlineData("05/17/2024", 2024, 5, 17)]
    [InlineData("17.05.2024", 2024, 5, 17)]
    [InlineData("06/06/2024", 2024, 6, 6)]
    [InlineData("17 May 2024", 2024, 5, 17)]
    [InlineData("17-May-2024", 2024, 5, 17)]
    [InlineData("May 17, 2024", 2024, 5, 17)]
    public void CurationDate_reads_common_spellings_that_have_one_meaning(string text, int year, int month, int day)
    {
        Assert.True(CurationDate.TryRead(text, out DateOnly date, out string problem), problem);
        Assert.Equal(new DateOnly(year, month, day), date);
    }

    [Theory]
    [InlineData("05/06/2024")]
    [InlineData("31/31/2024")]
    [InlineData("last tuesday")]
    [InlineData("")]
    public void CurationDate_refuses_text_with_no_certain_date(string text) =>
        Assert.False(CurationDate.TryRead(text, out _, out _));

    [Fact]
    public void Save_keeps_every_byte_of_the_file_and_adds_the_new_rows_in_its_layout()
    {
        // Given a hand-edited file: a comment, columns in another order, CRLF line ends, a row PathFinder cannot use,
        // an ambiguous date, and no line end after the last row
        string path = Path.Combine(_folder, "curation.csv");
        const string before = "# kept by hand\r\ndate,id,action,reason\r\n17/05/2024,A01,exclude,typo\r\n2024-01-02,A02,drop,\"x, y\"\r\n05/06/2024,A03,exclude,odd";
        File.WriteAllText(path, before);
        CurationReadResult loaded = CurationFile.Read(path);

        // When a decision is saved
        CurationDecision added = new("B07", CurationAction.Exclude, "wrong phase, see p. 3", new DateOnly(2024, 6, 1));
        CurationSaveResult saved = CurationFile.Save(path, loaded, [added]);

        // Then the old content is there byte for byte, and the new row follows in the file's column order and line ends
        string after = File.ReadAllText(path);
        Assert.Equal(before + "\r\n2024-06-01,B07,exclude,\"wrong phase, see p. 3\"\r\n", after);
        Assert.False(saved.ChangedByOthers);
        Assert.Equal(["A01", "A03", "B07"], saved.Read.Set.ExcludedIds);
        Assert.Single(saved.Read.Unapplied);
    }

    [Fact]
    public void Save_after_someone_else_wrote_keeps_their_decisions_and_names_the_ids_decided_on_both_sides()
    {
        // Given a file read at the start of a session
        string path = Path.Combine(_folder, "curation.csv");
        CurationFile.Write(path, CurationSet.Empty.Exclude("A01", "typo", new DateOnly(2024, 1, 2)));
        CurationReadResult loaded = CurationFile.Read(path);

        // And someone else then adds a decision about B05 and one about C03
        File.AppendAllText(path, "B05,exclude,old calibration,2024-02-03\nC03,exclude,their reason,2024-02-03\n");

        // When this session saves its own decisions about C03 and D01
        CurationDecision[] mine =
        [
            new("C03", CurationAction.Exclude, "my reason", new DateOnly(2024, 2, 4)),
            new("D01", CurationAction.Exclude, "mine", new DateOnly(2024, 2, 4)),
        ];
        CurationSaveResult saved = CurationFile.Save(path, loaded, mine);

        // Then both sides' decisions are in the file, theirs are reported, and C03 is a conflict with this session's in force
        Assert.True(saved.ChangedByOthers);
        Assert.Equal(["B05", "C03"], saved.DecisionsByOthers.Select(d => d.MeasurementId));
        Assert.Equal(["C03"], saved.Conflicts);
        Assert.Equal(["A01", "B05", "C03", "D01"], saved.Read.Set.ExcludedIds);
        Assert.Equal("my reason", saved.Read.Set.CurrentDecision("C03")!.Reason);
        string text = File.ReadAllText(path);
        Assert.Contains("C03,exclude,their reason,2024-02-03", text, StringComparison.Ordinal);
        Assert.Contains("C03,exclude,my reason,2024-02-04", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Save_refuses_a_file_without_the_curation_header_and_writes_nothing()
    {
        string path = Path.Combine(_folder, "curation.csv");
        File.WriteAllText(path, "id,action,date\nA01,exclude,2024-01-02\n");
        CurationReadResult loaded = CurationFile.Read(path);

        IOException refused = Assert.Throws<IOException>(() => CurationFile.Save(path, loaded, [new CurationDecision("B01", CurationAction.Exclude, "x", new DateOnly(2024, 1, 2))]));

        Assert.Contains("nothing was written", refused.Message, StringComparison.Ordinal);
        Assert.Equal("id,action,date\nA01,exclude,2024-01-02\n", File.ReadAllText(path));
    }

    [Fact]
    public void Save_to_a_new_or_comment_only_file_writes_the_header_first()
    {
        string fresh = Path.Combine(_folder, "fresh.csv");
        string comments = Path.Combine(_folder, "comments.csv");
        File.WriteAllText(comments, "# notes only\n");
        CurationDecision decision = new("A01", CurationAction.Exclude, "typo", new DateOnly(2024, 1, 2));

        CurationFile.Save(fresh, CurationFile.Read(fresh), [decision]);
        CurationFile.Save(comments, CurationFile.Read(comments), [decision]);

        Assert.Equal(["A01"], CurationFile.Read(fresh).Set.ExcludedIds);
        Assert.Equal("# notes only\nid,action,reason,date\nA01,exclude,typo,2024-01-02\n", File.ReadAllText(comments));
    }

    [Fact]
    public void Recovery_offers_only_the_decisions_the_file_does_not_hold_yet()
    {
        string path = Path.Combine(_folder, "curation.csv");
        string recovery = CurationRecovery.PathFor(path);
        CurationDecision saved = new("A01", CurationAction.Exclude, "typo", new DateOnly(2024, 1, 2));
        CurationDecision unsaved = new("B02", CurationAction.Exclude, "wrong unit", new DateOnly(2024, 1, 3));

        CurationRecovery.Write(recovery, [saved, unsaved]);
        CurationReadResult offered = CurationRecovery.Read(recovery, new CurationSet([saved]));
        CurationRecovery.Write(recovery, []);

        Assert.Equal(Path.Combine(_folder, ".curation.csv.recovery"), recovery);
        Assert.Equal(["B02"], offered.Set.Decisions.Select(d => d.MeasurementId));
        Assert.False(File.Exists(recovery));
    }

    [Fact]
    public void Read_of_a_missing_file_gives_an_empty_set_and_no_diagnostics()
    {
        CurationReadResult read = CurationFile.Read(Path.Combine(_folder, "absent.csv"));

        Assert.Empty(read.Set.Decisions);
        Assert.Empty(read.Diagnostics);
    }

    [Fact]
    public void Read_reports_a_missing_column_at_the_header()
    {
        string path = Path.Combine(_folder, "curation.csv");
        File.WriteAllText(path, "# note\nid,action,date\nA01,exclude,2024-01-02\n");

        CurationReadResult read = CurationFile.Read(path);

        Diagnostic missing = Assert.Single(read.Diagnostics);
        Assert.Equal("missing-column", missing.Code);
        Assert.Equal(2, missing.Location.Line);
    }

    [Fact]
    public void Format_writes_iso_dates_whatever_the_current_culture()
    {
        CultureInfo saved = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            string text = CurationFile.Format(CurationSet.Empty.Exclude("B01", "typo", new DateOnly(2024, 12, 3)));

            Assert.Contains("B01,exclude,typo,2024-12-03", text, StringComparison.Ordinal);
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }

    [Fact]
    public void PathFor_a_folder_network_is_curation_csv_inside_it()
    {
        Assert.Equal(Path.Combine(_folder, "curation.csv"), CurationFile.PathFor(_folder));
    }
}
