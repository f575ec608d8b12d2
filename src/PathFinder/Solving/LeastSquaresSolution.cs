using PathFinder.Threading;

namespace PathFinder.Solving;

/// <summary>The weighted least-squares solution of an <see cref="ObservationSystem"/> with everything derived from it.</summary>
/// <remarks>
/// Unknown j is determined iff e_j lies in the row space of A. Undetermined unknowns get NaN values and
/// uncertainties, never made-up numbers; use <see cref="UndeterminedUnknowns"/> and <see cref="RelativeGroups"/>.
/// Covariances are those of the estimates: C = (AᵀWA)⁻ (a generalized inverse; on estimable quantities it is
/// the same for every choice). Uncertainties are the a-priori ones, not scaled by the Birge ratio.
/// </remarks>
public sealed class LeastSquaresSolution
{
    private readonly SolverEngine _engine;
    private readonly double[] _values;
    private readonly double[] _uncertainties;
    private readonly bool[] _determined;
    private readonly Lazy<ObservationDiagnostics[]> _diagnostics;
    private readonly Lazy<IReadOnlyList<RelativeGroup>> _relativeGroups;

    internal LeastSquaresSolution(SolverEngine engine)
    {
        _engine = engine;
        System = engine.CurrentSystem();
        int n = engine.UnknownCount;
        _values = new double[n];
        _uncertainties = new double[n];
        _determined = new bool[n];
        for (int j = 0; j < n; j++)
        {
            ComponentFactorization component = engine.Components[engine.ComponentOfUnknown(j)];
            int local = engine.LocalIndex(j);
            bool determined = component.Determined[local];
            _determined[j] = determined;
            _values[j] = determined ? component.Solution[local] : double.NaN;
            _uncertainties[j] = determined ? Math.Sqrt(component.Covariance[local + (local * component.Size)]) : double.NaN;
        }

        UndeterminedUnknowns = Enumerable.Range(0, n).Where(j => !_determined[j]).ToArray();
        Rank = engine.Components.Sum(c => c.Rank);
        // χ² needs only the fitted values; the per-observation diagnostics (a quadratic form in the covariance
        // each) are worked out when first asked for, which a plain solve never does.
        var residuals = new double[engine.ObservationCount];
        IndexedWork.For(residuals.Length, i =>
        {
            double r = (_engine.Row(i).Value - _engine.FittedValue(i)) / _engine.Uncertainty(i);
            residuals[i] = r * r;
        });
        double chiSquared = 0.0;
        foreach (double r2 in residuals)
        {
            chiSquared += r2;
        }

        ChiSquared = chiSquared;
        _diagnostics = new Lazy<ObservationDiagnostics[]>(() =>
        {
            var diagnostics = new ObservationDiagnostics[_engine.ObservationCount];
            IndexedWork.For(diagnostics.Length, i => diagnostics[i] = Diagnose(i));
            return diagnostics;
        });
        _relativeGroups = new Lazy<IReadOnlyList<RelativeGroup>>(FindRelativeGroups);
    }

    /// <summary>The system solved (with the uncertainties actually used).</summary>
    public ObservationSystem System { get; }

    /// <summary>The options used.</summary>
    public SolverOptions Options => _engine.Options;

    /// <summary>The backend that did the dense work (<see cref="LinearAlgebraBackend.Native"/> or <see cref="LinearAlgebraBackend.Managed"/>).</summary>
    public LinearAlgebraBackend BackendUsed => _engine.Backend;

    /// <summary>The number of unknowns n.</summary>
    public int UnknownCount => _engine.UnknownCount;

    /// <summary>The number of connected components (unknowns in no observation are components of their own).</summary>
    public int ComponentCount => _engine.Components.Count;

    /// <summary>The numerical rank of A (sum over components).</summary>
    public int Rank { get; }

    /// <summary>χ² = Σ wᵢrᵢ².</summary>
    public double ChiSquared { get; }

    /// <summary>Degrees of freedom m − rank.</summary>
    public int DegreesOfFreedom => _engine.ObservationCount - Rank;

