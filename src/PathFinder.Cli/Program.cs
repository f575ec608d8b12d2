using System.Text;

namespace PathFinder.Cli;

internal static class Program
{
    private static int Main(string[] args)
    {
        Console.OutputEncoding = Encoding.UTF8;
        return CliApp.Run(args, Console.Out, Console.Error);
    }
}
