using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Synthetic;

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

    private static string[] Describe(SyntheticNetwork network) =>
        network.Network.Measurements.Select(measurement => string.Create(CultureInfo.InvariantCulture, $"{measurement.Id} {measurement.Equation} {measurement.Value:R} {measurement.Uncertainty:R} {measurement.Source}")).ToArray();
}
