using PathFinder.Chemistry;
using PathFinder.Solving;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>The joint model and least-squares solution of one network, built on first use and shared by every question asked of them.</summary>
/// <remarks>
/// The network is modelled and solved once (ΔfH°, S° and the declared source offsets together), so evaluating many
/// targets, every species at a temperature, or ΔfH°, S° and ΔfG° side by side costs one solve. Solutions are made
/// after the suspect procedure unless told otherwise.
/// </remarks>
public sealed class NetworkSolutions
{
    private readonly Lazy<ThermoModel> _model;
    private readonly Lazy<JointSolution?> _joint;

    /// <summary>Prepares to solve <paramref name="network"/>.</summary>
    /// <param name="network">The network.</param>
    /// <param name="heatCapacities">Heat-capacity models by species (temperature corrections); may be empty.</param>
    /// <param name="adjust">Whether to run the suspect procedure before reporting (default true).</param>
    /// <param name="options">Options of the suspect procedure; defaults of <see cref="ConsistencyOptions"/> when omitted.</param>
    /// <param name="systematics">Declared systematic uncertainties of sources (<c>sources.csv</c>); may be empty.</param>
    public NetworkSolutions(ReactionNetwork network, IReadOnlyDictionary<Species, IHeatCapacity>? heatCapacities = null, bool adjust = true, ConsistencyOptions? options = null, IReadOnlyList<SourceSystematic>? systematics = null)
    {
        Options = options ?? new ConsistencyOptions();
        ArgumentNullException.ThrowIfNull(network);
        Network = network;
        HeatCapacities = heatCapacities ?? new Dictionary<Species, IHeatCapacity>();
        Systematics = systematics ?? [];
        Adjusted = adjust;
        _model = new Lazy<ThermoModel>(() => ThermoModel.Build(Network, HeatCapacities, Systematics));
        _joint = new Lazy<JointSolution?>(() => Model.Measurements.Count == 0 ? null : NetworkSolver.Solve(Model, Adjusted, Options));
    }

    /// <summary>The network.</summary>
    public ReactionNetwork Network { get; }

    /// <summary>Heat-capacity models by species.</summary>
    public IReadOnlyDictionary<Species, IHeatCapacity> HeatCapacities { get; }

    /// <summary>Declared systematic uncertainties of sources.</summary>
    public IReadOnlyList<SourceSystematic> Systematics { get; }

    /// <summary>Whether the suspect procedure runs before solutions are reported.</summary>
    public bool Adjusted { get; }

    /// <summary>Options of the suspect procedure.</summary>
    public ConsistencyOptions Options { get; }

    /// <summary>The joint model.</summary>
    public ThermoModel Model => _model.Value;

    /// <summary>The joint solution, or null when the network has no usable measurement.</summary>
    public JointSolution? Joint => _joint.Value;

    /// <summary>The view of the joint solution for one species quantity, or null when the data hold nothing of it.</summary>
    public SolveReport? Report(PropertyFamily family) => Joint is { } joint ? NetworkSolver.Report(joint, family) : null;

    /// <summary>The network estimate of an equation's ΔrH°, ΔrS° or ΔrG° at <paramref name="temperature"/>, or null when the data do not determine it.</summary>
    /// <remarks>An equation of conventional zeros only (e.g. elements in reference states for ΔH) is exactly its heat-capacity shift.</remarks>
    public UncertainValue? Estimate(PropertyFamily family, ChemicalEquation equation, double temperature = PhysicalConstantsTemperature)
    {
        ArgumentNullException.ThrowIfNull(equation);
        return DerivedEstimate(family, equation, temperature) is { } value ? new UncertainValue(value.Value, value.StandardUncertainty) : null;
    }

    /// <summary>As <see cref="Estimate"/>, as the solver's derived estimate (value and variance), or null when not determined.</summary>
    public DerivedEstimate? DerivedEstimate(PropertyFamily family, ChemicalEquation equation, double temperature = PhysicalConstantsTemperature)
    {
        ArgumentNullException.ThrowIfNull(equation);
        return Joint is { } joint ? Model.Quantity(family, equation, temperature).Evaluate(joint.Solution) : null;
    }

    private const double PhysicalConstantsTemperature = Quantities.PhysicalConstants.StandardTemperature;
}
