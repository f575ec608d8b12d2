using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace PathFinder.Solving;

/// <summary>Managed fallback for the dense kernel: blocked pivoted Cholesky and triangular inversion.</summary>
/// <remarks>
/// The factorization follows the blocked scheme of LAPACK's pivoted Cholesky: pivots are chosen from the running
/// Schur-complement diagonal, rows of U inside a block of <see cref="BlockSize"/> pivots are formed with short
/// contiguous dot products, and the trailing matrix is updated once per block, so each column of the trailing
/// matrix is streamed through the cache n/BlockSize times instead of n times. Everything is column-major and
/// only the upper triangle is used. About n³/3 multiply-adds for the factor and 2n³/3 for the inverse; roughly
/// 5–10 times slower than OpenBLAS at n = 2000 on this machine (see the benchmark).
/// </remarks>
internal sealed class ManagedKernel : IDenseKernel
{
    private const int BlockSize = 64;

    private ManagedKernel()
    {
    }

    /// <summary>The shared instance.</summary>
    public static ManagedKernel Instance { get; } = new();

    public LinearAlgebraBackend Backend => LinearAlgebraBackend.Managed;

    public int PivotedCholesky(AlignedBuffer matrix, int n, int[] pivot, double tolerance)
    {
        Span<double> a = matrix.Span;
        for (int k = 0; k < n; k++)
        {
            pivot[k] = k;
        }

        var dots = new double[n];
        for (int j0 = 0; j0 < n; j0 += BlockSize)
        {
            int jb = Math.Min(BlockSize, n - j0);
            Array.Clear(dots, j0, n - j0);
            for (int j = j0; j < j0 + jb; j++)
            {
                // Running Schur diagonal: block-start diagonal minus squares of this block's rows of U.
                int best = j;
                double bestValue = double.NegativeInfinity;
                for (int i = j; i < n; i++)
                {
                    if (j > j0)
                    {
                        double u = a[(j - 1) + (i * n)];
                        dots[i] += u * u;
                    }

                    double d = a[i + (i * n)] - dots[i];
                    if (d > bestValue)
                    {
                        bestValue = d;
                        best = i;
                    }
                }

                if (!(bestValue > tolerance))
                {
                    return j;
                }

                if (best != j)
                {
                    SwapSymmetric(a, n, j, best);
                    (dots[j], dots[best]) = (dots[best], dots[j]);
                    (pivot[j], pivot[best]) = (pivot[best], pivot[j]);
                }

                double ajj = Math.Sqrt(bestValue);
                a[j + (j * n)] = ajj;
                int blockRows = j - j0;
                ReadOnlySpan<double> columnJ = a.Slice(j0 + (j * n), blockRows);
                double inverse = 1.0 / ajj;
                for (int c = j + 1; c < n; c++)
                {
                    double value = a[j + (c * n)];
                    if (blockRows > 0)
                    {
                        value -= Dot(columnJ, a.Slice(j0 + (c * n), blockRows));
                    }

                    a[j + (c * n)] = value * inverse;
                }
            }

            // Trailing update: A22 -= U12ᵀ U12 over this block's rows (upper triangle only).
            int j1 = j0 + jb;
            for (int c = j1; c < n; c++)
            {
                ReadOnlySpan<double> uc = a.Slice(j0 + (c * n), jb);
                for (int i = j1; i <= c; i++)
                {
                    a[i + (c * n)] -= Dot(a.Slice(j0 + (i * n), jb), uc);
                }
            }
        }

        return n;
    }

    /// <summary>The managed kernel always takes the pivoted route (it is the fallback; simplicity over speed).</summary>
    public bool TryCholesky(AlignedBuffer a, int n, double minimumPivot) => false;

    public void InvertFromFactor(AlignedBuffer matrix, int n, int rank)
    {
        Span<double> a = matrix.Span;
        int r = rank;
        if (r == 0)
        {
            return;
        }

        // T = U⁻¹ in place (upper), column by column: T[0..j-1, j] = −T[j,j] · T₁₁ · U[0..j-1, j].
        var y = new double[r];
        for (int j = 0; j < r; j++)
        {
            double tjj = 1.0 / a[j + (j * n)];
            a[j + (j * n)] = tjj;
            Array.Clear(y, 0, j);
            for (int k = 0; k < j; k++)
            {
                double uk = a[k + (j * n)];
                Axpy(uk, a.Slice(k * n, k + 1), y.AsSpan(0, k + 1));
            }

            for (int i = 0; i < j; i++)
            {
                a[i + (j * n)] = -tjj * y[i];
            }
        }

        // G = T Tᵀ: G[i,c] = Σ_{k ≥ c} T[i,k] T[c,k]. Transpose T so that its rows are contiguous.
        var t = new double[r * r];
        for (int k = 0; k < r; k++)
        {
            for (int i = 0; i <= k; i++)
            {
                t[k + (i * r)] = a[i + (k * n)];
            }
        }

        for (int c = 0; c < r; c++)
        {
            ReadOnlySpan<double> rowC = t.AsSpan(c + (c * r), r - c);
            for (int i = 0; i <= c; i++)
            {
                a[i + (c * n)] = Dot(t.AsSpan(c + (i * r), r - c), rowC);
            }
        }
    }

