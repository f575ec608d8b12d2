namespace PathFinder.Solving;

/// <summary>Solves a network of observations by weighted least squares: minimize Σ wᵢ(vᵢ − aᵢᵀx)², wᵢ = 1/uᵢ².</summary>
/// <remarks>
/// Steps: split the unknowns into connected components (union–find over unknowns sharing an observation);
/// per component accumulate N = AᵀWA and AᵀWv, scale N to unit diagonal, factor it with a rank-revealing
/// (pivoted) Cholesky, form a reflexive generalized inverse from the leading full-rank block and an orthonormal
/// null-space basis for estimability. Dense steps run in OpenBLAS when available (see <see cref="LinearAlgebraBackend"/>).
/// </remarks>
public static class WeightedLeastSquares
{
    /// <summary>Solves the system.</summary>
    /// <param name="system">The observations.</param>
    /// <param name="options">Tolerances and backend; <see cref="SolverOptions.Default"/> when null.</param>
    /// <exception cref="DllNotFoundException">The native backend was demanded and cannot be loaded.</exception>
    public static LeastSquaresSolution Solve(ObservationSystem system, SolverOptions? options = null) =>
        new(SolverEngine.Create(system, options));

    /// <summary>Whether the native OpenBLAS backend can be used on this machine.</summary>
    public static bool IsNativeBackendAvailable => OpenBlasKernel.IsAvailable;

    /// <summary>The kernel family the native backend runs (for example "SkylakeX"), or null when it is not available.</summary>
    /// <remarks>PathFinder picks it from the CPU's instruction sets unless OPENBLAS_CORETYPE is set (see the developer guide).</remarks>
    public static string? NativeKernelName => OpenBlasKernel.CoreName;
}
