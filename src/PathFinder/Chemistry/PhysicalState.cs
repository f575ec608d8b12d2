namespace PathFinder.Chemistry;

/// <summary>A phase plus an optional modification such as <c>graphite</c> or <c>rhombic</c>.</summary>
/// <remarks>
/// <c>(cr,graphite)</c> and <c>(graphite)</c> denote the same state: a known crystal modification
/// written alone implies the crystalline phase.
/// </remarks>
/// <param name="Phase">The phase.</param>
/// <param name="Modification">The lower-case modification name, or empty.</param>
public readonly record struct PhysicalState(Phase Phase, string Modification = "")
{
    private static readonly Dictionary<string, Phase> PhaseWords = new(StringComparer.Ordinal)
    {
        ["g"] = Phase.Gas,
        ["gas"] = Phase.Gas,
        ["l"] = Phase.Liquid,
        ["liq"] = Phase.Liquid,
        ["liquid"] = Phase.Liquid,
        ["cr"] = Phase.Crystal,
        ["c"] = Phase.Crystal,
        ["s"] = Phase.Crystal,
        ["solid"] = Phase.Crystal,
        ["am"] = Phase.Amorphous,
        ["aq"] = Phase.Aqueous,
    };

    /// <summary>Crystal modifications that may be written on their own, e.g. <c>C(graphite)</c>.</summary>
    private static readonly HashSet<string> KnownModifications = new(StringComparer.Ordinal)
    {
        "graphite", "diamond", "rhombic", "monoclinic", "white", "red", "black", "grey", "gray",
        "alpha", "beta", "gamma", "delta", "calcite", "aragonite", "rutile", "anatase", "brookite",
        "quartz", "cristobalite", "tridymite", "corundum", "hexagonal", "cubic", "tetragonal", "orthorhombic",
    };

    /// <summary>The gas state.</summary>
    public static PhysicalState Gas => new(Phase.Gas);

    /// <summary>The liquid state.</summary>
    public static PhysicalState Liquid => new(Phase.Liquid);

    /// <summary>The crystalline state without a named modification.</summary>
    public static PhysicalState Crystal => new(Phase.Crystal);

    /// <summary>The aqueous state.</summary>
    public static PhysicalState Aqueous => new(Phase.Aqueous);

    /// <summary>The crystalline state in the named modification.</summary>
    public static PhysicalState CrystalModification(string modification) => new(Phase.Crystal, modification);

    /// <summary>The short code of the phase as written in data: g, l, cr, am, aq.</summary>
    public string PhaseCode => Phase switch
    {
        Phase.Gas => "g",
        Phase.Liquid => "l",
        Phase.Crystal => "cr",
        Phase.Amorphous => "am",
        Phase.Aqueous => "aq",
        _ => "?",
    };

    /// <summary>Reads the text between the parentheses, e.g. <c>cr,graphite</c>, <c>graphite</c> or <c>g</c>.</summary>
    public static ParseStateResult Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        string[] parts = text.Split(',', StringSplitOptions.TrimEntries);
        string first = parts[0].ToLowerInvariant();
        if (parts.Length > 2 || parts.Any(part => part.Length == 0))
        {
            return ParseStateResult.Fail($"state '({text})' has an empty or extra part");
        }

        if (PhaseWords.TryGetValue(first, out Phase phase))
        {
            string modification = parts.Length == 2 ? parts[1].ToLowerInvariant() : "";
            if (modification.Length > 0 && phase != Phase.Crystal && phase != Phase.Amorphous)
            {
                return ParseStateResult.Fail($"state '({text})': only solids take a modification name");
            }

            return ParseStateResult.Ok(new PhysicalState(phase, modification));
        }

        if (parts.Length == 1 && KnownModifications.Contains(first))
        {
            return ParseStateResult.Ok(new PhysicalState(Phase.Crystal, first));
        }

        return ParseStateResult.Fail($"unknown state '({text})'");
    }

    /// <summary>Formats as written in data, e.g. <c>cr,graphite</c>.</summary>
    public override string ToString() => Modification.Length > 0 ? $"{PhaseCode},{Modification}" : PhaseCode;
}
