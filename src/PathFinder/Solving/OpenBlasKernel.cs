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

    public int PivotedCholesky(AlignedBuffer a, int n, int[] pivot, double tolerance)
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
        lock (s_gate)
        {
            UseThreads(AllCores);
            Dpstrf(ref uplo, ref order, ref a.First, ref lda, piv, ref rank, ref tol, work, ref info, 1);
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

    public bool TryCholesky(AlignedBuffer a, int n, double minimumPivot)
    {
        if (n == 0)
        {
            return true;
        }

        int info = CallUpper(Dpotrf, a, n, n);
        if (info < 0)
        {
            throw new InvalidOperationException($"dpotrf_ rejected argument {-info}.");
        }

        if (info > 0)
        {
            return false;
        }

        Span<double> factor = a.Span;
        for (int j = 0; j < n; j++)
        {
            double pivot = factor[j + (j * n)];
            if (!(pivot * pivot > minimumPivot))
            {
                return false;
            }
        }

        return true;
    }

    public void InvertFromFactor(AlignedBuffer a, int n, int rank)
    {
        if (rank == 0)
        {
            return;
        }

        int info = CallUpper(Dpotri, a, rank, n);
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
        // U = V·diag(√|c|): one dsyrk_ on the upper triangle (n²·rank flops). Otherwise one dgemm_ (both triangles).
        // G is updated in place: its storage is pinned and 64-byte aligned for its lifetime, so no copy is needed.
        bool allNegative = true;
        bool allPositive = true;
        for (int j = 0; j < rank; j++)
        {
            allNegative &= coefficients[j] <= 0.0;
            allPositive &= coefficients[j] >= 0.0;
        }

        AlignedBuffer scaled = Scratch(n * rank);
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
            lock (s_gate)
            {
                UseThreads(AllCores);
                Dsyrk(ref uplo, ref trans, ref order, ref inner, ref alpha, ref scaled.First, ref ld, ref beta, ref g.First, ref ld, 1, 1);
            }

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
        lock (s_gate)
        {
            UseThreads(AllCores);
            Dgemm(ref transA, ref transB, ref order, ref columns, ref inner, ref minusOne, ref scaled.First, ref ld, ref alignedB.First, ref ld, ref beta, ref g.First, ref ld, 1, 1);
        }
    }

    /// <summary>Calls a LAPACK routine on the upper triangle of the leading order×order block, with the factorization threads.</summary>
    /// <returns>LAPACK's info.</returns>
    private static int CallUpper(UpperTriangleRoutine routine, AlignedBuffer a, int order, int leadingDimension)
    {
        byte uplo = (byte)'U';
        int info = 0;
        lock (s_gate)
        {
            UseThreads(AllCores);
            routine(ref uplo, ref order, ref a.First, ref leadingDimension, ref info, 1);
        }

        return info;
    }

    /// <summary>Threads for every call: all cores.</summary>
    private static int AllCores => Environment.ProcessorCount;

    /// <summary>Sets OpenBLAS's thread count for the next call (the caller holds <see cref="s_gate"/>).</summary>
    /// <remarks>
    /// <para>
    /// Each operation always runs with the same number of threads, so results repeat to the last bit: how OpenBLAS
    /// splits a computation (and so rounds it) may depend on the thread count. The count is global to the library,
    /// and changing it while another thread was inside a call once changed that call's result in the last digits
    /// (a repeatability test caught it), hence the gate: concurrent solves (the explorer analyses in the background)
    /// take turns.
    /// </para>
    /// <para>
    /// Every call uses every core, the suspect procedure's low-rank folds too. Those once ran on one thread because
    /// between calls OpenBLAS's idle workers spun for about 0.1 s and took the core from the managed work and the
    /// cycle search beside it; since <see cref="OpenBlasSettings"/> makes them sleep at once, two threads make the
    /// procedure faster even while the cycle search runs (measured; see the benchmark baseline), and the folds'
    /// results were identical to the last bit with one thread and with two.
    /// </para>
    /// </remarks>
    private static void UseThreads(int count)
    {
        if (s_hasThreadControl && s_threads != count)
        {
            SetThreadCount(count);
            s_threads = count;
        }
    }

    /// <summary>A reusable 64-byte-aligned scratch buffer of at least <paramref name="length"/> elements for this thread.</summary>
    private static AlignedBuffer Scratch(int length)
    {
        if (t_scratch is null || t_scratch.Length < length)
        {
            t_scratch = new AlignedBuffer(length);
        }

        return t_scratch;
    }

    private static void Scale(double factor, ReadOnlySpan<double> source, Span<double> target)
    {
        for (int t = 0; t < source.Length; t++)
        {
            target[t] = factor * source[t];
        }
    }

    /// <summary>The kernel family OpenBLAS uses (for example "SkylakeX"), or null when the library is not available.</summary>
    public static string? CoreName => IsAvailable && s_hasCoreName ? Marshal.PtrToStringAnsi(GetCoreName()) : null;

    private static bool s_hasCoreName;

    private static bool s_hasThreadControl;

    /// <summary>Serializes calls into OpenBLAS with their thread count (see <see cref="UseThreads"/>).</summary>
    private static readonly Lock s_gate = new();

    /// <summary>The thread count last set, or 0 before the first call.</summary>
    private static int s_threads;

    [ThreadStatic]
    private static AlignedBuffer? t_scratch;

    private static bool Probe()
    {
        // Must happen before the first load: OpenBLAS chooses its kernels once, when it is loaded.
        OpenBlasSettings.Apply();
        if (!NativeLibrary.TryLoad(LibraryName, out IntPtr handle))
        {
            return false;
        }

        s_hasCoreName = NativeLibrary.TryGetExport(handle, "openblas_get_corename", out _);
        // A thread count the user set for OpenBLAS is left alone (then it is the same for every call anyway).
        s_hasThreadControl = NativeLibrary.TryGetExport(handle, "openblas_set_num_threads", out _)
            && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("OPENBLAS_NUM_THREADS"));

        return NativeLibrary.TryGetExport(handle, "dpstrf_", out _) && NativeLibrary.TryGetExport(handle, "dpotri_", out _)
            && NativeLibrary.TryGetExport(handle, "dpotrf_", out _)
            && NativeLibrary.TryGetExport(handle, "dgemm_", out _)
            && NativeLibrary.TryGetExport(handle, "dsyrk_", out _);
    }

    [DllImport(LibraryName, EntryPoint = "openblas_get_corename", ExactSpelling = true)]
    private static extern IntPtr GetCoreName();

    [DllImport(LibraryName, EntryPoint = "openblas_set_num_threads", ExactSpelling = true)]
    private static extern void SetThreadCount(int count);

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

    /// <summary>The shape shared by dpotrf_ and dpotri_.</summary>
    private delegate void UpperTriangleRoutine(ref byte uplo, ref int n, ref double a, ref int lda, ref int info, nuint uploLength);

    [DllImport(LibraryName, EntryPoint = "dpotrf_", ExactSpelling = true)]
    private static extern void Dpotrf(ref byte uplo, ref int n, ref double a, ref int lda, ref int info, nuint uploLength);

    [DllImport(LibraryName, EntryPoint = "dpotri_", ExactSpelling = true)]
    private static extern void Dpotri(ref byte uplo, ref int n, ref double a, ref int lda, ref int info, nuint uploLength);
}