    /// <summary>The Birge ratio √(χ²/dof); NaN when dof = 0. Near 1 when the uncertainties are realistic.</summary>
    public double BirgeRatio => DegreesOfFreedom > 0 ? Math.Sqrt(ChiSquared / DegreesOfFreedom) : double.NaN;

    /// <summary>The estimates x̂ⱼ (NaN for undetermined unknowns).</summary>
    public IReadOnlyList<double> Values => _values;

    /// <summary>The standard uncertainties √Cⱼⱼ (NaN for undetermined unknowns).</summary>
    public IReadOnlyList<double> StandardUncertainties => _uncertainties;

    /// <summary>The unknowns the data do not determine, ascending.</summary>
    public IReadOnlyList<int> UndeterminedUnknowns { get; }

    /// <summary>Groups of undetermined unknowns known relative to each other (groups of two or more).</summary>
    public IReadOnlyList<RelativeGroup> RelativeGroups => _relativeGroups.Value;

    /// <summary>Per-observation residuals, leverages, normalized residuals and leave-one-out predictions, by index.</summary>
    /// <remarks>Worked out on first use (on all cores for large systems) and kept.</remarks>
    public IReadOnlyList<ObservationDiagnostics> Observations => _diagnostics.Value;

    /// <summary>The adjusted value ŷᵢ = aᵢᵀx̂ of observation i, without working out the other per-observation diagnostics.</summary>
    public double FittedValue(int observation) => _engine.FittedValue(observation);

    /// <summary>Whether unknown j is determined by the data.</summary>
    public bool IsDetermined(int unknown) => _determined[unknown];

    /// <summary>The connected component of unknown j.</summary>
    public int ComponentOf(int unknown) => _engine.ComponentOfUnknown(unknown);

    /// <summary>Cov(x̂ⱼ, x̂ₖ); 0 across components; NaN if either unknown is undetermined.</summary>
    public double Covariance(int first, int second)
    {
        if (!_determined[first] || !_determined[second])
        {
            return double.NaN;
        }

        int c = _engine.ComponentOfUnknown(first);
        if (c != _engine.ComponentOfUnknown(second))
        {
            return 0.0;
        }

        ComponentFactorization component = _engine.Components[c];
        return component.Covariance[_engine.LocalIndex(first) + (_engine.LocalIndex(second) * component.Size)];
    }

    /// <summary>Whether aᵀx is determined by the data (a in the row space of A).</summary>
    public bool IsEstimable(SparseRow combination)
    {
        ArgumentNullException.ThrowIfNull(combination);
        CheckRange(combination);
        return _engine.IsEstimable(combination);
    }

    /// <summary>Estimates aᵀx with variance aᵀ·Cov·a, or reports that it is not estimable.</summary>
    public DerivedEstimate Estimate(SparseRow combination)
    {
        if (!IsEstimable(combination))
        {
            return DerivedEstimate.NotEstimable;
        }

        double[] ca = _engine.CovarianceTimes(combination);
        return new DerivedEstimate(true, RawDot(combination), Math.Max(0.0, combination.Dot(ca)));
    }

    /// <summary>Cov·a as a dense vector over all unknowns (0 outside a's components): what rank-one tests of a direction need beyond aᵀ·Cov·a.</summary>
    /// <remarks>Meaningful for estimable a (see <see cref="IsEstimable"/>); entries of undetermined unknowns depend on the g-inverse.</remarks>
    public double[] CovarianceTimes(SparseRow combination)
    {
        ArgumentNullException.ThrowIfNull(combination);
        CheckRange(combination);
        return _engine.CovarianceTimes(combination);
    }

    /// <summary>Sensitivities and variance contributions of every observation to aᵀx̂ (see <see cref="QuantityProvenance"/>).</summary>
    public QuantityProvenance Provenance(SparseRow combination)
    {
        DerivedEstimate estimate = Estimate(combination);
        if (!estimate.IsEstimable)
        {
            return new QuantityProvenance(combination, estimate, []);
        }

        double[] ca = _engine.CovarianceTimes(combination);
        var entries = new List<ProvenanceEntry>();
        foreach (int c in combination.Indices.ToArray().Select(_engine.ComponentOfUnknown).Distinct())
        {
            foreach (int i in _engine.Components[c].Observations)
            {
                double u = _engine.Uncertainty(i);
                double s = System.Observations[i].Row.Dot(ca) / (u * u);
                double contribution = s * s * u * u;
                entries.Add(new ProvenanceEntry(i, s, contribution, estimate.Variance > 0.0 ? contribution / estimate.Variance : 0.0));
            }
        }

        return new QuantityProvenance(
            combination, estimate, entries.OrderByDescending(e => e.VarianceContribution).ThenBy(e => e.ObservationIndex).ToArray());
    }

