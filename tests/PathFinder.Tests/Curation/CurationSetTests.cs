using PathFinder.Chemistry;
using PathFinder.Curation;
using PathFinder.Quantities;

namespace PathFinder.Tests.Curation;

public sealed class CurationSetTests
{
    private static readonly DateOnly Day = new(2024, 5, 17);

    private static ReactionNetwork Network() => new("demo", new[] { "M1", "M2", "M3" }.Select((id, i) => new Measurement
    {
        Id = id,
        Equation = ChemicalEquation.Parse("H2(g) + 1/2 O2(g) -> H2O(l)"),
        Property = ThermoProperty.Enthalpy,
        Value = -280.0 - i,
        Uncertainty = 1.0,
        Source = "s" + i,
    }));

    [Fact]
    public void Apply_removes_excluded_measurements_and_lists_them_with_their_reason()
    {
        CurationSet set = CurationSet.Empty.Exclude("M2", "bad calibration", Day);

        CurationResult result = set.Apply(Network());

        Assert.Equal(["M1", "M3"], result.Network.Measurements.Select(m => m.Id));
        ExcludedMeasurement excluded = Assert.Single(result.Excluded);
        Assert.Equal("M2", excluded.Measurement.Id);
        Assert.Equal("bad calibration", excluded.Decision.Reason);
        Assert.Empty(result.UnknownIds);
    }

    [Fact]
    public void The_last_decision_about_an_id_wins()
    {
        CurationSet set = CurationSet.Empty.Exclude("M1", "typo", Day).Include("M1", "checked again", Day.AddDays(1));

        Assert.False(set.IsExcluded("M1"));
        Assert.Equal(3, set.Apply(Network()).Network.Measurements.Count);
        Assert.Equal(2, set.Decisions.Count);
        Assert.Equal(CurationAction.Include, set.CurrentDecision("M1")!.Action);
    }

    [Fact]
    public void Apply_reports_ids_that_are_not_in_the_network()
    {
        CurationSet set = CurationSet.Empty.Exclude("Z9", "gone", Day);

        CurationResult result = set.Apply(Network());

        Assert.Equal(["Z9"], result.UnknownIds);
        Assert.Equal(3, result.Network.Measurements.Count);
    }

    [Fact]
    public void Exclude_refuses_a_blank_reason_and_leaves_the_set_unchanged()
    {
        CurationSet set = CurationSet.Empty;

        Assert.Throws<ArgumentException>(() => set.Exclude("M1", "  ", Day));
        Assert.Empty(set.Decisions);
    }
}
