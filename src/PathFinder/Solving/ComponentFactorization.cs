using System.Runtime.CompilerServices;

namespace PathFinder.Solving;

/// <summary>The factored normal equations of one connected component: generalized inverse, solution, null space.</summary>
/// <remarks>
/// <para>
/// Scaling limit of this dense route (compromise stated on purpose): the component's normal matrix is held
/// densely, so memory grows as k² (8·k² bytes: 32 MB at k = 2000, 800 MB at k = 10 000) and time as k³
/// (pivoted Cholesky k³/3 plus inversion 2k³/3 flops; about 0.3 s at k = 2000 with OpenBLAS on 2 cores,
/// so roughly 40 s at k = 10 000). Past a few thousand unknowns in one component the sparse route is the
/// one to take: N = AᵀWA is very sparse (a few nonzeros per row of A), so a sparse Cholesky with a
/// fill-reducing ordering (approximate minimum degree or nested dissection), plus selected inversion
/// (Takahashi equations) for the diagonal of the covariance and aᵢᵀCaᵢ, or CGLS/LSQR on √W·A for each
/// requested quantity aᵀx̂ and Ca, avoids ever forming the dense inverse.
/// </para>
/// <para>
/// The generalized inverse used is G = S·P·[N̂₁₁⁻¹ 0; 0 0]·Pᵀ·S, where S = diag(1/√Nⱼⱼ) scales N to unit diagonal
/// (N̂ = SNS), P is the pivoting of the rank-revealing Cholesky and N̂₁₁ the leading rank×rank block. It is a
/// reflexive g-inverse (NGN = N, GNG = G), the solution it gives sets the non-pivot unknowns to zero, and every
/// estimable quantity (aᵀx̂, aᵀGb for a, b in the row space) is the same for any g-inverse.
/// </para>
/// </remarks>
internal sealed class ComponentFactorization
{
    /// <summary>How far every unpivoted pivot must clear the rank tolerance for the fast full-rank route (see <see cref="Factor"/>).</summary>
    private const double FullRankMargin = 1e4;

    private ComponentFactorization(int[] unknowns, int[] observations)
    {
        Unknowns = unknowns;
        Observations = observations;
        int k = unknowns.Length;
        Covariance = new AlignedBuffer(k * k);
        Solution = new double[k];
        Determined = new bool[k];
        NullBasis = [];
    }

    /// <summary>Global indices of the unknowns, ascending; the local index is the position here.</summary>
    public int[] Unknowns { get; }

    /// <summary>Indices of the observations of this component, ascending.</summary>
    public int[] Observations { get; }

    /// <summary>k, the number of unknowns.</summary>
    public int Size => Unknowns.Length;

    /// <summary>The numerical rank of the component's design matrix.</summary>
    public int Rank { get; private set; }

    /// <summary>The nullity k − rank.</summary>
    public int Nullity => Size - Rank;

    /// <summary>G, the k×k generalized inverse of N (column-major, full symmetric), the covariance on estimable quantities.</summary>
    public AlignedBuffer Covariance { get; }

    /// <summary>The g-inverse solution x̂ = G·AᵀWv (entries for undetermined unknowns are arbitrary).</summary>
    public double[] Solution { get; }

    /// <summary>Orthonormal basis of the null space of A (k × nullity, column-major, original variables).</summary>
    public double[] NullBasis { get; private set; }

    /// <summary>Whether e_j is in the row space, per local unknown.</summary>
    public bool[] Determined { get; }

    /// <summary>Rank-one updates applied since the last factorization.</summary>
    public int UpdatesSinceFactorization { get; set; }

    /// <summary>Creates and factors a component.</summary>
    public static ComponentFactorization Create(
        int[] unknowns, int[] observations, IReadOnlyList<Observation> rows, double[] uncertainties, int[] localOf,
        IDenseKernel kernel, SolverOptions options)
    {
        var component = new ComponentFactorization(unknowns, observations);
        component.Factor(rows, uncertainties, localOf, kernel, options);
        return component;
    }

    /// <summary>An independent copy with its own arrays, so the copy can be updated while this one stays as it is.</summary>
    /// <remarks>Copying the k×k covariance costs O(k²), far less than the O(k³) factorization it saves.</remarks>
    public ComponentFactorization Clone()
    {
        var copy = new ComponentFactorization(Unknowns, Observations)
        {
            Rank = Rank,
            NullBasis = (double[])NullBasis.Clone(),
            UpdatesSinceFactorization = UpdatesSinceFactorization,
        };
        Covariance.Span.CopyTo(copy.Covariance.Span);
        Solution.CopyTo(copy.Solution, 0);
        Determined.CopyTo(copy.Determined, 0);
        return copy;
    }

