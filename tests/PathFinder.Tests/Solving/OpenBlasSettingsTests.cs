using System.Runtime.InteropServices;
using System.Runtime.Intrinsics.X86;
using PathFinder.Solving;

namespace PathFinder.Tests.Solving;

/// <summary>The OpenBLAS kernels chosen must use what the CPU has, and never fall back to generic ones on a CPU with AVX2.</summary>
public sealed class OpenBlasSettingsTests
{
    [Fact]
    public void ForThisCpu_NeverAsksForMoreThanTheCpuHas()
    {
        // Given the instruction sets the runtime reports, when choosing a kernel family
        string? chosen = OpenBlasSettings.CoreTypeForThisCpu();

        // Then AVX-512 kernels are chosen only with AVX-512, AVX2 kernels only with AVX2 and FMA (OpenBLAS's families, from its documentation; from memory)
        switch (chosen)
        {
            case "SkylakeX":
                Assert.True(Avx512F.IsSupported && Avx512BW.IsSupported && Avx512DQ.IsSupported && Avx512CD.IsSupported);
                break;
            case "Haswell":
                Assert.True(Avx2.IsSupported && Fma.IsSupported);
                break;
            case "Sandybridge":
                Assert.True(Avx.IsSupported);
                break;
            case null:
                Assert.False(OperatingSystem.IsLinux() && Avx.IsSupported && System.Runtime.InteropServices.RuntimeInformation.ProcessArchitecture == System.Runtime.InteropServices.Architecture.X64);
                break;
            default:
                Assert.Fail($"unexpected kernel family {chosen}");
                break;
        }
    }

    [Fact]
    public void NativeBackend_OnAnAvx2Cpu_DoesNotRunTheGenericKernels()
    {
        // Given a machine where the native backend loads and the user did not pick kernels themselves
        if (!WeightedLeastSquares.IsNativeBackendAvailable || !Avx2.IsSupported || !string.IsNullOrEmpty(Environment.GetEnvironmentVariable(OpenBlasSettings.CoreTypeVariable)))
        {
            return;
        }

        // Then OpenBLAS reports a kernel family for AVX2 or better, not the SSE3 fallback it picks for CPU models it
        // does not know (observed in virtual machines with Debian's OpenBLAS 0.3.21, 8 times slower)
        string? kernels = WeightedLeastSquares.NativeKernelName;
        Assert.NotNull(kernels);
        Assert.DoesNotContain(kernels, new[] { "Prescott", "Core2", "Nehalem", "Katmai", "Coppermine", "Northwood", "Banias", "Atom" });
    }

    [Fact]
    public void NativeBackend_LetsIdleWorkersSleepAtOnce()
    {
        // Given a machine where the native backend loads and the user did not set the spin time themselves
        if (!WeightedLeastSquares.IsNativeBackendAvailable || !string.IsNullOrEmpty(Environment.GetEnvironmentVariable(OpenBlasSettings.ThreadTimeoutVariable)))
        {
            return;
        }

        // Then the C environment OpenBLAS read at load time holds the shortest spin (2^4 cycles, OpenBLAS's minimum;
        // from its documentation of OPENBLAS_THREAD_TIMEOUT, from memory)
        Assert.Equal(OpenBlasSettings.ThreadTimeout, Marshal.PtrToStringUTF8(GetEnvironment(OpenBlasSettings.ThreadTimeoutVariable)));
    }

    [DllImport("libc", EntryPoint = "getenv", ExactSpelling = true)]
    private static extern IntPtr GetEnvironment([MarshalAs(UnmanagedType.LPUTF8Str)] string name);
}