    /// <summary>Symmetric interchange of rows/columns j &lt; p in upper storage, including the rows of U above j.</summary>
    private static void SwapSymmetric(Span<double> a, int n, int j, int p)
    {
        for (int i = 0; i < j; i++)
        {
            (a[i + (j * n)], a[i + (p * n)]) = (a[i + (p * n)], a[i + (j * n)]);
        }

        (a[j + (j * n)], a[p + (p * n)]) = (a[p + (p * n)], a[j + (j * n)]);
        for (int i = j + 1; i < p; i++)
        {
            (a[j + (i * n)], a[i + (p * n)]) = (a[i + (p * n)], a[j + (i * n)]);
        }

        for (int i = p + 1; i < n; i++)
        {
            (a[j + (i * n)], a[p + (i * n)]) = (a[p + (i * n)], a[j + (i * n)]);
        }
    }

    public void SubtractLowRank(AlignedBuffer g, int n, double[] vectors, double[] coefficients, int rank)
    {
        // Column by column, upper part only: G[0..c, c] −= Σⱼ cⱼ·vⱼ[c]·vⱼ[0..c]; the vectors stay in cache.
        for (int c = 0; c < n; c++)
        {
            Span<double> column = g.AsSpan(c * n, c + 1);
            for (int j = 0; j < rank; j++)
            {
                double alpha = -coefficients[j] * vectors[c + (j * n)];
                if (alpha != 0.0)
                {
                    Axpy(alpha, vectors.AsSpan(j * n, c + 1), column);
                }
            }
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static double Dot(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        int length = x.Length;
        int k = 0;
        double sum = 0.0;
        if (Vector.IsHardwareAccelerated && length >= Vector<double>.Count * 2)
        {
            ReadOnlySpan<Vector<double>> vx = MemoryMarshal.Cast<double, Vector<double>>(x);
            ReadOnlySpan<Vector<double>> vy = MemoryMarshal.Cast<double, Vector<double>>(y[..length]);
            var acc = Vector<double>.Zero;
            for (int v = 0; v < vx.Length; v++)
            {
                acc += vx[v] * vy[v];
            }

            sum = Vector.Sum(acc);
            k = vx.Length * Vector<double>.Count;
        }

        for (; k < length; k++)
        {
            sum += x[k] * y[k];
        }

        return sum;
    }

    /// <summary>Copies the upper triangle onto the lower one, in cache-sized tiles.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void MirrorUpper(Span<double> g, int n)
    {
        const int Tile = 32;
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

    /// <summary>y += Σⱼ alphas[j]·x⁽ʲ⁾ with x⁽ʲ⁾ = vectors[offsets[j] .. offsets[j] + y.Length − 1].</summary>
    /// <remarks>
    /// Bit for bit the same as calling <see cref="Axpy"/> for j = 0, 1, … in turn (each element receives the same
    /// products in the same order, each sum rounded), but y is loaded and stored once per four vectors.
    /// </remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void AxpyMany(ReadOnlySpan<double> alphas, ReadOnlySpan<int> offsets, ReadOnlySpan<double> vectors, Span<double> y)
    {
        int length = y.Length;
        int count = alphas.Length;
        int k = 0;
        if (Vector.IsHardwareAccelerated && length >= Vector<double>.Count * 2)
        {
            Span<Vector<double>> vy = MemoryMarshal.Cast<double, Vector<double>>(y);
            int j = 0;
            for (; j + 4 <= count; j += 4)
            {
                ReadOnlySpan<Vector<double>> x0 = MemoryMarshal.Cast<double, Vector<double>>(vectors.Slice(offsets[j], length));
                ReadOnlySpan<Vector<double>> x1 = MemoryMarshal.Cast<double, Vector<double>>(vectors.Slice(offsets[j + 1], length));
                ReadOnlySpan<Vector<double>> x2 = MemoryMarshal.Cast<double, Vector<double>>(vectors.Slice(offsets[j + 2], length));
                ReadOnlySpan<Vector<double>> x3 = MemoryMarshal.Cast<double, Vector<double>>(vectors.Slice(offsets[j + 3], length));
                var a0 = new Vector<double>(alphas[j]);
                var a1 = new Vector<double>(alphas[j + 1]);
                var a2 = new Vector<double>(alphas[j + 2]);
                var a3 = new Vector<double>(alphas[j + 3]);
                for (int v = 0; v < vy.Length; v++)
                {
                    Vector<double> acc = vy[v];
                    acc += a0 * x0[v];
                    acc += a1 * x1[v];
                    acc += a2 * x2[v];
                    acc += a3 * x3[v];
                    vy[v] = acc;
                }
            }

            for (; j < count; j++)
            {
                ReadOnlySpan<Vector<double>> x0 = MemoryMarshal.Cast<double, Vector<double>>(vectors.Slice(offsets[j], length));
                var a0 = new Vector<double>(alphas[j]);
                for (int v = 0; v < vy.Length; v++)
                {
                    vy[v] += a0 * x0[v];
                }
            }

            k = vy.Length * Vector<double>.Count;
        }

        for (; k < length; k++)
        {
            double acc = y[k];
            for (int j = 0; j < count; j++)
            {
                acc += alphas[j] * vectors[offsets[j] + k];
            }

            y[k] = acc;
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void Axpy(double alpha, ReadOnlySpan<double> x, Span<double> y)
    {
        int length = x.Length;
        int k = 0;
        if (Vector.IsHardwareAccelerated && length >= Vector<double>.Count * 2)
        {
            ReadOnlySpan<Vector<double>> vx = MemoryMarshal.Cast<double, Vector<double>>(x);
            Span<Vector<double>> vy = MemoryMarshal.Cast<double, Vector<double>>(y[..length]);
            var va = new Vector<double>(alpha);
            for (int v = 0; v < vx.Length; v++)
            {
                vy[v] += va * vx[v];
            }

            k = vx.Length * Vector<double>.Count;
        }

        for (; k < length; k++)
        {
            y[k] += alpha * x[k];
        }
    }
}
