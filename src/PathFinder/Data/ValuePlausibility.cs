using System.Globalization;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.Quantities;

namespace PathFinder.Data;

/// <summary>Warns about a value far outside what its property takes for the species involved (a J/mol value labelled kJ/mol).</summary>
/// <remarks>
/// <para>Only warnings: the bounds are rules of thumb, and a row beyond them is still used. Figures quoted here are from
/// the NIST-JANAF tables (4th ed., 1998) and the CODATA Key Values (1989), from memory.</para>
/// <para>Energies (ΔH, ΔU, and ΔG up to <see cref="GibbsTemperatureLimit"/>): no neutral species has |ΔfH°| above about
/// 850 kJ/mol per atom. The most positive are gaseous atoms (W(g) +849, C(g) +717 kJ/mol); the most negative per
/// atom are fluorides and oxides (CaF2 −1228/3 ≈ −409, AlF3 −1510/4 ≈ −378, Al2O3 −1676/5 ≈ −335 kJ/mol per atom).
/// As |ΔrH| = |Σν·ΔfH°| ≤ Σ|ν|·|ΔfH°| and elements in their reference states add 0, a reaction's value is bounded by
/// <see cref="MaxEnergyPerAtom"/> times the atoms of its other species, Σ|ν|·atoms. Common practice, no source:
/// 1000 kJ/mol per atom leaves a margin over every tabulated value. Gaseous ions are left out (Al³⁺(g) is about
/// +5480 kJ/mol: ionization energies add up).</para>
/// <para>S°: a pure substance's third-law entropy is positive; a gas has at least about 115 J/(mol·K) (H(g) 114.7,
/// H2(g) 130.7); no species has more than about 200 J/(mol·K) per atom (heavy monatomic gases: Rn(g) 176,
/// Cs(g) 176). Common practice, no source: warn below 0 (not for aqueous ions, whose S° is relative to
/// S°(H+, aq) = 0 and may be negative), below <see cref="MinGasEntropy"/> for a gas, and above
/// <see cref="MaxEntropyPerAtom"/> per atom.</para>
/// </remarks>
internal static class ValuePlausibility
{
    /// <summary>The code of these warnings.</summary>
    public const string Code = "value-implausible";

    /// <summary>Largest |ΔfH°| per atom of a neutral species taken as plausible, kJ/mol (common practice, no source).</summary>
    public const double MaxEnergyPerAtom = 1000.0;

    /// <summary>Above this temperature (K) ΔG rows are not checked: −T·ΔS grows with T.</summary>
    public const double GibbsTemperatureLimit = 1000.0;

    /// <summary>Largest S° per atom taken as plausible, J/(mol·K) (common practice, no source).</summary>
    public const double MaxEntropyPerAtom = 250.0;

    /// <summary>Smallest S° of a gas taken as plausible, J/(mol·K) (common practice, no source).</summary>
    public const double MinGasEntropy = 100.0;

    /// <summary>A warning located at the value when it is far outside the plausible range for the species involved, or null.</summary>
    /// <param name="measurement">A usable measurement (value in the canonical unit).</param>
    /// <param name="valueLocation">Where the value is written.</param>
    public static Diagnostic? Check(Measurement measurement, SourceLocation valueLocation)
    {
        ArgumentNullException.ThrowIfNull(measurement);
        return measurement.Property switch
        {
            ThermoProperty.Enthalpy or ThermoProperty.InternalEnergy => CheckEnergy(measurement, valueLocation),
            ThermoProperty.GibbsEnergy when measurement.Temperature <= GibbsTemperatureLimit => CheckEnergy(measurement, valueLocation),
            ThermoProperty.AbsoluteEntropy => CheckEntropy(measurement, valueLocation),
            _ => null,
        };
    }

    private static Diagnostic? CheckEnergy(Measurement measurement, SourceLocation location)
    {
        double atoms = 0.0;
        foreach (EquationTerm term in measurement.Equation.Terms)
        {
            Species species = term.Species;
            if (species.Formula.Charge != 0 && species.IsGas)
            {
                return null;
            }

            if (!ReferenceStates.HasZeroFormationProperties(species))
            {
                atoms += Math.Abs(term.Coefficient.ToDouble()) * Atoms(species);
            }
        }

        double bound = MaxEnergyPerAtom * atoms;
        double value = measurement.Value;
        if (atoms <= 0.0 || Math.Abs(value) <= bound)
        {
            return null;
        }

        string cause = Math.Abs(value) / 1000.0 <= bound
            ? $"likely a value in J/mol labelled {measurement.Unit.Symbol} (÷1000 gives {Number(measurement.ValueInOriginalUnit / 1000.0)} {measurement.Unit.Symbol}); check the unit"
            : "check the unit, the exponent and the equation";
        return Diagnostic.Warning(
            Code,
            location,
            $"{measurement.Property.Symbol()} = {Number(value)} kJ/mol is far beyond what the species involved can show: at most about {Number(bound)} kJ/mol ({Number(MaxEnergyPerAtom)} kJ/mol per atom of {Number(atoms)} atom(s) other than elements in their reference states)",
            cause);
    }

    private static Diagnostic? CheckEntropy(Measurement measurement, SourceLocation location)
    {
        if (measurement.Equation.Terms.Count != 1)
        {
            return null;
        }

        Species species = measurement.Equation.Terms[0].Species;
        if (species.Formula.IsElectron)
        {
            return null;
        }

        double value = measurement.Value;
        double bound = MaxEntropyPerAtom * Atoms(species);
        string unit = measurement.Unit.Symbol;
        string shown = $"S° = {Number(value)} J/(mol·K)";
        string? problem = null;
        string cause = "check the unit (J or kJ, cal or J), and that the row is the absolute entropy of this species, not a reaction entropy (use dS)";
        if (value > bound)
        {
            problem = $"{shown} is more than any species shows: about {Number(MaxEntropyPerAtom)} J/(mol·K) per atom, {Number(bound)} for {species.Name}";
        }
        else if (value < 0.0 && species.State.Phase != Phase.Aqueous)
        {
            problem = $"{shown} is negative, but the entropy of a pure substance is positive (third law)";
        }
        else if (species.IsGas && value < MinGasEntropy)
        {
            problem = $"{shown} is less than any gas shows (at least about {Number(MinGasEntropy)} J/(mol·K); H2(g) has 130.7)";
            if (value * 1000.0 >= MinGasEntropy && value * 1000.0 <= bound)
            {
                cause = $"likely a value in kJ/(mol·K) labelled {unit} (×1000 gives {Number(measurement.ValueInOriginalUnit * 1000.0)} {unit}); check the unit";
            }
        }

        return problem is null ? null : Diagnostic.Warning(Code, location, problem, cause);
    }

    private static double Atoms(Species species) => species.Formula.Composition.Values.Sum(count => count.ToDouble());

    private static string Number(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}
