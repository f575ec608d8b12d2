namespace PathFinder.Quantities;

/// <summary>Physical constants used by unit conversions and thermodynamic relations.</summary>
/// <remarks>
/// Values are the exact SI defining constants and the CODATA 2018 recommended values
/// (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)). The thermochemical calorie is exactly
/// 4.184 J (NIST SP 811, 2008, appendix B.8).
/// </remarks>
public static class PhysicalConstants
{
    /// <summary>Avogadro constant N_A in 1/mol (exact, SI 2019).</summary>
    public const double Avogadro = 6.02214076e23;

    /// <summary>Elementary charge e in C (exact, SI 2019).</summary>
    public const double ElementaryCharge = 1.602176634e-19;

    /// <summary>Planck constant h in J·s (exact, SI 2019).</summary>
    public const double Planck = 6.62607015e-34;

    /// <summary>Speed of light in vacuum c in m/s (exact).</summary>
    public const double SpeedOfLight = 299792458.0;

    /// <summary>Boltzmann constant k in J/K (exact, SI 2019).</summary>
    public const double Boltzmann = 1.380649e-23;

    /// <summary>Molar gas constant R = N_A·k in J/(mol·K) (exact by definition, 8.314462618... ).</summary>
    public const double GasConstant = Avogadro * Boltzmann;

    /// <summary>Faraday constant F = N_A·e in C/mol (exact by definition).</summary>
    public const double Faraday = Avogadro * ElementaryCharge;

    /// <summary>The thermochemical calorie in J (exact, NIST SP 811).</summary>
    public const double ThermochemicalCalorie = 4.184;

    /// <summary>The standard reference temperature of thermochemical tables, 298.15 K.</summary>
    public const double StandardTemperature = 298.15;

    /// <summary>The standard pressure, 1 bar = 100 000 Pa (IUPAC since 1982).</summary>
    public const double StandardPressure = 100000.0;
}
