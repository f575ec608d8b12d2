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

/// <summary>The joint thermodynamic model of a network: every ΔH, ΔU, ΔS, S°, ΔG and equilibrium-constant datum as one linear equation in ΔfH° and S° of the species.</summary>
/// <remarks>
/// <para>Unknowns: ΔfH°(298.15 K) of every species some energy datum touches (kJ/mol) and S°(298.15 K) of every species
/// some entropy, Gibbs-energy or equilibrium-constant datum touches (J/(mol·K)); ΔfG° is derived, never an unknown. Each
/// source with a declared systematic uncertainty (<see cref="SourceSystematic"/>) adds one offset unknown with the prior
/// observation 0 ± systematic, appended after the measurements.</para>
/// <para>Rows, with ν the signed coefficients: ΔH and ΔU (as ΔH) at 298.15 K: Σν·ΔfH° = v. S°: S° = v. ΔS: Σν·S° = v.
/// ΔG at T: Σν·ΔfH° − (T/1000)·Σν·S° = v − (∫ΔrCp dT − T·∫ΔrCp/T dT)/1000, the integrals from 298.15 K to T when heat
/// capacities cover every species, else taken as 0 (ΔrCp = 0, said beside the value). ln K at T is read as
/// ΔrG° = −RT·ln K (log₁₀ K through ln 10). So one K at several temperatures is a second-law data set and one K with
/// known entropies a third-law datum: both are rows of the same model.</para>
/// <para>Conventions: ΔfH° is zero for elements in their reference states, H+(aq) and e-; S°(H+, aq) = 0; and because
/// ΔfG°(e-) = ΔfH°(e-) = 0, the electron's S° equals ½·S°(H2, g) (it enters entropy terms as ½ H2(g)).</para>
/// <para>Rows are exact (coefficients as fractions; temperatures as their decimal values) for the cycle search, and
/// float for the least squares, where a declared source's offset adds a coefficient 1 to each row of its dimension.</para>
/// </remarks>
public sealed class ThermoModel
{
    private readonly Dictionary<(Species Species, UnknownKind Kind), int> _index;
    private readonly Dictionary<string, int> _offsetIndex;
    private readonly int[] _offsetOfMeasurement;
    private readonly IReadOnlyDictionary<Species, IHeatCapacity> _heatCapacities;
    private readonly Lazy<RouteNetwork> _routeNetwork;

    private ThermoModel(
        IReadOnlyList<ModelUnknown> unknowns,
        Dictionary<(Species, UnknownKind), int> index,
        IReadOnlyList<PreparedMeasurement> measurements,
        IReadOnlyList<SparseVector> vectors,
        IReadOnlyList<SourceSystematic> systematics,
        Dictionary<string, int> offsetIndex,
        int[] offsetOfMeasurement,
        IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities,
        IReadOnlyList<Diagnostic> warnings)
    {
        Unknowns = unknowns;
        _index = index;
        Measurements = measurements;
        Vectors = vectors;
        Systematics = systematics;
        _offsetIndex = offsetIndex;
        _offsetOfMeasurement = offsetOfMeasurement;
        _heatCapacities = heatCapacities;
        Warnings = warnings;
        _routeNetwork = new Lazy<RouteNetwork>(() => RouteNetwork.Create(Vectors, Measurements.Select(item => item.Value).ToArray(), Measurements.Select(item => item.Uncertainty).ToArray()));
    }

    /// <summary>The temperature of the unknowns, 298.15 K.</summary>
    public double ReferenceTemperature => PhysicalConstants.StandardTemperature;

    /// <summary>The unknowns: species' ΔfH° and S° in order of first use, then the source offsets.</summary>
    public IReadOnlyList<ModelUnknown> Unknowns { get; }

    /// <summary>The prepared measurements, in data order; observation i of <see cref="ToObservationSystem"/> is measurement i.</summary>
    public IReadOnlyList<PreparedMeasurement> Measurements { get; }

