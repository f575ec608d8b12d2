using Fractions;

namespace PathFinder.Chemistry;

/// <summary>A species with its signed stoichiometric coefficient: positive for products, negative for reactants.</summary>
/// <param name="Species">The species.</param>
/// <param name="Coefficient">The exact signed coefficient ν.</param>
public readonly record struct EquationTerm(Species Species, Fraction Coefficient);
