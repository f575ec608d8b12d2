using PathFinder.Solving;

namespace PathFinder.Tests.Solving;

public sealed class OutlierProcedureTests
{
    /// <summary>A redundant system with small noise (0.2 u) and one value shifted by +8 u.</summary>
    private static (ObservationSystem System, int Outlier) SpoiledSystem(int seed)
    {
        ObservationSystem clean = TestSystems.RandomFullRank(seed, unknowns: 10, extraRows: 50, noise: 0.2);
        var random = new Random(seed);
        int outlier = clean.UnknownCount + random.Next(50);
        Observation[] rows = clean.Observations.ToArray();
        Observation o = rows[outlier];
        rows[outlier] = new Observation(o.Row, o.Value + (8.0 * o.Uncertainty), o.Uncertainty);
        return (new ObservationSystem(clean.UnknownCount, rows), outlier);
    }

    [Theory]
    [InlineData(31)]
    [InlineData(32)]
    [InlineData(33)]
    public void Run_InjectedOutlier_IsTheFirstSuspect(int seed)
    {
        // Given a consistent system with one injected outlier
        (ObservationSystem system, int outlier) = SpoiledSystem(seed);

        // When running the procedure
        OutlierResult result = OutlierProcedure.Run(system);

        // Then it converges and the injected observation is the most serious suspect
        Assert.True(result.Converged);
        Assert.Equal(outlier, result.Suspects[0].ObservationIndex);
        Assert.True(result.Suspects[0].TotalInflation > 1.0);
        Assert.All(result.Solution.Observations.Where(d => d.IsCheckable), d => Assert.True(Math.Abs(d.NormalizedResidual!.Value) <= 2.0));
    }

    [Theory]
    [InlineData(1)]
    [InlineData(3)]
    [InlineData(1000)]
    public void Run_RankOneUpdatedResult_EqualsFreshSolve(int refactorizationInterval)
    {
        // Given a system with an outlier, and refactorization every step, every third step or never
        (ObservationSystem system, _) = SpoiledSystem(34);
        var options = new OutlierOptions { RefactorizationInterval = refactorizationInterval, Threshold = 1.0 };

        // When running the procedure, and solving the final system from scratch
        OutlierResult result = OutlierProcedure.Run(system, options);
        LeastSquaresSolution fresh = WeightedLeastSquares.Solve(result.Solution.System);

        // Then the updated solution equals the fresh one
        Assert.True(result.Adjustments.Count >= 3);
        for (int j = 0; j < system.UnknownCount; j++)
        {
            Assert.Equal(fresh.Values[j], result.Solution.Values[j], 1e-9);
            for (int k = 0; k < system.UnknownCount; k++)
            {
                Assert.Equal(fresh.Covariance(j, k), result.Solution.Covariance(j, k), 1e-11);
            }
        }

        for (int i = 0; i < system.ObservationCount; i++)
        {
            Assert.Equal(fresh.Observations[i].NormalizedResidual!.Value, result.Solution.Observations[i].NormalizedResidual!.Value, 1e-8);
        }

        Assert.Equal(fresh.ChiSquared, result.Solution.ChiSquared, 1e-8);
    }

    [Fact]
    public void Run_RecordsEachAdjustment()
    {
        (ObservationSystem system, int outlier) = SpoiledSystem(35);
        OutlierResult result = OutlierProcedure.Run(system, new OutlierOptions { InflationFactor = 3.0 });

        UncertaintyAdjustment first = result.Adjustments[0];
        Assert.Equal(1, first.Iteration);
        Assert.Equal(outlier, first.ObservationIndex);
        Assert.True(first.NormalizedResidualBefore > 2.0);
        Assert.Equal(system.Observations[outlier].Uncertainty, first.OldUncertainty);
        Assert.Equal(3.0 * first.OldUncertainty, first.NewUncertainty, 12);
        OutlierSuspect suspect = result.Suspects.Single(s => s.ObservationIndex == outlier);
        Assert.Equal(result.Adjustments.Count(a => a.ObservationIndex == outlier), suspect.Adjustments);
        Assert.Equal(result.Solution.System.Observations[outlier].Uncertainty, suspect.FinalUncertainty, 12);
    }

    [Fact]
    public void Run_IterationCapReached_IsNotConverged()
    {
        (ObservationSystem system, _) = SpoiledSystem(36);
        OutlierResult result = OutlierProcedure.Run(system, new OutlierOptions { MaxIterations = 0 });
        Assert.False(result.Converged);
        Assert.Empty(result.Adjustments);
        Assert.Empty(result.Suspects);
    }
}