    /// <summary>Each measurement's row as an exact vector over the species unknowns (source offsets are left out: cycles are chemistry).</summary>
    public IReadOnlyList<SparseVector> Vectors { get; }

    /// <summary>The declared systematics that act on at least one measurement, in declaration order; their prior observations follow the measurements.</summary>
    public IReadOnlyList<SourceSystematic> Systematics { get; }

    /// <summary>Warnings from preparation (uncorrected temperatures, extrapolated heat capacities, rows of conventional zeros).</summary>
    public IReadOnlyList<Diagnostic> Warnings { get; }

    /// <summary>The species that have a ΔfH° or S° unknown, in order of first use, each once.</summary>
    public IReadOnlyList<Species> Species => Unknowns.Where(unknown => unknown.Species is not null).Select(unknown => unknown.Species!).Distinct().ToArray();

    /// <summary>Builds the joint model of every measurement of <paramref name="network"/>.</summary>
    /// <param name="network">The network.</param>
    /// <param name="heatCapacities">Heat-capacity models by species (temperature corrections); may be empty.</param>
    /// <param name="systematics">Declared systematic uncertainties of sources; may be empty. Declarations of sources without measurements of their dimension are left out.</param>
    public static ThermoModel Build(ReactionNetwork network, IReadOnlyDictionary<Species, IHeatCapacity>? heatCapacities = null, IReadOnlyList<SourceSystematic>? systematics = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        heatCapacities ??= new Dictionary<Species, IHeatCapacity>();
        systematics ??= [];
        double reference = PhysicalConstants.StandardTemperature;
        var warnings = new List<Diagnostic>();
        var prepared = new List<PreparedMeasurement>();
        var rows = new List<List<(Species Species, UnknownKind Kind, Fraction Coefficient)>>();
        var unknowns = new List<ModelUnknown>();
        var index = new Dictionary<(Species, UnknownKind), int>();
        var zeroFormation = new Dictionary<Species, bool>(ReferenceEqualityComparer.Instance);
        bool HasZeroFormation(Species species)
        {
            if (!zeroFormation.TryGetValue(species, out bool isZero))
            {
                isZero = ReferenceStates.HasZeroFormationProperties(species);
                zeroFormation.Add(species, isZero);
            }

            return isZero;
        }

        foreach (Measurement measurement in network.Measurements)
        {
            List<(Species, UnknownKind, Fraction)> terms = Terms(measurement.Property, measurement.Equation, measurement.Temperature, HasZeroFormation);
            if (terms.Count == 0)
            {
                warnings.Add(Diagnostic.Warning("conventional-only", measurement.Location, $"'{measurement.Id}' involves only species whose {measurement.Property.Symbol()} contributions are zero by convention; it is left out of the analysis", "its value should be 0; drop the row or check the equation"));
                continue;
            }

            prepared.Add(Prepare(measurement, reference, heatCapacities, warnings));
            rows.Add(terms);
            foreach ((Species species, UnknownKind kind, Fraction _) in terms)
            {
                if (index.TryAdd((species, kind), unknowns.Count))
                {
                    unknowns.Add(new ModelUnknown(kind, species));
                }
            }
        }

        // One offset per declared source that has rows of its dimension; the rest of the declarations act on nothing.
        var offsetIndex = new Dictionary<string, int>(StringComparer.Ordinal);
        var used = new List<SourceSystematic>();
        int[] offsetOfMeasurement = new int[prepared.Count];
        Array.Fill(offsetOfMeasurement, -1);
        foreach (SourceSystematic systematic in systematics)
        {
            bool acts = false;
            for (int i = 0; i < prepared.Count; i++)
            {
                if (offsetOfMeasurement[i] < 0 && prepared[i].Source == systematic.Source && prepared[i].IsEnergy == systematic.IsEnergy)
                {
                    offsetOfMeasurement[i] = unknowns.Count;
                    acts = true;
                }
            }

            if (acts)
            {
                offsetIndex[OffsetKey(systematic.Source, systematic.IsEnergy)] = unknowns.Count;
                unknowns.Add(new ModelUnknown(UnknownKind.SourceOffset, null, systematic.Source, systematic));
                used.Add(systematic);
            }
        }

        var vectors = new SparseVector[prepared.Count];
        IndexedWork.For(vectors.Length, i =>
        {
            List<(Species Species, UnknownKind Kind, Fraction Coefficient)> terms = rows[i];
            var entries = new (int Index, Fraction Value)[terms.Count];
            for (int k = 0; k < terms.Count; k++)
            {
                entries[k] = (index[(terms[k].Species, terms[k].Kind)], terms[k].Coefficient);
            }

            vectors[i] = SparseVector.FromEntries(entries);
        });
        return new ThermoModel(unknowns, index, prepared, vectors, used, offsetIndex, offsetOfMeasurement, heatCapacities, warnings);
    }

