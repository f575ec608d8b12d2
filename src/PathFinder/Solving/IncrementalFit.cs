using System.Numerics;

namespace PathFinder.Solving;

/// <summary>Every observation's fitted value, aᵢᵀGaᵢ and normalized residual, kept current through weight changes.</summary>
/// <remarks>
/// <para>
/// A weight change w → w + Δw of observation i changes the g-inverse by a rank-one term (Sherman–Morrison):
/// G' = G − c·ggᵀ with g = Ga and c = Δw/(1 + Δw·aᵀGa), and x̂' = x̂ + c·(vᵢ − aᵢᵀx̂)·g. Instead of updating the
/// dense G (k² work and 8k² bytes of memory traffic per change), the changes are kept as a low-rank list,
/// G = G_f − Σⱼ cⱼgⱼgⱼᵀ, with G_f the last dense ("folded") matrix. Then
/// g = G_f·a − Σⱼ cⱼ(gⱼᵀa)·gⱼ costs O(k·(nnz + r)), and every other observation l follows from tₗ = aₗᵀg alone:
/// ŷₗ' = ŷₗ + c·eᵢ·tₗ and qₗ' = qₗ − c·tₗ² (O(nnz) each, O(m·nnz) in all). When r reaches the block size the list
/// is folded into G_f with one BLAS-3 product (<see cref="IDenseKernel.SubtractLowRank"/>), which costs the same
/// 2k² flops per change as a dense update but runs at matrix–matrix speed.
/// </para>
/// <para>
/// Because tₗ does not depend on Δw, the effect of enlarging observation i once, twice, … (factor F each time) on
/// every normalized residual can be evaluated for several Δw from one g, and a run of consecutive adjustments of
/// the same observation is committed as one rank-one change. The result equals doing them one by one.
/// </para>
/// </remarks>
internal sealed class IncrementalFit
{
    private readonly SolverEngine _engine;
    private readonly double _checkability;
    private readonly double[] _values;
    private readonly double[] _fitted;
    private readonly double[] _quadratic;
    private readonly double[] _z;
    private readonly int[] _rowStart;
    private readonly int[] _local;
    private readonly double[] _coefficients;
    private readonly LowRank[] _lowRank;
    private readonly RowGroup[]?[] _rowGroups;
    private readonly int _blockSize;
    private double[] _gBuffer = [];
    private double[] _tBuffer = [];
    private double[] _zBuffer = [];

    public IncrementalFit(SolverEngine engine, int blockSize)
    {
        _engine = engine;
        _checkability = engine.Options.CheckabilityTolerance;
        _blockSize = blockSize;
        int m = engine.ObservationCount;
        _values = new double[m];
        _fitted = new double[m];
        _quadratic = new double[m];
        _z = new double[m];
        _rowStart = new int[m + 1];
        for (int i = 0; i < m; i++)
        {
            _rowStart[i + 1] = _rowStart[i] + engine.Row(i).Row.Count;
        }

        _local = new int[_rowStart[m]];
        _coefficients = new double[_rowStart[m]];
        for (int i = 0; i < m; i++)
        {
            Observation observation = engine.Row(i);
            _values[i] = observation.Value;
            ReadOnlySpan<int> idx = observation.Row.Indices;
            ReadOnlySpan<double> coef = observation.Row.Coefficients;
            for (int p = 0; p < idx.Length; p++)
            {
                _local[_rowStart[i] + p] = engine.LocalIndex(idx[p]);
                _coefficients[_rowStart[i] + p] = coef[p];
            }
        }

        _lowRank = new LowRank[engine.Components.Count];
        _rowGroups = new RowGroup[engine.Components.Count][];
        for (int c = 0; c < _lowRank.Length; c++)
        {
            Refresh(c);
        }
    }

    /// <summary>The normalized residual of observation i, or NaN when it is not checkable.</summary>
    public double NormalizedResidual(int i) => _z[i];

    /// <summary>The current uncertainty of observation i.</summary>
    public double Uncertainty(int i) => _engine.Uncertainty(i);

    /// <summary>Rank-one changes committed to component c since its last fresh factorization.</summary>
    public int ChangesSinceFactorization(int component) => _lowRank[component]?.Changes ?? 0;

    /// <summary>The checkable observation with the largest |z| (first index on ties), or −1.</summary>
    public int Worst()
    {
        int worst = -1;
        double best = 0.0;
        for (int i = 0; i < _z.Length; i++)
        {
            double a = Math.Abs(_z[i]);
            if (a > best || (worst < 0 && !double.IsNaN(a)))
            {
                worst = i;
                best = a;
            }
        }

        return worst;
    }

