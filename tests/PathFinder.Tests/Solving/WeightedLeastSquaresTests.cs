using MathNet.Numerics.LinearAlgebra;
using PathFinder.Solving;

namespace PathFinder.Tests.Solving;

public sealed class WeightedLeastSquaresTests
{
    public static TheoryData<int, LinearAlgebraBackend> SeedsAndBackends()
    {
        var data = new TheoryData<int, LinearAlgebraBackend>();
        foreach (int seed in new[] { 1, 2, 3, 4, 5 })
        {
            data.Add(seed, LinearAlgebraBackend.Managed);
            if (WeightedLeastSquares.IsNativeBackendAvailable)
            {
                data.Add(seed, LinearAlgebraBackend.Native);
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(SeedsAndBackends))]
    public void Solve_FullRankRandomSystem_MatchesDenseQrReference(int seed, LinearAlgebraBackend backend)
    {
        // Given a seeded random full-rank system
        ObservationSystem system = TestSystems.RandomFullRank(seed, unknowns: 12, extraRows: 30);

        // When solving it, and solving it densely with MathNet QR of √W·A as an independent reference
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system, new SolverOptions { Backend = backend });
        (Vector<double> x, Matrix<double> covariance) = TestSystems.DenseReference(system);

        // Then values, uncertainties and covariances agree
        Assert.Equal(backend, solution.BackendUsed);
        Assert.Empty(solution.UndeterminedUnknowns);
        Assert.Equal(12, solution.Rank);
        for (int j = 0; j < 12; j++)
        {
            Assert.Equal(x[j], solution.Values[j], 1e-9);
            Assert.Equal(Math.Sqrt(covariance[j, j]), solution.StandardUncertainties[j], 1e-10);
            for (int k = 0; k < 12; k++)
            {
                Assert.Equal(covariance[j, k], solution.Covariance(j, k), 1e-10);
            }
        }

        double chiSquared = system.Observations.Sum(o => Math.Pow((o.Value - o.Row.Dot(x.ToArray())) / o.Uncertainty, 2));
        Assert.Equal(chiSquared, solution.ChiSquared, 1e-7 * chiSquared);
        Assert.Equal(system.ObservationCount - 12, solution.DegreesOfFreedom);
    }

    [Fact]
    public void Solve_WeightedMeanOfOneQuantity_IsTextbookWeightedAverage()
    {
        // Given three independent measurements of one quantity
        double[] values = [10.2, 9.7, 10.5];
        double[] uncertainties = [0.2, 0.5, 0.4];
        var system = new ObservationSystem(1, values.Select((v, i) => new Observation(SparseRow.Unit(0), v, uncertainties[i])));

        // When solving
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);

