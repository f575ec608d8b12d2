using System.Globalization;
using System.Text;
using Fractions;
using PathFinder.Chemistry;
using PathFinder.IO;
using PathFinder.Quantities;

namespace PathFinder.Synthetic;

/// <summary>Makes element-balanced test networks of a chosen size from known true formation enthalpies plus noise.</summary>
/// <remarks>
/// <para>Species are C/H/O/N molecules with distinct compositions, all gases. Reactions join two to four
/// species that lie near each other in the species list (families of related compounds, as in real data)
/// and are balanced with elements in their reference states; some are combustions to CO2(g), H2O(l) and
/// N2(g), some are formation reactions, and some repeat an earlier reaction as another determination.</para>
/// <para>Each value is Σν·ΔfH°(true) plus Gaussian noise of its standard uncertainty (0.2–2 kJ/mol); outliers
/// get an extra shift of 8–30 standard uncertainties with a random sign. Everything follows from the seed.</para>
/// </remarks>
public static class SyntheticNetworkGenerator
{
    /// <summary>Generates a network.</summary>
    public static SyntheticNetwork Generate(SyntheticNetworkOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        if (options.SpeciesCount < 3 || options.MeasurementCount < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(options), "need at least 3 species and 1 measurement");
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

        return new SyntheticNetwork(new ReactionNetwork($"synthetic-{options.Seed}", measurements), truth, outliers);
    }

    /// <summary>Writes the network as a CSV file <c>measurements.csv</c> and its ground truth <c>truth.txt</c> into a folder.</summary>
    /// <remarks>Equations are quoted: reference states such as C(cr,graphite) contain a comma.</remarks>
    public static void Write(SyntheticNetwork network, string folder)
    {
        ArgumentNullException.ThrowIfNull(network);
        Directory.CreateDirectory(folder);
        var data = new StringBuilder();
        data.AppendLine("# Synthetic network made by 'pathfinder generate': invented values, not for design.");
        data.AppendLine("id,equation,property,value,uncertainty,unit,temperature,source");
        foreach (Measurement measurement in network.Network.Measurements)
        {
            data.AppendLine(string.Create(CultureInfo.InvariantCulture, $"{measurement.Id},\"{measurement.Equation}\",dH,{measurement.Value:R},{measurement.Uncertainty:R},kJ/mol,298.15,{measurement.Source}"));
        }

        var truth = new StringBuilder();
        truth.AppendLine("# Ground truth of the synthetic network: true formation enthalpies and injected outliers.");
        truth.AppendLine("kind,name,value");
        foreach ((Species species, double value) in network.TrueFormationEnthalpy.Where(pair => network.Network.IndexOf(pair.Key) >= 0))
        {
            truth.AppendLine(string.Create(CultureInfo.InvariantCulture, $"species,{species.Name},{value:R}"));
        }

        foreach (string id in network.OutlierIds.Order(StringComparer.Ordinal))
        {
            truth.AppendLine($"outlier,{id},");
        }

        AtomicFile.WriteAllText(Path.Combine(folder, "measurements.csv"), data.ToString());
        AtomicFile.WriteAllText(Path.Combine(folder, "truth.txt"), truth.ToString());
    }

    private static List<Species> MakeSpecies(int count, Random random)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var list = new List<Species>(count);
        while (list.Count < count)
        {
            int carbon = 1 + random.Next(12);
            int nitrogen = random.NextDouble() < 0.2 ? 1 + random.Next(2) : 0;
            int hydrogen = random.Next((2 * carbon) + 3 + nitrogen);
            int oxygen = random.NextDouble() < 0.5 ? random.Next(4) : 0;
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
