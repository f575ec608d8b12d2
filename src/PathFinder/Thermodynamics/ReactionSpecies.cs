namespace PathFinder.Thermodynamics;

/// <summary>One species of a reaction for heat-capacity purposes: the caller's key, its signed coefficient and its Cp model (if any).</summary>
/// <remarks>
/// The coefficient is signed: products positive, reactants negative (an exact rational factor may be converted with its
/// double value, since heat-capacity data are measured values anyway). <see cref="Model"/> is <see langword="null"/> when
/// no heat-capacity data are known for the species.
/// </remarks>
/// <typeparam name="TKey">The caller's opaque species identifier.</typeparam>
/// <param name="Species">The caller's identifier of the species.</param>
/// <param name="Coefficient">Signed stoichiometric coefficient (products +, reactants −).</param>
/// <param name="Model">The heat-capacity model, or <see langword="null"/> when unknown.</param>
public readonly record struct ReactionSpecies<TKey>(TKey Species, double Coefficient, IHeatCapacity? Model);
