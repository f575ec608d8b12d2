using System.Globalization;
using Fractions;
using PathFinder.Algebra;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.Quantities;
using PathFinder.Routes;
using PathFinder.Solving;
using PathFinder.Thermodynamics;
using PathFinder.Threading;

namespace PathFinder.Analysis;

/// <summary>The linear model of one property family: unknown species, and one equation Σν·Xₛ = v per measurement.</summary>
/// <remarks>
/// <para>Species whose value is fixed by convention (elements in reference states, H+(aq), e-) are not
/// unknowns; they drop out of every equation. This is what lets route search ignore the O2/H2/graphite hubs:
/// when all other species cancel, an element-balanced combination of reference species is zero.</para>
/// <para>Measurements are prepared once: ΔU becomes ΔH = ΔU + Δn(gas)·R·T, and values at T ≠ 298.15 K are moved
/// to 298.15 K with Kirchhoff's law when every species has heat-capacity data (otherwise they are used as measured,
/// with a warning). The conversions are kept with each measurement so every output can show them.</para>
/// </remarks>
public sealed class PropertyModel
{
    /// <summary>Measurements further than this from the reference temperature (K) are temperature-corrected.</summary>
    public const double TemperatureTolerance = 0.01;

    private readonly Dictionary<Species, int> _unknownIndex;
    private readonly Lazy<RouteNetwork> _routeNetwork;

    private PropertyModel(
        PropertyFamily family,
        double referenceTemperature,
        IReadOnlyList<Species> unknowns,
        IReadOnlyList<PreparedMeasurement> measurements,
        IReadOnlyList<SparseVector> vectors,
        IReadOnlyList<Diagnostic> warnings)
    {
        Family = family;
        ReferenceTemperature = referenceTemperature;
        Unknowns = unknowns;
        Measurements = measurements;
        Vectors = vectors;
        Warnings = warnings;
        _routeNetwork = new Lazy<RouteNetwork>(() => RouteNetwork.Create(Vectors, Measurements.Select(item => item.Value).ToArray(), Measurements.Select(item => item.Uncertainty).ToArray()));
        _unknownIndex = new Dictionary<Species, int>();
        for (int i = 0; i < unknowns.Count; i++)
        {
            _unknownIndex[unknowns[i]] = i;
        }
    }

    /// <summary>The family modelled.</summary>
    public PropertyFamily Family { get; }

    /// <summary>The temperature all values refer to, in K.</summary>
    public double ReferenceTemperature { get; }

    /// <summary>The species whose property is unknown, in order of first use.</summary>
    public IReadOnlyList<Species> Unknowns { get; }

    /// <summary>The prepared measurements, in data order.</summary>
    public IReadOnlyList<PreparedMeasurement> Measurements { get; }

    /// <summary>Each measurement's equation as an exact vector over <see cref="Unknowns"/>.</summary>
    public IReadOnlyList<SparseVector> Vectors { get; }

    /// <summary>Warnings from preparation (uncorrected temperatures, extrapolated heat capacities).</summary>
    public IReadOnlyList<Diagnostic> Warnings { get; }

    /// <summary>The unit of values.</summary>
    public EnergyUnit Unit => Family.Unit();

    /// <summary>Builds the model of <paramref name="family"/> from the network's measurements of that family.</summary>
    /// <param name="network">The network.</param>
    /// <param name="family">Which property family to model.</param>
    /// <param name="heatCapacities">Heat-capacity models by species, for temperature corrections; may be empty.</param>
    public static PropertyModel Build(ReactionNetwork network, PropertyFamily family, IReadOnlyDictionary<Species, IHeatCapacity>? heatCapacities = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        heatCapacities ??= new Dictionary<Species, IHeatCapacity>();
        double reference = PhysicalConstants.StandardTemperature;
        var warnings = new List<Diagnostic>();
        var prepared = new List<PreparedMeasurement>();
        var unknowns = new List<Species>();
        var index = new Dictionary<Species, int>();

        // Whether a species is fixed by convention is asked for every term of every measurement; the answer compares
        // formulas, so it is kept per species instance (the reader shares one instance per species).
        var fixedByInstance = new Dictionary<Species, bool>(ReferenceEqualityComparer.Instance);
        bool IsFixed(Species species)
        {
            if (!fixedByInstance.TryGetValue(species, out bool isFixed))
            {
                isFixed = family.IsFixed(species);
                fixedByInstance.Add(species, isFixed);
            }

            return isFixed;
        }

        foreach (Measurement measurement in network.Measurements)
        {
            if (PropertyFamilies.FamilyOf(measurement.Property) != family)
            {
                continue;
            }

            if (measurement.Equation.Terms.All(term => IsFixed(term.Species)))
            {
                // Nothing to determine: every species is fixed by convention, so the value should simply be zero.
                warnings.Add(Diagnostic.Warning("conventional-only", measurement.Location, $"'{measurement.Id}' involves only species whose {family.SpeciesQuantity()} is zero by convention; it is left out of the analysis", "its value should be 0; drop the row or check the equation"));
                continue;
            }

            prepared.Add(Prepare(measurement, reference, heatCapacities, warnings));
            foreach (EquationTerm term in measurement.Equation.Terms)
            {
                if (!IsFixed(term.Species) && index.TryAdd(term.Species, unknowns.Count))
                {
                    unknowns.Add(term.Species);
                }
            }
        }

        // Each vector depends on its equation alone (the index and the fixed flags are complete and only read now).
        var vectors = new SparseVector[prepared.Count];
        IndexedWork.For(vectors.Length, i => vectors[i] = ToVector(prepared[i].Equation, fixedByInstance, index));
        return new PropertyModel(family, reference, unknowns, prepared, vectors, warnings);
    }