    /// <summary>A copy with one more offset unknown, without a prior, acting on every row of <paramref name="source"/> of one dimension that has no offset yet.</summary>
    /// <remarks>What the consistency check uses when a source's common offset explains its rows better than any single suspect.</remarks>
    /// <exception cref="ArgumentException">No row of that source and dimension is free of an offset.</exception>
    public ThermoModel WithInferredOffset(string source, bool energy)
    {
        ArgumentNullException.ThrowIfNull(source);
        int offset = Unknowns.Count;
        int[] offsets = (int[])_offsetOfMeasurement.Clone();
        bool acts = false;
        for (int i = 0; i < Measurements.Count; i++)
        {
            if (offsets[i] < 0 && Measurements[i].Source == source && Measurements[i].IsEnergy == energy)
            {
                offsets[i] = offset;
                acts = true;
            }
        }

        if (!acts)
        {
            throw new ArgumentException($"no row of '{source}' is free of an offset", nameof(source));
        }

        var offsetIndex = new Dictionary<string, int>(_offsetIndex, StringComparer.Ordinal) { [OffsetKey(source, energy)] = offset };
        var unknowns = Unknowns.Append(new ModelUnknown(UnknownKind.SourceOffset, null, source)).ToArray();
        return new ThermoModel(unknowns, _index, Measurements, Vectors, Systematics, offsetIndex, offsets, _heatCapacities, Warnings);
    }

    /// <summary>The number of observations of <see cref="ToObservationSystem"/>: the measurements, then one prior per declared source offset.</summary>
    public int ObservationCount => Measurements.Count + Systematics.Count;

    /// <summary>Whether observation <paramref name="observation"/> is a source offset's prior rather than a measurement.</summary>
    public bool IsPrior(int observation) => observation >= Measurements.Count;

    /// <summary>The position of a species' ΔfH° or S° among the unknowns, or −1 (fixed by convention, or untouched by the data).</summary>
    public int IndexOf(Species species, UnknownKind kind) => _index.TryGetValue((species, kind), out int position) ? position : -1;

    /// <summary>The position of a declared source's offset (energy or entropy) among the unknowns, or −1.</summary>
    public int IndexOfOffset(string source, bool energy) => _offsetIndex.TryGetValue(OffsetKey(source, energy), out int position) ? position : -1;

    /// <summary>The offset unknown that acts on measurement <paramref name="measurement"/>, or −1.</summary>
    public int OffsetOf(int measurement) => _offsetOfMeasurement[measurement];

