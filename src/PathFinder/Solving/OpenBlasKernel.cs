using System.Runtime.InteropServices;

namespace PathFinder.Solving;

/// <summary>Dense kernel calling LAPACK in Debian's <c>libopenblas.so.0</c> directly (Fortran symbols, column-major).</summary>
/// <remarks>
/// MathNet's OpenBLAS provider needs a wrapper library that is not shipped here, so the Fortran entry points
/// (<c>dpstrf_</c>, <c>dpotri_</c>, <c>dgemm_</c>) are called through P/Invoke. Fortran passes every argument by reference and
/// appends a hidden length for each character argument, which is passed explicitly. Integers are 32-bit (LP64 build).
/// </remarks>
internal sealed class OpenBlasKernel : IDenseKernel
{
    private const string LibraryName = "libopenblas.so.0";

    private static readonly Lazy<bool> s_available = new(Probe);

    private OpenBlasKernel()
    {
    }

    /// <summary>The shared instance.</summary>
    public static OpenBlasKernel Instance { get; } = new();

    /// <summary>Whether the library loads and exports the needed symbols.</summary>
    public static bool IsAvailable => s_available.Value;

    public LinearAlgebraBackend Backend => LinearAlgebraBackend.Native;

    public int PivotedCholesky(double[] a, int n, int[] pivot, double tolerance)
    {
        if (n == 0)
        {
            return 0;
        }

        byte uplo = (byte)'U';
        int order = n;
        int lda = n;
        int rank = 0;
        int info = 0;
        double tol = tolerance;
        var work = new double[2 * n];
        var piv = new int[n];
        Dpstrf(ref uplo, ref order, a, ref lda, piv, ref rank, ref tol, work, ref info, 1);
        if (info < 0)
        {
            throw new InvalidOperationException($"dpstrf_ rejected argument {-info}.");
        }

        for (int k = 0; k < n; k++)
        {
            pivot[k] = piv[k] - 1;
        }

        // info = 1 means "rank deficient", which is an expected outcome here, not an error.
        return rank;
    }

    public void InvertFromFactor(double[] a, int n, int rank)
    {
        if (rank == 0)
        {
            return;
        }

        byte uplo = (byte)'U';
        int order = rank;
        int lda = n;
        int info = 0;
        Dpotri(ref uplo, ref order, a, ref lda, ref info, 1);
        if (info != 0)
        {
            throw new InvalidOperationException($"dpotri_ failed with info = {info}.");
        }
    }

    public void SubtractLowRank(double[] g, int n, double[] vectors, double[] coefficients, int rank)
    {
        if (rank == 0 || n == 0)
        {
            return;
        }

        // G ← G − (V·diag(c))·Vᵀ as one dgemm_: 2n²·rank flops at BLAS-3 speed instead of rank memory-bound passes.
        var scaled = new double[n * rank];
        for (int j = 0; j < rank; j++)
        {
            double c = coefficients[j];
            ReadOnlySpan<double> source = vectors.AsSpan(j * n, n);
            Span<double> target = scaled.AsSpan(j * n, n);
            for (int t = 0; t < n; t++)
            {
                target[t] = c * source[t];
            }
        }

        byte transA = (byte)'N';
        byte transB = (byte)'T';
        int m = n;
        int columns = n;
        int inner = rank;
        double alpha = -1.0;
        double beta = 1.0;
        int ld = n;
        Dgemm(ref transA, ref transB, ref m, ref columns, ref inner, ref alpha, scaled, ref ld, vectors, ref ld, ref beta, g, ref ld, 1, 1);
    }

    private static bool Probe()
    {
        if (!NativeLibrary.TryLoad(LibraryName, out IntPtr handle))
        {
            return false;
        }

        return NativeLibrary.TryGetExport(handle, "dpstrf_", out _) && NativeLibrary.TryGetExport(handle, "dpotri_", out _)
            && NativeLibrary.TryGetExport(handle, "dgemm_", out _);
    }

    [DllImport(LibraryName, EntryPoint = "dpstrf_", ExactSpelling = true)]
    private static extern void Dpstrf(
        ref byte uplo, ref int n, double[] a, ref int lda, int[] piv, ref int rank, ref double tol, double[] work, ref int info, nuint uploLength);

    [DllImport(LibraryName, EntryPoint = "dgemm_", ExactSpelling = true)]
    private static extern void Dgemm(
        ref byte transA, ref byte transB, ref int m, ref int n, ref int k, ref double alpha, double[] a, ref int lda, double[] b, ref int ldb,
        ref double beta, double[] c, ref int ldc, nuint transALength, nuint transBLength);

    [DllImport(LibraryName, EntryPoint = "dpotri_", ExactSpelling = true)]
    private static extern void Dpotri(ref byte uplo, ref int n, double[] a, ref int lda, ref int info, nuint uploLength);
}
