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
}
