namespace PathFinder.Thermodynamics;

/// <summary>One-line Kirchhoff's-law shifts of reaction enthalpies and entropies between temperatures.</summary>
/// <remarks>
/// ΔrH(T2) = ΔrH(T1) + ∫ΔrCp dT (J/mol); ΔrS(T2) = ΔrS(T1) + ∫ΔrCp/T dT (J/(mol·K)); integrals from T1 to T2 in K,
/// ΔrCp = Σ νᵢ·Cp,ᵢ with products ν &gt; 0 and reactants ν &lt; 0. See <see cref="ReactionHeatCapacity{TKey}"/> for the details;
/// the overloads taking (coefficient, model) pairs key the species by their position in the list (0-based).
/// </remarks>
public static class Kirchhoff
{
    /// <summary>Moves ΔrH (J/mol) from <paramref name="from"/> to <paramref name="to"/> (K).</summary>
    /// <typeparam name="TKey">The caller's species identifier.</typeparam>
    /// <param name="species">The reaction's species with signed coefficients and models.</param>
    /// <param name="enthalpy">ΔrH(T1) in J/mol.</param>
    /// <param name="from">T1 in K.</param>
    /// <param name="to">T2 in K.</param>
    public static KirchhoffShift<TKey> ShiftEnthalpy<TKey>(IEnumerable<ReactionSpecies<TKey>> species, double enthalpy, double from, double to)
        where TKey : notnull =>
        new ReactionHeatCapacity<TKey>(species).ShiftEnthalpy(enthalpy, from, to);

    /// <summary>Moves ΔrS (J/(mol·K)) from <paramref name="from"/> to <paramref name="to"/> (K).</summary>
    /// <typeparam name="TKey">The caller's species identifier.</typeparam>
    /// <param name="species">The reaction's species with signed coefficients and models.</param>
    /// <param name="entropy">ΔrS(T1) in J/(mol·K).</param>
    /// <param name="from">T1 in K.</param>
    /// <param name="to">T2 in K.</param>
    public static KirchhoffShift<TKey> ShiftEntropy<TKey>(IEnumerable<ReactionSpecies<TKey>> species, double entropy, double from, double to)
        where TKey : notnull =>
        new ReactionHeatCapacity<TKey>(species).ShiftEntropy(entropy, from, to);

    /// <summary>Moves ΔrH (J/mol) for species given as (coefficient, model) pairs, keyed by list position.</summary>
    /// <param name="species">Signed coefficients with models (a model may be <see langword="null"/>).</param>
    /// <param name="enthalpy">ΔrH(T1) in J/mol.</param>
    /// <param name="from">T1 in K.</param>
    /// <param name="to">T2 in K.</param>
    public static KirchhoffShift<int> ShiftEnthalpy(IReadOnlyList<(double Coefficient, IHeatCapacity? Model)> species, double enthalpy, double from, double to) =>
        ShiftEnthalpy(Indexed(species), enthalpy, from, to);

    /// <summary>Moves ΔrS (J/(mol·K)) for species given as (coefficient, model) pairs, keyed by list position.</summary>
    /// <param name="species">Signed coefficients with models (a model may be <see langword="null"/>).</param>
    /// <param name="entropy">ΔrS(T1) in J/(mol·K).</param>
    /// <param name="from">T1 in K.</param>
    /// <param name="to">T2 in K.</param>
    public static KirchhoffShift<int> ShiftEntropy(IReadOnlyList<(double Coefficient, IHeatCapacity? Model)> species, double entropy, double from, double to) =>
        ShiftEntropy(Indexed(species), entropy, from, to);

    private static IEnumerable<ReactionSpecies<int>> Indexed(IReadOnlyList<(double Coefficient, IHeatCapacity? Model)> species)
    {
        ArgumentNullException.ThrowIfNull(species);
        return species.Select((s, i) => new ReactionSpecies<int>(i, s.Coefficient, s.Model));
    }
}
