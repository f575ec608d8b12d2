namespace PathFinder.Diagrams;

/// <summary>Chooses "nice" tick values (1, 2 or 5 times a power of ten) for an axis.</summary>
internal static class AxisTicks
{
    /// <summary>Ticks covering [<paramref name="min"/>, <paramref name="max"/>] with about <paramref name="target"/> intervals; 0 is always a tick when inside.</summary>
    public static IReadOnlyList<double> Nice(double min, double max, int target = 6)
    {
        double span = max - min;
        if (!(span > 0.0) || double.IsInfinity(span))
        {
            return [min];
        }

        double raw = span / target;
        double power = Math.Pow(10.0, Math.Floor(Math.Log10(raw)));
        double fraction = raw / power;
        double step = (fraction <= 1.0 ? 1.0 : fraction <= 2.0 ? 2.0 : fraction <= 5.0 ? 5.0 : 10.0) * power;
        double first = Math.Ceiling((min / step) - 1e-9) * step;
        var ticks = new List<double>();
        for (int k = 0; k < 1000; k++)
        {
            double t = first + (k * step);
            if (t > max + (step * 1e-9))
            {
                break;
            }

            ticks.Add(Math.Abs(t) < step * 1e-9 ? 0.0 : t);
        }

        return ticks;
    }
}
