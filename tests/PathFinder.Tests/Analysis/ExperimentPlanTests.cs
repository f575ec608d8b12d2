using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Solving;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Analysis;

public sealed class ExperimentPlanTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private SolveReport Solve() => AnalysisNetworks.SolveRedundant(_folder);

    private static ChemicalEquation Parse(SolveReport report, string text) => AnalysisNetworks.Target(report, text);

    private static double ReSolvedUncertainty(ObservationSystem system, SparseRow target) =>
        WeightedLeastSquares.Solve(system).Estimate(target).StandardUncertainty;

    [Theory]
    [InlineData(0.5, null)]
    [InlineData(0.2, null)]
    [InlineData(0.5, 0.05)]
    public void Remeasurements_EqualFullReSolves(double factor, double? absolute)
    {
        // Given a solved network and a target
        SolveReport report = Solve();
        ChemicalEquation target = Parse(report, "CH3OH(g)");
        SparseRow row = report.Model.Quantity(report.Family, target).Row;
        ObservationSystem system = report.Model.ToObservationSystem();

        // When re-measurements are ranked by the rank-one formula
        ExperimentPlan plan = ExperimentPlan.Build(report, target, new ExperimentPlanOptions { UncertaintyFactor = factor, RemeasurementUncertainty = absolute, GenerateCandidates = false });

        // Then each predicted uncertainty equals a re-solve with that measurement's new uncertainty
        Assert.NotEmpty(plan.Remeasurements);
        foreach (RemeasurementSuggestion item in plan.Remeasurements)
        {
            Assert.Equal(absolute ?? (factor * item.CurrentUncertainty), item.NewUncertainty, 12);
            Assert.Equal(ReSolvedUncertainty(system.WithUncertainty(item.Index, item.NewUncertainty), row), item.TargetUncertainty, 9);
        }

        Assert.Equal(plan.Remeasurements.OrderBy(item => item.TargetUncertainty).Select(item => item.Index), plan.Remeasurements.Select(item => item.Index));
    }

    [Fact]
    public void Candidates_EqualFullReSolvesWithTheNewReaction()
    {
        // Given a solved network, a target, one user candidate and generated ones
        SolveReport report = Solve();
        ChemicalEquation target = Parse(report, "CO(g) + 2 H2(g) -> CH3OH(g)");
        SparseRow row = report.Model.Quantity(report.Family, target).Row;
        ObservationSystem system = report.Model.ToObservationSystem();
        ChemicalEquation given = Parse(report, "CH3OH(g) + H2O(g) -> CO2(g) + 3 H2(g)");

        // When candidates are ranked at an assumed uncertainty of 0.3 kJ/mol
        ExperimentPlan plan = ExperimentPlan.Build(report, target, new ExperimentPlanOptions { Candidates = [given], CandidateUncertainty = 0.3 });

        // Then every candidate's predicted uncertainty equals a re-solve with it added (any value: variances do not depend on it)
        Assert.Contains(plan.Candidates, item => item.Origin == CandidateOrigin.Given);
        Assert.Contains(plan.Candidates, item => item.Origin == CandidateOrigin.Pair);
        Assert.Contains(plan.Candidates, item => item.Origin == CandidateOrigin.Combustion);
        foreach (CandidateSuggestion item in plan.Candidates)
        {
            Assert.Empty(item.NewSpecies);
            SparseRow candidate = report.Model.Quantity(report.Family, item.Equation).Row;
            double expected = ReSolvedUncertainty(system.With(new Observation(candidate, 0.0, 0.3)), row);
            Assert.Equal(expected, item.TargetUncertainty, 9);
        }
    }

    [Fact]
    public void Candidates_TheTargetItselfCutsTheVarianceByTheTwoUncertainties()
    {
        // Given a target with uncertainty u and a direct measurement of it with uncertainty u_c
        SolveReport report = Solve();
        ChemicalEquation target = Parse(report, "CH3OH(g)");
        ExperimentPlan plan = ExperimentPlan.Build(report, target, new ExperimentPlanOptions { CandidateUncertainty = 0.4 });

        // Then the combination is the inverse-variance mean: 1/u'² = 1/u² + 1/u_c²
        CandidateSuggestion direct = plan.Candidates.Single(item => item.Origin == CandidateOrigin.Target);
        double u = plan.Current.StandardUncertainty;
        Assert.Equal(1.0 / Math.Sqrt((1.0 / (u * u)) + (1.0 / 0.16)), direct.TargetUncertainty, 9);
    }

    [Fact]
    public void Candidates_ASpeciesWithoutDataCannotHelp()
    {
        SolveReport report = Solve();
        ChemicalEquation target = Parse(report, "CH3OH(g)");
        ChemicalEquation ethane = ChemicalEquation.Formation(Species.Parse("C2H6(g)"));

        ExperimentPlan plan = ExperimentPlan.Build(report, target, new ExperimentPlanOptions { Candidates = [ethane], GenerateCandidates = false, CandidateUncertainty = 0.1 });

        CandidateSuggestion only = Assert.Single(plan.Candidates);
        Assert.Equal(["C2H6(g)"], only.NewSpecies.Select(species => species.Name));
        Assert.Equal(0.0, only.VarianceReduction, 12);
    }

    [Fact]
    public void Build_UndeterminedTargetRanksNothing()
    {
        SolveReport report = Solve();

        ExperimentPlan plan = ExperimentPlan.Build(report, ChemicalEquation.Formation(Species.Parse("C2H6(g)")));

        Assert.False(plan.IsDetermined);
        Assert.Empty(plan.Remeasurements);
        Assert.Empty(plan.Candidates);
    }

    [Fact]
    public void Build_DefaultCandidateUncertaintyIsTheMedianOfTheData()
    {
        SolveReport report = Solve();

        ExperimentPlan plan = ExperimentPlan.Build(report, Parse(report, "CH3OH(g)"));

        // Uncertainties 0.1 0.1 0.2 0.3 0.3 0.4 0.5 0.5 0.6 0.7: median (0.3 + 0.4)/2
        Assert.Equal(0.35, plan.CandidateUncertainty, 12);
    }
}
