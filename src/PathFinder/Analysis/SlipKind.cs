namespace PathFinder.Analysis;

/// <summary>A common slip that turns a sound measurement into a suspect.</summary>
public enum SlipKind
{
    /// <summary>A flipped sign or a reversed equation (code <c>sign</c>).</summary>
    Sign,

    /// <summary>kcal typed as kJ or the reverse, or cal/J for entropies: a ratio of 4.184 (code <c>calorie</c>).</summary>
    Calorie,

    /// <summary>The equation scaled by 2, 3, 1/2 or 1/3 but the value not, or the reverse (code <c>factor</c>).</summary>
    Factor,

    /// <summary>A species in the wrong state: the gap equals a phase change the network knows (code <c>phase</c>).</summary>
    Phase,

    /// <summary>A per-particle unit (eV, cm⁻¹) confused with a per-mole unit (code <c>per-particle</c>).</summary>
    PerParticle,
}
