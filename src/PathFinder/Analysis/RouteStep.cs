using Fractions;
using PathFinder.Chemistry;

namespace PathFinder.Analysis;

/// <summary>One measurement as a route uses it: flipped and/or scaled by an exact factor.</summary>
/// <param name="Measurement">The prepared measurement.</param>
/// <param name="Factor">The exact factor c (negative = flipped).</param>
/// <param name="Equation">The measurement's equation multiplied by the factor.</param>
/// <param name="Value">c·v, in the family's unit.</param>
/// <param name="Uncertainty">|c|·u.</param>
public sealed record RouteStep(PreparedMeasurement Measurement, Fraction Factor, ChemicalEquation Equation, double Value, double Uncertainty)
{
    /// <summary>Whether the measurement is used reversed.</summary>
    public bool IsFlipped => Factor < Fraction.Zero;

    /// <summary>How the step is described: "as measured", "reversed", "× 1/2", "reversed, × 3/2".</summary>
    public string Operation
    {
        get
        {
            Fraction magnitude = Factor < Fraction.Zero ? -Factor : Factor;
            string scale = magnitude == Fraction.One ? "" : $"× {RationalText.Format(magnitude)}";
            return (IsFlipped, scale.Length > 0) switch
            {
                (false, false) => "as measured",
                (true, false) => "reversed",
                (false, true) => scale,
                _ => $"reversed, {scale}",
            };
        }
    }
}
