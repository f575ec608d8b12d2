using System.Runtime.CompilerServices;
using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>Asks <see cref="SlipDiagnosis"/> about a suspect of the joint model, with the phase changes the network knows for its species.</summary>
internal static class SuspectCauses
{
    /// <summary>The likely slip behind measurement <paramref name="index"/>, or null when none fits or nothing predicts it.</summary>
    public static LikelyCause? Diagnose(ThermoModel model, LeastSquaresSolution solution, int index, double? predicted, double? predictedUncertainty)
    {
        if (predicted is not { } p || predictedUncertainty is not { } up)
        {
            return null;
        }

        PreparedMeasurement measurement = model.Measurements[index];
        var question = new SlipQuestion(measurement.Measurement.Property, measurement.Value, measurement.Correction, measurement.Uncertainty, p, up, Phases(model, solution, measurement));
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);
        if (cause is null || !measurement.Measurement.Property.IsEquilibriumConstant())
        {
            return cause;
        }

        // The analysis compares K rows as ΔrG° in kJ/mol; say what the undone value is in the number the user typed.
        double lnK = -(cause.ExplainedValue - measurement.Correction) * 1000.0 / (PhysicalConstants.GasConstant * measurement.Measurement.Temperature);
        double typed = measurement.Measurement.Property == ThermoProperty.Log10EquilibriumConstant ? lnK / Math.Log(10.0) : lnK;
        return cause with { Detail = string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{cause.Detail} (as ΔrG° in kJ/mol; as {measurement.Measurement.Property.Symbol()}: {typed:0.###})") };
    }

    /// <summary>The model's species grouped by formula and label, in model order: built once per model, not once per suspect.</summary>
    /// <remarks>Asked per suspect, listing every species and comparing each with every term cost about 0.2 s of a check with
    /// hundreds of suspects on thousands of species.</remarks>
    private static readonly ConditionalWeakTable<ThermoModel, Dictionary<(string Hill, string Label), List<Species>>> SpeciesByFormula = [];

    private static Dictionary<(string Hill, string Label), List<Species>> BuildSpeciesByFormula(ThermoModel model)
    {
        var groups = new Dictionary<(string Hill, string Label), List<Species>>();
        foreach (Species species in model.Species)
        {
            (string, string) key = (species.Formula.HillNotation, species.Label);
            if (!groups.TryGetValue(key, out List<Species>? list))
            {
                list = [];
                groups.Add(key, list);
            }

            list.Add(species);
        }

        return groups;
    }

    /// <summary>For each species of the equation, every other state of the same formula that the model knows, with ν·(X(other) − X(written)) in the row's property.</summary>
    private static List<PhaseAlternative> Phases(ThermoModel model, LeastSquaresSolution solution, PreparedMeasurement measurement)
    {
        var alternatives = new List<PhaseAlternative>();
        ThermoProperty property = measurement.Measurement.Property;
        PropertyFamily family = property.Dimension() == UnitDimension.MolarEntropy ? PropertyFamily.Entropy
            : property is ThermoProperty.Enthalpy or ThermoProperty.InternalEnergy ? PropertyFamily.Enthalpy
            : PropertyFamily.GibbsEnergy;
        Dictionary<(string Hill, string Label), List<Species>> byFormula = SpeciesByFormula.GetValue(model, BuildSpeciesByFormula);
        foreach (EquationTerm term in measurement.Equation.Terms)
        {
            if (!byFormula.TryGetValue((term.Species.Formula.HillNotation, term.Species.Label), out List<Species>? sameFormula))
            {
                continue;
            }

            foreach (Species other in sameFormula)
            {
                if (other.Equals(term.Species))
                {
                    continue;
                }

                // The change written → other as a reaction of the row's own kind (at the row's temperature for ΔG and K).
                ChemicalEquation change = ChemicalEquation.FromTerms([new EquationTerm(term.Species, Fractions.Fraction.MinusOne), new EquationTerm(other, Fractions.Fraction.One)]);
                ModelQuantity quantity = model.Quantity(family, change, measurement.Measurement.Temperature);
                if (quantity.Missing.Count > 0 || quantity.Vector.IsZero)
                {
                    continue;
                }

                DerivedEstimate estimate = solution.Estimate(quantity.Row);
                if (!estimate.IsEstimable)
                {
                    continue;
                }

                double nu = term.Coefficient.ToDouble();
                alternatives.Add(new PhaseAlternative(term.Species, other, nu, nu * estimate.Value, Math.Abs(nu) * estimate.StandardUncertainty));
            }
        }

        return alternatives;
    }
}