    /// <summary>ΔH − ΔU = Δn(gas)·R·T of an equation, in kJ/mol: what turns a ΔU into a ΔH (and back).</summary>
    public static double EnthalpyMinusInternalEnergy(ChemicalEquation equation, double temperature = PhysicalConstants.StandardTemperature)
    {
        ArgumentNullException.ThrowIfNull(equation);
        return ConstantVolumeCalorimetry.Correction(equation.GasMoleChange().ToDouble(), temperature) / 1000.0;
    }

    /// <summary>The position of a species among the unknowns, or -1 (fixed by convention, or absent).</summary>
    public int IndexOf(Species species) => _unknownIndex.TryGetValue(species, out int position) ? position : -1;

    /// <summary>The exact vector of an equation over the unknowns; species absent from the model are reported in <paramref name="missing"/>.</summary>
    public SparseVector VectorOf(ChemicalEquation equation, out IReadOnlyList<Species> missing)
    {
        ArgumentNullException.ThrowIfNull(equation);
        var absent = new List<Species>();
        var entries = new List<KeyValuePair<int, Fraction>>();
        foreach (EquationTerm term in equation.Terms)
        {
            if (Family.IsFixed(term.Species))
            {
                continue;
            }

            if (_unknownIndex.TryGetValue(term.Species, out int position))
            {
                entries.Add(new KeyValuePair<int, Fraction>(position, term.Coefficient));
            }
            else
            {
                absent.Add(term.Species);
            }
        }

        missing = absent;
        return SparseVector.Create(entries);
    }

    /// <summary>The floating-point row of a vector, for the least-squares solver.</summary>
    public static SparseRow RowOf(SparseVector vector)
    {
        ArgumentNullException.ThrowIfNull(vector);
        int[] indices = vector.Indices.ToArray();
        double[] coefficients = new double[indices.Length];
        ReadOnlySpan<Fraction> values = vector.Values;
        for (int i = 0; i < coefficients.Length; i++)
        {
            coefficients[i] = values[i].ToDouble();
        }

        return SparseRow.Of(indices, coefficients);
    }

    /// <summary>The least-squares system: one observation per measurement, with weight 1/u².</summary>
    /// <param name="uncertaintyOverride">Optional replacement uncertainties (e.g. after the suspect procedure).</param>
    public ObservationSystem ToObservationSystem(IReadOnlyList<double>? uncertaintyOverride = null)
    {
        var observations = new Observation[Measurements.Count];
        IndexedWork.For(observations.Length, i =>
        {
            double uncertainty = uncertaintyOverride?[i] ?? Measurements[i].Uncertainty;
            observations[i] = new Observation(RowOf(Vectors[i]), Measurements[i].Value, uncertainty);
        });

        return new ObservationSystem(Unknowns.Count, observations);
    }

    /// <summary>The network for route and cycle search over this model.</summary>
    /// <remarks>Built on first use and then shared (the model and the route network are both immutable), so a second search to another target starts at once.</remarks>
    public RouteNetwork ToRouteNetwork() => _routeNetwork.Value;

    private static SparseVector ToVector(ChemicalEquation equation, Dictionary<Species, bool> fixedByInstance, Dictionary<Species, int> index)
    {
        var entries = new (int Index, Fraction Value)[equation.Terms.Count];
        int count = 0;
        foreach (EquationTerm term in equation.Terms)
        {
            if (index.TryGetValue(term.Species, out int position))
            {
                entries[count++] = (position, term.Coefficient);
            }
            else if (!fixedByInstance.GetValueOrDefault(term.Species))
            {
                throw new InvalidOperationException($"{term.Species.Name} is neither an unknown nor fixed by convention.");
            }
        }

        return SparseVector.FromEntries(entries.AsSpan(0, count));
    }

