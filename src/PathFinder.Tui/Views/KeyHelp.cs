namespace PathFinder.Tui.Views;

/// <summary>Every key of the explorer, as shown on the help screen (F1).</summary>
internal static class KeyHelp
{
    public static IReadOnlyList<(string Keys, string Action)> All { get; } =
    [
        ("F1", "this help"),
        ("F2 F3 F4", "screens: Measurements, Species, Sources"),
        ("F5 F6 F7", "screens: Target, Consistency, Curation"),
        ("Tab Shift+Tab", "next / previous field or table on a screen"),
        ("arrows PgUp PgDn", "move in a table or list"),
        ("Ctrl+F", "Measurements: go to the filter box"),
        ("Ctrl+O", "Measurements: sort by the next column"),
        ("Ctrl+R", "Measurements: reverse the sort"),
        ("Ctrl+E", "exclude selected measurement (reason) / re-include"),
        ("Ctrl+S", "save the curation decisions beside the data"),
        ("Ctrl+X", "export table (.csv .json .md) or diagram (.svg)"),
        ("", "  .svg draws the selected route / cycle / measurement"),
        ("Enter", "Target: search / open route steps / pick species"),
        ("Ctrl+P", "Target: change property (dH dG dS dU)"),
        ("Enter", "Consistency: show cycles through the suspect"),
        ("Tab", "Consistency: move between suspects and cycles"),
        ("Ctrl+G", "Consistency: go to the suspect's measurement"),
        ("Ctrl+J", "Consistency: go to the suspect's source"),
        ("Ctrl+A", "recompute the analysis"),
        ("Esc", "close a dialog; clear filter or cycle selection"),
        ("Ctrl+Q", "quit (asks first when decisions are unsaved)"),
    ];
}
