using System.Globalization;
using System.Text;
using Fractions;
using PathFinder.Chemistry;
using PathFinder.IO;
using PathFinder.Quantities;

namespace PathFinder.Synthetic;

/// <summary>Makes element-balanced test networks of a chosen size from known true formation enthalpies (and, on request, absolute entropies) plus noise.</summary>
/// <remarks>
/// <para>Species are C/H/O/N molecules with distinct compositions, all gases. Reactions join two to four
/// species that lie near each other in the species list (families of related compounds, as in real data)
/// and are balanced with elements in their reference states; some are combustions to CO2(g), H2O(l) and
/// N2(g), some are formation reactions, and some repeat an earlier reaction as another determination.</para>
/// <para>Each value is Σν·ΔfH°(true) plus Gaussian noise of its standard uncertainty (0.2–2 kJ/mol); outliers
/// get an extra shift of 8–30 standard uncertainties with a random sign. Everything follows from the seed.</para>
/// <para>On request (<see cref="SyntheticNetworkOptions.EntropyFraction"/>, <see cref="SyntheticNetworkOptions.GibbsCount"/>)
/// a share of the species, the element reference states, CO2(g) and H2O(l) get a true S° and one S° datum each, and
/// ΔG, ln K and log₁₀ K data at 298.15–1000 K follow ΔrG°(T) = ΔrH° − T·ΔrS° (ΔrCp = 0). They are drawn after the ΔH
/// rows, which stay the same as without them.</para>
/// </remarks>
public static class SyntheticNetworkGenerator
{
    private const int MaxCarbon = 12;
    private const int MaxNitrogen = 2;
    private const int MaxOxygen = 3;

    /// <summary>The most species a network can have: the number of distinct C/H/N/O formulas the generator draws from (2,446).</summary>
    public static int MaxSpeciesCount { get; } = CountDistinctFormulas();

    /// <summary>The most ΔH measurements, and separately the most Gibbs-energy data, one network may have (2,000,000).</summary>
    /// <remarks>A bound on memory: generating a million measurements peaks at about 1.6 GB (measured on the 2-core VM).</remarks>
    public const int MaxMeasurementCount = 2_000_000;

