using PathFinder.Analysis;
using PathFinder.Data;
using PathFinder.Solving;
using PathFinder.Synthetic;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Solving;

public sealed class RepeatabilityTests
{
    [Fact]
    public void Solve_GivesBitForBitTheSameNumbers_EveryTimeInOneProcess()
    {
        // Given the demo network's enthalpy model (a user re-running a command expects identical output)
        PropertyModel model = PropertyModel.Build(NetworkReader.Read(RepoPaths.Demo("combustion-lab")).Network, PropertyFamily.Enthalpy);
        ObservationSystem system = model.ToObservationSystem();
        double[] first = WeightedLeastSquares.Solve(system).Values.ToArray();

        // When it is solved many times
        for (int run = 0; run < 30; run++)
        {
            double[] again = WeightedLeastSquares.Solve(system).Values.ToArray();

            // Then every value is identical to the last bit
            for (int i = 0; i < first.Length; i++)
            {
                Assert.Equal(BitConverter.DoubleToInt64Bits(first[i]), BitConverter.DoubleToInt64Bits(again[i]));
            }
        }
    }

    [Fact]
    public async Task Solve_GivesBitForBitTheSameNumbers_WhileASuspectProcedureRunsBeside()
    {
        // Given the demo model, and a suspect procedure running on another thread (OpenBLAS's thread count is
        // global, and changing it while the other thread was inside a call once changed a result by 65 units in the
        // last place: calls must take turns)
        PropertyModel model = PropertyModel.Build(NetworkReader.Read(RepoPaths.Demo("combustion-lab")).Network, PropertyFamily.Enthalpy);
        ObservationSystem system = model.ToObservationSystem();
        double[] first = WeightedLeastSquares.Solve(system).Values.ToArray();
        ObservationSystem busy = TestSystems.RandomFullRank(7, unknowns: 60, extraRows: 600);
        using var stop = new CancellationTokenSource();
        Task beside = Task.Run(() =>
        {
            while (!stop.IsCancellationRequested)
            {
                OutlierProcedure.Run(busy, new OutlierOptions { LowRankBlockSize = 4 });
            }
        });

        // When it is solved again and again meanwhile
        try
        {
            for (int run = 0; run < 30; run++)
            {
                double[] again = WeightedLeastSquares.Solve(system).Values.ToArray();

                // Then every value is identical to the last bit
                for (int i = 0; i < first.Length; i++)
                {
                    Assert.Equal(BitConverter.DoubleToInt64Bits(first[i]), BitConverter.DoubleToInt64Bits(again[i]));
                }
            }
        }
        finally
        {
            await stop.CancelAsync();
            await beside;
        }
    }

    [Fact]
    public void Solve_LargeModel_BuiltAndSolvedOnSeveralCores_GivesBitForBitTheSameNumbersEveryTime()
    {
        // Given a network large enough for the model, the least-squares rows and the diagnostics to be computed on
        // several threads (6,000 measurements; the loops go parallel from 4,096 items)
        ReactionNetwork network = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { SpeciesCount = 400, MeasurementCount = 6000, Seed = 3 }).Network;

        // When the model is built and solved twice from scratch
        LeastSquaresSolution first = WeightedLeastSquares.Solve(PropertyModel.Build(network, PropertyFamily.Enthalpy).ToObservationSystem());
        LeastSquaresSolution second = WeightedLeastSquares.Solve(PropertyModel.Build(network, PropertyFamily.Enthalpy).ToObservationSystem());

        // Then values, uncertainties, normalized residuals and χ² agree to the last bit
        Assert.Equal(first.Values.ToArray(), second.Values.ToArray());
        Assert.Equal(first.StandardUncertainties.ToArray(), second.StandardUncertainties.ToArray());
        Assert.Equal(first.Observations.Select(o => o.NormalizedResidual), second.Observations.Select(o => o.NormalizedResidual));
        Assert.Equal(BitConverter.DoubleToInt64Bits(first.ChiSquared), BitConverter.DoubleToInt64Bits(second.ChiSquared));
    }
}