    internal SolverEngine Engine => _engine;

    internal void CheckRange(SparseRow combination)
    {
        if (combination.MinimumUnknownCount > UnknownCount)
        {
            throw new ArgumentOutOfRangeException(nameof(combination), "The combination refers to an unknown outside the system.");
        }
    }

    /// <summary>aᵀx̂ with the g-inverse solution (meaningful only for estimable a).</summary>
    private double RawDot(SparseRow combination)
    {
        double sum = 0.0;
        for (int p = 0; p < combination.Count; p++)
        {
            int j = combination.Indices[p];
            ComponentFactorization component = _engine.Components[_engine.ComponentOfUnknown(j)];
            sum += combination.Coefficients[p] * component.Solution[_engine.LocalIndex(j)];
        }

        return sum;
    }

    private ObservationDiagnostics Diagnose(int i)
    {
        Observation observation = _engine.Row(i);
        (double fitted, double quadratic) = _engine.FitObservation(i);
        double u = _engine.Uncertainty(i);
        double u2 = u * u;
        double v = observation.Value;
        double leverage = quadratic / u2;
        double residual = v - fitted;
        double rest = u2 - quadratic;
        if (rest > Options.CheckabilityTolerance * u2)
        {
            double oneMinusH = 1.0 - leverage;
            return new ObservationDiagnostics(
                i, v, u, fitted, Math.Sqrt(Math.Max(0.0, quadratic)), residual, leverage,
                residual / Math.Sqrt(rest),
                (fitted - (leverage * v)) / oneMinusH,
                Math.Sqrt(Math.Max(0.0, quadratic) / oneMinusH));
        }

        return new ObservationDiagnostics(i, v, u, fitted, Math.Sqrt(Math.Max(0.0, quadratic)), residual, leverage, null, null, null);
    }

    private IReadOnlyList<RelativeGroup> FindRelativeGroups()
    {
        var groups = new List<RelativeGroup>();
        double tolerance = Options.EstimabilityTolerance;
        for (int c = 0; c < _engine.Components.Count; c++)
        {
            ComponentFactorization component = _engine.Components[c];
            int k = component.Size;
            int d = component.Nullity;
            var pending = Enumerable.Range(0, k).Where(t => !component.Determined[t]).ToList();
            while (pending.Count > 0)
            {
                int anchor = pending[0];
                var members = new List<int> { component.Unknowns[anchor] };
                var ratios = new List<double> { 1.0 };
                var rest = new List<int>();
                double anchorNorm2 = RowDot(component, anchor, anchor, d);
                for (int t = 1; t < pending.Count; t++)
                {
                    int j = pending[t];
                    double ratio = RowDot(component, j, anchor, d) / anchorNorm2;
                    double miss2 = 0.0;
                    for (int e = 0; e < d; e++)
                    {
                        double diff = component.NullBasis[j + (e * k)] - (ratio * component.NullBasis[anchor + (e * k)]);
                        miss2 += diff * diff;
                    }

                    if (miss2 <= tolerance * tolerance * (1.0 + (ratio * ratio)))
                    {
                        members.Add(component.Unknowns[j]);
                        ratios.Add(ratio);
                    }
                    else
                    {
                        rest.Add(j);
                    }
                }

                if (members.Count > 1)
                {
                    groups.Add(new RelativeGroup(c, members.ToArray(), ratios.ToArray()));
                }

                pending = rest;
            }
        }

        return groups;
    }

    private static double RowDot(ComponentFactorization component, int first, int second, int nullity)
    {
        int k = component.Size;
        double sum = 0.0;
        for (int e = 0; e < nullity; e++)
        {
            sum += component.NullBasis[first + (e * k)] * component.NullBasis[second + (e * k)];
        }

        return sum;
    }
}