    /// <summary>Generates a network.</summary>
    public static SyntheticNetwork Generate(SyntheticNetworkOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        if (options.SpeciesCount < 3 || options.MeasurementCount < 1 || options.SpeciesCount > MaxSpeciesCount || options.MeasurementCount > MaxMeasurementCount || options.GibbsCount > MaxMeasurementCount)
        {
            throw new ArgumentOutOfRangeException(nameof(options), $"need 3 to {MaxSpeciesCount} species, and 1 to {MaxMeasurementCount} measurements and at most as many Gibbs-energy data");
        }

        if (!double.IsFinite(options.EntropyFraction) || options.EntropyFraction < 0.0 || options.EntropyFraction > 1.0)
        {
            throw new ArgumentOutOfRangeException(nameof(options), "the entropy fraction must be from 0 to 1");
        }

        if (options.GibbsCount < 0 || (options.GibbsCount > 0 && options.EntropyFraction <= 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(options), "Gibbs-energy data need a count of at least 0 and an entropy fraction above 0");
        }

        var random = new Random(options.Seed);
        List<Species> species = MakeSpecies(options.SpeciesCount, random);
        var truth = new Dictionary<Species, double>();
        foreach (Species reference in ReferenceStates.All)
        {
            truth[reference] = 0.0;
        }

        foreach (Species item in species)
        {
            double carbon = item.Formula.CountOf("C").ToDouble();
            truth[item] = Math.Round(-20.0 * carbon + (random.NextDouble() * 300.0) - 150.0, 2);
        }

        Species carbonDioxide = Species.Parse("CO2(g)");
        Species water = Species.Parse("H2O(l)");
        truth[carbonDioxide] = -393.51;
        truth[water] = -285.83;

        var measurements = new List<Measurement>(options.MeasurementCount);
        var outliers = new HashSet<string>(StringComparer.Ordinal);
        var reactions = new List<ChemicalEquation>();
        string[] sources = Enumerable.Range(1, Math.Max(1, options.SourceCount)).Select(i => $"source-{i:D2}").ToArray();
        for (int i = 0; i < options.MeasurementCount; i++)
        {
            ChemicalEquation equation;
            double draw = random.NextDouble();
            if (reactions.Count > 0 && draw < options.RepeatFraction)
            {
                equation = reactions[random.Next(reactions.Count)];
            }
            else if (draw < options.RepeatFraction + options.FormationFraction)
            {
                equation = ChemicalEquation.Formation(species[random.Next(species.Count)]);
                reactions.Add(equation);
            }
            else if (draw < options.RepeatFraction + options.FormationFraction + options.CombustionFraction)
            {
                equation = Combustion(species[random.Next(species.Count)], carbonDioxide, water);
                reactions.Add(equation);
            }
            else
            {
                equation = LocalReaction(species, random, options.Locality);
                reactions.Add(equation);
            }

            double uncertainty = Math.Round(0.2 + (random.NextDouble() * 1.8), 2);
            double trueValue = equation.Terms.Sum(term => term.Coefficient.ToDouble() * truth[term.Species]);
            double value = trueValue + (uncertainty * NextGaussian(random));
            string id = $"m{i + 1}";
            if (random.NextDouble() < options.OutlierFraction)
            {
                double sigmas = options.OutlierMinSigma + (random.NextDouble() * (options.OutlierMaxSigma - options.OutlierMinSigma));
                value += (random.Next(2) == 0 ? -1.0 : 1.0) * sigmas * uncertainty;
                outliers.Add(id);
            }

            measurements.Add(new Measurement
            {
                Id = id,
                Equation = equation,
                EquationText = equation.ToString(),
                Property = ThermoProperty.Enthalpy,
                Value = Math.Round(value, 3),
                Uncertainty = uncertainty,
                Source = sources[random.Next(sources.Length)],
            });
        }

        // Drawn after every ΔH row from the same stream, so a ΔH-only network is the same with or without these options.
        var entropy = new Dictionary<Species, double>();
        if (options.EntropyFraction > 0.0)
        {
            var context = new DrawContext(random, options, sources, measurements, outliers);
            List<Species> withEntropy = AddEntropyData(context, species, carbonDioxide, water, entropy);
            AddGibbsData(context, withEntropy, truth, entropy);
        }

        return new SyntheticNetwork(new ReactionNetwork($"synthetic-{options.Seed}", measurements), truth, outliers) { TrueEntropy = entropy };
    }

    /// <summary>Writes the network as a CSV file <c>measurements.csv</c> and its ground truth <c>truth.txt</c> (CSV text) into a folder, as one unit.</summary>
    /// <remarks>
    /// <para>The truth file is not named <c>.csv</c> so that reading the folder as a network does not take it for data.
    /// Fields are quoted where needed: reference states such as <c>C(cr,graphite)</c> contain a comma.</para>
    /// <para>The two files belong together, so a kill must never leave a new <c>measurements.csv</c> beside an old
    /// <c>truth.txt</c>. A missing or empty folder is built complete as a hidden sibling (<c>.name.&lt;guid&gt;.tmp</c>)
    /// and renamed into place in one step: all or nothing. A manifest written last was the other choice, but every
    /// reader would have to learn to check it, and the folder rename needs none. A folder that already holds files
    /// (written into with <c>--force</c>) cannot be swapped whole without moving the user's other files, so there both
    /// files are first written completely as temporary files, then the old <c>truth.txt</c> is removed, the new
    /// <c>measurements.csv</c> renamed into place, and the new <c>truth.txt</c> last: a kill between these renames
    /// leaves at worst a folder without <c>truth.txt</c>, which says "incomplete" plainly, never a truth that belongs to
    /// other data. Each file is written as <see cref="AtomicFile"/> writes (links followed, special files refused).</para>
    /// </remarks>
    /// <param name="network">The network and its truth.</param>
    /// <param name="folder">The destination folder; created when missing.</param>
    /// <param name="replaceReadOnly">Whether read-only <c>measurements.csv</c> or <c>truth.txt</c> files may be replaced.</param>
    public static void Write(SyntheticNetwork network, string folder, bool replaceReadOnly = false) =>
        Write(network, folder, replaceReadOnly, afterFirstFile: null);

