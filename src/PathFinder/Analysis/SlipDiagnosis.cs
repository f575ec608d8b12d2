using System.Globalization;
using PathFinder.Diagrams;
using PathFinder.Quantities;

namespace PathFinder.Analysis;

/// <summary>Names the common slip (sign, calorie, factor, per-particle unit, phase) that explains why a measurement disagrees with the rest.</summary>
/// <remarks>
/// <para>Each candidate undoes one slip on the typed number r = v − c (v the value the analysis used, c its own
/// correction): explained = k·r + c for a sign (k = −1), calorie (k = 4.184 or 1/4.184), factor (k = 2, 3, 1/2,
/// 1/3) or per-particle slip (k = 1 eV or 1 cm⁻¹ per particle in kJ/mol, or their inverses), and explained = v − s
/// for a phase slip with shift s ± u_s (<see cref="PhaseAlternative"/>).</para>
/// <para>The uncertainty of an explained value is that of the typed number scaled with it, since a slip in the unit
/// or the equation applies to the stated uncertainty too: u_e = √((k·u)² + u_p²), and u_e = √(u² + u_p² + u_s²) for
/// a phase slip. With u_c = √(u² + u_p²), a candidate fits when all three hold:</para>
/// <list type="bullet">
/// <item>the value as given does not agree: |v − p| &gt; a·u_c (a = <c>agreement</c>);</item>
/// <item>the explained value does: |explained − p| ≤ a·u_e;</item>
/// <item>the slip moves the value clearly more than the noise of either reading:
/// |explained − v| &gt; 3·max(u_c, u_e/|k|) (k = 1 for a phase slip). The second term matters for shrinking
/// transforms (k &lt; 1): they pull any value towards zero, so without it every outlier against a prediction near
/// zero would be "explained" by reading kJ/mol as cm⁻¹.</item>
/// </list>
/// <para>Among fitting candidates the one closest to p in units of its u_e wins; ties go to the earlier in the order
/// sign, calorie, factor, per-particle, phase. Calorie candidates apply to energies and entropies (cal/(mol·K) vs
/// J/(mol·K) is the same ratio), per-particle candidates to energies only, and neither to ln K or log₁₀ K rows,
/// whose numbers carry no unit.</para>
/// <para>A cause is a hint, not a verdict: each of up to 13 candidates accepts a window of ±a·u_e, so an outlier that
/// is no slip is sometimes named. Seeded draws (|p| 5–1000 kJ/mol, u 0.05–3, u_p 0.1–3, uniform) name one for about
/// 4 % of outliers 5–50 u_c away; the rate grows when |p| is only a few tens of u_c, where the candidates' values
/// crowd the gap.</para>
/// </remarks>
public static class SlipDiagnosis
{
    /// <summary>How many combined uncertainties a slip must move the value by to count as more than noise.</summary>
    private const double DistinctFactor = 3.0;

    private static readonly double Calorie = PhysicalConstants.ThermochemicalCalorie;
    private static readonly double ElectronVolt = EnergyUnit.ElectronVolt.ToCanonical;
    private static readonly double Wavenumber = EnergyUnit.Wavenumber.ToCanonical;

    /// <summary>The slip that explains why <paramref name="question"/>'s value disagrees with its prediction, or null when none does.</summary>
    /// <param name="question">The suspect measurement, its prediction and the phase changes the network knows.</param>
    /// <param name="agreement">How many standard uncertainties count as agreement. Default 2.</param>
    /// <returns>The most likely cause, or null when the value as given agrees or no candidate fits.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite, an uncertainty is negative, or <paramref name="agreement"/> is not positive.</exception>
    public static LikelyCause? Diagnose(SlipQuestion question, double agreement = 2.0)
    {
        ArgumentNullException.ThrowIfNull(question);
        ArgumentNullException.ThrowIfNull(question.Phases);
        if (!double.IsFinite(agreement) || agreement <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(agreement), agreement, "The agreement must be finite and positive.");
        }

        Validate(question);
        double combined = Math.Sqrt((question.Uncertainty * question.Uncertainty) + (question.PredictedUncertainty * question.PredictedUncertainty));
        if (Math.Abs(question.Value - question.Predicted) <= agreement * combined)
        {
            return null;
        }

        Candidate? best = null;
        double bestScore = double.PositiveInfinity;
        foreach (Candidate candidate in Candidates(question))
        {
            double distance = Math.Abs(candidate.Explained - question.Predicted);
            bool fits = distance <= agreement * candidate.Uncertainty
                && Math.Abs(candidate.Explained - question.Value) > DistinctFactor * Math.Max(combined, candidate.Uncertainty / Math.Abs(candidate.Slope));
            double score = candidate.Uncertainty > 0.0 ? distance / candidate.Uncertainty : 0.0;
            if (fits && score < bestScore)
            {
                best = candidate;
                bestScore = score;
            }
        }

