using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Quantities;
using PathFinder.Synthetic;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Synthetic;

public sealed class SyntheticNetworkGeneratorTests
{
    private static double TrueValue(SyntheticNetwork network, Measurement measurement) =>
        measurement.Equation.Terms.Sum(term => term.Coefficient.ToDouble() * network.TrueFormationEnthalpy[term.Species]);

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(77)]
    public void Generate_EveryEquationIsElementAndChargeBalanced(int seed)
    {
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = seed, SpeciesCount = 60, MeasurementCount = 400 });

        Assert.Equal(400, network.Network.Measurements.Count);
        Assert.All(network.Network.Measurements, measurement =>
        {
            Assert.Empty(measurement.Equation.FindImbalances());
            Assert.Contains(measurement.Equation.Terms, term => !ReferenceStates.HasZeroFormationProperties(term.Species));
            Assert.True(measurement.Uncertainty is >= 0.2 and <= 2.0, measurement.ToString());
        });
    }

    [Fact]
    public void Generate_SameSeedGivesTheSameNetwork_AndAnotherSeedAnother()
    {
        var options = new SyntheticNetworkOptions { Seed = 5, SpeciesCount = 40, MeasurementCount = 150, OutlierFraction = 0.1 };

        SyntheticNetwork first = SyntheticNetworkGenerator.Generate(options);
        SyntheticNetwork second = SyntheticNetworkGenerator.Generate(options);
        SyntheticNetwork other = SyntheticNetworkGenerator.Generate(options with { Seed = 6 });

        Assert.Equal(Describe(first), Describe(second));
        Assert.Equal(first.OutlierIds.Order(StringComparer.Ordinal), second.OutlierIds.Order(StringComparer.Ordinal));
        Assert.NotEqual(Describe(first), Describe(other));
    }

    [Theory]
    [InlineData(0.05)]
    [InlineData(0.2)]
    public void Generate_OutlierCountIsAboutTheFraction(double fraction)
    {
        // Given 2000 measurements, the outlier count is binomial(2000, f): within 4 standard deviations of 2000·f
        const int count = 2000;
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 11, SpeciesCount = 100, MeasurementCount = count, OutlierFraction = fraction });

        double expected = count * fraction;
        double spread = Math.Sqrt(count * fraction * (1 - fraction));
        Assert.InRange(network.OutlierIds.Count, expected - (4 * spread), expected + (4 * spread));
        Assert.All(network.OutlierIds, id => Assert.True(network.Network.TryGetMeasurement(id, out _)));
    }

    [Fact]
    public void Generate_ValuesScatterAroundTheTruthByTheirUncertainty_AndOutliersLieFar()
    {
        // Given a network with outliers shifted by 8 to 30 σ
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 3, SpeciesCount = 80, MeasurementCount = 1500, OutlierFraction = 0.05 });

        // When each value is compared with Σν·ΔfH°(true)
        var sound = new List<double>();
        foreach (Measurement measurement in network.Network.Measurements)
        {
            double z = (measurement.Value - TrueValue(network, measurement)) / measurement.Uncertainty;
            if (network.OutlierIds.Contains(measurement.Id))
            {
                // Then outliers lie beyond the smallest shift less a 5σ noise allowance
                Assert.True(Math.Abs(z) > 8.0 - 5.0, $"{measurement.Id}: z = {z}");
            }
            else
            {
                sound.Add(z);
            }
        }

        // and the rest are standard normal: |z| < 5.5, mean near 0, standard deviation near 1 (n ≈ 1400)
        Assert.All(sound, z => Assert.InRange(z, -5.5, 5.5));
        double mean = sound.Average();
        double sd = Math.Sqrt(sound.Sum(z => (z - mean) * (z - mean)) / (sound.Count - 1));
        Assert.InRange(mean, -0.12, 0.12);
        Assert.InRange(sd, 0.9, 1.1);
    }

    [Fact]
    public void Generate_WithoutOutliers_SolvesBackToTheTruthWithinTheSolvedUncertainties()
    {
        // Given a dense network with no outliers
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 9, SpeciesCount = 30, MeasurementCount = 300, Locality = 6 });

        // When solved as given
        SolveReport report = NetworkSolver.Report(NetworkSolver.Solve(ThermoModel.Build(network.Network), adjust: false), PropertyFamily.Enthalpy)!;

        // Then every determined species is within 5 of its standard uncertainties of the truth, and χ²/ν is near 1
        Assert.Contains(report.Species, estimate => estimate.IsDetermined);
        Assert.All(report.Species.Where(estimate => estimate.IsDetermined), estimate =>
            Assert.InRange(estimate.Value, network.TrueFormationEnthalpy[estimate.Species] - (5 * estimate.Uncertainty), network.TrueFormationEnthalpy[estimate.Species] + (5 * estimate.Uncertainty)));
        Assert.InRange(report.Solution.BirgeRatio, 0.8, 1.2);
        Assert.Equal(-393.51, network.TrueFormationEnthalpy[Species.Parse("CO2(g)")], 1e-12);
    }

    [Fact]
    public void Generate_MaxSpeciesCount_MakesThatManyDistinctSpecies()
    {
        // Given the largest species count the generator accepts (2,446 distinct C/H/N/O formulas)
        // When a network that large is generated
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { SpeciesCount = SyntheticNetworkGenerator.MaxSpeciesCount, MeasurementCount = 10 });

        // Then it ends, and every formula made is distinct
        Assert.Equal(2446, SyntheticNetworkGenerator.MaxSpeciesCount);
        Assert.True(network.TrueFormationEnthalpy.Count >= SyntheticNetworkGenerator.MaxSpeciesCount);
    }

    [Fact]
    public void Generate_MoreSpeciesThanDistinctFormulas_IsRefusedInsteadOfLoopingForever()
    {
        var options = new SyntheticNetworkOptions { SpeciesCount = SyntheticNetworkGenerator.MaxSpeciesCount + 1, MeasurementCount = 10 };

        ArgumentOutOfRangeException refused = Assert.Throws<ArgumentOutOfRangeException>(() => SyntheticNetworkGenerator.Generate(options));

        Assert.Contains("2446", refused.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Write_KilledBetweenTheTwoFiles_IntoANewFolder_LeavesNothing()
    {
        // Given a network and a destination that does not exist yet
        using var temp = new TempFolder();
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 4, SpeciesCount = 10, MeasurementCount = 20 });
        string folder = Path.Combine(temp.Path, "net");

        // When the write fails after the first file
        Assert.Throws<IOException>(() => SyntheticNetworkGenerator.Write(network, folder, replaceReadOnly: false, afterFirstFile: () => throw new IOException("killed")));

        // Then no destination folder and no staging folder remain; a second write completes
        Assert.False(Directory.Exists(folder));
        Assert.Empty(Directory.EnumerateFileSystemEntries(temp.Path));
        SyntheticNetworkGenerator.Write(network, folder);
        Assert.True(File.Exists(Path.Combine(folder, SyntheticNetworkGenerator.MeasurementsFileName)));
        Assert.True(File.Exists(Path.Combine(folder, SyntheticNetworkGenerator.TruthFileName)));
        Assert.Empty(Directory.EnumerateFileSystemEntries(temp.Path, ".*"));
    }

    [Fact]
    public void Write_KilledBetweenTheTwoFiles_IntoAFullFolder_NeverLeavesTheOldTruthBesideNewData()
    {
        // Given a folder holding an older network (another seed) and a note of the user's
        using var temp = new TempFolder();
        SyntheticNetwork older = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 1, SpeciesCount = 10, MeasurementCount = 20 });
        SyntheticNetwork newer = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 2, SpeciesCount = 10, MeasurementCount = 20 });
        SyntheticNetworkGenerator.Write(older, temp.Path);
        string oldData = File.ReadAllText(Path.Combine(temp.Path, SyntheticNetworkGenerator.MeasurementsFileName));
        temp.Write("notes.txt", "keep me");

        // When the newer network's write fails between the two files
        Assert.Throws<IOException>(() => SyntheticNetworkGenerator.Write(newer, temp.Path, replaceReadOnly: false, afterFirstFile: () => throw new IOException("killed")));

        // Then the data are new and the old truth is gone (an incomplete folder says so), the note stays, no temporary file is left
        Assert.NotEqual(oldData, File.ReadAllText(Path.Combine(temp.Path, SyntheticNetworkGenerator.MeasurementsFileName)));
        Assert.False(File.Exists(Path.Combine(temp.Path, SyntheticNetworkGenerator.TruthFileName)));
        Assert.Equal("keep me", File.ReadAllText(Path.Combine(temp.Path, "notes.txt")));
        Assert.Empty(Directory.EnumerateFiles(temp.Path, "*.tmp"));
    }

    [Fact]
    public void Write_CreatesTheDataAndTheTruthFiles()
    {
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 4, SpeciesCount = 10, MeasurementCount = 20, OutlierFraction = 0.2 });
        string folder = Path.Combine(Path.GetTempPath(), "pathfinder-tests-" + Guid.NewGuid().ToString("N"));
        try
        {
            SyntheticNetworkGenerator.Write(network, folder);

            NetworkReadResult read = NetworkReader.Read(Path.Combine(folder, "measurements.csv"));
            Assert.Empty(read.Errors);
            Assert.Equal(Describe(network), Describe(new SyntheticNetwork(read.Network, network.TrueFormationEnthalpy, network.OutlierIds)));
            string truth = File.ReadAllText(Path.Combine(folder, "truth.txt"));
            Assert.All(network.OutlierIds, id => Assert.Contains($"outlier,{id},", truth, StringComparison.Ordinal));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void Write_WithDefaultOptions_GivesTheSameFilesAsBeforeEntropiesExisted()
    {
        // Given the options of an earlier ΔH-only network, whose files' SHA-256 (LF line ends) was taken with the generator
        // as it was before S° and Gibbs-energy data were added (commit 733beef)
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 5, SpeciesCount = 40, MeasurementCount = 150, OutlierFraction = 0.1 });

        // When written
        (string data, string truth) = WriteAndRead(network);

        // Then both files are byte for byte as before
        Assert.Equal("4e8f5049213a00231f51cef7bb263d6b33b8f69dd95015101826c5867cfa9b16", Sha256(data));
        Assert.Equal("584449226cf9e5d1c68d0da40db007936cb768ef01fe0af7366cde610671e906", Sha256(truth));
        Assert.Empty(network.TrueEntropy);
    }

    [Fact]
    public void Generate_WithEntropiesAndGibbsData_KeepsTheEnthalpyRowsAsWithout()
    {
        // Given the same options with and without S° and Gibbs-energy data
        var options = new SyntheticNetworkOptions { Seed = 8, SpeciesCount = 50, MeasurementCount = 300, OutlierFraction = 0.05 };
        SyntheticNetwork plain = SyntheticNetworkGenerator.Generate(options);
        SyntheticNetwork joint = SyntheticNetworkGenerator.Generate(options with { EntropyFraction = 0.5, GibbsCount = 100 });

        // Then the ΔH rows, their outliers and the true ΔfH° are the same, and the new rows come after them
        Assert.Equal(Describe(plain), Describe(joint).Take(300));
        Assert.Equal(plain.OutlierIds.Order(StringComparer.Ordinal), joint.OutlierIds.Where(id => int.Parse(id[1..], CultureInfo.InvariantCulture) <= 300).Order(StringComparer.Ordinal));
        Assert.Equal(plain.TrueFormationEnthalpy.OrderBy(pair => pair.Key.Name, StringComparer.Ordinal), joint.TrueFormationEnthalpy.OrderBy(pair => pair.Key.Name, StringComparer.Ordinal));
        Assert.All(joint.Network.Measurements.Skip(300), measurement => Assert.NotEqual(ThermoProperty.Enthalpy, measurement.Property));
    }

    [Theory]
    [InlineData(1)]
    [InlineData(23)]
    public void Generate_EntropyAndGibbsData_AreBalancedPlausibleAndInTheirRanges(int seed)
    {
        // Given a network with S° for 40 % of its species and 300 Gibbs-energy data
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = seed, SpeciesCount = 100, MeasurementCount = 500, EntropyFraction = 0.4, GibbsCount = 300 });
        Measurement[] added = network.Network.Measurements.Skip(500).ToArray();
        Measurement[] entropies = added.Where(measurement => measurement.Property == ThermoProperty.AbsoluteEntropy).ToArray();
        Measurement[] gibbs = added.Where(measurement => measurement.Property != ThermoProperty.AbsoluteEntropy).ToArray();

        // Then 40 species plus C, H2, N2, O2, CO2 and H2O carry one S° datum each, with a plausible true S°
        Assert.Equal(40 + 6, entropies.Length);
        Assert.Equal(entropies.Length, entropies.Select(measurement => measurement.Equation.Terms.Single().Species).Distinct().Count());
        Assert.Equal(entropies.Length, network.TrueEntropy.Count);
        Assert.Contains(Species.Parse("C(cr,graphite)"), network.TrueEntropy.Keys);
        Assert.Contains(Species.Parse("O2(g)"), network.TrueEntropy.Keys);
        Assert.All(network.TrueEntropy.Values, value => Assert.InRange(value, 5.0, 400.0));
        Assert.All(network.TrueEntropy.Where(pair => !ReferenceStates.IsElementReference(pair.Key)), pair => Assert.InRange(pair.Value, 30.0, 400.0));
        Assert.All(entropies, measurement => Assert.InRange(measurement.Uncertainty, 0.05, 1.0));

        // and the 300 Gibbs-energy data mix ΔG, ln K and log10 K over balanced reactions among species with S°, at 298.15–1000 K
        Assert.Equal(300, gibbs.Length);
        Assert.Equal(
            [ThermoProperty.GibbsEnergy, ThermoProperty.LnEquilibriumConstant, ThermoProperty.Log10EquilibriumConstant],
            gibbs.Select(measurement => measurement.Property).Distinct().Order());
        Assert.All(gibbs, measurement =>
        {
            Assert.Empty(measurement.Equation.FindImbalances());
            Assert.All(measurement.Equation.Terms, term => Assert.Contains(term.Species, network.TrueEntropy.Keys));
            Assert.InRange(measurement.Temperature, 298.15, 1000.0);
            double lnKUncertainty = measurement.Property == ThermoProperty.Log10EquilibriumConstant ? measurement.Uncertainty * Math.Log(10.0) : measurement.Uncertainty;
            if (measurement.Property == ThermoProperty.GibbsEnergy)
            {
                Assert.InRange(measurement.Uncertainty, 0.2, 3.0);
            }
            else
            {
                Assert.InRange(lnKUncertainty, 0.0099, 0.5001);
            }
        });
        Assert.Contains(gibbs, measurement => measurement.Temperature > 700.0);
    }

    [Fact]
    public void Generate_EntropyAndGibbsData_ScatterAroundTheTruthByTheirUncertainty_AndOutliersLieFar()
    {
        // Given S° and Gibbs-energy data with 5 % outliers
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 4, SpeciesCount = 200, MeasurementCount = 100, EntropyFraction = 0.5, GibbsCount = 1500, OutlierFraction = 0.05 });

        // When each new value is compared with its truth (ΔrG° = ΔrH° − T·ΔrS°, ln K = −ΔrG°/RT)
        var sound = new List<double>();
        foreach (Measurement measurement in network.Network.Measurements.Skip(100))
        {
            double z = (measurement.Value - TrueValueOfAny(network, measurement)) / measurement.Uncertainty;
            if (network.OutlierIds.Contains(measurement.Id))
            {
                Assert.True(Math.Abs(z) > 8.0 - 5.0, $"{measurement.Id}: z = {z}");
            }
            else
            {
                sound.Add(z);
            }
        }

        // Then the sound ones are standard normal (n ≈ 1,500) and some are outliers
        Assert.All(sound, z => Assert.InRange(z, -5.5, 5.5));
        double mean = sound.Average();
        double sd = Math.Sqrt(sound.Sum(z => (z - mean) * (z - mean)) / (sound.Count - 1));
        Assert.InRange(mean, -0.12, 0.12);
        Assert.InRange(sd, 0.9, 1.1);
        Assert.InRange(network.OutlierIds.Count(id => int.Parse(id[1..], CultureInfo.InvariantCulture) > 100), 40, 120);
    }

    [Fact]
    public void Generate_JointWithoutOutliers_SolvesBackToTheTrueEnthalpiesAndEntropies()
    {
        // Given a dense outlier-free network with S° for every species and Gibbs-energy data
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 12, SpeciesCount = 30, MeasurementCount = 300, Locality = 6, EntropyFraction = 1.0, GibbsCount = 200 });

        // When the joint model is solved as given
        var solutions = new NetworkSolutions(network.Network, adjust: false);
        SolveReport enthalpy = solutions.Report(PropertyFamily.Enthalpy)!;
        SolveReport entropy = solutions.Report(PropertyFamily.Entropy)!;

        // Then every determined ΔfH° and S° is within 5 standard uncertainties of the truth, and χ²/ν is near 1
        Assert.All(new[] { (enthalpy, network.TrueFormationEnthalpy), (entropy, network.TrueEntropy) }, pair =>
        {
            (SolveReport report, IReadOnlyDictionary<Species, double> truth) = pair;
            Assert.Contains(report.Species, estimate => estimate.IsDetermined);
            Assert.All(report.Species.Where(estimate => estimate.IsDetermined), estimate =>
                Assert.InRange(estimate.Value, truth[estimate.Species] - (5 * estimate.Uncertainty), truth[estimate.Species] + (5 * estimate.Uncertainty)));
        });
        Assert.Equal(network.TrueEntropy.Count, entropy.Species.Count(estimate => estimate.IsDetermined));
        Assert.InRange(enthalpy.Solution.BirgeRatio, 0.8, 1.2);

        // and the derived ΔfG°(298.15 K) agrees with ΔfH° − T·ΔfS° of the truth
        SolveReport gibbs = solutions.Report(PropertyFamily.GibbsEnergy)!;
        Assert.Contains(gibbs.Species, estimate => estimate.IsDetermined);
        Assert.All(gibbs.Species.Where(estimate => estimate.IsDetermined), estimate =>
        {
            ChemicalEquation formation = ChemicalEquation.Formation(estimate.Species);
            double truth = formation.Terms.Sum(term => term.Coefficient.ToDouble() * (network.TrueFormationEnthalpy[term.Species] - (0.29815 * network.TrueEntropy[term.Species])));
            Assert.InRange(estimate.Value, truth - (5 * estimate.Uncertainty), truth + (5 * estimate.Uncertainty));
        });
    }

    [Fact]
    public void Write_WithEntropiesAndGibbsData_ReadsBackTheSameData_AndTheTruthListsEntropies()
    {
        // Given a small joint network
        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 6, SpeciesCount = 20, MeasurementCount = 40, EntropyFraction = 0.5, GibbsCount = 30, OutlierFraction = 0.1 });
        string folder = Path.Combine(Path.GetTempPath(), "pathfinder-tests-" + Guid.NewGuid().ToString("N"));
        try
        {
            // When written and read back
            SyntheticNetworkGenerator.Write(network, folder);
            NetworkReadResult read = NetworkReader.Read(Path.Combine(folder, "measurements.csv"));

            // Then the reader accepts every row with its property, unit and temperature, and the truth has one entropy line per S°
            Assert.Empty(read.Errors);
            Assert.Equal(DescribeFully(network.Network), DescribeFully(read.Network));
            string[] truth = File.ReadAllLines(Path.Combine(folder, "truth.txt"));
            Assert.Equal(network.TrueEntropy.Count, truth.Count(line => line.StartsWith("entropy,", StringComparison.Ordinal)));
            Assert.Contains(truth, line => line.StartsWith("entropy,\"C(cr,graphite)\",5.74", StringComparison.Ordinal));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Theory]
    [InlineData(-0.1, 0)]
    [InlineData(1.5, 0)]
    [InlineData(0.0, 10)]
    [InlineData(0.5, -1)]
    public void Generate_RejectsEntropyFractionsOutsideZeroToOne_AndGibbsDataWithoutEntropies(double fraction, int gibbs)
    {
        var options = new SyntheticNetworkOptions { SpeciesCount = 10, MeasurementCount = 10, EntropyFraction = fraction, GibbsCount = gibbs };

        Assert.Throws<ArgumentOutOfRangeException>(() => SyntheticNetworkGenerator.Generate(options));
    }

    private static double TrueValueOfAny(SyntheticNetwork network, Measurement measurement)
    {
        double Sum(IReadOnlyDictionary<Species, double> truth) => measurement.Equation.Terms.Sum(term => term.Coefficient.ToDouble() * truth[term.Species]);
        double gibbs() => Sum(network.TrueFormationEnthalpy) - (measurement.Temperature * Sum(network.TrueEntropy) / 1000.0);
        double lnK() => -1000.0 * gibbs() / (PhysicalConstants.GasConstant * measurement.Temperature);
        return measurement.Property switch
        {
            ThermoProperty.Enthalpy => Sum(network.TrueFormationEnthalpy),
            ThermoProperty.AbsoluteEntropy => Sum(network.TrueEntropy),
            ThermoProperty.GibbsEnergy => gibbs(),
            ThermoProperty.LnEquilibriumConstant => lnK(),
            ThermoProperty.Log10EquilibriumConstant => lnK() / Math.Log(10.0),
            _ => throw new ArgumentOutOfRangeException(nameof(measurement)),
        };
    }

    private static (string Data, string Truth) WriteAndRead(SyntheticNetwork network)
    {
        string folder = Path.Combine(Path.GetTempPath(), "pathfinder-tests-" + Guid.NewGuid().ToString("N"));
        try
        {
            SyntheticNetworkGenerator.Write(network, folder);
            return (File.ReadAllText(Path.Combine(folder, "measurements.csv")), File.ReadAllText(Path.Combine(folder, "truth.txt")));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    private static string Sha256(string text) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text.Replace("\r\n", "\n", StringComparison.Ordinal))));

    private static string[] DescribeFully(ReactionNetwork network) =>
        network.Measurements.Select(measurement => string.Create(CultureInfo.InvariantCulture, $"{measurement.Id} {measurement.Property.Code()} {measurement.Equation} {measurement.Value:R} {measurement.Uncertainty:R} {measurement.Unit.Symbol} {measurement.Temperature:R} {measurement.Source}")).ToArray();

    private static string[] Describe(SyntheticNetwork network) =>
        network.Network.Measurements.Select(measurement => string.Create(CultureInfo.InvariantCulture, $"{measurement.Id} {measurement.Equation} {measurement.Value:R} {measurement.Uncertainty:R} {measurement.Source}")).ToArray();
}
