using PathFinder.Chemistry;
using PathFinder.Solving;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>The property models and least-squares solutions of one network, built on first use and shared by every question asked of them.</summary>
/// <remarks>
/// Each family (ΔH, ΔG, S°) is modelled and solved at most once, so evaluating many targets or every species at a
/// temperature costs one solve per family. Solutions are made after the suspect procedure unless told otherwise.
/// </remarks>
public sealed class NetworkSolutions
{
    private readonly Dictionary<PropertyFamily, SolveReport?> _reports = [];

    /// <summary>Prepares to solve <paramref name="network"/>.</summary>
    /// <param name="network">The network.</param>
    /// <param name="heatCapacities">Heat-capacity models by species (temperature corrections); may be empty.</param>
    /// <param name="adjust">Whether to run the suspect procedure before reporting (default true).</param>
    /// <param name="options">Options of the suspect procedure; defaults of <see cref="ConsistencyOptions"/> when omitted.</param>
    public NetworkSolutions(ReactionNetwork network, IReadOnlyDictionary<Species, IHeatCapacity>? heatCapacities = null, bool adjust = true, ConsistencyOptions? options = null)
    {
        Options = options ?? new ConsistencyOptions();
        ArgumentNullException.ThrowIfNull(network);
        Network = network;
        HeatCapacities = heatCapacities ?? new Dictionary<Species, IHeatCapacity>();
        Adjusted = adjust;
    }

    /// <summary>The network.</summary>
    public ReactionNetwork Network { get; }

    /// <summary>Heat-capacity models by species.</summary>
    public IReadOnlyDictionary<Species, IHeatCapacity> HeatCapacities { get; }

    /// <summary>Whether the suspect procedure runs before solutions are reported.</summary>
    public bool Adjusted { get; }

    /// <summary>Options of the suspect procedure.</summary>
    public ConsistencyOptions Options { get; }

    /// <summary>The solved family, or null when the network has no data of that family.</summary>
    public SolveReport? Report(PropertyFamily family)
    {
        if (!_reports.TryGetValue(family, out SolveReport? report))
        {
            PropertyModel model = PropertyModel.Build(Network, family, HeatCapacities);
            report = model.Measurements.Count == 0 ? null : NetworkSolver.Solve(model, Adjusted, Options);
            _reports[family] = report;
        }

        return report;
    }

    /// <summary>The network estimate of an equation's property in one family, or null when the data do not determine it.</summary>
    /// <remarks>An equation of conventional-zero species only (e.g. elements in reference states for ΔH) is exactly 0.</remarks>
    public UncertainValue? Estimate(PropertyFamily family, ChemicalEquation equation)
    {
        ArgumentNullException.ThrowIfNull(equation);
        if (equation.Terms.All(term => family.IsFixed(term.Species)))
        {
            return new UncertainValue(0.0, 0.0);
        }

        SolveReport? report = Report(family);
        if (report is null)
        {
            return null;
        }

        Algebra.SparseVector vector = report.Model.VectorOf(equation, out IReadOnlyList<Species> missing);
        if (missing.Count > 0)
        {
            return null;
        }

        DerivedEstimate estimate = report.Solution.Estimate(PropertyModel.RowOf(vector));
        return estimate.IsEstimable ? new UncertainValue(estimate.Value, estimate.StandardUncertainty) : null;
    }
}
