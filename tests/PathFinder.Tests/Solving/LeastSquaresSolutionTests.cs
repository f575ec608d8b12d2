using PathFinder.Solving;

namespace PathFinder.Tests.Solving;

public sealed class LeastSquaresSolutionTests
{
    [Theory]
    [InlineData(0)]
    [InlineData(7)]
    [InlineData(20)]
    [InlineData(33)]
    public void LeaveOneOutPrediction_EqualsSolveWithoutThatObservation(int index)
    {
        // Given a random system and its solution
        ObservationSystem system = TestSystems.RandomFullRank(seed: 21, unknowns: 8, extraRows: 30);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        ObservationDiagnostics d = solution.Observations[index];
        Assert.True(d.IsCheckable);

        // When re-solving without observation i and predicting its quantity from the rest
        LeastSquaresSolution without = WeightedLeastSquares.Solve(system.Without(index));
        DerivedEstimate prediction = without.Estimate(system.Observations[index].Row);

        // Then the closed-form leave-one-out prediction and its uncertainty match
        Assert.Equal(prediction.Value, d.LeaveOneOutPrediction!.Value, 1e-8);
        Assert.Equal(prediction.StandardUncertainty, d.LeaveOneOutUncertainty!.Value, 1e-10);
    }

    [Fact]
    public void NormalizedResidual_FollowsItsDefinition()
    {
        // Given a random system
        ObservationSystem system = TestSystems.RandomFullRank(seed: 22, unknowns: 6, extraRows: 20);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);

        foreach (ObservationDiagnostics d in solution.Observations)
        {
            // Then z = r/√(u² − aᵀCa), with aᵀCa the variance of the fitted value computed independently,
            Observation o = system.Observations[d.Index];
            DerivedEstimate fitted = solution.Estimate(o.Row);
            Assert.Equal(o.Value - fitted.Value, d.Residual, 1e-9);
            Assert.Equal(d.Residual / Math.Sqrt((o.Uncertainty * o.Uncertainty) - fitted.Variance), d.NormalizedResidual!.Value, 1e-8);
            Assert.Equal(fitted.Variance / (o.Uncertainty * o.Uncertainty), d.Leverage, 1e-10);

            // and equals the leave-one-out discrepancy over its standard uncertainty √(u² + Var ŷ₍₋ᵢ₎)
            double loo = (o.Value - d.LeaveOneOutPrediction!.Value)
                / Math.Sqrt((o.Uncertainty * o.Uncertainty) + Math.Pow(d.LeaveOneOutUncertainty!.Value, 2));
            Assert.Equal(loo, d.NormalizedResidual.Value, 1e-8);
        }
    }

    [Fact]
    public void Leverages_SumToRank()
    {
        // The hat matrix is a projection of rank r, so Σ hᵢ = r (a standard identity of least squares, from memory)
        ObservationSystem system = TestSystems.RandomFullRank(seed: 23, unknowns: 10, extraRows: 25);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        Assert.Equal(solution.Rank, solution.Observations.Sum(d => d.Leverage), 1e-9);
    }

    [Fact]
    public void ObservationThatAloneFixesAnUnknown_IsReportedNotCheckable()
    {
        // Given x0 measured twice and x1 only through x1 − x0
        var system = new ObservationSystem(2,
        [
            new Observation(SparseRow.Unit(0), 10.0, 1.0),
            new Observation(SparseRow.Unit(0), 11.0, 1.0),
            new Observation(SparseRow.Difference(1, 0), 4.0, 0.3),
        ]);

        // When solving
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);

        // Then the x1 − x0 observation has leverage 1, residual 0 and no normalized residual or LOO prediction
        ObservationDiagnostics lonely = solution.Observations[2];
        Assert.False(lonely.IsCheckable);
        Assert.Null(lonely.NormalizedResidual);
        Assert.Null(lonely.LeaveOneOutPrediction);
        Assert.Null(lonely.LeaveOneOutUncertainty);
        Assert.Equal(1.0, lonely.Leverage, 10);
        Assert.Equal(0.0, lonely.Residual, 10);
        Assert.True(solution.Observations[0].IsCheckable);
        Assert.Equal(-0.5 / Math.Sqrt(0.5), solution.Observations[0].NormalizedResidual!.Value, 10);
        Assert.Equal(14.5, solution.Values[1], 10);
    }

    [Fact]
    public void Estimate_CrossComponentCombination_AddsIndependentVariances()
    {
        // Given two separate anchored unknowns
        var system = new ObservationSystem(2, [new Observation(SparseRow.Unit(0), 1.0, 0.3), new Observation(SparseRow.Unit(1), 2.0, 0.4)]);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);

        // When estimating 2·x0 − x1
        DerivedEstimate estimate = solution.Estimate(SparseRow.Of((0, 2.0), (1, -1.0)));

        // Then the variance is 4·0.09 + 0.16 and the covariance across components is zero
        Assert.Equal(0.0, estimate.Value, 12);
        Assert.Equal((4.0 * 0.09) + 0.16, estimate.Variance, 12);
        Assert.Equal(0.0, solution.Covariance(0, 1));
        Assert.Equal(2, solution.ComponentCount);
    }

    [Fact]
    public void Provenance_ContributionsSumToVarianceAndSensitivitiesAreDerivatives()
    {
        // Given a random system and a derived quantity
        ObservationSystem system = TestSystems.RandomFullRank(seed: 24, unknowns: 9, extraRows: 25);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        SparseRow quantity = SparseRow.Of((2, 1.0), (7, -2.0), (5, 0.5));

        // When asking where it comes from
        QuantityProvenance provenance = solution.Provenance(quantity);

        // Then the contributions add up to aᵀCa, shares to 1, and they are sorted
        Assert.Equal(provenance.Estimate.Variance, provenance.Contributions.Sum(e => e.VarianceContribution), 1e-10);
        Assert.Equal(1.0, provenance.Contributions.Sum(e => e.Share), 1e-10);
        Assert.Equal(system.ObservationCount, provenance.Contributions.Count);
        for (int k = 1; k < provenance.Contributions.Count; k++)
        {
            Assert.True(provenance.Contributions[k - 1].VarianceContribution >= provenance.Contributions[k].VarianceContribution);
        }

        // And each sensitivity is the derivative of aᵀx̂ with respect to vᵢ (the estimate is linear in v)
        foreach (ProvenanceEntry entry in provenance.Contributions.Take(5))
        {
            Observation[] rows = system.Observations.ToArray();
            Observation o = rows[entry.ObservationIndex];
            rows[entry.ObservationIndex] = new Observation(o.Row, o.Value + 1.0, o.Uncertainty);
            double shifted = WeightedLeastSquares.Solve(new ObservationSystem(system.UnknownCount, rows)).Estimate(quantity).Value;
            Assert.Equal(entry.Sensitivity, shifted - provenance.Estimate.Value, 1e-8);
        }
    }

    [Fact]
    public void Provenance_NotEstimableQuantity_HasNoContributions()
    {
        var system = new ObservationSystem(2, [new Observation(SparseRow.Unit(0), 1.0, 1.0)]);
        QuantityProvenance provenance = WeightedLeastSquares.Solve(system).Provenance(SparseRow.Unit(1));
        Assert.False(provenance.Estimate.IsEstimable);
        Assert.Empty(provenance.Contributions);
    }
}
