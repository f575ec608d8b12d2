using System.Diagnostics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using PathFinder.Threading;

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
/// <para>
/// The O(m·nnz) pass runs once per step, thousands of times, so its layout matters: observations are
/// kept in "slot" order, grouped by component and within a component by their number of nonzeros, with each
/// group's indices stored column by column. Four rows are then evaluated at once in SIMD registers with a fixed
/// trip count and contiguous loads; each row's tₗ is still summed in the row's own order, and the vector and
/// scalar paths perform the same operations, so results do not depend on the hardware. Ties between equal |z|
/// go to the lowest observation index, as in a plain scan.
/// </para>
/// </remarks>
internal sealed class IncrementalFit
{
    private const int Lanes = 4;

    private readonly SolverEngine _engine;
    private readonly double _checkability;
    private readonly int _blockSize;
    private readonly int[] _slotOf;
    private readonly int[] _observationAt;
    private readonly double[] _values;
    private readonly double[] _fitted;
    private readonly double[] _quadratic;
    private readonly double[] _variance;
    private readonly double[] _t;
    private readonly ComponentSlots[] _components;
    private readonly LowRank?[] _lowRank;
    private double[] _gBuffer = [];

    // The last committed change, whose ŷ/q update over its component is still to be applied: the next pass over that
    // component applies it on the way (one pass per step instead of three), and single rows read it on the fly.
    private int _pendingComponent = -1;
    private double _pendingShift;
    private double _pendingFactor;

    public IncrementalFit(SolverEngine engine, int blockSize)
    {
        _engine = engine;
        _checkability = engine.Options.CheckabilityTolerance;
        _blockSize = blockSize;
        int m = engine.ObservationCount;
        _slotOf = new int[m];
        _observationAt = new int[m];
        _values = new double[m];
        _fitted = new double[m];
        _quadratic = new double[m];
        _variance = new double[m];
        _t = new double[m];
        _components = new ComponentSlots[engine.Components.Count];
        _lowRank = new LowRank?[engine.Components.Count];

        int slot = 0;
        for (int c = 0; c < _components.Length; c++)
        {
            int start = slot;
            var groups = new List<WidthGroup>();
            foreach (IGrouping<int, int> byWidth in engine.Components[c].Observations.GroupBy(i => engine.Row(i).Row.Count).OrderBy(g => g.Key))
            {
                int[] members = byWidth.ToArray();
                int width = byWidth.Key;
                var local = new int[members.Length * width];
                var coefficients = new double[members.Length * width];
                for (int r = 0; r < members.Length; r++)
                {
                    int i = members[r];
                    _slotOf[i] = slot + r;
                    _observationAt[slot + r] = i;
                    Observation observation = engine.Row(i);
                    _values[slot + r] = observation.Value;
                    ReadOnlySpan<int> idx = observation.Row.Indices;
                    ReadOnlySpan<double> coef = observation.Row.Coefficients;
                    for (int e = 0; e < width; e++)
                    {
                        // Column by column: entry e of row r at e·count + r, so four rows load contiguously.
                        local[(e * members.Length) + r] = engine.LocalIndex(idx[e]);
                        coefficients[(e * members.Length) + r] = coef[e];
                    }
                }

                groups.Add(new WidthGroup(width, slot, members.Length, local, coefficients));
                slot += members.Length;
            }

            _components[c] = new ComponentSlots(start, slot, groups.ToArray());
            Refresh(c);
        }
    }

    /// <summary>The normalized residual of observation i, or NaN when it is not checkable.</summary>
    public double NormalizedResidual(int i)
    {
        int s = _slotOf[i];
        return ZOf(_values[s] - Fitted(s), _variance[s], Quadratic(s));
    }

    /// <summary>The current uncertainty of observation i.</summary>
    public double Uncertainty(int i) => _engine.Uncertainty(i);

    /// <summary>Rank-one changes committed to component c since its last fresh factorization.</summary>
    public int ChangesSinceFactorization(int component) => _lowRank[component]?.Changes ?? 0;

    /// <summary>The checkable observation with the largest |z| (lowest index on ties), or −1.</summary>
    public int Worst() => WorstExcept(-1, -1);

