using PathFinder.Data;
using PathFinder.Quantities;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Data;

public sealed class NetworkSummaryTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Of_CountsMeasurementsSpeciesSourcesPropertiesAndElements()
    {
        // Given three measurements from two sources
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty,source\n"
            + "m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,north\n"
            + "m2,CO2(g),dH,-393.51,0.13,south\n"
            + "m3,CO2(g),S,213.79,0.05,north\n");
        ReactionNetwork network = NetworkReader.Read(file).Network;

        // When summarised
        NetworkSummary summary = NetworkSummary.Of(network);

        // Then: species CO, O2, CO2, C(graphite); sources in order of first use; properties in enum order
        Assert.Equal(3, summary.MeasurementCount);
        Assert.Equal(4, summary.SpeciesCount);
        Assert.Equal([new("north", 2), new("south", 1)], summary.MeasurementsBySource);
        Assert.Equal([new(ThermoProperty.Enthalpy, 2), new(ThermoProperty.AbsoluteEntropy, 1)], summary.MeasurementsByProperty);
        Assert.Equal(["C", "O"], summary.Elements);
        Assert.Equal(["C(cr,graphite)", "O2(g)"], summary.ReferenceStatesUsed.Select(species => species.Name));
    }

    [Fact]
    public void Of_AnEmptyNetworkIsAllZero()
    {
        NetworkSummary summary = NetworkSummary.Of(new ReactionNetwork("empty", []));

        Assert.Equal(0, summary.MeasurementCount);
        Assert.Equal(0, summary.SpeciesCount);
        Assert.Empty(summary.Elements);
    }
}
