using PathFinder.Data;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Data;

public sealed class NetworkFilesTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void MeasurementFiles_OfAFolderAreItsCsvFilesSortedWithoutAuxiliaryTables()
    {
        _folder.Write("b.csv", "");
        _folder.Write("a.csv", "");
        _folder.Write("species.csv", "");
        _folder.Write("heat-capacity.csv", "");
        _folder.Write("curation.csv", "");
        _folder.Write("sources.csv", "");
        _folder.Write("notes.txt", "");

        IReadOnlyList<string> files = NetworkFiles.MeasurementFiles(_folder.Path);

        Assert.Equal(["a.csv", "b.csv"], files.Select(Path.GetFileName));
    }

    [Fact]
    public void MeasurementFiles_LeavesOutWhatThePathfinderignoreFileNames()
    {
        // Given a folder with a stray notes CSV and an ignore file with a comment, a blank line and two globs
        _folder.Write("a.csv", "");
        _folder.Write("Notes-2024.CSV", "");
        _folder.Write("old1.csv", "");
        _folder.Write(".pathfinderignore", "# not data\n\nnotes*.csv\nold?.csv\n");

        // When the measurement files are listed
        IReadOnlyList<string> files = NetworkFiles.MeasurementFiles(_folder.Path, out IReadOnlyList<SkippedEntry> skipped);

        // Then the matching files (any letter case) are skipped with the line that matched, and the ignore file is not listed
        Assert.Equal(["a.csv"], files.Select(Path.GetFileName));
        Assert.Equal(["Notes-2024.CSV", "old1.csv"], skipped.Select(entry => Path.GetFileName(entry.Path)));
        Assert.Contains("'notes*.csv' (.pathfinderignore line 3)", skipped[0].Reason, StringComparison.Ordinal);
        Assert.Contains("'old?.csv' (.pathfinderignore line 4)", skipped[1].Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void MeasurementFiles_OfAFileIsTheFile()
    {
        string file = _folder.Write("lab.csv", "");

        Assert.Equal([file], NetworkFiles.MeasurementFiles(file));
    }

    [Fact]
    public void Companion_SitsInsideAFolderOrBesideAFileWithItsStem()
    {
        string file = _folder.Write("lab.csv", "");

        Assert.Equal(Path.Combine(_folder.Path, "species.csv"), NetworkFiles.Companion(_folder.Path, NetworkFiles.SpeciesFileName));
        Assert.Equal(Path.Combine(_folder.Path, "lab.curation.csv"), NetworkFiles.Companion(file, NetworkFiles.CurationFileName));
    }

    [Theory]
    [InlineData("species.csv", true)]
    [InlineData("Species.CSV", true)]
    [InlineData("lab.heat-capacity.csv", true)]
    [InlineData("lab.curation.csv", true)]
    [InlineData("sources.csv", true)]
    [InlineData("lab.sources.csv", true)]
    [InlineData("open-sources.csv", false)]
    [InlineData("lab.csv", false)]
    [InlineData("my-species.csv", false)]
    public void IsAuxiliary_RecognisesTheCompanionTables(string name, bool expected)
    {
        Assert.Equal(expected, NetworkFiles.IsAuxiliary(name));
    }

    [Fact]
    public void MeasurementFiles_ReadsCsvInAnyLetterCaseAndNamesEveryOtherEntryWithItsReason()
    {
        // Given a folder with an upper-case .CSV, lock files, a subfolder, a FIFO, a text file and misnamed tables
        _folder.Write("a.csv", "");
        _folder.Write("data.CSV", "");
        _folder.Write("~$data.csv", "");
        _folder.Write(".~lock.data.csv#", "");
        _folder.Write("notes.txt", "");
        _folder.Write("Species.CSV", "");
        _folder.Write("lab.species.csv", "");
        _folder.Write("curation.csv", "");
        Directory.CreateDirectory(Path.Combine(_folder.Path, "old"));
        SpecialFiles.Fifo(Path.Combine(_folder.Path, "pipe.csv"));

        // When the measurement files are listed
        IReadOnlyList<string> files = NetworkFiles.MeasurementFiles(_folder.Path, out IReadOnlyList<SkippedEntry> skipped);

        // Then both CSV files are read, and every other entry but the curation file is named with its reason
        Assert.Equal(["a.csv", "data.CSV"], files.Select(Path.GetFileName));
        var reasons = skipped.ToDictionary(entry => Path.GetFileName(entry.Path), entry => entry.Reason);
        Assert.Equal([".~lock.data.csv#", "Species.CSV", "lab.species.csv", "notes.txt", "old", "pipe.csv", "~$data.csv"], reasons.Keys.Order(StringComparer.Ordinal));
        Assert.Contains("lock file", reasons["~$data.csv"], StringComparison.Ordinal);
        Assert.Contains("lock file", reasons[".~lock.data.csv#"], StringComparison.Ordinal);
        Assert.Contains("subfolder", reasons["old"], StringComparison.Ordinal);
        Assert.Contains("not a regular file", reasons["pipe.csv"], StringComparison.Ordinal);
        Assert.Contains("letter case", reasons["Species.CSV"], StringComparison.Ordinal);
        Assert.Contains("single-file network", reasons["lab.species.csv"], StringComparison.Ordinal);
        Assert.Equal("not a .csv file", reasons["notes.txt"]);
    }
}
