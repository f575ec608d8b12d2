using PathFinder.Analysis;
using PathFinder.Solving;
using PathFinder.Synthetic;

namespace PathFinder.Tests.Solving;

/// <summary>Least-squares systems made from generated networks, with their ground truth per observation.</summary>
internal static class SyntheticSystems
{
    /// <summary>Generates a network and returns its enthalpy system, the true value of every observation and which are outliers.</summary>
    /// <remarks>
    /// Measurements whose species all cancel carry no information and are left out (the generator can emit a
    /// combustion of CO2 itself); the returned arrays are indexed by observation.
    /// </remarks>
    public static (ObservationSystem System, double[] TrueValues, bool[] IsOutlier) Create(int species, int measurements, int seed, double outlierFraction)
    {
        SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions
        {
            SpeciesCount = species,
            MeasurementCount = measurements,
            Seed = seed,
            OutlierFraction = outlierFraction,
        });
        PropertyModel model = PropertyModel.Build(synthetic.Network, PropertyFamily.Enthalpy);
        double[] truth = model.Unknowns.Select(s => synthetic.TrueFormationEnthalpy[s]).ToArray();
        int[] kept = Enumerable.Range(0, model.Measurements.Count).Where(i => !model.Vectors[i].IsZero).ToArray();
        var observations = kept
            .Select(i => new Observation(PropertyModel.RowOf(model.Vectors[i]), model.Measurements[i].Value, model.Measurements[i].Uncertainty))
            .ToArray();
        double[] trueValues = observations.Select(o => o.Row.Dot(truth)).ToArray();
        bool[] isOutlier = kept.Select(i => synthetic.OutlierIds.Contains(model.Measurements[i].Id)).ToArray();
        return (new ObservationSystem(model.Unknowns.Count, observations), trueValues, isOutlier);
    }
}
