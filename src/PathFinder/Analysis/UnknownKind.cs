namespace PathFinder.Analysis;

/// <summary>What an unknown of the joint model stands for.</summary>
public enum UnknownKind
{
    /// <summary>ΔfH°(298.15 K) of a species, in kJ/mol.</summary>
    FormationEnthalpy,

    /// <summary>S°(298.15 K) of a species, in J/(mol·K).</summary>
    Entropy,

    /// <summary>The common offset of a source with a declared systematic uncertainty (kJ/mol or J/(mol·K), positive when the source reads high).</summary>
    SourceOffset,
}
