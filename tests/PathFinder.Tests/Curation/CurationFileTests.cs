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
    public void Read_reports_each_bad_field_with_file_line_and_column()
    {
        // Given a file with a bad action (line 3), a bad date (line 4) and an exclusion without reason (line 5)
        string path = Path.Combine(_folder, "curation.csv");
        File.WriteAllText(path, "id,action,reason,date\nA01,exclude,ok,2024-01-02\nA02,drop,x,2024-01-02\nA03,exclude,x,17/05/2024\nA04,exclude,,2024-01-02\n");

        // When it is read
        CurationReadResult read = CurationFile.Read(path);

        // Then only the good row is kept and each problem is located
        Assert.Equal(["A01"], read.Set.ExcludedIds);
        Assert.True(read.HasErrors);
        Diagnostic action = Assert.Single(read.Diagnostics, d => d.Code == "unknown-action");
        Assert.Equal((3, 5), (action.Location.Line, action.Location.Column));
        Diagnostic date = Assert.Single(read.Diagnostics, d => d.Code == "bad-date");
        Assert.Equal((4, 15), (date.Location.Line, date.Location.Column));
        Diagnostic reason = Assert.Single(read.Diagnostics, d => d.Code == "missing-reason");
        Assert.Equal(5, reason.Location.Line);
        Assert.Equal(path, reason.Location.File);
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