    /// <summary>As <see cref="Write(SyntheticNetwork, string, bool)"/>, calling <paramref name="afterFirstFile"/> between the two files (tests inject a failure there).</summary>
    internal static void Write(SyntheticNetwork network, string folder, bool replaceReadOnly, Action? afterFirstFile)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(folder);
        var data = new StringBuilder();
        data.AppendLine("# Synthetic network made by 'pathfinder generate': invented values, not for design.");
        data.AppendLine("id,equation,property,value,uncertainty,unit,temperature,source");
        foreach (Measurement measurement in network.Network.Measurements)
        {
            // S° belongs to one species: its equation field names the species, not a formation reaction.
            string equation = measurement.Property == ThermoProperty.AbsoluteEntropy ? measurement.Equation.Terms[0].Species.Name : measurement.Equation.ToString();
            data.AppendLine(string.Create(CultureInfo.InvariantCulture, $"{measurement.Id},{CsvCell.Field(equation)},{measurement.Property.Code()},{measurement.Value:R},{measurement.Uncertainty:R},{measurement.Unit.Symbol},{measurement.Temperature:R},{measurement.Source}"));
        }

        var truth = new StringBuilder();
        truth.AppendLine(network.TrueEntropy.Count == 0
            ? "# Ground truth of the synthetic network: true formation enthalpies and injected outliers."
            : "# Ground truth of the synthetic network: true formation enthalpies (species, kJ/mol), absolute entropies (entropy, J/(mol·K)) and injected outliers.");
        truth.AppendLine("kind,name,value");
        foreach ((Species species, double value) in network.TrueFormationEnthalpy.Where(pair => network.Network.IndexOf(pair.Key) >= 0))
        {
            truth.AppendLine(string.Create(CultureInfo.InvariantCulture, $"species,{CsvCell.Field(species.Name)},{value:R}"));
        }

        foreach ((Species species, double value) in network.TrueEntropy.Where(pair => network.Network.IndexOf(pair.Key) >= 0))
        {
            truth.AppendLine(string.Create(CultureInfo.InvariantCulture, $"entropy,{CsvCell.Field(species.Name)},{value:R}"));
        }

        foreach (string id in network.OutlierIds.Order(StringComparer.Ordinal))
        {
            truth.AppendLine($"outlier,{id},");
        }

