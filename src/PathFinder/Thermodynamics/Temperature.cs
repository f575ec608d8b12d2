namespace PathFinder.Thermodynamics;

/// <summary>Guards for temperature arguments shared by this namespace.</summary>
internal static class Temperature
{
    /// <summary>Throws unless <paramref name="value"/> is a finite, strictly positive temperature in K.</summary>
    public static void RequirePositive(double value, string parameterName)
    {
        if (!double.IsFinite(value) || !(value > 0.0))
        {
            throw new ArgumentOutOfRangeException(parameterName, value, "A thermodynamic temperature must be finite and greater than 0 K.");
        }
    }
}