    /// <summary>Builds N and AᵀWv from the rows, factors, inverts and finds the null space (discarding updates).</summary>
    public void Factor(IReadOnlyList<Observation> rows, double[] uncertainties, int[] localOf, IDenseKernel kernel, SolverOptions options)
    {
        int k = Size;
        UpdatesSinceFactorization = 0;
        Covariance.Clear();
        Array.Clear(Solution);
        if (Observations.Length == 0)
        {
            // Unknowns that occur in no observation: nothing is known, the null space is everything.
            Rank = 0;
            NullBasis = new double[k * k];
            for (int j = 0; j < k; j++)
            {
                NullBasis[j + (j * k)] = 1.0;
                Determined[j] = false;
            }

            return;
        }

        // Fast path: an unpivoted Cholesky in place in the covariance buffer (no second k×k buffer, no pivot
        // search). The unpivoted pivot of column j is its squared distance from the span of the earlier columns, so a
        // singular N̂ always shows a zero pivot (up to rounding) in this order too; when every pivot clears the rank
        // tolerance by a wide margin the rank is full, and the rank-revealing pivoted route would find the same.
        // Otherwise that route decides the rank.
        var b = new double[k];
        var s = new double[k];
        Span<double> covariance = Covariance.Span;
        AccumulateNormalEquations(rows, uncertainties, localOf, covariance, b, s);
        if (kernel.TryCholesky(Covariance, k, options.RankTolerance * FullRankMargin))
        {
            Rank = k;
            NullBasis = [];
            Array.Fill(Determined, true);
            kernel.InvertFromFactor(Covariance, k, k);
            for (int c = 0; c < k; c++)
            {
                for (int r = 0; r <= c; r++)
                {
                    covariance[r + (c * k)] *= s[r] * s[c];
                }
            }

            ManagedKernel.MirrorUpper(covariance, k);
        }
        else
        {
            FactorPivoted(rows, uncertainties, localOf, kernel, options, b, s);
        }

        for (int c = 0; c < k; c++)
        {
            ManagedKernel.Axpy(b[c], Covariance.AsSpan(c * k, k), Solution);
        }
    }

    /// <summary>Rank-revealing route: pivoted Cholesky in a work buffer, g-inverse of the leading block, null space.</summary>
    private void FactorPivoted(IReadOnlyList<Observation> rows, double[] uncertainties, int[] localOf, IDenseKernel kernel, SolverOptions options, double[] b, double[] s)
    {
        int k = Size;
        AlignedBuffer work = WorkBuffer.Take(k * k);
        Span<double> n = work.Span[..(k * k)];
        Array.Clear(b);
        AccumulateNormalEquations(rows, uncertainties, localOf, n, b, s);
        var pivot = new int[k];
        int rank = kernel.PivotedCholesky(work, k, pivot, options.RankTolerance);
        Rank = rank;
        int d = k - rank;

        // Null space: with PᵀN̂P = UᵀU and U = [U₁₁ U₁₂], the null space of N̂ is P·[−U₁₁⁻¹U₁₂; I].
        NullBasis = d == 0 ? [] : NullSpace(n, k, rank, pivot, s);
        for (int j = 0; j < k; j++)
        {
            double norm2 = 0.0;
            for (int c = 0; c < d; c++)
            {
                double z = NullBasis[j + (c * k)];
                norm2 += z * z;
            }

            Determined[j] = Math.Sqrt(norm2) <= options.EstimabilityTolerance;
        }

        kernel.InvertFromFactor(work, k, rank);
        Span<double> covariance = Covariance.Span;
        covariance.Clear();
        for (int bc = 0; bc < rank; bc++)
        {
            int gc = pivot[bc];
            for (int br = 0; br <= bc; br++)
            {
                int gr = pivot[br];
                double g = n[br + (bc * k)] * s[gr] * s[gc];
                covariance[gr + (gc * k)] = g;
                covariance[gc + (gr * k)] = g;
            }
        }

        WorkBuffer.Return(work);
    }

    /// <summary>Accumulates the upper triangle of N = AᵀWA and b = AᵀWv, then scales N to unit diagonal (s = 1/√Nⱼⱼ).</summary>
    /// <remarks>Scaling makes the rank tolerance relative, so weights of very different size do not matter.</remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void AccumulateNormalEquations(IReadOnlyList<Observation> rows, double[] uncertainties, int[] localOf, Span<double> n, double[] b, double[] s)
    {
        int k = Size;
        n[..(k * k)].Clear();
        foreach (int i in Observations)
        {
            Observation observation = rows[i];
            double u = uncertainties[i];
            double w = 1.0 / (u * u);
            ReadOnlySpan<int> idx = observation.Row.Indices;
            ReadOnlySpan<double> coef = observation.Row.Coefficients;
            for (int p = 0; p < idx.Length; p++)
            {
                int lp = localOf[idx[p]];
                double wp = w * coef[p];
                b[lp] += wp * observation.Value;
                for (int q = 0; q < idx.Length; q++)
                {
                    int lq = localOf[idx[q]];
                    if (lp <= lq)
                    {
                        n[lp + (lq * k)] += wp * coef[q];
                    }
                }
            }
        }

        for (int j = 0; j < k; j++)
        {
            s[j] = 1.0 / Math.Sqrt(n[j + (j * k)]);
        }

        for (int c = 0; c < k; c++)
        {
            for (int r = 0; r <= c; r++)
            {
                n[r + (c * k)] *= s[r] * s[c];
            }
        }
    }

