using PathFinder.Cli.Tests.TestSupport;
using PathFinder.Data;

namespace PathFinder.Cli.Tests;

public sealed class GenerateCommandTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Generate_WritesMeasurementsThatTheReaderAcceptsAndTheTruth()
    {
        // Given a fresh destination folder
        string destination = Path.Combine(_folder.Path, "net");

        // When a small network with outliers is generated
        (int exitCode, string output, string error) = Invoke("generate", "--species", "30", "--measurements", "200", "--seed", "7", "--outliers", "0.05", "--out", destination);

        // Then both files exist, the data read without errors with the requested count, and the truth lists species and outliers
        Assert.Equal(ExitCodes.Success, exitCode);
        Assert.Equal("", error);
        Assert.Contains("Wrote 200 measurement(s)", output, StringComparison.Ordinal);
        NetworkReadResult read = NetworkReader.Read(destination);
        Assert.False(read.HasErrors, string.Join(Environment.NewLine, read.Errors.Take(3)));
        Assert.Equal(200, read.Network.Measurements.Count);
        string[] truth = File.ReadAllLines(Path.Combine(destination, "truth.txt"));
        Assert.Contains(truth, line => line.StartsWith("species,", StringComparison.Ordinal));
        Assert.Contains(truth, line => line.StartsWith("outlier,m", StringComparison.Ordinal));
    }

    [Fact]
    public void Generate_WithEntropiesAndGibbs_WritesSAndGibbsDataThatTheReaderAccepts()
    {
        // Given a fresh destination folder
        string destination = Path.Combine(_folder.Path, "joint");

        // When S° is asked for half the species (10 + 6 known species) and 40 Gibbs-energy data
        (int exitCode, string output, string error) = Invoke("generate", "--species", "20", "--measurements", "100", "--entropies", "0.5", "--gibbs", "40", "--out", destination);

        // Then all 156 rows read without errors, with S°, ΔG and K rows among them, and the truth lists entropies
        Assert.Equal(ExitCodes.Success, exitCode);
        Assert.Equal("", error);
        Assert.Contains("Wrote 156 measurement(s)", output, StringComparison.Ordinal);
        NetworkReadResult read = NetworkReader.Read(destination);
        Assert.False(read.HasErrors, string.Join(Environment.NewLine, read.Errors.Take(3)));
        Assert.Equal(16, read.Network.Measurements.Count(measurement => measurement.Property == PathFinder.Quantities.ThermoProperty.AbsoluteEntropy));
        Assert.Equal(40, read.Network.Measurements.Count(measurement => measurement.Temperature >= 298.15 && measurement.Property is not (PathFinder.Quantities.ThermoProperty.Enthalpy or PathFinder.Quantities.ThermoProperty.AbsoluteEntropy)));
        Assert.Equal(16, File.ReadAllLines(Path.Combine(destination, "truth.txt")).Count(line => line.StartsWith("entropy,", StringComparison.Ordinal)));
    }

    [Fact]
    public void Generate_SameSeedGivesTheSameFiles()
    {
        // Given two folders
        string first = Path.Combine(_folder.Path, "a");
        string second = Path.Combine(_folder.Path, "b");

        // When the same options are generated into both
        Assert.Equal(ExitCodes.Success, Invoke("generate", "--species", "20", "--measurements", "60", "--seed", "3", "--out", first).ExitCode);
        Assert.Equal(ExitCodes.Success, Invoke("generate", "--species", "20", "--measurements", "60", "--seed", "3", "--out", second).ExitCode);

        // Then the files are identical
        Assert.Equal(File.ReadAllText(Path.Combine(first, "measurements.csv")), File.ReadAllText(Path.Combine(second, "measurements.csv")));
        Assert.Equal(File.ReadAllText(Path.Combine(first, "truth.txt")), File.ReadAllText(Path.Combine(second, "truth.txt")));
    }

    [Fact]
    public void Generate_RefusesANonEmptyFolderAndLeavesItUntouched()
    {
        // Given a folder that already holds a file
        string existing = _folder.Write("notes.txt", "keep me");

        // When generating into it without --force
        (int exitCode, _, string error) = Invoke("generate", "--species", "10", "--measurements", "20", "--out", _folder.Path);

        // Then it is refused with exit 2 and nothing is written
        Assert.Equal(ExitCodes.InvalidInput, exitCode);
        Assert.Contains("not empty", error, StringComparison.Ordinal);
        Assert.False(File.Exists(Path.Combine(_folder.Path, "measurements.csv")));
        Assert.Equal("keep me", File.ReadAllText(existing));
    }

    [Fact]
    public void Generate_WithForceWritesIntoANonEmptyFolder()
    {
        // Given a folder that already holds a file
        _folder.Write("notes.txt", "keep me");

        // When generating into it with --force
        (int exitCode, _, _) = Invoke("generate", "--species", "10", "--measurements", "20", "--out", _folder.Path, "--force");

        // Then the network is written beside the other file
        Assert.Equal(ExitCodes.Success, exitCode);
        Assert.True(File.Exists(Path.Combine(_folder.Path, "measurements.csv")));
        Assert.True(File.Exists(Path.Combine(_folder.Path, "notes.txt")));
    }

    [Fact]
    public void Generate_TooManySpecies_SaysHowManyCanBeMade()
    {
        // When more species are asked for than the generator has distinct formulas
        (int exitCode, _, string error) = Invoke("generate", "--species", "3000", "--measurements", "10", "--out", Path.Combine(_folder.Path, "out"));

        // Then exit 2 at once (it used to loop forever), naming the limit
        Assert.Equal(ExitCodes.InvalidInput, exitCode);
        Assert.Contains("from 3 to 2,446", error, StringComparison.Ordinal);
    }

    [UnixFact]
    public void Generate_WithForceIntoAFolderWhoseDataFileIsAFifo_ExitsTwo()
    {
        // Given a folder whose measurements.csv is a FIFO
        string fifo = SpecialFiles.Fifo(Path.Combine(_folder.Path, "measurements.csv"));

        // When generating into it with --force
        (int exitCode, _, string error) = Invoke("generate", "--species", "10", "--measurements", "20", "--out", _folder.Path, "--force");

        // Then it is refused before any work and the FIFO stays
        Assert.Equal(ExitCodes.InvalidInput, exitCode);
        Assert.Contains("FIFO", error, StringComparison.Ordinal);
        Assert.Equal(PathFinder.IO.FileEntryKind.Fifo, PathFinder.IO.AtomicFile.Inspect(fifo).Kind);
    }

    [Theory]
    [InlineData("--species", "2", "--measurements", "10")]
    [InlineData("--species", "10", "--measurements", "0")]
    [InlineData("--species", "10", "--measurements", "10", "--outliers", "1.5")]
    [InlineData("--species", "10", "--measurements", "10", "--outliers", "-0.1")]
    [InlineData("--species", "ten", "--measurements", "10")]
    [InlineData("--measurements", "10")]
    [InlineData("--species", "10", "--measurements", "10", "--entropies", "1.2")]
    [InlineData("--species", "10", "--measurements", "10", "--gibbs", "5")]
    [InlineData("--species", "10", "--measurements", "10", "--entropies", "0.5", "--gibbs", "-1")]
    [InlineData("--species", "2447", "--measurements", "10")]
    [InlineData("--species", "10", "--measurements", "2147483647")]
    [InlineData("--species", "10", "--measurements", "10", "--entropies", "0.5", "--gibbs", "2000001")]
    public void Generate_BadOptionsExitTwoAndWriteNothing(params string[] options)
    {
        // Given a destination folder
        string destination = Path.Combine(_folder.Path, "out");

        // When an option is out of range, malformed or missing
        (int exitCode, _, string error) = Invoke(["generate", .. options, "--out", destination]);

        // Then exit code 2 with a message, and no folder is created
        Assert.Equal(ExitCodes.InvalidInput, exitCode);
        Assert.StartsWith("error:", error, StringComparison.Ordinal);
        Assert.False(Directory.Exists(destination));
    }

    /// <summary>Runs the command through System.CommandLine with the same error mapping as <see cref="CliApp"/> (parse errors and <see cref="UserInputException"/> give exit 2).</summary>
    private static (int ExitCode, string Out, string Error) Invoke(params string[] args)
    {
        CliRun run = CliRun.Of(args);
        return (run.ExitCode, run.Out, run.Error);
    }
}