    /// <summary>The weighted least-squares system: one observation per measurement with weight 1/u², then the source priors 0 ± systematic.</summary>
    /// <param name="uncertaintyOverride">Optional replacement uncertainties of every observation (e.g. after the suspect procedure).</param>
    public ObservationSystem ToObservationSystem(IReadOnlyList<double>? uncertaintyOverride = null)
    {
        var observations = new Observation[ObservationCount];
        IndexedWork.For(Measurements.Count, i =>
        {
            double uncertainty = uncertaintyOverride?[i] ?? Measurements[i].Uncertainty;
            SparseRow row = _offsetOfMeasurement[i] < 0 ? PropertyModel.RowOf(Vectors[i]) : WithOffset(Vectors[i], _offsetOfMeasurement[i]);
            observations[i] = new Observation(row, Measurements[i].Value, uncertainty);
        });
        for (int k = 0; k < Systematics.Count; k++)
        {
            int observation = Measurements.Count + k;
            int offset = IndexOfOffset(Systematics[k].Source, Systematics[k].IsEnergy);
            observations[observation] = new Observation(SparseRow.Unit(offset), 0.0, uncertaintyOverride?[observation] ?? Systematics[k].Systematic);
        }

        return new ObservationSystem(Unknowns.Count, observations);
    }

    /// <summary>The network for cycle search over the exact rows: cycles may mix ΔH, S°, ΔS, ΔG and K data (G = H − TS closes them).</summary>
    public RouteNetwork ToRouteNetwork() => _routeNetwork.Value;

    /// <summary>A quantity of an equation as a combination of the unknowns, with the heat-capacity shift that moves it to <paramref name="temperature"/>.</summary>
    /// <param name="family">ΔrH° (enthalpy), ΔrS° (entropy) or ΔrG° (Gibbs energy).</param>
    /// <param name="equation">The reaction (a formation reaction for a species' ΔfH°, ΔfG°; a single species term for S°).</param>
    /// <param name="temperature">T in K; 298.15 K needs no heat capacities.</param>
    public ModelQuantity Quantity(PropertyFamily family, ChemicalEquation equation, double temperature = PhysicalConstants.StandardTemperature)
    {
        ArgumentNullException.ThrowIfNull(equation);
        ThermoProperty property = family switch
        {
            PropertyFamily.Enthalpy => ThermoProperty.Enthalpy,
            PropertyFamily.Entropy => ThermoProperty.Entropy,
            _ => ThermoProperty.GibbsEnergy,
        };
        List<(Species Species, UnknownKind Kind, Fraction Coefficient)> terms = Terms(property, equation, temperature, ReferenceStates.HasZeroFormationProperties);
        var entries = new List<KeyValuePair<int, Fraction>>();
        var missing = new List<Species>();
        foreach ((Species species, UnknownKind kind, Fraction coefficient) in terms)
        {
            if (_index.TryGetValue((species, kind), out int position))
            {
                entries.Add(new KeyValuePair<int, Fraction>(position, coefficient));
            }
            else if (!missing.Contains(species))
            {
                missing.Add(species);
            }
        }

        double shift = 0.0;
        IReadOnlyList<Species> lacking = [];
        if (Math.Abs(temperature - ReferenceTemperature) > PropertyModel.TemperatureTolerance)
        {
            ReactionHeatCapacity<Species> heatCapacity = HeatCapacityOf(equation);
            lacking = heatCapacity.SpeciesWithoutData;
            if (heatCapacity.IsComplete)
            {
                shift = family switch
                {
                    PropertyFamily.Enthalpy => heatCapacity.IntegrateHeatCapacity(ReferenceTemperature, temperature) / 1000.0,
                    PropertyFamily.Entropy => heatCapacity.IntegrateHeatCapacityOverTemperature(ReferenceTemperature, temperature),
                    _ => GibbsShift(heatCapacity, ReferenceTemperature, temperature),
                };
            }
        }

        return new ModelQuantity(family, temperature, SparseVector.Create(entries), shift, missing, lacking);
    }

    /// <summary>The heat capacity of a reaction from the model's Cp data (the electron carries none).</summary>
    public ReactionHeatCapacity<Species> HeatCapacityOf(ChemicalEquation equation) => HeatCapacityOf(equation, _heatCapacities);