        string full = Path.TrimEndingDirectorySeparator(Path.GetFullPath(folder));
        bool fresh = !Directory.Exists(full) || (new DirectoryInfo(full).LinkTarget is null && !Directory.EnumerateFileSystemEntries(full).Any());
        if (fresh)
        {
            WriteNewFolder(full, data.ToString(), truth.ToString(), afterFirstFile);
        }
        else
        {
            ReplaceInFolder(full, data.ToString(), truth.ToString(), replaceReadOnly, afterFirstFile);
        }
    }

    /// <summary>The name of the data file <see cref="Write(SyntheticNetwork, string, bool)"/> writes.</summary>
    public const string MeasurementsFileName = "measurements.csv";

    /// <summary>The name of the ground-truth file <see cref="Write(SyntheticNetwork, string, bool)"/> writes.</summary>
    public const string TruthFileName = "truth.txt";

    /// <summary>Builds the folder complete beside its place and renames it there (an empty folder at the place is removed first).</summary>
    private static void WriteNewFolder(string folder, string data, string truth, Action? afterFirstFile)
    {
        string parent = Path.GetDirectoryName(folder) ?? ".";
        Directory.CreateDirectory(parent);
        AtomicFile.RemoveStaleTemporaries(parent);
        string stage = Path.Combine(parent, $".{Path.GetFileName(folder)}.{Guid.NewGuid():N}.tmp");
        Directory.CreateDirectory(stage);
        try
        {
            AtomicFile.WriteAllText(Path.Combine(stage, MeasurementsFileName), data);
            afterFirstFile?.Invoke();
            AtomicFile.WriteAllText(Path.Combine(stage, TruthFileName), truth);
            if (Directory.Exists(folder))
            {
                // Not recursive: should anything have appeared in it meanwhile, this fails and nothing is lost.
                Directory.Delete(folder);
            }

            Directory.Move(stage, folder);
        }
        finally
        {
            if (Directory.Exists(stage))
            {
                Directory.Delete(stage, recursive: true);
            }
        }
    }

    /// <summary>Writes both files as temporaries, then removes the old truth and renames data first, truth last (see <see cref="Write(SyntheticNetwork, string, bool)"/>).</summary>
    private static void ReplaceInFolder(string folder, string data, string truth, bool replaceReadOnly, Action? afterFirstFile)
    {
        using PendingFile dataFile = AtomicFile.Prepare(Path.Combine(folder, MeasurementsFileName), stream => stream.Write(Encoding.UTF8.GetBytes(data)), replaceReadOnly);
        using PendingFile truthFile = AtomicFile.Prepare(Path.Combine(folder, TruthFileName), stream => stream.Write(Encoding.UTF8.GetBytes(truth)), replaceReadOnly);
        if (truthFile.Target.Exists)
        {
            File.Delete(truthFile.Target.FinalPath);
        }

        dataFile.Commit();
        afterFirstFile?.Invoke();
        truthFile.Commit();
    }

    /// <summary>What the S° and Gibbs-energy draws share with the ΔH rows: the stream, the options, the sources and the lists they add to.</summary>
    private sealed record DrawContext(Random Random, SyntheticNetworkOptions Options, string[] Sources, List<Measurement> Measurements, HashSet<string> Outliers)
    {
        /// <summary>Adds one datum: the true value plus Gaussian noise of its uncertainty, and an outlier's shift as for ΔH rows.</summary>
        public void Add(ChemicalEquation equation, ThermoProperty property, EnergyUnit unit, double temperature, double trueValue, double uncertainty, int decimals)
        {
            double value = trueValue + (uncertainty * NextGaussian(Random));
            string id = $"m{Measurements.Count + 1}";
            if (Random.NextDouble() < Options.OutlierFraction)
            {
                double sigmas = Options.OutlierMinSigma + (Random.NextDouble() * (Options.OutlierMaxSigma - Options.OutlierMinSigma));
                value += (Random.Next(2) == 0 ? -1.0 : 1.0) * sigmas * uncertainty;
                Outliers.Add(id);
            }

            Measurements.Add(new Measurement
            {
                Id = id,
                Equation = equation,
                EquationText = property == ThermoProperty.AbsoluteEntropy ? equation.Terms[0].Species.Name : equation.ToString(),
                Property = property,
                Value = Math.Round(value, decimals),
                Uncertainty = uncertainty,
                Unit = unit,
                Temperature = temperature,
                Source = Sources[Random.Next(Sources.Length)],
            });
        }
    }

    /// <summary>True S° of the element reference states (C, H, N, O), CO2(g) and H2O(l) at 298.15 K in J/(mol·K) (CODATA key values).</summary>
    private static readonly (string Name, double Entropy)[] KnownEntropies =
    [
        ("C(cr,graphite)", 5.74), ("H2(g)", 130.68), ("N2(g)", 191.61), ("O2(g)", 205.15), ("CO2(g)", 213.79), ("H2O(l)", 69.95),
    ];

    /// <summary>Draws the species with S° and their true values, and adds one S° datum each (known species first, then in list order).</summary>
    /// <returns>The generated species with S°, in list order.</returns>
    private static List<Species> AddEntropyData(DrawContext context, List<Species> species, Species carbonDioxide, Species water, Dictionary<Species, double> entropy)
    {
        Random random = context.Random;
        int count = (int)Math.Round(context.Options.EntropyFraction * species.Count);
        int[] order = Enumerable.Range(0, species.Count).ToArray();
        random.Shuffle(order);
        int[] chosen = order.Take(count).Order().ToArray();
        var withEntropy = new List<Species>(count);
        foreach ((string name, double value) in KnownEntropies)
        {
            Species known = name switch
            {
                "CO2(g)" => carbonDioxide,
                "H2O(l)" => water,
                _ => Species.Parse(name),
            };
            entropy[known] = value;
        }

        foreach (int index in chosen)
        {
            // Plausible gas-phase values: rising with the number of atoms and levelling off, 150–400 J/(mol·K) before the scatter.
            Species item = species[index];
            double atoms = item.Formula.Composition.Values.Sum(amount => amount.ToDouble());
            double value = 150.0 + (250.0 * (1.0 - Math.Exp(-atoms / 12.0))) + ((random.NextDouble() * 40.0) - 20.0);
            entropy[item] = Math.Round(Math.Clamp(value, 30.0, 400.0), 2);
            withEntropy.Add(item);
        }

        foreach ((Species item, double value) in entropy)
        {
            double uncertainty = Math.Round(0.05 + (random.NextDouble() * 0.95), 3);
            context.Add(ChemicalEquation.FromTerms([new EquationTerm(item, Fraction.One)]), ThermoProperty.AbsoluteEntropy, EnergyUnit.JoulePerMoleKelvin, PhysicalConstants.StandardTemperature, value, uncertainty, 3);
        }

        return withEntropy;
    }

    /// <summary>Adds ΔG, ln K and log₁₀ K data at 298.15–1000 K: formation reactions of species with S° and reactions among near neighbours of them.</summary>
    private static void AddGibbsData(DrawContext context, List<Species> withEntropy, Dictionary<Species, double> enthalpy, Dictionary<Species, double> entropy)
    {
        Random random = context.Random;
        // Partners come from a window at least four wide on each side, so a four-species reaction always finds distinct partners.
        int locality = Math.Max(4, context.Options.Locality * withEntropy.Count / Math.Max(1, context.Options.SpeciesCount));
        bool local = withEntropy.Count >= 5;
        for (int i = 0; i < context.Options.GibbsCount && withEntropy.Count > 0; i++)
        {
            ChemicalEquation equation = local && random.NextDouble() < 0.7
                ? LocalReaction(withEntropy, random, locality)
                : ChemicalEquation.Formation(withEntropy[random.Next(withEntropy.Count)]);
            double temperature = Math.Round(PhysicalConstants.StandardTemperature + (random.NextDouble() * (1000.0 - PhysicalConstants.StandardTemperature)), 2);
            double reactionEnthalpy = equation.Terms.Sum(term => term.Coefficient.ToDouble() * enthalpy[term.Species]);
            double reactionEntropy = equation.Terms.Sum(term => term.Coefficient.ToDouble() * entropy[term.Species]);
            double gibbs = reactionEnthalpy - (temperature * reactionEntropy / 1000.0);
            double lnK = -1000.0 * gibbs / (PhysicalConstants.GasConstant * temperature);
            switch (random.Next(3))
            {
                case 0:
                    context.Add(equation, ThermoProperty.GibbsEnergy, EnergyUnit.KilojoulePerMole, temperature, gibbs, Math.Round(0.2 + (random.NextDouble() * 2.8), 2), 3);
                    break;
                case 1:
                    context.Add(equation, ThermoProperty.LnEquilibriumConstant, EnergyUnit.Dimensionless, temperature, lnK, Math.Round(0.01 + (random.NextDouble() * 0.49), 3), 4);
                    break;
                default:
                    double lnKUncertainty = 0.01 + (random.NextDouble() * 0.49);
                    context.Add(equation, ThermoProperty.Log10EquilibriumConstant, EnergyUnit.Dimensionless, temperature, lnK / Math.Log(10.0), Math.Round(lnKUncertainty / Math.Log(10.0), 4), 4);
                    break;
            }
        }
    }

    /// <summary>Distinct formulas <see cref="MakeSpecies"/> can draw: C1–12, N0–2, H0 to 2C+2+N, O0–3, less C and CO2.</summary>
    private static int CountDistinctFormulas()
    {
        int count = 0;
        for (int carbon = 1; carbon <= MaxCarbon; carbon++)
        {
            for (int nitrogen = 0; nitrogen <= MaxNitrogen; nitrogen++)
            {
                count += HydrogenChoices(carbon, nitrogen) * (MaxOxygen + 1);
            }
        }

        return count - 2;
    }

    private static int HydrogenChoices(int carbon, int nitrogen) => (2 * carbon) + 3 + nitrogen;

    private static List<Species> MakeSpecies(int count, Random random)
    {
        // Every formula has a positive chance, so the loop ends whenever count is at most the number of distinct formulas
        // (the rarest has a chance of about 4e-5 per draw, so even all of them take well under a second).
        if (count > MaxSpeciesCount)
        {
            throw new ArgumentOutOfRangeException(nameof(count), count, $"at most {MaxSpeciesCount} distinct species can be made");
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        var list = new List<Species>(count);
        while (list.Count < count)
        {
            int carbon = 1 + random.Next(MaxCarbon);
            int nitrogen = random.NextDouble() < 0.2 ? 1 + random.Next(MaxNitrogen) : 0;
            int hydrogen = random.Next(HydrogenChoices(carbon, nitrogen));
            int oxygen = random.NextDouble() < 0.5 ? random.Next(MaxOxygen + 1) : 0;
            var text = new StringBuilder();
            text.Append('C');
            if (carbon > 1)
            {
                text.Append(carbon.ToString(CultureInfo.InvariantCulture));
            }

            Append(text, "H", hydrogen);
            Append(text, "N", nitrogen);
            Append(text, "O", oxygen);
            string formula = text.ToString();
            // CO2 is the combustion product the generator adds itself; a second CO2 species would make empty reactions.
            if (formula is "C" or "CO2" || !seen.Add(formula))
            {
                continue;
            }

            list.Add(Species.Parse($"{formula}(g)"));
        }

        return list;
    }

    private static void Append(StringBuilder text, string symbol, int count)
    {
        if (count > 0)
        {
            text.Append(symbol);
            if (count > 1)
            {
                text.Append(count.ToString(CultureInfo.InvariantCulture));
            }
        }
    }

    private static ChemicalEquation Combustion(Species fuel, Species carbonDioxide, Species water)
    {
        Fraction carbon = fuel.Formula.CountOf("C");
        Fraction hydrogen = fuel.Formula.CountOf("H");
        var terms = new List<EquationTerm>
        {
            new(fuel, Fraction.MinusOne),
            new(carbonDioxide, carbon),
            new(water, hydrogen / 2),
        };
        return Balance(terms);
    }

    private static ChemicalEquation LocalReaction(List<Species> species, Random random, int locality)
    {
        int partners = 2 + random.Next(3);
        int centre = random.Next(species.Count);
        var chosen = new HashSet<int> { centre };
        while (chosen.Count < partners)
        {
            int offset = random.Next(-locality, locality + 1);
            int index = Math.Clamp(centre + offset, 0, species.Count - 1);
            chosen.Add(index);
        }

        var terms = new List<EquationTerm>();
        int position = 0;
        foreach (int index in chosen)
        {
            // The first species is always consumed and the second always formed, so both sides are non-empty.
            int sign = position == 0 ? -1 : position == 1 ? 1 : (random.Next(2) == 0 ? -1 : 1);
            int magnitude = random.NextDouble() < 0.8 ? 1 : 2;
            terms.Add(new EquationTerm(species[index], new Fraction(sign * magnitude)));
            position++;
        }

        return Balance(terms);
    }

    /// <summary>Adds element reference species so that every element balances.</summary>
    private static ChemicalEquation Balance(List<EquationTerm> terms)
    {
        var excess = new Dictionary<string, Fraction>(StringComparer.Ordinal);
        foreach (EquationTerm term in terms)
        {
            foreach (KeyValuePair<string, Fraction> pair in term.Species.Formula.Composition)
            {
                excess[pair.Key] = excess.GetValueOrDefault(pair.Key, Fraction.Zero) + (term.Coefficient * pair.Value);
            }
        }

        foreach ((string element, Fraction amount) in excess)
        {
            if (!amount.IsZero)
            {
                terms.Add(new EquationTerm(ReferenceStates.Of(element), -amount / ReferenceStates.AtomsPerUnit(element)));
            }
        }

        return ChemicalEquation.FromTerms(terms);
    }

    private static double NextGaussian(Random random)
    {
        double u1 = 1.0 - random.NextDouble();
        double u2 = random.NextDouble();
        return Math.Sqrt(-2.0 * Math.Log(u1)) * Math.Cos(2.0 * Math.PI * u2);
    }
}
