using PathFinder.Chemistry;

namespace PathFinder.Synthetic;

/// <summary>A generated network with its ground truth: the true formation enthalpies (and absolute entropies, when generated) and which measurements are outliers.</summary>
/// <param name="Network">The measurements, as if read from files.</param>
/// <param name="TrueFormationEnthalpy">True ΔfH° (kJ/mol) of every species; zero for reference states.</param>
/// <param name="OutlierIds">Ids of measurements given a gross error.</param>
public sealed record SyntheticNetwork(
    ReactionNetwork Network,
    IReadOnlyDictionary<Species, double> TrueFormationEnthalpy,
    IReadOnlySet<string> OutlierIds)
{
    /// <summary>True S° (J/(mol·K)) of the species that have one; empty for a ΔH-only network.</summary>
    public IReadOnlyDictionary<Species, double> TrueEntropy { get; init; } = new Dictionary<Species, double>();
}
