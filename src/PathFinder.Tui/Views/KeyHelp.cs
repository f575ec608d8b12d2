namespace PathFinder.Tui.Views;

/// <summary>Every key of the explorer, as shown on the help screen (F1).</summary>
internal static class KeyHelp
{
    public static IReadOnlyList<(string Keys, string Action)> All { get; } =
    [
        ("F1", "this help"),
        ("F2 .. F7", "screens: Measurements, Species, Sources, Target, Consistency, Curation"),
        ("Tab / Shift+Tab", "move between the fields and tables of a screen"),
        ("Up/Down PgUp/PgDn", "move in a table or list"),
        ("Ctrl+F", "Measurements: go to the filter box (type to filter; Enter back to the table)"),
        ("Ctrl+O", "Measurements: sort by the next column (id, equation, ..., status, data order)"),
        ("Ctrl+R", "Measurements: reverse the sort"),
        ("Ctrl+E", "exclude the selected measurement (asks a reason) or re-include it"),
        ("Ctrl+S", "save the curation decisions beside the data"),
        ("Ctrl+X", "export the current table (.csv .json .md) or a diagram (.svg)"),
        ("Enter", "Target: search routes / open a route's steps / pick a species"),
        ("Ctrl+P", "Target: change the property (dH, dG, dS, dU)"),
        ("Enter", "Consistency: show only the cycles through the selected suspect"),
        ("Ctrl+G", "Consistency: go to the suspect in Measurements"),
        ("Ctrl+J", "Consistency: go to the suspect's source in Sources"),
        ("Ctrl+A", "recompute the analysis"),
        ("Esc", "close a dialog; clear the filter or cycle selection"),
        ("Ctrl+Q", "quit (asks first when decisions are unsaved)"),
    ];
}
