using System.Numerics;
using Fractions;
using PathFinder.Algebra;

namespace PathFinder.Routes;

/// <summary>A prepared set of measured reaction vectors with values and standard uncertainties, ready for route and cycle searches.</summary>
/// <remarks>
/// <para>Measurement i is a sparse vector rᵢ over species indices (products +, reactants −), a measured value vᵢ and a
/// standard uncertainty uᵢ ≥ 0. Species in element reference states are expected to be removed by the caller.</para>
/// <para>Measurements whose vectors are parallel (rᵢ = sᵢ·p for one primitive integer vector p) form a class; searches
/// run over classes and expand to measurements afterwards. Within a class, members are ordered by uᵢ/|sᵢ|, so the
/// first member gives the smallest uncertainty contribution. Zero vectors form no class: each is a one-member cycle.</para>
/// </remarks>
public sealed class RouteNetwork
{
    private RouteNetwork(
        IReadOnlyList<SparseVector> vectors,
        double[] values,
        double[] uncertainties,
        int[] speciesIds,
        Dictionary<int, int> speciesIndex,
        NetworkClass[] classes,
        int[] classOfMeasurement,
        Fraction[] scaleOfMeasurement,
        int[][] classesOfSpecies,
        int[] zeroMeasurements)
    {
        Vectors = vectors;
        Values = values;
        Uncertainties = uncertainties;
        SpeciesIds = speciesIds;
        SpeciesIndex = speciesIndex;
        Classes = classes;
        ClassOfMeasurement = classOfMeasurement;
        ScaleOfMeasurement = scaleOfMeasurement;
        ClassesOfSpecies = classesOfSpecies;
        ZeroMeasurements = zeroMeasurements;
    }

    /// <summary>The measurement vectors, by measurement index.</summary>
    public IReadOnlyList<SparseVector> Vectors { get; }

    /// <summary>The measured values vᵢ, by measurement index.</summary>
    public IReadOnlyList<double> Values { get; }

    /// <summary>The standard uncertainties uᵢ, by measurement index.</summary>
    public IReadOnlyList<double> Uncertainties { get; }

    /// <summary>Number of measurements.</summary>
    public int Count => Vectors.Count;

    /// <summary>Number of classes of parallel nonzero measurement vectors.</summary>
    public int ClassCount => Classes.Length;

    internal int[] SpeciesIds { get; }

    internal Dictionary<int, int> SpeciesIndex { get; }

    internal NetworkClass[] Classes { get; }

    internal int[] ClassOfMeasurement { get; }

    internal Fraction[] ScaleOfMeasurement { get; }

    internal int[][] ClassesOfSpecies { get; }

    internal int[] ZeroMeasurements { get; }

    /// <summary>Prepares a network from parallel lists of vectors, values and standard uncertainties.</summary>
    /// <exception cref="ArgumentException">The lists differ in length, or a value/uncertainty is not finite or an uncertainty is negative.</exception>
    public static RouteNetwork Create(IReadOnlyList<SparseVector> vectors, IReadOnlyList<double> values, IReadOnlyList<double> uncertainties)
    {
        ArgumentNullException.ThrowIfNull(vectors);
        ArgumentNullException.ThrowIfNull(values);
        ArgumentNullException.ThrowIfNull(uncertainties);
        if (values.Count != vectors.Count || uncertainties.Count != vectors.Count)
        {
            throw new ArgumentException("Vectors, values and uncertainties must have the same length.", nameof(values));
        }

        int m = vectors.Count;
        var speciesSet = new SortedSet<int>();
        for (int i = 0; i < m; i++)
        {
            ArgumentNullException.ThrowIfNull(vectors[i]);
            if (!double.IsFinite(values[i]) || !double.IsFinite(uncertainties[i]) || uncertainties[i] < 0)
            {
                throw new ArgumentException($"Measurement {i}: value and uncertainty must be finite and the uncertainty non-negative.", nameof(uncertainties));
            }

            foreach (int s in vectors[i].Indices)
            {
                speciesSet.Add(s);
            }
        }

        int[] speciesIds = [.. speciesSet];
        var speciesIndex = new Dictionary<int, int>(speciesIds.Length);
        for (int k = 0; k < speciesIds.Length; k++)
        {
            speciesIndex[speciesIds[k]] = k;
        }

        var classOf = new int[m];
        var scaleOf = new Fraction[m];
        var keyToClass = new Dictionary<string, int>(StringComparer.Ordinal);
        var builders = new List<(int[] Species, BigInteger[] Ints, List<int> Members)>();
        var zeros = new List<int>();
        for (int i = 0; i < m; i++)
        {
            SparseVector v = vectors[i];
            if (v.IsZero)
            {
                classOf[i] = -1;
                scaleOf[i] = Fraction.Zero;
                zeros.Add(i);
                continue;
            }

            BigInteger[] ints = v.ToPrimitive(out Fraction scale);
            int[] species = [.. v.Indices.ToArray().Select(s => speciesIndex[s])];
            string key = string.Join(';', species.Select((s, k) => $"{s}:{ints[k]}"));
            if (!keyToClass.TryGetValue(key, out int c))
            {
                c = builders.Count;
                keyToClass.Add(key, c);
                builders.Add((species, ints, []));
            }

            classOf[i] = c;
            scaleOf[i] = scale;
            builders[c].Members.Add(i);
        }

        var classes = new NetworkClass[builders.Count];
        var classLists = new List<int>[speciesIds.Length];
        for (int c = 0; c < classes.Length; c++)
        {
            (int[] species, BigInteger[] ints, List<int> members) = builders[c];
            int[] ordered = [.. members.OrderBy(i => uncertainties[i] / Math.Abs(scaleOf[i].ToDouble())).ThenBy(i => i)];
            classes[c] = new NetworkClass(species, ints, ordered, [.. ordered.Select(i => uncertainties[i] / Math.Abs(scaleOf[i].ToDouble()))]);
            foreach (int s in species)
            {
                (classLists[s] ??= []).Add(c);
            }
        }

        int[][] classesOfSpecies = [.. classLists.Select(l => l is null ? Array.Empty<int>() : l.ToArray())];
        return new RouteNetwork(vectors, [.. values], [.. uncertainties], speciesIds, speciesIndex, classes, classOf, scaleOf, classesOfSpecies, [.. zeros]);
    }

    /// <summary>Returns the class number of measurement <paramref name="measurement"/>, or −1 for a zero vector.</summary>
    public int ClassOf(int measurement) => ClassOfMeasurement[measurement];

    /// <summary>Returns the measurements of class <paramref name="classNumber"/>, cheapest (smallest uᵢ/|sᵢ|) first.</summary>
    public IReadOnlyList<int> MembersOf(int classNumber) => Classes[classNumber].Members;
}