        return best is { } found ? new LikelyCause(found.Kind, found.Explained, Detail(found, question)) : null;
    }

    private static void Validate(SlipQuestion question)
    {
        Finite(question.Value, nameof(question.Value));
        Finite(question.Correction, nameof(question.Correction));
        Finite(question.Predicted, nameof(question.Predicted));
        Uncertainty(question.Uncertainty, nameof(question.Uncertainty));
        Uncertainty(question.PredictedUncertainty, nameof(question.PredictedUncertainty));
        foreach (PhaseAlternative phase in question.Phases)
        {
            ArgumentNullException.ThrowIfNull(phase, nameof(question));
            Finite(phase.Shift, nameof(phase.Shift));
            Uncertainty(phase.ShiftUncertainty, nameof(phase.ShiftUncertainty));
        }

        static void Finite(double value, string name)
        {
            if (!double.IsFinite(value))
            {
                throw new ArgumentOutOfRangeException(nameof(question), value, $"{name} must be finite.");
            }
        }

        static void Uncertainty(double value, string name)
        {
            if (!double.IsFinite(value) || value < 0.0)
            {
                throw new ArgumentOutOfRangeException(nameof(question), value, $"{name} must be finite and non-negative.");
            }
        }
    }

    // In tie-break order: sign, calorie, factor, per-particle, phase.
    private static IEnumerable<Candidate> Candidates(SlipQuestion question)
    {
        ThermoProperty property = question.Property;
        bool entropy = property is ThermoProperty.Entropy or ThermoProperty.AbsoluteEntropy;
        string perMole = entropy ? "J/(mol·K)" : "kJ/mol";
        string calories = entropy ? "cal/(mol·K)" : "kcal/mol";

        yield return Scaled(question, SlipKind.Sign, -1.0, "a sign slip", null);
        if (property.IsEnergy() || entropy)
        {
            yield return Scaled(question, SlipKind.Calorie, Calorie, $"{calories} typed as {perMole}", "×" + Factor(Calorie));
            yield return Scaled(question, SlipKind.Calorie, 1.0 / Calorie, $"{perMole} typed as {calories}", "÷" + Factor(Calorie));
        }

        yield return Scaled(question, SlipKind.Factor, 2.0, "the equation was scaled by 2 but the value was not", "×2");
        yield return Scaled(question, SlipKind.Factor, 3.0, "the equation was scaled by 3 but the value was not", "×3");
        yield return Scaled(question, SlipKind.Factor, 1.0 / 2.0, "the equation was halved but the value was not", "÷2");
        yield return Scaled(question, SlipKind.Factor, 1.0 / 3.0, "the equation was divided by 3 but the value was not", "÷3");
        if (property.IsEnergy())
        {
            yield return Scaled(question, SlipKind.PerParticle, ElectronVolt, "eV per particle typed as kJ/mol", "×" + Factor(ElectronVolt));
            yield return Scaled(question, SlipKind.PerParticle, 1.0 / ElectronVolt, "kJ/mol typed as eV per particle", "÷" + Factor(ElectronVolt));
            yield return Scaled(question, SlipKind.PerParticle, Wavenumber, "cm⁻¹ per particle typed as kJ/mol", "×" + Factor(Wavenumber));
            yield return Scaled(question, SlipKind.PerParticle, 1.0 / Wavenumber, "kJ/mol typed as cm⁻¹ per particle", "÷" + Factor(Wavenumber));
        }

        foreach (PhaseAlternative phase in question.Phases)
        {
            double uncertainty = Math.Sqrt((question.Uncertainty * question.Uncertainty)
                + (question.PredictedUncertainty * question.PredictedUncertainty)
                + (phase.ShiftUncertainty * phase.ShiftUncertainty));
            yield return new Candidate(SlipKind.Phase, question.Value - phase.Shift, uncertainty, 1.0, $"{phase.Written.Name} where {phase.Alternative.Name} was measured", null);
        }
    }

    private static Candidate Scaled(SlipQuestion question, SlipKind kind, double slope, string what, string? operation)
    {
        double explained = (slope * question.Typed) + question.Correction;
        double scaledUncertainty = slope * question.Uncertainty;
        double uncertainty = Math.Sqrt((scaledUncertainty * scaledUncertainty) + (question.PredictedUncertainty * question.PredictedUncertainty));
        return new Candidate(kind, explained, uncertainty, slope, what, operation);
    }

    private static string Factor(double factor) => factor.ToString("G5", CultureInfo.InvariantCulture);

    // "looks like <what>: [<operation> gives] <explained> [, which] would agree with the rest (<p ± u_p>)", with the
    // explained value printed to the decimals of the prediction (at least 2) by the one formatter of signed values.
    private static string Detail(Candidate candidate, SlipQuestion question)
    {
        int decimals = DiagramText.DecimalsFor(question.PredictedUncertainty, 2);
        string explained = DiagramText.Signed(candidate.Explained, decimals);
        string rest = DiagramText.WithUncertainty(question.Predicted, question.PredictedUncertainty, 2);
        return candidate.Operation is null
            ? $"looks like {candidate.What}: {explained} would agree with the rest ({rest})"
            : $"looks like {candidate.What}: {candidate.Operation} gives {explained}, which would agree with the rest ({rest})";
    }

    /// <summary>One undone slip: the explained value, its uncertainty u_e, the slope k of the transform (1 for a phase slip) and the words for it.</summary>
    private readonly record struct Candidate(SlipKind Kind, double Explained, double Uncertainty, double Slope, string What, string? Operation);
}
