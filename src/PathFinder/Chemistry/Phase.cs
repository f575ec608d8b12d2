namespace PathFinder.Chemistry;

/// <summary>The physical state (phase) of a species, as written in parentheses after its formula.</summary>
public enum Phase
{
    /// <summary>Ideal gas at the standard pressure, written <c>(g)</c>.</summary>
    Gas,

    /// <summary>Liquid, written <c>(l)</c>.</summary>
    Liquid,

    /// <summary>Crystalline solid, written <c>(cr)</c>; <c>(s)</c> is accepted as a synonym.</summary>
    Crystal,

    /// <summary>Amorphous solid, written <c>(am)</c>.</summary>
    Amorphous,

    /// <summary>Aqueous solution at the standard molality, written <c>(aq)</c>.</summary>
    Aqueous,
}
