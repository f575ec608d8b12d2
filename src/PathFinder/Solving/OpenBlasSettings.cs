using System.Runtime.InteropServices;
using System.Runtime.Intrinsics.X86;

namespace PathFinder.Solving;

/// <summary>Settings OpenBLAS reads from the environment when it loads: its kernels and how long its idle threads spin.</summary>
/// <remarks>
/// <para>
/// A multi-architecture OpenBLAS picks its kernels from the CPU's family and model number when the library is
/// loaded. Inside virtual machines the model is often one it does not know, and it then falls back to the
/// oldest x86-64 kernels ("Prescott", SSE3): measured on this project's 2-core build machine (a VM on a recent
/// Xeon with AVX-512, Debian's OpenBLAS 0.3.21), dsyrk_ and dgemm_ at n = 2000 ran at 10–15 GFLOP/s with those
/// and at 90–100 GFLOP/s with the AVX-512 kernels, a factor of about 8 on every dense step of the solver.
/// </para>
/// <para>
/// OpenBLAS honours the environment variable OPENBLAS_CORETYPE, read once at load time. Before the library is
/// first loaded, and only when the user has not set the variable, it is set from the instruction sets the .NET
/// runtime reports for this CPU (AVX-512 F/CD/BW/DQ/VL → SkylakeX, AVX2 + FMA → Haswell, AVX → Sandybridge), so
/// the kernels chosen never need more than the CPU has. The variable must reach the C library's environment,
/// which <see cref="Environment.SetEnvironmentVariable(string, string)"/> does not do on Linux, hence setenv(3).
/// </para>
/// <para>
/// After a threaded call OpenBLAS's worker threads spin (yielding) for 2^28 cycles, about 0.1 s, before they sleep.
/// The suspect procedure makes a threaded dense update every few tens of milliseconds, so the workers would spin
/// through the whole procedure and take the other cores from the cycle search running beside it. With
/// OPENBLAS_THREAD_TIMEOUT = 4 (2^4 cycles, OpenBLAS's smallest) they sleep at once and are woken for the next call,
/// which costs microseconds against the milliseconds of the calls themselves.
/// </para>
/// </remarks>
internal static class OpenBlasSettings
{
    /// <summary>The name of the variable that chooses the kernels.</summary>
    public const string CoreTypeVariable = "OPENBLAS_CORETYPE";

    /// <summary>The name of the variable that sets how long idle worker threads spin (2^value cycles).</summary>
    public const string ThreadTimeoutVariable = "OPENBLAS_THREAD_TIMEOUT";

    /// <summary>The spin time set: 2^4 cycles, the smallest OpenBLAS accepts.</summary>
    public const string ThreadTimeout = "4";

    /// <summary>The kernel family suited to this CPU, or null when nothing better than OpenBLAS's own choice is known.</summary>
    public static string? CoreTypeForThisCpu()
    {
        if (!OperatingSystem.IsLinux() || RuntimeInformation.ProcessArchitecture != Architecture.X64)
        {
            return null;
        }

        if (Avx512F.IsSupported && Avx512F.VL.IsSupported && Avx512CD.IsSupported && Avx512BW.IsSupported && Avx512DQ.IsSupported)
        {
            return "SkylakeX";
        }

        if (Avx2.IsSupported && Fma.IsSupported)
        {
            return "Haswell";
        }

        return Avx.IsSupported ? "Sandybridge" : null;
    }

    /// <summary>Sets OPENBLAS_CORETYPE for this CPU and OPENBLAS_THREAD_TIMEOUT, each unless the user already set it; call before the library loads.</summary>
    /// <remarks>Without a suitable family, or where setenv(3) is missing, OpenBLAS keeps its own choice (the kernel name it reports shows which).</remarks>
    public static void Apply()
    {
        SetUnlessSet(CoreTypeVariable, CoreTypeForThisCpu());
        SetUnlessSet(ThreadTimeoutVariable, ThreadTimeout);
    }

    private static void SetUnlessSet(string name, string? value)
    {
        if (value is null || !string.IsNullOrEmpty(Environment.GetEnvironmentVariable(name)))
        {
            return;
        }

        try
        {
            // overwrite = 0: a value already in the C environment (set by a parent process) wins.
            _ = SetEnvironment(name, value, 0);
        }
        catch (Exception exception) when (exception is DllNotFoundException or EntryPointNotFoundException)
        {
            // Not fatal: only the speed of the dense steps is at stake.
        }
    }

    [DllImport("libc", EntryPoint = "setenv", ExactSpelling = true)]
    private static extern int SetEnvironment([MarshalAs(UnmanagedType.LPUTF8Str)] string name, [MarshalAs(UnmanagedType.LPUTF8Str)] string value, int overwrite);
}
