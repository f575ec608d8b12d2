using PathFinder.IO;

namespace PathFinder.Diagrams;

/// <summary>A finished, self-contained SVG 1.1 document and its size.</summary>
/// <param name="Svg">The XML text (UTF-8 when saved, no external fonts or style sheets).</param>
/// <param name="Width">Canvas width in SVG user units (the viewBox); the <c>width</c> attribute equals it up to 1600 px,
/// wider drawings are displayed scaled down to 1600 px (same aspect ratio).</param>
/// <param name="Height">Canvas height in SVG user units.</param>
public sealed record SvgDiagram(string Svg, double Width, double Height)
{
    /// <summary>Writes the SVG to <paramref name="path"/> atomically (readers never see a partial file).</summary>
    public void Save(string path) => AtomicFile.WriteAllText(path, Svg);

    /// <summary>Writes the SVG to <paramref name="path"/> atomically; <paramref name="replaceReadOnly"/> allows replacing a read-only file (see <see cref="AtomicFile"/>).</summary>
    public void Save(string path, bool replaceReadOnly) => AtomicFile.WriteAllText(path, Svg, replaceReadOnly);
}
