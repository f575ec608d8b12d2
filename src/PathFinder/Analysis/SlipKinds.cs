namespace PathFinder.Analysis;

/// <summary>Data codes and printed names of <see cref="SlipKind"/> values.</summary>
public static class SlipKinds
{
    /// <summary>The data code: <c>sign</c>, <c>calorie</c>, <c>factor</c>, <c>phase</c> or <c>per-particle</c>.</summary>
    /// <remarks>Reports and JSON use this code, not the enum name.</remarks>
    public static string Code(this SlipKind kind) => kind switch
    {
        SlipKind.Sign => "sign",
        SlipKind.Calorie => "calorie",
        SlipKind.Factor => "factor",
        SlipKind.Phase => "phase",
        SlipKind.PerParticle => "per-particle",
        _ => throw new ArgumentOutOfRangeException(nameof(kind)),
    };

    /// <summary>The name for text: "sign slip", "calorie slip", "factor slip", "phase slip" or "per-particle unit slip".</summary>
    /// <remarks>A calorie slip is kcal/mol read as kJ/mol or the reverse (cal/(mol·K) and J/(mol·K) for entropies).</remarks>
    public static string Describe(this SlipKind kind) => kind switch
    {
        SlipKind.Sign => "sign slip",
        SlipKind.Calorie => "calorie slip",
        SlipKind.Factor => "factor slip",
        SlipKind.Phase => "phase slip",
        SlipKind.PerParticle => "per-particle unit slip",
        _ => throw new ArgumentOutOfRangeException(nameof(kind)),
    };
}
