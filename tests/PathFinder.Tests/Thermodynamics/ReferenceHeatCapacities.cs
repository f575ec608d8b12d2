using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

/// <summary>Published heat-capacity coefficient sets used by the handbook checks.</summary>
/// <remarks>
/// Shomate sets: gas-phase Shomate parameters published by NIST, fitted to the NIST-JANAF Thermochemical Tables
/// (Chase 1998), quoted from memory. NASA 7-coefficient set for N2: GRI-Mech 3.0 thermodynamic data file, quoted
/// from memory. Being from memory, each set was cross-checked against tabulated H° − H°298.15 values in the tests.
/// </remarks>
internal static class ReferenceHeatCapacities
{
    /// <summary>N2(g), Shomate, 100–500, 500–2000, 2000–6000 K (Shomate fit to NIST-JANAF 1998, from memory).</summary>
    public static PiecewiseHeatCapacity NitrogenShomate() => new(
    [
        new ShomateEquation(28.98641, 1.853978, -9.647459, 16.63537, 0.000117, new TemperatureRange(100, 500), -8.671914, 226.4168, 0.0),
        new ShomateEquation(19.50583, 19.88705, -8.598535, 1.369784, 0.527601, new TemperatureRange(500, 2000), -4.935202, 212.3900, 0.0),
        new ShomateEquation(35.51872, 1.128728, -0.196103, 0.014662, -4.553760, new TemperatureRange(2000, 6000), -18.97091, 224.9810, 0.0),
    ]);

    /// <summary>O2(g), Shomate, 100–700, 700–2000, 2000–6000 K (Shomate fit to NIST-JANAF 1998, from memory).</summary>
    public static PiecewiseHeatCapacity OxygenShomate() => new(
    [
        new ShomateEquation(31.32234, -20.23531, 57.86644, -36.50624, -0.007374, new TemperatureRange(100, 700), -8.903471, 246.7945, 0.0),
        new ShomateEquation(30.03235, 8.772972, -3.988133, 0.788313, -0.741599, new TemperatureRange(700, 2000), -11.32468, 236.1663, 0.0),
        new ShomateEquation(20.91111, 10.72071, -2.020498, 0.146449, 9.245722, new TemperatureRange(2000, 6000), 5.337651, 237.6185, 0.0),
    ]);

    /// <summary>CO2(g), Shomate, 298–1200, 1200–6000 K (Shomate fit to NIST-JANAF 1998, from memory).</summary>
    public static PiecewiseHeatCapacity CarbonDioxideShomate() => new(
    [
        new ShomateEquation(24.99735, 55.18696, -33.69137, 7.948387, -0.136638, new TemperatureRange(298, 1200), -403.6075, 228.2431, -393.5224),
        new ShomateEquation(58.16639, 2.720074, -0.492289, 0.038844, -6.447293, new TemperatureRange(1200, 6000), -425.9186, 263.6125, -393.5224),
    ]);

    /// <summary>H2(g), Shomate, 298–1000 K (Shomate fit to NIST-JANAF 1998, from memory).</summary>
    public static ShomateEquation HydrogenShomate() =>
        new(33.066178, -11.363417, 11.432816, -2.772874, -0.158558, new TemperatureRange(298, 1000), -9.980797, 172.707974, 0.0);

    /// <summary>H2O(g), Shomate, 500–1700 K (Shomate fit to NIST-JANAF 1998, from memory); note the range starts at 500 K.</summary>
    public static ShomateEquation WaterShomate() =>
        new(30.09200, 6.832514, 6.793435, -2.534480, 0.082139, new TemperatureRange(500, 1700), -250.8810, 223.3967, -241.8264);

    /// <summary>N2(g), NASA 7-coefficient polynomials, 300–1000–5000 K (GRI-Mech 3.0 thermo data, from memory).</summary>
    public static PiecewiseHeatCapacity NitrogenNasa7() => Nasa7Polynomial.TwoRange(
        [3.298677, 1.4082404e-3, -3.963222e-6, 5.641515e-9, -2.444854e-12, -1020.8999, 3.950372],
        [2.926640, 1.4879768e-3, -5.684760e-7, 1.0097038e-10, -6.753351e-15, -922.7977, 5.980528],
        300,
        1000,
        5000);
}