    /// <summary>Prepares g = G·aᵢ and tₗ = aₗᵀg for every observation l of i's component.</summary>
    /// <remarks>The probe shares buffers with the next one: it is valid until the next call.</remarks>
    public Probe Prepare(int i)
    {
        int c = _engine.ComponentOfObservation(i);
        ComponentFactorization component = _engine.Components[c];
        LowRank lowRank = LowRankOf(c);
        int k = component.Size;
        int[] observations = component.Observations;
        if (_gBuffer.Length < k)
        {
            _gBuffer = new double[k];
        }

        if (_tBuffer.Length < observations.Length)
        {
            _tBuffer = new double[observations.Length];
            _zBuffer = new double[observations.Length];
        }

        Span<double> g = _gBuffer.AsSpan(0, k);
        g.Clear();
        int start = _rowStart[i];
        int end = _rowStart[i + 1];
        for (int p = start; p < end; p++)
        {
            ManagedKernel.Axpy(_coefficients[p], component.Covariance.AsSpan(_local[p] * k, k), g);
        }

        // g −= Σⱼ cⱼ(gⱼᵀa)·gⱼ: the dots first (a is sparse), then one pass over g for all the vectors.
        int used = 0;
        for (int j = 0; j < lowRank.Count; j++)
        {
            double dot = 0.0;
            int offset = j * k;
            for (int p = start; p < end; p++)
            {
                dot += _coefficients[p] * lowRank.Vectors[offset + _local[p]];
            }

            double alpha = -lowRank.Coefficients[j] * dot;
            if (alpha != 0.0)
            {
                lowRank.Alphas[used] = alpha;
                lowRank.Offsets[used] = offset;
                used++;
            }
        }

        ManagedKernel.AxpyMany(lowRank.Alphas.AsSpan(0, used), lowRank.Offsets.AsSpan(0, used), lowRank.Vectors, g);

        // t = A·g over the component's rows.
        MultiplyRows(RowGroupsOf(c), g, _tBuffer.AsSpan(0, observations.Length));

        return new Probe(i, c, _gBuffer, _tBuffer);
    }

    /// <summary>The largest |z| and its observation if observation i (prepared in probe) had uncertainty u.</summary>
    /// <returns>The index of the worst checkable observation after the change (first on ties) and i's own z.</returns>
    public (int Worst, double OwnZ) Evaluate(Probe probe, double uncertainty)
    {
        int i = probe.Observation;
        double factor = ChangeFactor(i, uncertainty);
        double e = _values[i] - _fitted[i];
        int[] observations = _engine.Components[probe.Component].Observations;
        if (observations.Length == _z.Length)
        {
            return EvaluateEvery(probe, uncertainty, factor * e, factor);
        }

        int worst = -1;
        double best = 0.0;
        double own = double.NaN;
        int p = 0;

        // Other components are unchanged; scanning in index order keeps the tie rule of Worst().
        for (int l = 0; l < _z.Length; l++)
        {
            double z;
            if (p < observations.Length && observations[p] == l)
            {
                double tl = probe.T[p];
                p++;
                double u = l == i ? uncertainty : _engine.Uncertainty(l);
                z = ZOf(_values[l] - _fitted[l] - (factor * e * tl), u, _quadratic[l] - (factor * tl * tl));
                _zBuffer[p - 1] = z;
                if (l == i)
                {
                    own = z;
                }
            }
            else
            {
                z = _z[l];
            }

            double a = Math.Abs(z);
            if (a > best || (worst < 0 && !double.IsNaN(a)))
            {
                worst = l;
                best = a;
            }
        }

        return (worst, own);
    }

