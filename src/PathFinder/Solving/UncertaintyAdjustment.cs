namespace PathFinder.Solving;

/// <summary>One step of <see cref="OutlierProcedure"/>: the worst observation and how its uncertainty was enlarged.</summary>
/// <param name="Iteration">1 for the first adjustment, and so on.</param>
/// <param name="ObservationIndex">The observation adjusted.</param>
/// <param name="NormalizedResidualBefore">Its normalized residual before the adjustment (signed).</param>
/// <param name="OldUncertainty">Its uncertainty before.</param>
/// <param name="NewUncertainty">Its uncertainty after.</param>
public readonly record struct UncertaintyAdjustment(
    int Iteration, int ObservationIndex, double NormalizedResidualBefore, double OldUncertainty, double NewUncertainty);
