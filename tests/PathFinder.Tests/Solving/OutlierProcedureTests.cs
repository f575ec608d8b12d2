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

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void Run_GeneratedNetworkWithOutliers_FindsDetectableOutliersWithHighRecallAndPrecision(int seed)
    {
        // Given a generated network (300 species, 3 000 measurements) with 2 % gross errors of 8–30 σ
        (ObservationSystem system, double[] trueValues, bool[] isOutlier) = SyntheticSystems.Create(300, 3000, seed, 0.02);
        LeastSquaresSolution initial = WeightedLeastSquares.Solve(system);

        // When running the procedure with the default threshold 2 and α = 0.05
        OutlierResult result = OutlierProcedure.Run(system);

        // Then, with "detectable" meaning checkable and a lone-error expected |z| = |v − aᵀx_true|/u·√(1 − h)
        // at least z_crit + Φ⁻¹(0.95) (the error would be flagged with ≥ 95 % power if it were alone; the
        // reliability idea of data snooping, from memory), recall among detectable outliers and precision are ≥ 95 %
        double margin = 1.6448536269514722; // Φ⁻¹(0.95), standard normal table (from memory)
        var detectable = new HashSet<int>();
        for (int i = 0; i < system.ObservationCount; i++)
        {
            ObservationDiagnostics d = initial.Observations[i];
            Observation o = system.Observations[i];
            double expectedZ = Math.Abs(o.Value - trueValues[i]) / o.Uncertainty * Math.Sqrt(Math.Max(0.0, 1.0 - d.Leverage));
            if (isOutlier[i] && d.IsCheckable && expectedZ >= result.CriticalValue + margin)
            {
                detectable.Add(i);
            }
        }

        var suspects = result.Suspects.Select(s => s.ObservationIndex).ToHashSet();
        Assert.True(result.Converged);
        Assert.True(detectable.Count >= 40, $"only {detectable.Count} detectable outliers");
        double recall = (double)detectable.Count(suspects.Contains) / detectable.Count;
        double precision = (double)suspects.Count(i => isOutlier[i]) / suspects.Count;
        Assert.True(recall >= 0.95, $"recall {recall:P1}");
        Assert.True(precision >= 0.95, $"precision {precision:P1}");
    }

    [Theory]
    [InlineData(4)]
    [InlineData(5)]
    [InlineData(6)]
    public void Run_GeneratedNetworkWithoutOutliers_HasBirgeRatioNearOneAndNoSuspects(int seed)
    {
        // Given a generated network without gross errors (values = truth + Gaussian noise of their uncertainty)
        (ObservationSystem system, _, _) = SyntheticSystems.Create(300, 3000, seed, 0.0);

        // When solving it and running the procedure
        LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
        OutlierResult result = OutlierProcedure.Run(system);

        // Then χ²/dof is near 1 (its standard deviation is √(2/dof) ≈ 0.03 for dof ≈ 2 700; the Birge ratio √(χ²/dof)
        // has half of that), the threshold-2 loop makes only mild adjustments, and at most one measurement is a
        // suspect (the family-wise rate is α = 0.05, so the expected number of suspects is about 0.05)
        Assert.InRange(solution.BirgeRatio, 0.9, 1.1);
        Assert.True(result.Converged);
        Assert.NotEmpty(result.Adjustments);
        Assert.True(result.Suspects.Count <= 1, $"{result.Suspects.Count} suspects");
        Assert.All(result.Suspects, s => Assert.True(Math.Abs(s.LargestNormalizedResidual) > result.CriticalValue));
    }

    [Fact]
    public void Run_MildAdjustments_AreReportedButAreNotSuspects()
    {
        // Given a consistent system with ordinary noise (some |z| exceed 2 by chance)
        ObservationSystem system = TestSystems.RandomFullRank(41, unknowns: 20, extraRows: 400, noise: 1.0);

        // When running the procedure
        OutlierResult result = OutlierProcedure.Run(system);

        // Then measurements picked only below the critical value are adjustments, not suspects
        var suspectIndices = result.Suspects.Select(s => s.ObservationIndex).ToHashSet();
        Assert.True(result.CriticalValue > 2.0);
        Assert.Contains(result.Adjustments, a => !suspectIndices.Contains(a.ObservationIndex));
        Assert.All(
            result.Adjustments.Where(a => !suspectIndices.Contains(a.ObservationIndex)),
            a => Assert.True(Math.Abs(a.NormalizedResidualBefore) <= result.CriticalValue));
        Assert.Equal(system.ObservationCount, result.CheckableCount);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(4)]
    [InlineData(128)]
    public void Run_IncrementalSteps_MatchARefreshedSolveAtEveryStep(int blockSize)
    {
        // Given a small system with three gross errors and a low threshold (many interleaved adjustments)
        ObservationSystem clean = TestSystems.RandomFullRank(42, unknowns: 12, extraRows: 60, noise: 1.0);
        Observation[] rows = clean.Observations.ToArray();
        foreach ((int index, double shift) in new[] { (15, 9.0), (30, -12.0), (47, 6.0) })
        {
            rows[index] = new Observation(rows[index].Row, rows[index].Value + (shift * rows[index].Uncertainty), rows[index].Uncertainty);
        }

        var system = new ObservationSystem(clean.UnknownCount, rows);
        var options = new OutlierOptions { Threshold = 1.5, LowRankBlockSize = blockSize };

        // When running the procedure, and a reference that solves from scratch after every single adjustment
        OutlierResult result = OutlierProcedure.Run(system, options);
        var reference = new List<(int Index, double Z)>();
        ObservationSystem current = system;
        while (true)
        {
            LeastSquaresSolution fresh = WeightedLeastSquares.Solve(current);
            ObservationDiagnostics worst = fresh.Observations.Where(d => d.IsCheckable).MaxBy(d => Math.Abs(d.NormalizedResidual!.Value));
            if (Math.Abs(worst.NormalizedResidual!.Value) <= options.Threshold)
            {
                break;
            }

            reference.Add((worst.Index, worst.NormalizedResidual.Value));
            current = current.WithUncertainty(worst.Index, current.Observations[worst.Index].Uncertainty * options.InflationFactor);
        }

        // Then the same observations are adjusted in the same order with the same z values
        Assert.True(reference.Count >= 10, $"{reference.Count} steps");
        Assert.Equal(reference.Count, result.Adjustments.Count);
        for (int s = 0; s < reference.Count; s++)
        {
            Assert.Equal(reference[s].Index, result.Adjustments[s].ObservationIndex);
            Assert.Equal(reference[s].Z, result.Adjustments[s].NormalizedResidualBefore, 1e-9);
        }
    }

    [Theory]
    [InlineData(LinearAlgebraBackend.Automatic)]
    [InlineData(LinearAlgebraBackend.Managed)]
    public void Run_GeneratedNetwork_FinalSolutionEqualsFreshSolve(LinearAlgebraBackend backend)
    {
        // Given a generated network with outliers (one large component, thousands of rank-one changes folded in blocks)
        (ObservationSystem system, _, _) = SyntheticSystems.Create(150, 1500, 7, 0.02);

        // When running the procedure, and solving the final system from scratch
        var solver = new SolverOptions { Backend = backend };
        OutlierResult result = OutlierProcedure.Run(system, new OutlierOptions { LowRankBlockSize = 16, Solver = solver });
        LeastSquaresSolution fresh = WeightedLeastSquares.Solve(result.Solution.System, solver);

        // Then values, uncertainties and normalized residuals agree
        Assert.True(result.Adjustments.Count > 50);
        for (int j = 0; j < system.UnknownCount; j++)
        {
            Assert.Equal(fresh.Values[j], result.Solution.Values[j], 1e-8);
            Assert.Equal(fresh.StandardUncertainties[j], result.Solution.StandardUncertainties[j], 1e-10);
        }

        for (int i = 0; i < system.ObservationCount; i++)
        {
            Assert.Equal(fresh.Observations[i].NormalizedResidual!.Value, result.Solution.Observations[i].NormalizedResidual!.Value, 1e-7);
        }
    }

    [Theory]
    [InlineData(1, 0.05, 1.959963984540054)] // two-sided 5 % point of the standard normal (standard normal table, from memory)
    [InlineData(1, 0.01, 2.5758293035489004)] // two-sided 1 % point (standard normal table, from memory)
    public void SidakCriticalValue_SingleTest_IsTheTwoSidedNormalPoint(int count, double alpha, double expected)
    {
        Assert.Equal(expected, OutlierProcedure.SidakCriticalValue(count, alpha), 1e-9);
    }

    [Theory]
    [InlineData(20)]
    [InlineData(3000)]
    [InlineData(30000)]
    public void SidakCriticalValue_ManyTests_LiesJustBelowBonferroniAndControlsTheFamilyRate(int count)
    {
        // Given m tests at family-wise level 0.05
        double z = OutlierProcedure.SidakCriticalValue(count, 0.05);

        // Then m independent two-sided tests at z have family-wise rate 1 − (1 − 2Φ(−z))^m = 0.05 (definition of Šidák),
        // and z is below the Bonferroni value Φ⁻¹(1 − 0.05/(2m)) but above the single-test value
        double tail = 2.0 * MathNet.Numerics.Distributions.Normal.CDF(0.0, 1.0, -z);
        Assert.Equal(0.05, 1.0 - Math.Pow(1.0 - tail, count), 1e-9);
        double bonferroni = -MathNet.Numerics.Distributions.Normal.InvCDF(0.0, 1.0, 0.05 / (2.0 * count));
        Assert.True(z < bonferroni && z > bonferroni - 0.01);
        Assert.True(z > 1.96);
    }

    [Theory]
    [InlineData(5)]
    [InlineData(6)]
    public void Run_FromASolution_GivesTheSameResultAndLeavesTheSolutionUnchanged(int seed)
    {
        // Given a synthetic system with 2 % outliers and its solution as given
        (ObservationSystem system, _, _) = SyntheticSystems.Create(120, 1200, seed, 0.02);
        LeastSquaresSolution asGiven = WeightedLeastSquares.Solve(system);
        double[] valuesBefore = asGiven.Values.ToArray();
        double[] uncertaintiesBefore = asGiven.StandardUncertainties.ToArray();
        double covarianceBefore = asGiven.Covariance(0, 1);

        // When the procedure runs from the system and from the solution
        OutlierResult fromSystem = OutlierProcedure.Run(system);
        OutlierResult fromSolution = OutlierProcedure.Run(asGiven);

        // Then the adjustments, suspects and final values agree, and the given solution is untouched
        Assert.Equal(fromSystem.Adjustments.Select(a => (a.ObservationIndex, a.NewUncertainty)), fromSolution.Adjustments.Select(a => (a.ObservationIndex, a.NewUncertainty)));
        Assert.Equal(fromSystem.Suspects.Select(s => s.ObservationIndex), fromSolution.Suspects.Select(s => s.ObservationIndex));
        Assert.True(fromSolution.Adjustments.Count > 0);
        for (int j = 0; j < system.UnknownCount; j++)
        {
            if (fromSystem.Solution.IsDetermined(j))
            {
                Assert.Equal(fromSystem.Solution.Values[j], fromSolution.Solution.Values[j], 1e-9);
            }
        }

        Assert.Equal(valuesBefore, asGiven.Values.ToArray());
        Assert.Equal(uncertaintiesBefore, asGiven.StandardUncertainties.ToArray());
        Assert.Equal(covarianceBefore, asGiven.Covariance(0, 1));
        Assert.Equal(system.Observations.Select(o => o.Uncertainty), asGiven.System.Observations.Select(o => o.Uncertainty));
    }
}