    private static ReactionHeatCapacity<Species> HeatCapacityOf(ChemicalEquation equation, IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities)
    {
        ArgumentNullException.ThrowIfNull(equation);
        return new ReactionHeatCapacity<Species>(equation.Terms
            .Where(term => !term.Species.Formula.IsElectron)
            .Select(term => new ReactionSpecies<Species>(term.Species, term.Coefficient.ToDouble(), heatCapacities.GetValueOrDefault(term.Species))));
    }

    /// <summary>(∫ΔrCp dT − T·∫ΔrCp/T dT)/1000 from <paramref name="from"/> to <paramref name="to"/>, in kJ/mol: what heat capacities add to ΔrG°(T) beyond ΔrH°(from) − T·ΔrS°(from).</summary>
    public static double GibbsShift(ReactionHeatCapacity<Species> heatCapacity, double from, double to)
    {
        ArgumentNullException.ThrowIfNull(heatCapacity);
        return (heatCapacity.IntegrateHeatCapacity(from, to) - (to * heatCapacity.IntegrateHeatCapacityOverTemperature(from, to))) / 1000.0;
    }

    /// <summary>The joint row of a datum: (species, ΔfH° or S°, exact coefficient) terms, netted; empty when every contribution is zero by convention.</summary>
    /// <summary>Whether a measurement involves only quantities zero by convention, so that the model leaves it out.</summary>
    /// <remarks>Such a row (<c>H+(aq) + e- -> 1/2 H2(g)</c>) only checks the convention; the reader warns about it so every command says so.</remarks>
    internal static bool MeasuresOnlyConventions(Measurement measurement)
    {
        ArgumentNullException.ThrowIfNull(measurement);
        foreach (EquationTerm term in measurement.Equation.Terms)
        {
            if (!ReferenceStates.HasZeroFormationProperties(term.Species))
            {
                return false;
            }
        }

        return Terms(measurement.Property, measurement.Equation, measurement.Temperature, ReferenceStates.HasZeroFormationProperties).Count == 0;
    }

    private static List<(Species Species, UnknownKind Kind, Fraction Coefficient)> Terms(ThermoProperty property, ChemicalEquation equation, double temperature, Func<Species, bool> hasZeroFormation)
    {
        bool enthalpy = property is ThermoProperty.Enthalpy or ThermoProperty.InternalEnergy or ThermoProperty.GibbsEnergy || property.IsEquilibriumConstant();
        bool entropy = !enthalpy || property is ThermoProperty.GibbsEnergy || property.IsEquilibriumConstant();
        Fraction entropyFactor = enthalpy && entropy ? GibbsEntropyFactor(temperature) : Fraction.One;
        var terms = new List<(Species Species, UnknownKind Kind, Fraction Coefficient)>(equation.Terms.Count * 2);
        void Add(Species species, UnknownKind kind, Fraction coefficient)
        {
            for (int k = 0; k < terms.Count; k++)
            {
                if (terms[k].Kind == kind && terms[k].Species.Equals(species))
                {
                    terms[k] = (species, kind, terms[k].Coefficient + coefficient);
                    return;
                }
            }

            terms.Add((species, kind, coefficient));
        }

        foreach (EquationTerm term in equation.Terms)
        {
            if (enthalpy && !hasZeroFormation(term.Species))
            {
                Add(term.Species, UnknownKind.FormationEnthalpy, term.Coefficient);
            }

            if (entropy)
            {
                if (term.Species.Formula.IsElectron)
                {
                    // ΔfG°(e-) = ΔfH°(e-) = 0 makes S°(e-) = ½·S°(H2, g).
                    Add(HydrogenGas, UnknownKind.Entropy, term.Coefficient * entropyFactor / 2);
                }
                else if (!term.Species.Equals(ReferenceStates.AqueousProton))
                {
                    Add(term.Species, UnknownKind.Entropy, term.Coefficient * entropyFactor);
                }
            }
        }

        terms.RemoveAll(term => term.Coefficient.IsZero);
        return terms;
    }

