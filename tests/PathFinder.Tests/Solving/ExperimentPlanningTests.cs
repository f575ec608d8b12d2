using PathFinder.Solving;

namespace PathFinder.Tests.Solving;

public sealed class ExperimentPlanningTests
{
    [Fact]
    public void Remeasurements_VarianceEqualsResolveWithBetterUncertainty()
    {
        // Given a random system and a derived quantity
        ObservationSystem system = TestSystems.RandomFullRank(seed: 41, unknowns: 7, extraRows: 20);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        SparseRow quantity = SparseRow.Difference(6, 1);

        // When planning re-measurements at a third of the current uncertainty
        IReadOnlyList<RemeasurementOption> options = ExperimentPlanning.Remeasurements(solution, quantity, 1.0 / 3.0);

        // Then each predicted variance equals a full re-solve with that uncertainty, and the list is sorted
        Assert.Equal(system.ObservationCount, options.Count);
        foreach (RemeasurementOption option in options)
        {
            ObservationSystem better = system.WithUncertainty(option.ObservationIndex, option.NewUncertainty);
            double variance = WeightedLeastSquares.Solve(better).Estimate(quantity).Variance;
            Assert.Equal(variance, option.Variance, 1e-11);
            Assert.True(option.Variance <= option.CurrentVariance + 1e-15);
        }

        Assert.True(options.Zip(options.Skip(1)).All(p => p.First.Variance <= p.Second.Variance));
    }

    [Fact]
    public void VarianceWithNewObservation_EqualsResolveWithTheRowAdded()
    {
        // Given a random system
        ObservationSystem system = TestSystems.RandomFullRank(seed: 42, unknowns: 7, extraRows: 10);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        SparseRow quantity = SparseRow.Of((3, 1.0), (4, -0.5));
        SparseRow[] candidates = [SparseRow.Unit(3), SparseRow.Difference(4, 0), SparseRow.Of((1, 2.0), (3, -1.0), (5, 1.0))];

        foreach (SparseRow candidate in candidates)
        {
            // When predicting the variance after adding the candidate with u = 0.7
            double predicted = ExperimentPlanning.VarianceWithNewObservation(solution, quantity, candidate, 0.7);

            // Then it equals a re-solve with the candidate appended (its value does not matter)
            double resolved = WeightedLeastSquares.Solve(system.With(new Observation(candidate, 1.0, 0.7))).Estimate(quantity).Variance;
            Assert.Equal(resolved, predicted, 1e-11);
        }
    }

    [Fact]
    public void VarianceWithNewObservation_NonEstimableCandidate_LeavesVarianceUnchanged()
    {
        // Given x0 determined and x1 free
        var system = new ObservationSystem(2,
        [
            new Observation(SparseRow.Unit(0), 1.0, 0.5),
            new Observation(SparseRow.Unit(0), 1.2, 0.5),
        ]);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        SparseRow candidate = SparseRow.Of((0, 1.0), (1, 1.0));

        // When adding a row that involves the free x1
        double predicted = ExperimentPlanning.VarianceWithNewObservation(solution, SparseRow.Unit(0), candidate, 0.1);

        // Then the variance of x0 is unchanged, as a re-solve confirms
        double resolved = WeightedLeastSquares.Solve(system.With(new Observation(candidate, 5.0, 0.1))).Estimate(SparseRow.Unit(0)).Variance;
        Assert.Equal(0.125, predicted, 12);
        Assert.Equal(resolved, predicted, 12);
    }

    [Fact]
    public void Remeasurements_NotEstimableQuantity_Throws()
    {
        var system = new ObservationSystem(2, [new Observation(SparseRow.Unit(0), 1.0, 0.5)]);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        Assert.Throws<ArgumentException>(() => ExperimentPlanning.Remeasurements(solution, SparseRow.Unit(1), 0.5));
    }
}
