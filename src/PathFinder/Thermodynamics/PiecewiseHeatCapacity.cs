namespace PathFinder.Thermodynamics;

/// <summary>A heat capacity made of several models on adjacent temperature ranges (for example the low and high NASA polynomials, or Shomate ranges).</summary>
/// <remarks>
/// The pieces are sorted by their lower bound; each must start where the previous one ends, within the tolerance given
/// to the constructor (default <see cref="TemperatureRange.DefaultTolerance"/>). The joint between two pieces is taken at
/// the mean of the earlier piece's maximum and the later piece's minimum; at the joint itself the lower piece is used.
/// Integrals are split at the joints, so each piece is only integrated over its own range. Below the first piece the first
/// piece is extrapolated, above the last the last one; <see cref="ValidRange"/> spans from the first minimum to the last maximum.
/// Units as in <see cref="IHeatCapacity"/>.
/// </remarks>
public sealed class PiecewiseHeatCapacity : IHeatCapacity
{
    private readonly IHeatCapacity[] _pieces;
    private readonly double[] _joints;

    /// <summary>Creates the model from contiguous pieces (any order).</summary>
    /// <param name="pieces">At least one model; their ranges must neither overlap nor leave gaps.</param>
    /// <param name="tolerance">Allowed mismatch, in K, between one range's end and the next one's start.</param>
    /// <exception cref="ArgumentException">No pieces, or ranges overlap or leave a gap.</exception>
    public PiecewiseHeatCapacity(IEnumerable<IHeatCapacity> pieces, double tolerance = TemperatureRange.DefaultTolerance)
    {
        ArgumentNullException.ThrowIfNull(pieces);
        _pieces = [.. pieces.OrderBy(p => p.ValidRange.Minimum)];
        if (_pieces.Length == 0)
        {
            throw new ArgumentException("At least one piece is needed.", nameof(pieces));
        }

        _joints = new double[_pieces.Length - 1];
        for (int i = 0; i < _joints.Length; i++)
        {
            double end = _pieces[i].ValidRange.Maximum;
            double start = _pieces[i + 1].ValidRange.Minimum;
            if (Math.Abs(end - start) > tolerance)
            {
                string kind = start > end ? "a gap" : "an overlap";
                throw new ArgumentException($"The ranges {_pieces[i].ValidRange} and {_pieces[i + 1].ValidRange} leave {kind}.", nameof(pieces));
            }

            _joints[i] = (end + start) / 2.0;
        }

        ValidRange = new TemperatureRange(_pieces[0].ValidRange.Minimum, _pieces[^1].ValidRange.Maximum);
    }

    /// <summary>The pieces, sorted by temperature.</summary>
    public IReadOnlyList<IHeatCapacity> Pieces => _pieces;

    /// <inheritdoc />
    public TemperatureRange ValidRange { get; }

    /// <summary>The piece used at <paramref name="temperature"/> (K).</summary>
    /// <param name="temperature">Temperature in K.</param>
    public IHeatCapacity PieceAt(double temperature)
    {
        for (int i = 0; i < _joints.Length; i++)
        {
            if (temperature <= _joints[i])
            {
                return _pieces[i];
            }
        }

        return _pieces[^1];
    }

    /// <inheritdoc />
    public double HeatCapacity(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        return PieceAt(temperature).HeatCapacity(temperature);
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacity(double from, double to) =>
        Integrate(from, to, static (p, a, b) => p.IntegrateHeatCapacity(a, b));

    /// <inheritdoc />
    public double IntegrateHeatCapacityOverTemperature(double from, double to) =>
        Integrate(from, to, static (p, a, b) => p.IntegrateHeatCapacityOverTemperature(a, b));

    private double Integrate(double from, double to, Func<IHeatCapacity, double, double, double> integral)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        double low = Math.Min(from, to);
        double high = Math.Max(from, to);
        double sum = 0.0;
        for (int i = 0; i < _pieces.Length; i++)
        {
            double left = i == 0 ? low : Math.Max(low, _joints[i - 1]);
            double right = i == _pieces.Length - 1 ? high : Math.Min(high, _joints[i]);
            if (right > left)
            {
                sum += integral(_pieces[i], left, right);
            }
        }

        return to >= from ? sum : -sum;
    }
}