    /// <summary>Prepares g = G·aᵢ; the first evaluation of the probe computes tₗ = aₗᵀg for every observation l of i's component.</summary>
    /// <remarks>The probe shares buffers with the next one: it is valid until the next call.</remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public Probe Prepare(int i)
    {
        int c = _engine.ComponentOfObservation(i);
        ComponentFactorization component = _engine.Components[c];
        LowRank lowRank = LowRankOf(c);
        int k = component.Size;
        if (_gBuffer.Length < k)
        {
            _gBuffer = new double[k];
        }

        Span<double> g = _gBuffer.AsSpan(0, k);
        g.Clear();
        Observation observation = _engine.Row(i);
        ReadOnlySpan<int> idx = observation.Row.Indices;
        ReadOnlySpan<double> coef = observation.Row.Coefficients;
        Span<int> local = stackalloc int[idx.Length];
        for (int p = 0; p < idx.Length; p++)
        {
            local[p] = _engine.LocalIndex(idx[p]);
            ManagedKernel.Axpy(coef[p], FreshColumn(c, local[p]), g);
        }

        // g −= Σⱼ cⱼ(gⱼᵀa)·gⱼ: the dots first (a is sparse), then one pass over g for all the vectors.
        int used = 0;
        for (int j = 0; j < lowRank.Count; j++)
        {
            double dot = 0.0;
            int offset = j * k;
            for (int p = 0; p < idx.Length; p++)
            {
                dot += coef[p] * lowRank.Vectors[offset + local[p]];
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
        if (_pendingComponent != c)
        {
            ApplyPending();
        }

        return new Probe(i, c, _gBuffer);
    }

    /// <summary>The largest |z| and its observation if observation i (prepared in probe) had uncertainty u.</summary>
    /// <returns>The index of the worst checkable observation after the change (lowest on ties) and i's own z.</returns>
    public (int Worst, double OwnZ) Evaluate(Probe probe, double uncertainty)
    {
        (int bestSlot, double bestSquare) = EvaluateChange(probe, uncertainty);
        int worst = WorstExcept(probe.Component, bestSlot < 0 ? -1 : _observationAt[bestSlot], bestSquare);
        int own = _slotOf[probe.Observation];
        double factor = ChangeFactor(probe.Observation, uncertainty);
        double t = _t[own];
        double fitted = _fitted[own] + (factor * (_values[own] - _fitted[own]) * t);
        return (worst, ZOf(_values[own] - fitted, uncertainty * uncertainty, _quadratic[own] - (factor * t * t)));
    }

    /// <summary>Commits the change of observation i's uncertainty to u (one rank-one change).</summary>
    /// <param name="probe">The prepared observation.</param>
    /// <param name="uncertainty">Its new uncertainty.</param>
    /// <param name="evaluated">True when the last <see cref="Evaluate"/> call was for this probe and this uncertainty (its results are reused).</param>
    /// <param name="refactorizationInterval">Changes after which the component is factored afresh.</param>
    public void Commit(Probe probe, double uncertainty, bool evaluated, int refactorizationInterval)
    {
        int i = probe.Observation;
        int c = probe.Component;
        ComponentSlots slots = _components[c];
        if (!evaluated)
        {
            EvaluateChange(probe, uncertainty);
        }

        double factor = ChangeFactor(i, uncertainty);
        double shift = factor * (_values[_slotOf[i]] - _fitted[_slotOf[i]]);
        ComponentFactorization component = _engine.Components[c];
        ManagedKernel.Axpy(shift, probe.G.AsSpan(0, component.Size), component.Solution);
        _engine.StoreUncertainty(i, uncertainty);
        _variance[_slotOf[i]] = uncertainty * uncertainty;

        // ŷ and q of the other rows follow in the next pass over the component (or ApplyPending).
        _pendingComponent = c;
        _pendingShift = shift;
        _pendingFactor = factor;
        slots.BestSlot = slots.PendingBestSlot;
        slots.BestSquare = slots.PendingBestSquare;

        LowRank lowRank = LowRankOf(c);
        lowRank.Changes++;
        if (lowRank.Changes >= refactorizationInterval)
        {
            _engine.Refactor(c);
            lowRank.Count = 0;
            lowRank.Changes = 0;
            lowRank.Generation = 0;
            Array.Clear(lowRank.ColumnGeneration);
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
        ApplyPending();
        for (int c = 0; c < _lowRank.Length; c++)
        {
            if (_lowRank[c] is { Count: > 0 })
            {
                Fold(c);
            }

            MirrorIfStale(c);
        }
    }

    private void Fold(int c)
    {
        ComponentFactorization component = _engine.Components[c];
        LowRank lowRank = _lowRank[c]!;
        _engine.Kernel.SubtractLowRank(component.Covariance, component.Size, lowRank.Vectors, lowRank.Coefficients, lowRank.Count);
        lowRank.Count = 0;

        // Only the upper triangle was updated: every column's part below the diagonal is now stale.
        lowRank.Generation++;
    }

    /// <summary>Column s of component c's G with its part below the diagonal refreshed from the upper triangle if stale.</summary>
    /// <remarks>
    /// After a fold only the upper triangle is current. A step reads a handful of columns, so copying those rows
    /// down on demand (k − s elements each) is far cheaper than mirroring the whole matrix after every fold.
    /// </remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private ReadOnlySpan<double> FreshColumn(int c, int s)
    {
        ComponentFactorization component = _engine.Components[c];
        LowRank lowRank = LowRankOf(c);
        int k = component.Size;
        Span<double> g = component.Covariance.Span;
        if (lowRank.ColumnGeneration[s] != lowRank.Generation)
        {
            for (int r = s + 1; r < k; r++)
            {
                g[r + (s * k)] = g[s + (r * k)];
            }

            lowRank.ColumnGeneration[s] = lowRank.Generation;
        }

        return g.Slice(s * k, k);
    }

    /// <summary>Makes the whole of component c's G current below the diagonal again (after the last fold).</summary>
    private void MirrorIfStale(int c)
    {
        if (_lowRank[c] is { } lowRank && lowRank.Generation != 0)
        {
            ComponentFactorization component = _engine.Components[c];
            ManagedKernel.MirrorUpper(component.Covariance.Span, component.Size);
            lowRank.Generation = 0;
            Array.Clear(lowRank.ColumnGeneration);
        }
    }

    /// <summary>The slot of the worst observation of the probed component (or −1) and its z², if i had uncertainty u.</summary>
    /// <remarks>Also remembered as the component's pending best, which <see cref="Commit"/> takes over.</remarks>
    private (int Slot, double Square) EvaluateChange(Probe probe, double uncertainty)
    {
        int i = probe.Observation;
        int own = _slotOf[i];
        double factor = ChangeFactor(i, uncertainty);
        double shift = factor * (_values[own] - Fitted(own));
        ComponentSlots slots = _components[probe.Component];

        // i's own z uses its new uncertainty: put it in place for the pass, then restore.
        double oldVariance = _variance[own];
        _variance[own] = uncertainty * uncertainty;
        // A second evaluation of the same probe (another uncertainty) computes the same products again: rare, and one
        // pass then serves every case.
        (int bestSlot, double bestSquare) = SweepOfGroups(slots, probe.G.AsSpan(0, _engine.Components[probe.Component].Size), shift, factor);
        _variance[own] = oldVariance;
        slots.PendingBestSlot = bestSlot;
        slots.PendingBestSquare = bestSquare;
        return (bestSlot, bestSquare);
    }

    /// <summary>ŷ ← ŷ + shift·t and q ← q − factor·t² over a component's slots.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void ApplyChange(ComponentSlots slots, double shift, double factor)
    {
        int s = slots.Start;
        if (Vector256.IsHardwareAccelerated)
        {
            var vShift = Vector256.Create(shift);
            var vFactor = Vector256.Create(factor);
            for (; s + Lanes <= slots.End; s += Lanes)
            {
                var t = Vector256.Create(_t.AsSpan(s, Lanes));
                (Vector256.Create(_fitted.AsSpan(s, Lanes)) + (vShift * t)).CopyTo(_fitted.AsSpan(s, Lanes));
                (Vector256.Create(_quadratic.AsSpan(s, Lanes)) - (vFactor * t * t)).CopyTo(_quadratic.AsSpan(s, Lanes));
            }
        }

        for (; s < slots.End; s++)
        {
            double t = _t[s];
            _fitted[s] += shift * t;
            _quadratic[s] -= factor * t * t;
        }
    }

    /// <summary>One pass over a component: applies the pending change, computes tₗ = aₗᵀg, and finds the worst slot after the probed change.</summary>
    /// <returns>The worst slot after the change (lowest observation index on ties) and its z², or (−1, −1).</returns>
    private (int Slot, double Square) SweepOfGroups(ComponentSlots slots, ReadOnlySpan<double> g, double shift, double factor)
    {
        bool pending = _pendingComponent >= 0;
        Debug.Assert(!pending || _components[_pendingComponent] == slots, "A pending change of another component is applied when the probe is prepared.");
        int bestSlot = -1;
        double bestSquare = -1.0;
        foreach (WidthGroup group in slots.Groups)
        {
            (int slot, double square) = pending
                ? SweepGroup<ApplyPendingChange>(group, g, shift, factor)
                : SweepGroup<NoPendingChange>(group, g, shift, factor);
            if (slot >= 0 && (square > bestSquare || (square == bestSquare && _observationAt[slot] < _observationAt[bestSlot])))
            {
                bestSlot = slot;
                bestSquare = square;
            }
        }

        _pendingComponent = -1;
        return (bestSlot, bestSquare);
    }

    /// <summary>The pass of <see cref="SweepOfGroups"/> over one group of rows.</summary>
    /// <remarks>
    /// Per row: ŷ ← ŷ + shift₀·t₀ and q ← q − factor₀·t₀² for the pending change (its t₀ still in place), then the new
    /// t = aᵀg (summed in the row's own order) and z² = (v − ŷ − shift·t)²/(u² − q + factor·t²), compared instead of
    /// |z| to save a square root per row. The vector and scalar paths perform the same operations, so results do not
    /// depend on the hardware. Within a group slots ascend with the observation index, so the first slot holding the
    /// largest value (strictly-greater updates per SIMD lane, then the lowest row among tied lanes) is the lowest
    /// index. Indices come from the fit's own layout (always within g), so the loads skip bounds checks.
    /// </remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private (int Slot, double Square) SweepGroup<TPending>(WidthGroup group, ReadOnlySpan<double> g, double shift, double factor)
        where TPending : struct
    {
        bool applyPending = typeof(TPending) == typeof(ApplyPendingChange);
        int width = group.Width;
        int count = group.Count;
        int start = group.Start;
        ref int local = ref MemoryMarshal.GetArrayDataReference(group.Local);
        ref double coefficients = ref MemoryMarshal.GetArrayDataReference(group.Coefficients);
        ref double gFirst = ref MemoryMarshal.GetReference(g);
        ref double t = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_t), start);
        ref double values = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_values), start);
        ref double fitted = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_fitted), start);
        ref double quadratic = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_quadratic), start);
        ref double variance = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_variance), start);
        double pendingShift = _pendingShift;
        double pendingFactor = _pendingFactor;
        double best = -1.0;
        int bestRow = -1;
        int r = 0;
        if (Vector256.IsHardwareAccelerated && count >= Lanes)
        {
            var vPendingShift = Vector256.Create(pendingShift);
            var vPendingFactor = Vector256.Create(pendingFactor);
            var vShift = Vector256.Create(shift);
            var vFactor = Vector256.Create(factor);
            var vCheckability = Vector256.Create(_checkability);
            var vBest = Vector256.Create(-1.0);
            var vBestRow = Vector256.Create(-1.0);
            var vRow = Vector256.Create(0.0, 1.0, 2.0, 3.0);
            var vStep = Vector256.Create((double)Lanes);
            var minusOne = Vector256.Create(-1.0);
            var vMargin = Vector256.Create(1.0 - 1e-12);
            for (; r + Lanes <= count; r += Lanes)
            {
                nuint at = (nuint)r;
                Vector256<double> rowFitted = Vector256.LoadUnsafe(ref fitted, at);
                Vector256<double> rowQuadratic = Vector256.LoadUnsafe(ref quadratic, at);
                if (applyPending)
                {
                    Vector256<double> old = Vector256.LoadUnsafe(ref t, at);
                    rowFitted += vPendingShift * old;
                    rowQuadratic -= vPendingFactor * old * old;
                    rowFitted.StoreUnsafe(ref fitted, at);
                    rowQuadratic.StoreUnsafe(ref quadratic, at);
                }

                Vector256<double> sum = Vector256<double>.Zero;
                for (int e = 0; e < width; e++)
                {
                    int o = (e * count) + r;
                    ref int index = ref Unsafe.Add(ref local, o);
                    Vector256<double> gathered = Vector256.Create(
                        Unsafe.Add(ref gFirst, index),
                        Unsafe.Add(ref gFirst, Unsafe.Add(ref index, 1)),
                        Unsafe.Add(ref gFirst, Unsafe.Add(ref index, 2)),
                        Unsafe.Add(ref gFirst, Unsafe.Add(ref index, 3)));
                    sum += Vector256.LoadUnsafe(ref coefficients, (nuint)o) * gathered;
                }

                sum.StoreUnsafe(ref t, at);
                Vector256<double> rowVariance = Vector256.LoadUnsafe(ref variance, at);
                Vector256<double> residual = Vector256.LoadUnsafe(ref values, at) - (rowFitted + (vShift * sum));
                Vector256<double> rest = rowVariance - (rowQuadratic - (vFactor * sum * sum));
                Vector256<double> checkable = Vector256.GreaterThan(rest, vCheckability * rowVariance);

                // The division only where a lane may beat its best: r²/u'² > best needs r² > best·u'² (u'² > 0 where
                // checkable), tested with a margin far above rounding, so every lane skipped would have lost anyway.
                Vector256<double> numerator = residual * residual;
                if (!Vector256.EqualsAll(checkable & Vector256.GreaterThan(numerator, vBest * rest * vMargin), Vector256<double>.Zero))
                {
                    Vector256<double> square = Vector256.ConditionalSelect(checkable, numerator / rest, minusOne);
                    Vector256<double> better = Vector256.GreaterThan(square, vBest);
                    vBest = Vector256.ConditionalSelect(better, square, vBest);
                    vBestRow = Vector256.ConditionalSelect(better, vRow, vBestRow);
                }

                vRow += vStep;
            }

            for (int lane = 0; lane < Lanes; lane++)
            {
                double value = vBest[lane];
                int row = (int)vBestRow[lane];
                if (row >= 0 && (value > best || (value == best && row < bestRow)))
                {
                    best = value;
                    bestRow = row;
                }
            }
        }

        for (; r < count; r++)
        {
            if (applyPending)
            {
                double old = Unsafe.Add(ref t, r);
                Unsafe.Add(ref fitted, r) += pendingShift * old;
                Unsafe.Add(ref quadratic, r) -= pendingFactor * old * old;
            }

            double sum = 0.0;
            for (int e = 0; e < width; e++)
            {
                int o = (e * count) + r;
                sum += Unsafe.Add(ref coefficients, o) * Unsafe.Add(ref gFirst, Unsafe.Add(ref local, o));
            }

            Unsafe.Add(ref t, r) = sum;
            double rowVariance = Unsafe.Add(ref variance, r);
            double residual = Unsafe.Add(ref values, r) - (Unsafe.Add(ref fitted, r) + (shift * sum));
            double rest = rowVariance - (Unsafe.Add(ref quadratic, r) - (factor * sum * sum));
            if (rest > _checkability * rowVariance)
            {
                double square = residual * residual / rest;
                if (square > best || bestRow < 0)
                {
                    best = square;
                    bestRow = r;
                }
            }
        }

        return bestRow < 0 ? (-1, best) : (start + bestRow, best);
    }

    /// <summary>Applies the pending change (if any) to its component's ŷ and q.</summary>
    private void ApplyPending()
    {
        if (_pendingComponent >= 0)
        {
            ApplyChange(_components[_pendingComponent], _pendingShift, _pendingFactor);
            _pendingComponent = -1;
        }
    }

    /// <summary>ŷ of slot s, including the pending change.</summary>
    private double Fitted(int s) => IsPending(s) ? _fitted[s] + (_pendingShift * _t[s]) : _fitted[s];

    /// <summary>q = aᵀGa of slot s, including the pending change.</summary>
    private double Quadratic(int s) => IsPending(s) ? _quadratic[s] - (_pendingFactor * _t[s] * _t[s]) : _quadratic[s];

    private bool IsPending(int s) => _pendingComponent >= 0 && s >= _components[_pendingComponent].Start && s < _components[_pendingComponent].End;

    /// <summary>The worst observation over all components, taking <paramref name="candidate"/> (with z² <paramref name="candidateSquare"/>) for component <paramref name="replaced"/>.</summary>
    private int WorstExcept(int replaced, int candidate, double candidateSquare = -1.0)
    {
        int worst = -1;
        double best = -1.0;
        for (int c = 0; c < _components.Length; c++)
        {
            int observation;
            double square;
            if (c == replaced)
            {
                observation = candidate;
                square = candidateSquare;
            }
            else
            {
                int slot = _components[c].BestSlot;
                observation = slot < 0 ? -1 : _observationAt[slot];
                square = _components[c].BestSquare;
            }

            if (observation >= 0 && (square > best || (square == best && observation < worst)))
            {
                worst = observation;
                best = square;
            }
        }

        return worst;
    }

    /// <summary>c = Δw/(1 + Δw·qᵢ) for the change of observation i's uncertainty to u.</summary>
    private double ChangeFactor(int i, double uncertainty)
    {
        double old = _engine.Uncertainty(i);
        double deltaWeight = (1.0 / (uncertainty * uncertainty)) - (1.0 / (old * old));
        return deltaWeight / (1.0 + (deltaWeight * Quadratic(_slotOf[i])));
    }

    private double ZOf(double residual, double variance, double quadratic)
    {
        double rest = variance - quadratic;
        return rest > _checkability * variance ? residual / Math.Sqrt(rest) : double.NaN;
    }

    /// <summary>Recomputes ŷ and q of component c's observations from the dense G and x̂, and its worst observation.</summary>
    private void Refresh(int c)
    {
        if (_pendingComponent == c)
        {
            // Recomputed from the engine below.
            _pendingComponent = -1;
        }
        else
        {
            ApplyPending();
        }

        ComponentSlots slots = _components[c];
        IndexedWork.For(slots.End - slots.Start, offset =>
        {
            int s = slots.Start + offset;
            int i = _observationAt[s];
            (double fitted, double quadratic) = _engine.FitObservation(i);
            double u = _engine.Uncertainty(i);
            _fitted[s] = fitted;
            _quadratic[s] = quadratic;
            _variance[s] = u * u;
            _t[s] = 0.0;
        });

        // With g = 0 (so t = 0) the "change" is none: the same pass finds the current worst.
        (slots.BestSlot, slots.BestSquare) = SweepOfGroups(slots, new double[_engine.Components[c].Size], 0.0, 0.0);
    }

    private LowRank LowRankOf(int c) => _lowRank[c] ??= new LowRank(_engine.Components[c].Size, Math.Max(1, Math.Min(_blockSize, _engine.Components[c].Size)));

    /// <summary>Marks <see cref="SweepGroup{TPending}"/> to apply a pending change (specialized at compile time).</summary>
    private struct ApplyPendingChange;

    /// <summary>Marks <see cref="SweepGroup{TPending}"/> to find no pending change.</summary>
    private struct NoPendingChange;

    /// <summary>g = G·aᵢ (first k entries) for a prepared observation; tₗ for its component is held by the fit.</summary>
    internal sealed record Probe(int Observation, int Component, double[] G);

    /// <summary>A component's slots [Start, End), its rows grouped by length, and its current worst slot.</summary>
    private sealed class ComponentSlots(int start, int end, WidthGroup[] groups)
    {
        public int Start { get; } = start;

        public int End { get; } = end;

        public WidthGroup[] Groups { get; } = groups;

        /// <summary>The slot with the largest checkable |z| now, or −1.</summary>
        public int BestSlot { get; set; } = -1;

        /// <summary>Its z² (−1 when there is none).</summary>
        public double BestSquare { get; set; } = -1.0;

        /// <summary>The slot and z² found by the last evaluated change, which a commit takes over.</summary>
        public int PendingBestSlot { get; set; } = -1;

        /// <summary>The z² of <see cref="PendingBestSlot"/>.</summary>
        public double PendingBestSquare { get; set; } = -1.0;
    }

    /// <summary>Rows of one length occupying slots Start..Start+Count−1; entry e of row r at e·Count + r.</summary>
    private sealed record WidthGroup(int Width, int Start, int Count, int[] Local, double[] Coefficients);

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

        /// <summary>Folds since the whole matrix was last current below the diagonal.</summary>
        public int Generation { get; set; }

        /// <summary>Per column, the generation its part below the diagonal was last refreshed in.</summary>
        public int[] ColumnGeneration { get; } = new int[size];
    }
}
