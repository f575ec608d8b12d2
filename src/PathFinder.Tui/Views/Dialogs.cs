using System.Collections.ObjectModel;
using PathFinder.IO;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace PathFinder.Tui.Views;

/// <summary>Small modal dialogs: a text prompt, a text viewer, and a yes/no question. Esc cancels each.</summary>
/// <remarks>Titles, prompts and lines may carry data (ids, paths): their control characters are shown, not sent (<see cref="TerminalText"/>).</remarks>
internal static class Dialogs
{
    /// <summary>Asks for one line of text; null when cancelled.</summary>
    public static string? AskText(IApplication app, string title, string prompt, string initial)
    {
        using var dialog = new Dialog { Title = TerminalText.Visible(title), Width = Dim.Percent(90), Height = 9 };
        var label = new Label { Text = TerminalText.Visible(prompt), X = 1, Y = 0, Width = Dim.Fill(1), Height = 2 };
        var field = new TextField { Text = initial, X = 1, Y = 2, Width = Dim.Fill(1) };
        dialog.Add(label, field);
        dialog.AddButton(new Button { Text = "_Cancel" });
        dialog.AddButton(new Button { Text = "_OK" });
        field.SetFocus();
        // The text is taken when Enter or OK is pressed, and the field then takes no more keys: the dialog only closes at
        // the end of the main-loop iteration, and keys typed fast after Enter (meant for the next decision) would
        // otherwise still land in this field and merge two reasons into one.
        string? accepted = null;
        dialog.Accepting += (_, _) =>
        {
            accepted ??= field.Text;
            field.ReadOnly = true;
        };
        app.Run(dialog);
        return dialog.Result == 1 && !dialog.Canceled ? accepted ?? field.Text : null;
    }

    /// <summary>Shows lines of text until Enter or Esc.</summary>
    public static void ShowText(IApplication app, string title, IReadOnlyList<string> lines)
    {
        title = TerminalText.Visible(title);
        lines = lines.Select(line => TerminalText.Visible(line)).ToArray();
        int height = Math.Min(lines.Count + 7, Math.Max(8, (app.Screen.Height) - 2));
        int width = Math.Min(Math.Max(lines.Select(line => line.Length).DefaultIfEmpty(20).Max() + 8, 40), Math.Max(40, app.Screen.Width - 2));
        using var dialog = new Dialog { Title = title, Width = width, Height = height };
        if (lines.Count + 7 <= height)
        {
            // It fits: a plain label (a list view left its last line undrawn until the first key press).
            dialog.Add(new Label { X = 1, Y = 0, Width = Dim.Fill(1), Height = Dim.Fill(2), Text = string.Join("\n", lines) });
        }
        else
        {
            // A list, so long texts scroll with the arrow keys at 80×24.
            var text = new ListView { X = 1, Y = 0, Width = Dim.Fill(1), Height = Dim.Fill(2) };
            text.SetSource(new ObservableCollection<string>(lines));
            dialog.Add(text);
        }

        dialog.AddButton(new Button { Text = "_Close" });
        app.Run(dialog);
    }

    /// <summary>Asks a question with buttons; returns the button index, or null when cancelled.</summary>
    public static int? Ask(IApplication app, string title, string message, params string[] buttons) =>
        MessageBox.Query(app, TerminalText.Visible(title), TerminalText.Visible(message, keepLineBreaks: true), buttons);
}