    private static readonly Species HydrogenGas = ReferenceStates.Of("H");

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<double, Fraction> GibbsEntropyFactors = new();

    /// <summary>−T/1000 with T the exact decimal it was written as (298.15 is 5963/20, not the nearest binary fraction): the S° coefficient of a ΔG row, per unit of ν.</summary>
    /// <remarks>Kept per temperature: a data set has few distinct temperatures, and the decimal round trip is dear beside the rest of a row.</remarks>
    private static Fraction GibbsEntropyFactor(double temperature)
    {
        if (GibbsEntropyFactors.TryGetValue(temperature, out Fraction factor))
        {
            return factor;
        }

        factor = -Fraction.FromDecimal(decimal.Parse(temperature.ToString("R", CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture)) / 1000;
        if (GibbsEntropyFactors.Count < 4096)
        {
            GibbsEntropyFactors.TryAdd(temperature, factor);
        }

        return factor;
    }

    private static string OffsetKey(string source, bool energy) => (energy ? "E:" : "S:") + source;

    private static SparseRow WithOffset(SparseVector vector, int offset)
    {
        SparseRow row = PropertyModel.RowOf(vector);
        var entries = new (int Index, double Coefficient)[row.Count + 1];
        for (int k = 0; k < row.Count; k++)
        {
            entries[k] = (row.Indices[k], row.Coefficients[k]);
        }

        entries[^1] = (offset, 1.0);
        return SparseRow.Of(entries);
    }

    private static PreparedMeasurement Prepare(Measurement measurement, double reference, IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities, List<Diagnostic> warnings)
    {
        PreparedMeasurement prepared = PropertyModel.Prepare(measurement, reference, heatCapacities, warnings, warnAboutGibbsTemperature: false);
        bool gibbs = measurement.Property == ThermoProperty.GibbsEnergy || measurement.Property.IsEquilibriumConstant();
        double temperature = measurement.Temperature;
        if (!gibbs || Math.Abs(temperature - reference) <= PropertyModel.TemperatureTolerance)
        {
            return prepared;
        }

        // ΔrG°(T) = ΔrH°(298.15) − T·ΔrS°(298.15) + (∫ΔrCp dT − T·∫ΔrCp/T dT): the row carries the first two terms, the value
        // loses the third. Without heat capacities the third is taken as 0 (ΔrCp = 0), which the output says.
        string at = temperature.ToString("0.##", CultureInfo.InvariantCulture);
        ReactionHeatCapacity<Species> reaction = HeatCapacityOf(measurement.Equation, heatCapacities);
        var adjustments = prepared.Adjustments.ToList();
        if (!reaction.IsComplete)
        {
            adjustments.Add($"ΔG at {at} K related to ΔH° and S° at 298.15 K with ΔrCp = 0 (no heat capacities for {string.Join(", ", reaction.SpeciesWithoutData.Select(species => species.Name))})");
            return prepared with { Adjustments = adjustments };
        }

        double shift = GibbsShift(reaction, reference, temperature);
        foreach (SpeciesRangeWarning<Species> rangeWarning in reaction.CheckInterval(reference, temperature))
        {
            warnings.Add(Diagnostic.Warning("heat-capacity-range", measurement.Location with { Field = "temperature" }, $"'{measurement.Id}': the heat capacity of {rangeWarning.Species.Name} is extrapolated ({rangeWarning.Warning.Message})", "extend the heat-capacity data over the measurement temperature"));
        }

        adjustments.Add(string.Create(CultureInfo.InvariantCulture, $"ΔG at {at} K related to 298.15 K: {-shift:+0.000;-0.000} kJ/mol (∫ΔrCp dT − T·∫ΔrCp/T dT from heat-capacity data)"));
        return prepared with { Value = prepared.Value - shift, Correction = prepared.Correction - shift, Adjustments = adjustments };
    }
}