    /// <summary>Converts a measurement to its family's property: ΔU → ΔH, ln K → ΔG, and Kirchhoff's law to <paramref name="reference"/> for ΔH, ΔS and S°.</summary>
    /// <remarks>ΔG (and K read as ΔG) away from the reference temperature is returned as measured, at its own temperature: the joint model (<see cref="ThermoModel"/>) takes it from there.</remarks>
    internal static PreparedMeasurement Prepare(Measurement measurement, double reference, IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities, List<Diagnostic> warnings, bool warnAboutGibbsTemperature = true)
    {
        var adjustments = new List<string>();
        double value = measurement.Value;
        double uncertainty = measurement.Uncertainty;
        double correction = 0.0;
        double temperature = measurement.Temperature;
        if (measurement.Property == ThermoProperty.InternalEnergy)
        {
            Fraction gasChange = measurement.Equation.GasMoleChange();
            correction = EnthalpyMinusInternalEnergy(measurement.Equation, temperature);
            value += correction;
            adjustments.Add(string.Create(CultureInfo.InvariantCulture, $"ΔU → ΔH: {correction:+0.000;-0.000} kJ/mol (Δn(gas) = {RationalText.Format(gasChange)}, T = {temperature:0.##} K)"));
        }
        else if (measurement.Property.IsEquilibriumConstant())
        {
            // ΔrG° = −RT·ln K; the typed number scales, so this is no additive correction.
            double lnK = measurement.Property == ThermoProperty.Log10EquilibriumConstant ? measurement.Value * Math.Log(10.0) : measurement.Value;
            double perUnitLnK = PhysicalConstants.GasConstant * temperature / 1000.0;
            double lnKUncertainty = measurement.Property == ThermoProperty.Log10EquilibriumConstant ? measurement.Uncertainty * Math.Log(10.0) : measurement.Uncertainty;
            value = -perUnitLnK * lnK;
            uncertainty = perUnitLnK * lnKUncertainty;
            adjustments.Add(string.Create(CultureInfo.InvariantCulture, $"{measurement.Property.Symbol()} = {measurement.Value:G6} → ΔrG° = −RT·ln K = {value:+0.000;-0.000} ± {uncertainty:0.000} kJ/mol (T = {temperature:0.##} K)"));
        }

        if (Math.Abs(temperature - reference) <= TemperatureTolerance)
        {
            return new PreparedMeasurement(measurement, value, uncertainty, adjustments) { Correction = correction };
        }

        bool isEnthalpy = measurement.Property is ThermoProperty.Enthalpy or ThermoProperty.InternalEnergy;
        bool isEntropy = measurement.Property is ThermoProperty.Entropy or ThermoProperty.AbsoluteEntropy;
        string at = temperature.ToString("0.##", CultureInfo.InvariantCulture);
        if (!isEnthalpy && !isEntropy)
        {
            if (warnAboutGibbsTemperature)
            {
                warnings.Add(Diagnostic.Warning("uncorrected-temperature", measurement.Location with { Field = "temperature" }, $"'{measurement.Id}' (ΔG at {at} K) is used as measured in route search: moving ΔG to 298.15 K needs ΔH and ΔS of the reaction", "the joint solution (solve, check) uses it at its own temperature"));
                adjustments.Add($"used as measured at {at} K (no ΔG temperature correction)");
            }

            return new PreparedMeasurement(measurement, value, uncertainty, adjustments) { Correction = correction };
        }

        var species = measurement.Equation.Terms
            .Where(term => !term.Species.Formula.IsElectron)
            .Select(term => new ReactionSpecies<Species>(term.Species, term.Coefficient.ToDouble(), heatCapacities.GetValueOrDefault(term.Species)))
            .ToArray();
        if (species.Any(item => item.Model is null))
        {
            // The reader already warned about the missing heat capacities; say here what that means for the value.
            adjustments.Add($"used as measured at {at} K (heat capacities missing)");
            return new PreparedMeasurement(measurement, value, uncertainty, adjustments) { Correction = correction };
        }

        KirchhoffShift<Species> shift = isEnthalpy
            ? Kirchhoff.ShiftEnthalpy(species, value * 1000.0, temperature, reference)
            : Kirchhoff.ShiftEntropy(species, value, temperature, reference);
        double shifted = isEnthalpy ? shift.Result / 1000.0 : shift.Result;
        string unit = isEnthalpy ? "kJ/mol" : "J/(mol·K)";
        adjustments.Add(string.Create(CultureInfo.InvariantCulture, $"Kirchhoff {at} K → 298.15 K: {shifted - value:+0.000;-0.000} {unit} (Cp from heat-capacity data)"));
        foreach (SpeciesRangeWarning<Species> rangeWarning in shift.RangeWarnings)
        {
            warnings.Add(Diagnostic.Warning("heat-capacity-range", measurement.Location with { Field = "temperature" }, $"'{measurement.Id}': the heat capacity of {rangeWarning.Species.Name} is extrapolated ({rangeWarning.Warning.Message})", "extend the heat-capacity data over the measurement temperature"));
        }

        return new PreparedMeasurement(measurement, shifted, uncertainty, adjustments) { Correction = correction + shifted - value };
    }
}
