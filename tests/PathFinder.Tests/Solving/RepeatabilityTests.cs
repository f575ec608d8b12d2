using PathFinder.Analysis;
using PathFinder.Data;
using PathFinder.Solving;
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
}