        // Then x = Σwv/Σw and u = 1/√Σw (Taylor, An Introduction to Error Analysis, 2nd ed., 1997, ch. 7, from memory)
        double[] w = uncertainties.Select(u => 1.0 / (u * u)).ToArray();
        double mean = values.Zip(w, (v, wi) => v * wi).Sum() / w.Sum();
        Assert.Equal(mean, solution.Values[0], 12);
        Assert.Equal(1.0 / Math.Sqrt(w.Sum()), solution.StandardUncertainties[0], 12);
        Assert.Equal(2, solution.DegreesOfFreedom);
    }

    [Fact]
    public void Solve_HandComputableTriangle_GivesChiSquaredDofAndBirgeRatio()
    {
        // Given x0 = 1 ± 1, x1 = 2 ± 1 and x0 − x1 = 0 ± 1
        var system = new ObservationSystem(2,
        [
            new Observation(SparseRow.Unit(0), 1.0, 1.0),
            new Observation(SparseRow.Unit(1), 2.0, 1.0),
            new Observation(SparseRow.Difference(0, 1), 0.0, 1.0),
        ]);

        // When solving
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);

        // Then by hand: N = [[2,−1],[−1,2]], b = (1, 2), x = (4/3, 5/3), residuals ∓1/3, χ² = 1/3, dof = 1
        Assert.Equal(4.0 / 3.0, solution.Values[0], 12);
        Assert.Equal(5.0 / 3.0, solution.Values[1], 12);
        Assert.Equal(Math.Sqrt(2.0 / 3.0), solution.StandardUncertainties[0], 12);
        Assert.Equal(1.0 / 3.0, solution.Covariance(0, 1), 12);
        Assert.Equal(1.0 / 3.0, solution.ChiSquared, 12);
        Assert.Equal(1, solution.DegreesOfFreedom);
        Assert.Equal(Math.Sqrt(1.0 / 3.0), solution.BirgeRatio, 12);
    }

    [Fact]
    public void Solve_NoRedundancy_BirgeRatioIsNaN()
    {
        var system = new ObservationSystem(2, [new Observation(SparseRow.Unit(0), 1.0, 1.0), new Observation(SparseRow.Difference(1, 0), 2.0, 1.0)]);
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        Assert.Equal(0, solution.DegreesOfFreedom);
        Assert.True(double.IsNaN(solution.BirgeRatio));
        Assert.Equal(3.0, solution.Values[1], 12);
    }

    [Theory]
    [InlineData(LinearAlgebraBackend.Managed)]
    [InlineData(LinearAlgebraBackend.Automatic)]
    public void Solve_IsolatedGroupAndUnobservedUnknown_AreUndeterminedWithoutNumbers(LinearAlgebraBackend backend)
    {
        // Given x0, x1 tied to the references, a group {2, 3, 4} linked only among itself, and x5 in no observation
        var system = new ObservationSystem(6,
        [
            new Observation(SparseRow.Unit(0), -100.0, 1.0),
            new Observation(SparseRow.Difference(1, 0), 20.0, 1.0),
            new Observation(SparseRow.Difference(2, 3), 5.0, 1.0),
            new Observation(SparseRow.Difference(3, 4), 7.0, 1.0),
            new Observation(SparseRow.Difference(2, 4), 12.5, 1.0),
        ]);

        // When solving
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system, new SolverOptions { Backend = backend });

        // Then 2..5 are undetermined, with NaN values, and {2,3,4} is one relative group (ratios 1)
        Assert.Equal([2, 3, 4, 5], solution.UndeterminedUnknowns);
        Assert.True(solution.IsDetermined(1));
        Assert.Equal(-80.0, solution.Values[1], 10);
        Assert.All(new[] { 2, 3, 4, 5 }, j => Assert.True(double.IsNaN(solution.Values[j])));
        Assert.All(new[] { 2, 3, 4, 5 }, j => Assert.True(double.IsNaN(solution.StandardUncertainties[j])));
        Assert.True(double.IsNaN(solution.Covariance(1, 2)));
        RelativeGroup group = Assert.Single(solution.RelativeGroups);
        Assert.Equal([2, 3, 4], group.Members);
        Assert.All(group.Ratios, r => Assert.Equal(1.0, r, 10));

        // And differences inside the group are estimable, single members are not
        DerivedEstimate difference = solution.Estimate(SparseRow.Difference(2, 4));
        Assert.True(difference.IsEstimable);
        Assert.False(solution.Estimate(SparseRow.Unit(3)).IsEstimable);
        Assert.True(double.IsNaN(solution.Estimate(SparseRow.Unit(3)).Value));
        Assert.False(solution.IsEstimable(SparseRow.Difference(1, 2)));
        Assert.Equal(4, solution.Rank);
        Assert.Equal(3, solution.ComponentCount);
    }

    [Fact]
    public void Solve_StoichiometricRelativePair_ReportsRatioOfTheKnownCombination()
    {
        // Given only X − 2Y measured (X = 1, Y = 2), beside a determined x0
        var system = new ObservationSystem(3,
        [
            new Observation(SparseRow.Unit(0), 4.0, 0.5),
            new Observation(SparseRow.Of((1, 1.0), (2, -2.0)), 30.0, 1.0),
        ]);

        // When solving
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);

        // Then the pair is a relative group whose combination x_Y − r·x_X is the measured one up to scale
        RelativeGroup group = Assert.Single(solution.RelativeGroups);
        Assert.Equal([1, 2], group.Members);
        Assert.Equal(0.5, group.Ratios[1], 10);
        DerivedEstimate known = solution.Estimate(group.RelativeCombination(1));
        Assert.True(known.IsEstimable);
        Assert.Equal(-15.0, known.Value, 10);
        Assert.Equal(0.5, known.StandardUncertainty, 10);
    }

    [Theory]
    [InlineData(LinearAlgebraBackend.Managed)]
    [InlineData(LinearAlgebraBackend.Automatic)]
    public void Solve_RankDeficiencyInsideOneComponent_IsFoundByPivotedCholesky(LinearAlgebraBackend backend)
    {
        // Given x0 = 5, x1 − x2 = 3 and x0 + x1 − x2 = 8.2: one component, rank 2 of 3
        var system = new ObservationSystem(3,
        [
            new Observation(SparseRow.Unit(0), 5.0, 1.0),
            new Observation(SparseRow.Difference(1, 2), 3.0, 1.0),
            new Observation(SparseRow.Of((0, 1.0), (1, 1.0), (2, -1.0)), 8.2, 1.0),
        ]);

        // When solving
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system, new SolverOptions { Backend = backend });

        // Then x0 is determined, x1 and x2 only relative to each other
        Assert.Equal(1, solution.ComponentCount);
        Assert.Equal(2, solution.Rank);
        Assert.Equal([1, 2], solution.UndeterminedUnknowns);
        Assert.Equal(1, solution.DegreesOfFreedom);
        RelativeGroup group = Assert.Single(solution.RelativeGroups);
        Assert.Equal([1, 2], group.Members);

        // And the estimable quantities equal the hand solution: reparametrize d = x1 − x2, then
        // x0 and d follow from x0 = 5, d = 3, x0 + d = 8.2 with N = [[2,1],[1,2]], b = (13.2, 11.2)
        Assert.Equal((2.0 * 13.2 - 11.2) / 3.0, solution.Values[0], 10);
        Assert.Equal((2.0 * 11.2 - 13.2) / 3.0, solution.Estimate(SparseRow.Difference(1, 2)).Value, 10);
        Assert.Equal(Math.Sqrt(2.0 / 3.0), solution.StandardUncertainties[0], 10);
    }

    [Fact]
    public void Solve_NativeAndManagedBackends_Agree()
    {
        // Given a larger random system plus a rank-deficient island (on a machine without OpenBLAS, Automatic
        // falls back to managed and this test compares managed with itself)
        ObservationSystem core = TestSystems.RandomFullRank(seed: 11, unknowns: 150, extraRows: 400);
        var island = new ObservationSystem(155, core.Observations.Concat(
        [
            new Observation(SparseRow.Difference(150, 151), 1.0, 1.0),
            new Observation(SparseRow.Of((151, 2.0), (152, -1.0)), 2.0, 1.0),
            new Observation(SparseRow.Of((3, 1.0), (153, 1.0), (154, -1.0)), 3.0, 1.0),
        ]));

        // When solving with both backends
        LeastSquaresSolution managed = WeightedLeastSquares.Solve(island, new SolverOptions { Backend = LinearAlgebraBackend.Managed });
        LeastSquaresSolution automatic = WeightedLeastSquares.Solve(island, new SolverOptions { Backend = LinearAlgebraBackend.Automatic });

        // Then everything agrees
        Assert.Equal(managed.UndeterminedUnknowns, automatic.UndeterminedUnknowns);
        Assert.Equal([150, 151, 152, 153, 154], managed.UndeterminedUnknowns);
        Assert.Equal(managed.Rank, automatic.Rank);
        for (int j = 0; j < 150; j++)
        {
            Assert.Equal(managed.Values[j], automatic.Values[j], 1e-9);
            Assert.Equal(managed.StandardUncertainties[j], automatic.StandardUncertainties[j], 1e-12);
            Assert.Equal(managed.Covariance(j, (j * 7) % 150), automatic.Covariance(j, (j * 7) % 150), 1e-12);
        }

        for (int i = 0; i < island.ObservationCount; i++)
        {
            Assert.Equal(managed.Observations[i].Leverage, automatic.Observations[i].Leverage, 1e-10);
            Assert.Equal(managed.Observations[i].Residual, automatic.Observations[i].Residual, 1e-9);
            Assert.Equal(managed.Observations[i].IsCheckable, automatic.Observations[i].IsCheckable);
        }

        Assert.Equal(managed.ChiSquared, automatic.ChiSquared, 1e-8);
    }
}
