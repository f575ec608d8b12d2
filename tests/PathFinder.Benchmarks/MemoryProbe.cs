using System.Diagnostics;
using System.Globalization;

namespace PathFinder.Benchmarks;

/// <summary>Reads the process's resident memory and its peak, and resets the peak so one phase can be measured alone.</summary>
/// <remarks>
/// On Linux the peak resident set (VmHWM in /proc/self/status) can be reset by writing 5 to /proc/self/clear_refs
/// (kernel 4.0 and later); after a reset the peak restarts from the current resident set, which still holds
/// whatever the earlier phases left on the managed heap, so a phase's peak is an upper bound. Elsewhere the
/// process-wide peak working set is used and <see cref="CanReset"/> is false.
/// </remarks>
public static class MemoryProbe
{
    /// <summary>Whether the last <see cref="ResetPeak"/> succeeded.</summary>
    public static bool CanReset { get; private set; }

    /// <summary>Collects garbage and restarts the peak from the current resident set, where the system allows it.</summary>
    public static void ResetPeak()
    {
        GC.Collect();
        GC.WaitForPendingFinalizers();
        GC.Collect();
        try
        {
            File.WriteAllText("/proc/self/clear_refs", "5");
            CanReset = true;
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException or NotSupportedException)
        {
            CanReset = false;
        }
    }

    /// <summary>The peak resident set in MB (10⁶ bytes) since the last reset (or since the start).</summary>
    public static double PeakMegabytes()
    {
        double? fromProc = Status("VmHWM:");
        if (fromProc is { } value)
        {
            return value;
        }

        using Process process = Process.GetCurrentProcess();
        return process.PeakWorkingSet64 / 1e6;
    }

    /// <summary>The current resident set in MB (10⁶ bytes).</summary>
    public static double CurrentMegabytes()
    {
        double? fromProc = Status("VmRSS:");
        if (fromProc is { } value)
        {
            return value;
        }

        using Process process = Process.GetCurrentProcess();
        return process.WorkingSet64 / 1e6;
    }

    private static double? Status(string key)
    {
        try
        {
            foreach (string line in File.ReadLines("/proc/self/status"))
            {
                if (line.StartsWith(key, StringComparison.Ordinal))
                {
                    string[] parts = line[key.Length..].Trim().Split(' ', StringSplitOptions.RemoveEmptyEntries);
                    return double.Parse(parts[0], CultureInfo.InvariantCulture) * 1024.0 / 1e6;
                }
            }
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            return null;
        }

        return null;
    }
}