    /// <summary><see cref="Evaluate"/> when the probed component holds every observation (position = index), vectorized.</summary>
    /// <remarks>The same operations in the same order as <see cref="ZOf"/> element by element, so the same z to the last bit.</remarks>
    private (int Worst, double OwnZ) EvaluateEvery(Probe probe, double uncertainty, double shift, double factor)
    {
        int i = probe.Observation;
        int m = _z.Length;
        ReadOnlySpan<double> t = probe.T.AsSpan(0, m);
        ReadOnlySpan<double> values = _values;
        ReadOnlySpan<double> fitted = _fitted;
        ReadOnlySpan<double> quadratic = _quadratic;
        ReadOnlySpan<double> uncertainties = _engine.Uncertainties;
        Span<double> z = _zBuffer.AsSpan(0, m);
        int l = 0;
        if (Vector.IsHardwareAccelerated)
        {
            int width = Vector<double>.Count;
            var vShift = new Vector<double>(shift);
            var vFactor = new Vector<double>(factor);
            var vCheckability = new Vector<double>(_checkability);
            var vNaN = new Vector<double>(double.NaN);
            for (; l + width <= m; l += width)
            {
                var tl = new Vector<double>(t.Slice(l, width));
                Vector<double> residual = new Vector<double>(values.Slice(l, width)) - new Vector<double>(fitted.Slice(l, width)) - (vShift * tl);
                Vector<double> q = new Vector<double>(quadratic.Slice(l, width)) - (vFactor * tl * tl);
                var u = new Vector<double>(uncertainties.Slice(l, width));
                Vector<double> u2 = u * u;
                Vector<double> rest = u2 - q;
                Vector<double> checkable = Vector.GreaterThan(rest, vCheckability * u2).As<long, double>();
                Vector.ConditionalSelect(checkable, residual / Vector.SquareRoot(rest), vNaN).CopyTo(z.Slice(l, width));
            }
        }

        for (; l < m; l++)
        {
            z[l] = ZOf(values[l] - fitted[l] - (shift * t[l]), uncertainties[l], quadratic[l] - (factor * t[l] * t[l]));
        }

        z[i] = ZOf(values[i] - fitted[i] - (shift * t[i]), uncertainty, quadratic[i] - (factor * t[i] * t[i]));
        int worst = -1;
        double best = 0.0;
        for (l = 0; l < m; l++)
        {
            double a = Math.Abs(z[l]);
            if (a > best || (worst < 0 && !double.IsNaN(a)))
            {
                worst = l;
                best = a;
            }
        }

        return (worst, z[i]);
    }

    /// <summary>Commits the change of observation i's uncertainty to u (one rank-one change).</summary>
    /// <param name="probe">The prepared observation.</param>
    /// <param name="uncertainty">Its new uncertainty.</param>
    /// <param name="evaluated">True when the last <see cref="Evaluate"/> call was for this probe and this uncertainty (its z values are reused).</param>
    /// <param name="refactorizationInterval">Changes after which the component is factored afresh.</param>
    public void Commit(Probe probe, double uncertainty, bool evaluated, int refactorizationInterval)
    {
        int i = probe.Observation;
        int c = probe.Component;
        double factor = ChangeFactor(i, uncertainty);
        double e = _values[i] - _fitted[i];
        ComponentFactorization component = _engine.Components[c];
        ManagedKernel.Axpy(factor * e, probe.G.AsSpan(0, component.Size), component.Solution);
        _engine.StoreUncertainty(i, uncertainty);
        int[] observations = component.Observations;
        for (int p = 0; p < observations.Length; p++)
        {
            int l = observations[p];
            double tl = probe.T[p];
            _fitted[l] += factor * e * tl;
            _quadratic[l] -= factor * tl * tl;
            _z[l] = evaluated ? _zBuffer[p] : ZOf(_values[l] - _fitted[l], _engine.Uncertainty(l), _quadratic[l]);
        }

        LowRank lowRank = LowRankOf(c);
        lowRank.Changes++;
        if (lowRank.Changes >= refactorizationInterval)
        {
            _engine.Refactor(c);
            lowRank.Count = 0;
            lowRank.Changes = 0;
            Refresh(c);
            return;
        }

        probe.G.AsSpan(0, component.Size).CopyTo(lowRank.Vectors.AsSpan(lowRank.Count * component.Size));
        lowRank.Coefficients[lowRank.Count] = factor;
        lowRank.Count++;
        if (lowRank.Count == lowRank.Capacity)
        {
            Fold(c);
        }
    }

    /// <summary>Folds every pending low-rank list into the dense matrices, so the engine holds the current G.</summary>
    public void FoldAll()
    {
        for (int c = 0; c < _lowRank.Length; c++)
        {
            if (_lowRank[c] is { Count: > 0 })
            {
                Fold(c);
            }
        }
    }

    private void Fold(int c)
    {

        ComponentFactorization component = _engine.Components[c];
        LowRank lowRank = _lowRank[c];
        _engine.Kernel.SubtractLowRank(component.Covariance, component.Size, lowRank.Vectors, lowRank.Coefficients, lowRank.Count);
        lowRank.Count = 0;
    }

