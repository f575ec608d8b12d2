namespace PathFinder.Solving;

/// <summary>The mutable state behind a solution: components, their factorizations and the current uncertainties.</summary>
/// <remarks>
/// <see cref="LeastSquaresSolution"/> wraps a finished engine read-only; <see cref="OutlierProcedure"/> drives
/// one through rank-one weight changes before wrapping it.
/// </remarks>
internal sealed class SolverEngine
{
    private readonly IReadOnlyList<Observation> _rows;
    private readonly double[] _uncertainties;
    private readonly int[] _componentOfUnknown;
    private readonly int[] _localOf;
    private readonly int[] _componentOfObservation;
    private readonly ComponentFactorization[] _components;
    private readonly IDenseKernel _kernel;

    private SolverEngine(ObservationSystem system, SolverOptions options)
    {
        options.Validate();
        Options = options;
        UnknownCount = system.UnknownCount;
        _rows = system.Observations;
        _uncertainties = _rows.Select(o => o.Uncertainty).ToArray();
        _kernel = SelectKernel(options.Backend);

        int n = system.UnknownCount;
        int m = _rows.Count;
        var sets = new UnionFind(n);
        foreach (Observation observation in _rows)
        {
            ReadOnlySpan<int> idx = observation.Row.Indices;
            for (int p = 1; p < idx.Length; p++)
            {
                sets.Union(idx[0], idx[p]);
            }
        }

        // Number components by their smallest unknown, so the numbering is deterministic.
        _componentOfUnknown = new int[n];
        _localOf = new int[n];
        var rootToComponent = new Dictionary<int, int>();
        var unknownLists = new List<List<int>>();
        for (int j = 0; j < n; j++)
        {
            int root = sets.Find(j);
            if (!rootToComponent.TryGetValue(root, out int c))
            {
                c = unknownLists.Count;
                rootToComponent.Add(root, c);
                unknownLists.Add([]);
            }

            _componentOfUnknown[j] = c;
            _localOf[j] = unknownLists[c].Count;
            unknownLists[c].Add(j);
        }

        var observationLists = unknownLists.Select(_ => new List<int>()).ToList();
        _componentOfObservation = new int[m];
        for (int i = 0; i < m; i++)
        {
            int c = _componentOfUnknown[_rows[i].Row.Indices[0]];
            _componentOfObservation[i] = c;
            observationLists[c].Add(i);
        }

        _components = new ComponentFactorization[unknownLists.Count];
        for (int c = 0; c < _components.Length; c++)
        {
            _components[c] = ComponentFactorization.Create(
                unknownLists[c].ToArray(), observationLists[c].ToArray(), _rows, _uncertainties, _localOf, _kernel, options);
        }
    }

    /// <summary>A deep copy of <paramref name="source"/>: same rows and components, own uncertainties and factorizations.</summary>
    private SolverEngine(SolverEngine source)
    {
        Options = source.Options;
        UnknownCount = source.UnknownCount;
        RefactorizationInterval = source.RefactorizationInterval;
        _rows = source._rows;
        _uncertainties = (double[])source._uncertainties.Clone();
        _kernel = source._kernel;
        // The component structure never changes after construction, so these maps are shared.
        _componentOfUnknown = source._componentOfUnknown;
        _localOf = source._localOf;
        _componentOfObservation = source._componentOfObservation;
        _components = source._components.Select(component => component.Clone()).ToArray();
    }

    public SolverOptions Options { get; }

    public int UnknownCount { get; }

    public int ObservationCount => _rows.Count;

    public LinearAlgebraBackend Backend => _kernel.Backend;

    public IReadOnlyList<ComponentFactorization> Components => _components;

    /// <summary>Rank-one updates between refactorizations of a component (numerical hygiene); default 50.</summary>
    public int RefactorizationInterval { get; set; } = 50;

    public static SolverEngine Create(ObservationSystem system, SolverOptions? options)
    {
        ArgumentNullException.ThrowIfNull(system);
        return new SolverEngine(system, options ?? SolverOptions.Default);
    }

    /// <summary>An independent copy that can be driven through weight changes without touching this engine.</summary>
    public SolverEngine Clone() => new(this);

    public int ComponentOfUnknown(int j) => _componentOfUnknown[j];

    public int LocalIndex(int j) => _localOf[j];

    public int ComponentOfObservation(int i) => _componentOfObservation[i];

    public Observation Row(int i) => _rows[i];

    public double Uncertainty(int i) => _uncertainties[i];

    /// <summary>The system with the current (possibly adjusted) uncertainties.</summary>
    public ObservationSystem CurrentSystem() =>
        new(UnknownCount, _rows.Select((o, i) => o.WithUncertainty(_uncertainties[i])));

    /// <summary>Changes the uncertainty of observation i by a Sherman–Morrison update (periodic refactorization).</summary>
    public void SetUncertainty(int i, double uncertainty)
    {
        if (!double.IsFinite(uncertainty) || uncertainty <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(uncertainty), uncertainty, "The uncertainty must be finite and positive.");
        }

        double oldWeight = 1.0 / (_uncertainties[i] * _uncertainties[i]);
        _uncertainties[i] = uncertainty;
        double newWeight = 1.0 / (uncertainty * uncertainty);
        ComponentFactorization component = _components[_componentOfObservation[i]];
        if (component.UpdatesSinceFactorization + 1 >= RefactorizationInterval)
        {
            component.Factor(_rows, _uncertainties, _localOf, _kernel, Options);
            return;
        }

