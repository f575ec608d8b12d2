namespace PathFinder.Solving;

/// <summary>How one observation fits the solution and what the rest of the data say about it.</summary>
/// <remarks>
/// With C the covariance (g-inverse of AᵀWA), qᵢ = aᵢᵀCaᵢ and ŷᵢ = aᵢᵀx̂:
/// residual rᵢ = vᵢ − ŷᵢ; leverage hᵢ = wᵢqᵢ ∈ [0, 1]; normalized residual zᵢ = rᵢ/√(uᵢ² − qᵢ), which is
/// standard normal when the model holds; leave-one-out prediction ŷ₍₋ᵢ₎ = (ŷᵢ − hᵢvᵢ)/(1 − hᵢ) with standard
/// uncertainty √(qᵢ/(1 − hᵢ)), the value the other observations predict. When 1 − hᵢ is below
/// <see cref="SolverOptions.CheckabilityTolerance"/> the observation alone fixes something: the residual is 0,
/// and the normalized residual and leave-one-out values are null (<see cref="IsCheckable"/> is false).
/// Note zᵢ = (vᵢ − ŷ₍₋ᵢ₎)/√(uᵢ² + Var ŷ₍₋ᵢ₎), the same number seen from the leave-one-out side.
/// </remarks>
/// <param name="Index">The observation's index in the system.</param>
/// <param name="Value">The measured value vᵢ.</param>
/// <param name="Uncertainty">The standard uncertainty uᵢ used in this solution.</param>
/// <param name="Fitted">The adjusted value ŷᵢ = aᵢᵀx̂.</param>
/// <param name="FittedUncertainty">√qᵢ, the standard uncertainty of ŷᵢ.</param>
/// <param name="Residual">rᵢ = vᵢ − ŷᵢ.</param>
/// <param name="Leverage">hᵢ = wᵢqᵢ.</param>
/// <param name="NormalizedResidual">zᵢ, or null when not checkable.</param>
/// <param name="LeaveOneOutPrediction">ŷ₍₋ᵢ₎, or null when not checkable.</param>
/// <param name="LeaveOneOutUncertainty">√(qᵢ/(1 − hᵢ)), or null when not checkable.</param>
public readonly record struct ObservationDiagnostics(
    int Index,
    double Value,
    double Uncertainty,
    double Fitted,
    double FittedUncertainty,
    double Residual,
    double Leverage,
    double? NormalizedResidual,
    double? LeaveOneOutPrediction,
    double? LeaveOneOutUncertainty)
{
    /// <summary>Whether the rest of the data can check this observation (false: it alone fixes some quantity).</summary>
    public bool IsCheckable => NormalizedResidual.HasValue;
}
