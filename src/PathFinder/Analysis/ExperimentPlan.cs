using Fractions;
using PathFinder.Algebra;
using PathFinder.Chemistry;
using PathFinder.Graph;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>Which measurement would most reduce a target's uncertainty: re-measuring existing data more precisely, or measuring new reactions.</summary>
/// <remarks>
/// <para>Both rankings use rank-one update formulas on the current solution, with no re-solve per option
/// (see <see cref="ExperimentPlanning"/>): with C the covariance and a the target,
/// re-measuring i with uncertainty u′ gives Var′ = aᵀCa − Δw·(aᵀCaᵢ)²/(1 + Δw·aᵢᵀCaᵢ), Δw = 1/u′² − 1/uᵢ²;
/// a new reaction c measured with uncertainty u_c gives Var′ = aᵀCa − (aᵀCc)²/(u_c² + cᵀCc).</para>
/// <para>Generated candidates, for the species within <see cref="ExperimentPlanOptions.NeighbourhoodDepth"/> measurement
/// steps of the target's species (walking the network graph, not through elements in reference states): the target
/// itself; each species' formation reaction; its combustion to CO2(g) and H2O(l) when it holds only C, H and O and both
/// products are in the data; and for each pair of species the reaction turning one into the other, balanced with
/// elements in their reference states. Candidates with the same vector over the unknowns (up to sign) are listed once.</para>
/// </remarks>
public sealed class ExperimentPlan
{
    private ExperimentPlan(ValueProvenance current, double candidateUncertainty, IReadOnlyList<RemeasurementSuggestion> remeasurements, IReadOnlyList<CandidateSuggestion> candidates)
    {
        Current = current;
        CandidateUncertainty = candidateUncertainty;
        Remeasurements = remeasurements;
        Candidates = candidates;
    }

    /// <summary>The target's current estimate and where it comes from.</summary>
    public ValueProvenance Current { get; }

    /// <summary>Whether the data determine the target (otherwise nothing is ranked).</summary>
    public bool IsDetermined => Current.IsDetermined;

    /// <summary>The uncertainty assumed for the generated candidates (the quantity's unit).</summary>
    public double CandidateUncertainty { get; }

    /// <summary>Existing measurements, the most useful re-measurement first.</summary>
    public IReadOnlyList<RemeasurementSuggestion> Remeasurements { get; }

    /// <summary>Candidate new measurements, the most useful first.</summary>
    public IReadOnlyList<CandidateSuggestion> Candidates { get; }

    /// <summary>Plans for <paramref name="target"/> in a solved family.</summary>
    /// <param name="report">The solved family (its solution's uncertainties are the ones re-measurements improve on).</param>
    /// <param name="target">The target equation.</param>
    /// <param name="options">Assumptions and candidates; defaults as documented on <see cref="ExperimentPlanOptions"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">An assumed uncertainty or factor is not finite and positive, or the depth is negative.</exception>
    public static ExperimentPlan Build(SolveReport report, ChemicalEquation target, ExperimentPlanOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(target);
        options ??= new ExperimentPlanOptions();
        RequirePositive(options.UncertaintyFactor, nameof(options.UncertaintyFactor));
        if (options.RemeasurementUncertainty is { } absolute)
        {
            RequirePositive(absolute, nameof(options.RemeasurementUncertainty));
        }

        ArgumentOutOfRangeException.ThrowIfNegative(options.NeighbourhoodDepth, nameof(options));
        ThermoModel model = report.Model;
        PropertyFamily family = report.Family;
        bool energy = family != PropertyFamily.Entropy;
        double candidateUncertainty = options.CandidateUncertainty ?? Median(model.Measurements.Where(item => item.IsEnergy == energy).Select(item => item.Uncertainty));
        RequirePositive(candidateUncertainty, nameof(options.CandidateUncertainty));
        ValueProvenance current = ValueProvenance.Trace(report, target);
        if (!current.IsDetermined || current.Variance <= 0.0)
        {
            return new ExperimentPlan(current, candidateUncertainty, [], []);
        }

        LeastSquaresSolution solution = report.Solution;
        SparseRow quantity = model.Quantity(family, target).Row;
        IReadOnlyList<RemeasurementOption> options1 = options.RemeasurementUncertainty is { } fixedUncertainty
            ? ExperimentPlanning.Remeasurements(solution, quantity, _ => fixedUncertainty)
            : ExperimentPlanning.Remeasurements(solution, quantity, options.UncertaintyFactor);
        var remeasurements = options1
            .Where(option => Math.Abs(option.VarianceReduction) > 1e-12 && !model.IsPrior(option.ObservationIndex))
            .Select(option => new RemeasurementSuggestion(
                option.ObservationIndex,
                model.Measurements[option.ObservationIndex],
                option.CurrentUncertainty,
                option.NewUncertainty,
                option.StandardUncertainty,
                option.VarianceReduction))
            .ToArray();

        var seen = new HashSet<string>(StringComparer.Ordinal);
        var candidates = new List<CandidateSuggestion>();
        foreach ((ChemicalEquation equation, CandidateOrigin origin) in options.Candidates.Select(item => (item, CandidateOrigin.Given))
            .Concat(options.GenerateCandidates ? Generate(model, target, options.NeighbourhoodDepth) : []))
        {
            ModelQuantity candidate = model.Quantity(family, equation);
            SparseVector vector = candidate.Vector;
            IReadOnlyList<Species> missing = candidate.Missing;
            if (vector.IsZero && missing.Count == 0)
            {
                continue;
            }

            if (!seen.Add(Signature(vector, missing)) && origin != CandidateOrigin.Given)
            {
                continue;
            }

            double variance = missing.Count > 0
                ? current.Variance
                : ExperimentPlanning.VarianceWithNewObservation(solution, quantity, PropertyModel.RowOf(vector), candidateUncertainty);
            candidates.Add(new CandidateSuggestion(equation, origin, candidateUncertainty, Math.Sqrt(variance), 1.0 - (variance / current.Variance), missing));
        }

        CandidateSuggestion[] ranked = candidates
            .OrderBy(candidate => candidate.TargetUncertainty)
            .ThenBy(candidate => candidate.Origin)
            .ThenBy(candidate => candidate.Equation.ToString(), StringComparer.Ordinal)
            .ToArray();
        return new ExperimentPlan(current, candidateUncertainty, remeasurements, ranked);
    }