    /// <summary>Computes G·a for a local sparse vector (result dense, length k).</summary>
    public void MultiplyCovariance(ReadOnlySpan<int> localIndices, ReadOnlySpan<double> coefficients, Span<double> result)
    {
        int k = Size;
        result.Clear();
        for (int p = 0; p < localIndices.Length; p++)
        {
            ManagedKernel.Axpy(coefficients[p], Covariance.AsSpan(localIndices[p] * k, k), result);
        }
    }

    /// <summary>Applies the weight change w → w + Δw of one row a by Sherman–Morrison, updating G and x̂.</summary>
    /// <remarks>
    /// G' = G − Δw·(Ga)(Ga)ᵀ/(1 + Δw·aᵀGa) and x̂' = x̂ + Δw·Ga·(v − aᵀx̂)/(1 + Δw·aᵀGa). The pivoted g-inverse is
    /// the true inverse on the pivot coordinates, and a weight change keeps the pivot columns independent, so
    /// the update is exact for this g-inverse. The denominator is ≥ w'/w &gt; 0 because aᵀGa ≤ 1/w.
    /// </remarks>
    public void ApplyWeightChange(ReadOnlySpan<int> localIndices, ReadOnlySpan<double> coefficients, double value, double deltaWeight)
    {
        int k = Size;
        var g = new double[k];
        MultiplyCovariance(localIndices, coefficients, g);
        double q = 0.0;
        double fitted = 0.0;
        for (int p = 0; p < localIndices.Length; p++)
        {
            q += coefficients[p] * g[localIndices[p]];
            fitted += coefficients[p] * Solution[localIndices[p]];
        }

        double factor = deltaWeight / (1.0 + (deltaWeight * q));
        ManagedKernel.Axpy(factor * (value - fitted), g, Solution);
        for (int c = 0; c < k; c++)
        {
            ManagedKernel.Axpy(-factor * g[c], g, Covariance.AsSpan(c * k, k));
        }

        UpdatesSinceFactorization++;
    }

    /// <summary>One reusable work matrix for factorizations, so repeated solves do not each allocate 8k² bytes.</summary>
    /// <remarks>
    /// A matrix of a few tens of megabytes lands on the large-object heap, and every such allocation counts toward
    /// a full (generation 2) collection; reusing one buffer removed several of those per command.
    /// </remarks>
    private static class WorkBuffer
    {
        private static AlignedBuffer? s_cached;

        public static AlignedBuffer Take(int length)
        {
            AlignedBuffer? cached = Interlocked.Exchange(ref s_cached, null);
            return cached is not null && cached.Length >= length ? cached : new AlignedBuffer(length);
        }

        public static void Return(AlignedBuffer buffer)
        {
            AlignedBuffer? previous = s_cached;
            if (previous is null || previous.Length < buffer.Length)
            {
                Interlocked.CompareExchange(ref s_cached, buffer, previous);
            }
        }
    }

    private static double[] NullSpace(ReadOnlySpan<double> u, int k, int rank, int[] pivot, double[] s)
    {
        int d = k - rank;
        var z = new double[k * d];
        var y = new double[rank];
        for (int c = 0; c < d; c++)
        {
            // Back substitution U₁₁ y = U₁₂[:, c] (column rank + c of the factored array).
            int column = rank + c;
            for (int r = 0; r < rank; r++)
            {
                y[r] = u[r + (column * k)];
            }

            for (int r = rank - 1; r >= 0; r--)
            {
                y[r] /= u[r + (r * k)];
                ManagedKernel.Axpy(-y[r], u.Slice(r * k, r), y.AsSpan(0, r));
            }

            // Back to original variables: null(A) = S·null(A·S).
            for (int r = 0; r < rank; r++)
            {
                z[pivot[r] + (c * k)] = -y[r] * s[pivot[r]];
            }

            z[pivot[column] + (c * k)] = s[pivot[column]];
        }

        // Orthonormalize (modified Gram–Schmidt, twice for safety; d is small in practice).
        for (int pass = 0; pass < 2; pass++)
        {
            for (int c = 0; c < d; c++)
            {
                Span<double> zc = z.AsSpan(c * k, k);
                for (int e = 0; e < c; e++)
                {
                    ReadOnlySpan<double> ze = z.AsSpan(e * k, k);
                    ManagedKernel.Axpy(-ManagedKernel.Dot(ze, zc), ze, zc);
                }

                double norm = Math.Sqrt(ManagedKernel.Dot(zc, zc));
                for (int t = 0; t < k; t++)
                {
                    zc[t] /= norm;
                }
            }
        }

        return z;
    }
}
