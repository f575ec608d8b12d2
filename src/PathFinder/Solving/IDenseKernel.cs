namespace PathFinder.Solving;

/// <summary>The two dense steps of the solver: rank-revealing Cholesky and inversion from the factor.</summary>
/// <remarks>
/// Matrices are column-major <c>double[]</c> of order n with leading dimension n, element (i, j) at i + j·n,
/// like LAPACK. Only the upper triangle is read or written.
/// </remarks>
internal interface IDenseKernel
{
    /// <summary>The backend this kernel implements.</summary>
    LinearAlgebraBackend Backend { get; }

    /// <summary>Pivoted Cholesky PᵀAP = UᵀU of a symmetric positive semi-definite matrix, stopping at pivots ≤ tolerance.</summary>
    /// <param name="a">On entry the upper triangle of A; on exit rows 0..rank−1 of U in the upper triangle (the rest is scratch).</param>
    /// <param name="n">The order.</param>
    /// <param name="pivot">On exit, pivot[k] = original index of the k-th pivoted column (0-based).</param>
    /// <param name="tolerance">Absolute pivot threshold.</param>
    /// <returns>The computed rank.</returns>
    int PivotedCholesky(AlignedBuffer a, int n, int[] pivot, double tolerance);

    /// <summary>Unpivoted Cholesky A = UᵀU in place, accepted only when every pivot Uⱼⱼ² exceeds <paramref name="minimumPivot"/>.</summary>
    /// <returns>True with U in the upper triangle; false when declined or not positive definite (A is then destroyed).</returns>
    bool TryCholesky(AlignedBuffer a, int n, double minimumPivot);

    /// <summary>Replaces the leading rank×rank upper triangle U₁₁ by the upper triangle of (U₁₁ᵀU₁₁)⁻¹.</summary>
    void InvertFromFactor(AlignedBuffer a, int n, int rank);

    /// <summary>Applies a symmetric low-rank correction G ← G − Σⱼ cⱼ·vⱼvⱼᵀ to the upper triangle of an n×n matrix.</summary>
    /// <remarks>
    /// The strict lower triangle may be left as it was (it is then stale): copying the upper triangle down after every
    /// correction cost as much as the correction itself, so callers refresh the columns they read (see <see cref="IncrementalFit"/>).
    /// </remarks>
    /// <param name="g">The symmetric matrix, column-major, leading dimension n (upper triangle updated in place).</param>
    /// <param name="n">The order.</param>
    /// <param name="vectors">The vectors vⱼ, column j at j·n (n × rank, column-major).</param>
    /// <param name="coefficients">The coefficients cⱼ.</param>
    /// <param name="rank">How many vectors to apply.</param>
    void SubtractLowRank(AlignedBuffer g, int n, double[] vectors, double[] coefficients, int rank);
}