    /// <summary>The candidate reactions generated around <paramref name="target"/> (see the remarks on the type).</summary>
    public static IEnumerable<(ChemicalEquation Equation, CandidateOrigin Origin)> Generate(ThermoModel model, ChemicalEquation target, int depth)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(target);
        yield return (target, CandidateOrigin.Target);
        var network = new ReactionNetwork("plan", model.Measurements.Select(item => item.Measurement));
        NetworkGraph graph = NetworkGraph.Build(network);
        Species[] near = graph.Neighbourhood(target.Terms.Select(term => term.Species).Where(species => !ReferenceStates.HasZeroFormationProperties(species)), depth)
            .Where(vertex => vertex.Species is { } species && !ReferenceStates.HasZeroFormationProperties(species) && Position(model, species) >= 0)
            .Select(vertex => vertex.Species!)
            .OrderBy(species => Position(model, species))
            .ToArray();
        foreach (Species species in near)
        {
            yield return (ChemicalEquation.Formation(species), CandidateOrigin.Formation);
            if (Combustion(model, species) is { } combustion)
            {
                yield return (combustion, CandidateOrigin.Combustion);
            }
        }

        for (int i = 0; i < near.Length; i++)
        {
            for (int j = i + 1; j < near.Length; j++)
            {
                ChemicalEquation pair = ChemicalEquation.Formation(near[j]).Add(ChemicalEquation.Formation(near[i]).Scale(Fraction.MinusOne));
                if (!pair.IsEmpty)
                {
                    yield return (pair, CandidateOrigin.Pair);
                }
            }
        }
    }

    /// <summary>The first position of a species among the unknowns (ΔfH° or S°), or −1.</summary>
    private static int Position(ThermoModel model, Species species)
    {
        int enthalpy = model.IndexOf(species, UnknownKind.FormationEnthalpy);
        int entropy = model.IndexOf(species, UnknownKind.Entropy);
        return enthalpy < 0 ? entropy : entropy < 0 ? enthalpy : Math.Min(enthalpy, entropy);
    }

    private static ChemicalEquation? Combustion(ThermoModel model, Species species)
    {
        Species carbonDioxide = Species.Parse("CO2(g)");
        Species water = Species.Parse("H2O(l)");
        IReadOnlyDictionary<string, Fraction> composition = species.Formula.Composition;
        if (species.Formula.Charge != 0 || composition.Keys.Any(element => element is not ("C" or "H" or "O"))
            || species.Equals(carbonDioxide) || species.Equals(water) || Position(model, carbonDioxide) < 0 || Position(model, water) < 0)
        {
            return null;
        }

        Fraction carbon = species.Formula.CountOf("C");
        Fraction hydrogen = species.Formula.CountOf("H");
        Fraction oxygen = species.Formula.CountOf("O");
        Fraction dioxygen = carbon + (hydrogen / 4) - (oxygen / 2);
        if (dioxygen <= Fraction.Zero)
        {
            return null;
        }

        return ChemicalEquation.FromTerms(
        [
            new EquationTerm(species, Fraction.MinusOne),
            new EquationTerm(ReferenceStates.Of("O"), -dioxygen),
            new EquationTerm(carbonDioxide, carbon),
            new EquationTerm(water, hydrogen / 2),
        ]);
    }

    private static string Signature(SparseVector vector, IReadOnlyList<Species> missing)
    {
        // Up to sign: measuring A -> B tells the same as measuring B -> A.
        bool flip = !vector.IsZero && vector.Values[0] < Fraction.Zero;
        SparseVector normal = flip ? vector.Scale(Fraction.MinusOne) : vector;
        string entries = string.Join(";", normal.Entries.Select(entry => $"{entry.Key}:{entry.Value}"));
        return missing.Count == 0 ? entries : entries + "|" + string.Join(";", missing.Select(species => species.Name));
    }

    private static double Median(IEnumerable<double> values)
    {
        double[] sorted = values.Order().ToArray();
        if (sorted.Length == 0)
        {
            return double.NaN;
        }

        int middle = sorted.Length / 2;
        return sorted.Length % 2 == 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2.0;
    }

    private static void RequirePositive(double value, string name)
    {
        if (!double.IsFinite(value) || value <= 0.0)
        {
            throw new ArgumentOutOfRangeException(name, value, "Must be finite and positive.");
        }
    }
}
