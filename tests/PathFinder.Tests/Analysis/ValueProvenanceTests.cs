using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Solving;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Analysis;

public sealed class ValueProvenanceTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private SolveReport Solve() => AnalysisNetworks.SolveRedundant(_folder);

    private static ChemicalEquation Target(SolveReport report, string text) => AnalysisNetworks.Target(report, text);

    [Theory]
    [InlineData("CH3OH(g)")]
    [InlineData("CO(g) + 2 H2(g) -> CH3OH(g)")]
    [InlineData("CH4(g) + H2O(g) -> CO(g) + 3 H2(g)")]
    public void Trace_SharesAddUpToTheWholeVariance(string targetText)
    {
        // Given a solved redundant network and a determined target
        SolveReport report = Solve();
        ChemicalEquation target = Target(report, targetText);

        // When traced
        ValueProvenance provenance = ValueProvenance.Trace(report, target);

        // Then the contributions add up to the variance, shares to 1, and sources to the same total
        Assert.True(provenance.IsDetermined);
        Assert.Equal(provenance.Variance, provenance.Contributions.Sum(item => item.VarianceContribution), 1e-9);
        Assert.Equal(1.0, provenance.Contributions.Sum(item => item.Share), 1e-9);
        Assert.Equal(1.0, provenance.Sources.Sum(source => source.Share), 1e-9);
        Assert.Equal(provenance.Contributions.Count, provenance.Sources.Sum(source => source.Measurements));
        Assert.Equal(provenance.Contributions.OrderByDescending(item => item.VarianceContribution).Select(item => item.Index), provenance.Contributions.Select(item => item.Index));
    }

    [Fact]
    public void Trace_SensitivitiesEqualFiniteDifferencesOfReSolves()
    {
        // Given a solved network and the ΔfH° of methanol gas
        SolveReport report = Solve();
        ChemicalEquation target = Target(report, "CH3OH(g)");
        ValueProvenance provenance = ValueProvenance.Trace(report, target);
        SparseRow row = report.Model.Quantity(report.Family, target).Row;
        ObservationSystem system = report.Model.ToObservationSystem();
        const double step = 0.01;

        // When each measured value is moved by a small step and the network is solved again
        for (int i = 0; i < system.ObservationCount; i++)
        {
            Observation original = system.Observations[i];
            var moved = system.Observations.Select((observation, k) => k == i ? new Observation(original.Row, original.Value + step, original.Uncertainty) : observation);
            double shifted = WeightedLeastSquares.Solve(new ObservationSystem(system.UnknownCount, moved)).Estimate(row).Value;
            double finiteDifference = (shifted - provenance.Value) / step;

            // Then the traced sensitivity is the slope (the estimate is linear in the values); absent ones are zero
            double traced = provenance.Contributions.FirstOrDefault(item => item.Index == i)?.Sensitivity ?? 0.0;
            Assert.Equal(finiteDifference, traced, 1e-6);
        }
    }

    [Fact]
    public void Trace_GroupsBySourceLargestFirst()
    {
        SolveReport report = Solve();

        ValueProvenance provenance = ValueProvenance.Trace(report, Target(report, "CH3OH(g)"));

        // Then each source total is the sum over its measurements, and the list is sorted
        foreach (SourceContribution source in provenance.Sources)
        {
            Assert.Equal(provenance.Contributions.Where(item => item.Measurement.Source == source.Source).Sum(item => item.VarianceContribution), source.VarianceContribution, 1e-12);
        }

        Assert.Equal(provenance.Sources.OrderByDescending(source => source.VarianceContribution).Select(source => source.Source), provenance.Sources.Select(source => source.Source));
    }

    [Fact]
    public void Trace_SpeciesWithoutDataIsNotDeterminedAndNamed()
    {
        SolveReport report = Solve();
        ChemicalEquation target = ChemicalEquation.Formation(Species.Parse("C2H6(g)"));

        ValueProvenance provenance = ValueProvenance.Trace(report, target);

        Assert.False(provenance.IsDetermined);
        Assert.Equal(["C2H6(g)"], provenance.MissingSpecies.Select(species => species.Name));
        Assert.Empty(provenance.Contributions);
        Assert.Contains("C2H6(g)", provenance.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Trace_ReferenceStatesOnlyIsExactlyZero()
    {
        SolveReport report = Solve();
        ChemicalEquation target = ChemicalEquation.Formation(ReferenceStates.Of("H")).Add(ChemicalEquation.FromTerms([new EquationTerm(ReferenceStates.Of("O"), Fractions.Fraction.One)]));

        ValueProvenance provenance = ValueProvenance.Trace(report, target);

        Assert.True(provenance.IsDetermined);
        Assert.Equal(0.0, provenance.Value);
        Assert.Equal(0.0, provenance.Variance);
    }
}
