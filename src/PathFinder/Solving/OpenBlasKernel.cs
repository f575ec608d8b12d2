using System.Runtime.InteropServices;

namespace PathFinder.Solving;

/// <summary>Dense kernel calling LAPACK in Debian's <c>libopenblas.so.0</c> directly (Fortran symbols, column-major).</summary>
/// <remarks>
/// MathNet's OpenBLAS provider needs a wrapper library that is not shipped here, so the Fortran entry points
/// (<c>dpstrf_</c>, <c>dpotri_</c>, <c>dgemm_</c>, <c>dsyrk_</c>) are called through P/Invoke. Fortran passes every argument by reference and
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
        using (var aligned = new AlignedCopy(a, n * n))
        {
            Dpstrf(ref uplo, ref order, ref aligned.First, ref lda, piv, ref rank, ref tol, work, ref info, 1);
        }

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
        using (var aligned = new AlignedCopy(a, n * n))
        {
            Dpotri(ref uplo, ref order, ref aligned.First, ref lda, ref info, 1);
        }

        if (info != 0)
        {
            throw new InvalidOperationException($"dpotri_ failed with info = {info}.");
        }
    }

    public void SubtractLowRank(AlignedBuffer g, int n, double[] vectors, double[] coefficients, int rank)
    {
        if (rank == 0 || n == 0)
        {
            return;
        }

        // With all cⱼ of one sign (always so when uncertainties only grow), G − Σcⱼvⱼvⱼᵀ = G ∓ UUᵀ with
        // U = V·diag(√|c|): one dsyrk_ on the upper triangle (n²·rank flops) and a mirror. Otherwise one dgemm_.
        // G is updated in place: its storage is pinned and 64-byte aligned for its lifetime, so no copy is needed.
        bool allNegative = true;
        bool allPositive = true;
        for (int j = 0; j < rank; j++)
        {
            allNegative &= coefficients[j] <= 0.0;
            allPositive &= coefficients[j] >= 0.0;
        }

        var scaled = new AlignedBuffer(n * rank);
        int order = n;
        int inner = rank;
        int ld = n;
        double beta = 1.0;
        if (allNegative || allPositive)
        {
            for (int j = 0; j < rank; j++)
            {
                double root = Math.Sqrt(Math.Abs(coefficients[j]));
                Scale(root, vectors.AsSpan(j * n, n), scaled.AsSpan(j * n, n));
            }

            byte uplo = (byte)'U';
            byte trans = (byte)'N';
            double alpha = allNegative ? 1.0 : -1.0;
            Dsyrk(ref uplo, ref trans, ref order, ref inner, ref alpha, ref scaled.First, ref ld, ref beta, ref g.First, ref ld, 1, 1);
            MirrorUpper(g.Span, n);
            return;
        }

        for (int j = 0; j < rank; j++)
        {
            Scale(coefficients[j], vectors.AsSpan(j * n, n), scaled.AsSpan(j * n, n));
        }

        byte transA = (byte)'N';
        byte transB = (byte)'T';
        int columns = n;
        double minusOne = -1.0;
        using var alignedB = new AlignedCopy(vectors, n * rank);
        Dgemm(ref transA, ref transB, ref order, ref columns, ref inner, ref minusOne, ref scaled.First, ref ld, ref alignedB.First, ref ld, ref beta, ref g.First, ref ld, 1, 1);
    }

    /// <summary>Copies the upper triangle onto the lower one, in cache-sized tiles.</summary>
    private static void MirrorUpper(Span<double> g, int n)
    {
        const int Tile = 64;
        for (int c0 = 0; c0 < n; c0 += Tile)
        {
            int c1 = Math.Min(n, c0 + Tile);
            for (int r0 = c0; r0 < n; r0 += Tile)
            {
                int r1 = Math.Min(n, r0 + Tile);
                for (int c = c0; c < c1; c++)
                {
                    for (int r = Math.Max(r0, c + 1); r < r1; r++)
                    {
                        g[r + (c * n)] = g[c + (r * n)];
                    }
                }
            }
        }
    }

    private static void Scale(double factor, ReadOnlySpan<double> source, Span<double> target)
    {
        for (int t = 0; t < source.Length; t++)
        {
            target[t] = factor * source[t];
        }
    }

    private static bool Probe()
    {
        if (!NativeLibrary.TryLoad(LibraryName, out IntPtr handle))
        {
            return false;
        }

        return NativeLibrary.TryGetExport(handle, "dpstrf_", out _) && NativeLibrary.TryGetExport(handle, "dpotri_", out _)
            && NativeLibrary.TryGetExport(handle, "dgemm_", out _)
            && NativeLibrary.TryGetExport(handle, "dsyrk_", out _);
    }

    [DllImport(LibraryName, EntryPoint = "dpstrf_", ExactSpelling = true)]
    private static extern void Dpstrf(
        ref byte uplo, ref int n, ref double a, ref int lda, int[] piv, ref int rank, ref double tol, double[] work, ref int info, nuint uploLength);

    [DllImport(LibraryName, EntryPoint = "dgemm_", ExactSpelling = true)]
    private static extern void Dgemm(
        ref byte transA, ref byte transB, ref int m, ref int n, ref int k, ref double alpha, ref double a, ref int lda, ref double b, ref int ldb,
        ref double beta, ref double c, ref int ldc, nuint transALength, nuint transBLength);

    [DllImport(LibraryName, EntryPoint = "dsyrk_", ExactSpelling = true)]
    private static extern void Dsyrk(
        ref byte uplo, ref byte trans, ref int n, ref int k, ref double alpha, ref double a, ref int lda, ref double beta, ref double c, ref int ldc,
        nuint uploLength, nuint transLength);

    [DllImport(LibraryName, EntryPoint = "dpotri_", ExactSpelling = true)]
    private static extern void Dpotri(ref byte uplo, ref int n, ref double a, ref int lda, ref int info, nuint uploLength);
}
