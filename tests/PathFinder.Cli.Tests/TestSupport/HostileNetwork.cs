using PathFinder.Tests.TestSupport;

namespace PathFinder.Cli.Tests.TestSupport;

/// <summary>A valid network whose text fields attack the outputs: formula cells, terminal escapes, Markdown and HTML.</summary>
internal static class HostileNetwork
{
    /// <summary>The title-change and screen-clear sequence in one source.</summary>
    public const string EscapeSource = "\u001b]0;pwned\u0007\u001b[2Jlab";

    /// <summary>Writes the network (data and species file) into <paramref name="folder"/>; returns the folder path.</summary>
    public static string Write(TempFolder folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        folder.Write("data.csv",
            "id,equation,property,value,uncertainty,unit,temperature,source,note\n" +
            $"\"=HYPERLINK(\"\"http://x\"\")\",@SUM(A1),dH,-100.0,0.5,kJ/mol,,\"{EscapeSource}\",|<script>alert(1)</script>\n" +
            "m2,\"@SUM(A1) + O2(g) -> CO2(g) + H2(g)\",dH,-293.5,0.5,kJ/mol,,@src,x\n" +
            "m3,CO2(g),dH,-393.51,0.1,kJ/mol,,-src,\n" +
            "m4,\"CO2(g) -> C(cr,graphite) + O2(g)\",dH,393.6,0.2,kJ/mol,,+src,\n" +
            "m5,-Y|<b>,dH,-10,0.1,kJ/mol,,x,\n" +
            "m6,-Y|<b>,dH,-10.1,0.1,kJ/mol,,y,\n");
        folder.Write("species.csv", "key,formula,state,name\n@SUM(A1),CH2,g,evil\n-Y|<b>,H2O2,g,\n");
        return folder.Path;
    }
}