    /// <summary>c = Δw/(1 + Δw·qᵢ) for the change of observation i's uncertainty to u.</summary>
    private double ChangeFactor(int i, double uncertainty)
    {
        double old = _engine.Uncertainty(i);
        double deltaWeight = (1.0 / (uncertainty * uncertainty)) - (1.0 / (old * old));
        return deltaWeight / (1.0 + (deltaWeight * _quadratic[i]));
    }

    private double ZOf(double residual, double uncertainty, double quadratic)
    {
        double u2 = uncertainty * uncertainty;
        double rest = u2 - quadratic;
        return rest > _checkability * u2 ? residual / Math.Sqrt(rest) : double.NaN;
    }

    /// <summary>Recomputes ŷ, q and z of component c's observations from the dense G and x̂.</summary>
    private void Refresh(int c)
    {
        foreach (int i in _engine.Components[c].Observations)
        {
            (double fitted, double quadratic) = _engine.FitObservation(i);
            _fitted[i] = fitted;
            _quadratic[i] = quadratic;
            _z[i] = ZOf(_values[i] - fitted, _engine.Uncertainty(i), quadratic);
        }
    }

    /// <summary>tₗ = aₗᵀg for every row of the groups, tₗ stored at the row's position.</summary>
    /// <remarks>
    /// Rows are grouped by length so the inner loop has a fixed trip count (no mispredicted loop exits); each tₗ is
    /// summed in the row's own order, as a plain loop would.
    /// </remarks>
    private static void MultiplyRows(RowGroup[] groups, ReadOnlySpan<double> g, Span<double> t)
    {
        foreach (RowGroup group in groups)
        {
            int width = group.Width;
            ReadOnlySpan<int> positions = group.Positions;
            ReadOnlySpan<int> local = group.Local;
            ReadOnlySpan<double> coefficients = group.Coefficients;
            for (int r = 0; r < positions.Length; r++)
            {
                int e0 = r * width;
                double sum = 0.0;
                for (int e = e0; e < e0 + width; e++)
                {
                    sum += coefficients[e] * g[local[e]];
                }

                t[positions[r]] = sum;
            }
        }
    }

    /// <summary>Component c's rows grouped by their number of nonzeros, built on first use.</summary>
    private RowGroup[] RowGroupsOf(int c)
    {
        if (_rowGroups[c] is { } built)
        {
            return built;
        }

        int[] observations = _engine.Components[c].Observations;
        var byWidth = new SortedDictionary<int, List<int>>();
        for (int p = 0; p < observations.Length; p++)
        {
            int l = observations[p];
            int width = _rowStart[l + 1] - _rowStart[l];
            if (!byWidth.TryGetValue(width, out List<int>? positions))
            {
                positions = [];
                byWidth.Add(width, positions);
            }

            positions.Add(p);
        }

        var groups = new RowGroup[byWidth.Count];
        int g = 0;
        foreach ((int width, List<int> positions) in byWidth)
        {
            var local = new int[positions.Count * width];
            var coefficients = new double[positions.Count * width];
            for (int r = 0; r < positions.Count; r++)
            {
                int start = _rowStart[observations[positions[r]]];
                Array.Copy(_local, start, local, r * width, width);
                Array.Copy(_coefficients, start, coefficients, r * width, width);
            }

            groups[g++] = new RowGroup(width, positions.ToArray(), local, coefficients);
        }

        return _rowGroups[c] = groups;
    }

    private LowRank LowRankOf(int c) => _lowRank[c] ??= new LowRank(_engine.Components[c].Size, Math.Max(1, Math.Min(_blockSize, _engine.Components[c].Size)));

    /// <summary>g = G·aᵢ (first k entries) for a prepared observation and tₗ = aₗᵀg for the observations of its component (in component order).</summary>
    internal sealed record Probe(int Observation, int Component, double[] G, double[] T);

    /// <summary>Rows of one length: positions in the component's observation list, then local indices and coefficients, row after row.</summary>
    private sealed record RowGroup(int Width, int[] Positions, int[] Local, double[] Coefficients);

    private sealed class LowRank(int size, int capacity)
    {
        public int Capacity { get; } = capacity;

        public double[] Vectors { get; } = new double[size * capacity];

        public double[] Coefficients { get; } = new double[capacity];

        /// <summary>Scratch: the nonzero multipliers of a probe's low-rank correction.</summary>
        public double[] Alphas { get; } = new double[capacity];

        /// <summary>Scratch: where the vectors of <see cref="Alphas"/> start in <see cref="Vectors"/>.</summary>
        public int[] Offsets { get; } = new int[capacity];

        public int Count { get; set; }

        public int Changes { get; set; }
    }
}
