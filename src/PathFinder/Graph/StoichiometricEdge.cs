using Fractions;
using QuikGraph;

namespace PathFinder.Graph;

/// <summary>An edge species → measurement (a reactant) or measurement → species (a product), carrying the coefficient.</summary>
/// <param name="Source">Where the edge starts.</param>
/// <param name="Target">Where it ends.</param>
/// <param name="Coefficient">The stoichiometric coefficient, positive.</param>
public sealed record StoichiometricEdge(NetworkVertex Source, NetworkVertex Target, Fraction Coefficient) : IEdge<NetworkVertex>
{
    /// <summary>Whether the species is a reactant of the measurement (the edge points into the measurement).</summary>
    public bool IsReactant => Source.IsSpecies;
}