        (int[] local, double[] coefficients) = Localize(_rows[i].Row);
        component.ApplyWeightChange(local, coefficients, _rows[i].Value, newWeight - oldWeight);
    }

    /// <summary>The dense kernel in use.</summary>
    internal IDenseKernel Kernel => _kernel;

    /// <summary>Records a new uncertainty for observation i without touching any factorization (the caller updates G and x̂).</summary>
    internal void StoreUncertainty(int i, double uncertainty) => _uncertainties[i] = uncertainty;

    /// <summary>Factors component c afresh from the rows and the current uncertainties.</summary>
    internal void Refactor(int c) => _components[c].Factor(_rows, _uncertainties, _localOf, _kernel, Options);

    /// <summary>The fitted value aᵢᵀx̂ of observation i, summed in the same order as <see cref="FitObservation"/>.</summary>
    public double FittedValue(int i)
    {
        ComponentFactorization component = _components[_componentOfObservation[i]];
        SparseRow row = _rows[i].Row;
        ReadOnlySpan<int> idx = row.Indices;
        ReadOnlySpan<double> coef = row.Coefficients;
        double fitted = 0.0;
        for (int p = 0; p < idx.Length; p++)
        {
            fitted += coef[p] * component.Solution[_localOf[idx[p]]];
        }

        return fitted;
    }

    /// <summary>The fitted value aᵢᵀx̂ and the quadratic form aᵢᵀGaᵢ of observation i.</summary>
    public (double Fitted, double Quadratic) FitObservation(int i)
    {
        ComponentFactorization component = _components[_componentOfObservation[i]];
        SparseRow row = _rows[i].Row;
        ReadOnlySpan<int> idx = row.Indices;
        ReadOnlySpan<double> coef = row.Coefficients;
        int k = component.Size;
        double fitted = 0.0;
        double quadratic = 0.0;
        for (int p = 0; p < idx.Length; p++)
        {
            int lp = _localOf[idx[p]];
            fitted += coef[p] * component.Solution[lp];
            double inner = 0.0;
            for (int q = 0; q < idx.Length; q++)
            {
                inner += coef[q] * component.Covariance[_localOf[idx[q]] + (lp * k)];
            }

            quadratic += coef[p] * inner;
        }

        return (fitted, quadratic);
    }

    /// <summary>The normalized residual of observation i, or null when it is not checkable.</summary>
    public double? NormalizedResidual(int i)
    {
        (double fitted, double quadratic) = FitObservation(i);
        double u = _uncertainties[i];
        double u2 = u * u;
        double rest = u2 - quadratic;
        return rest > Options.CheckabilityTolerance * u2 ? (_rows[i].Value - fitted) / Math.Sqrt(rest) : null;
    }

    /// <summary>Computes C·a as a dense vector over all unknowns (zero outside the components a touches).</summary>
    public double[] CovarianceTimes(SparseRow a)
    {
        var result = new double[UnknownCount];
        foreach (IGrouping<int, int> group in Enumerable.Range(0, a.Count).GroupBy(p => _componentOfUnknown[a.Indices[p]]))
        {
            ComponentFactorization component = _components[group.Key];
            int[] local = group.Select(p => _localOf[a.Indices[p]]).ToArray();
            double[] coefficients = group.Select(p => a.Coefficients[p]).ToArray();
            var part = new double[component.Size];
            component.MultiplyCovariance(local, coefficients, part);
            for (int t = 0; t < part.Length; t++)
            {
                result[component.Unknowns[t]] = part[t];
            }
        }

        return result;
    }

    /// <summary>Whether a lies in the row space of A: ‖Qᵀa‖ ≤ tol·‖a‖ with Q the orthonormal null-space bases.</summary>
    public bool IsEstimable(SparseRow a)
    {
        double norm2 = 0.0;
        for (int p = 0; p < a.Count; p++)
        {
            norm2 += a.Coefficients[p] * a.Coefficients[p];
        }

        double projection2 = 0.0;
        foreach (IGrouping<int, int> group in Enumerable.Range(0, a.Count).GroupBy(p => _componentOfUnknown[a.Indices[p]]))
        {
            ComponentFactorization component = _components[group.Key];
            int k = component.Size;
            for (int c = 0; c < component.Nullity; c++)
            {
                double dot = 0.0;
                foreach (int p in group)
                {
                    dot += a.Coefficients[p] * component.NullBasis[_localOf[a.Indices[p]] + (c * k)];
                }

                projection2 += dot * dot;
            }
        }

        double tolerance = Options.EstimabilityTolerance;
        return projection2 <= tolerance * tolerance * norm2;
    }

    private (int[] Local, double[] Coefficients) Localize(SparseRow row)
    {
        var local = new int[row.Count];
        for (int p = 0; p < local.Length; p++)
        {
            local[p] = _localOf[row.Indices[p]];
        }

        return (local, row.Coefficients.ToArray());
    }

    private static IDenseKernel SelectKernel(LinearAlgebraBackend backend) => backend switch
    {
        LinearAlgebraBackend.Managed => ManagedKernel.Instance,
        LinearAlgebraBackend.Native when OpenBlasKernel.IsAvailable => OpenBlasKernel.Instance,
        LinearAlgebraBackend.Native => throw new DllNotFoundException("libopenblas.so.0 (with dpstrf_, dpotri_, dgemm_ and dsyrk_) could not be loaded; install libopenblas0 or use the managed backend."),
        _ => OpenBlasKernel.IsAvailable ? OpenBlasKernel.Instance : ManagedKernel.Instance,
    };
}
