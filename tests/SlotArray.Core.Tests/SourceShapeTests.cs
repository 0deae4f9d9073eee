using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace SlotArray.Core.Tests;

/// <summary>Shape rules for every source file of src/: no method (constructor, accessor, operator) longer than a screenful.</summary>
public class SourceShapeTests
{
    /// <summary>Longest method body, lines from its opening to its closing brace (or of its expression body): 100.</summary>
    private const int MaximumBodyLines = 100;

    [Fact]
    public void No_method_in_src_is_longer_than_100_lines()
    {
        var files = SourceTree.Files("src");
        Assert.True(files.Count > 100, $"src/ was read: {files.Count} files");
        var tooLong = new List<(int Lines, string Where)>();
        foreach (var file in files)
        {
            var root = SourceTree.Parse(file).GetRoot();
            foreach (var node in root.DescendantNodes())
            {
                SyntaxNode? body = node switch
                {
                    BaseMethodDeclarationSyntax m => (SyntaxNode?)m.Body ?? m.ExpressionBody,
                    AccessorDeclarationSyntax a => (SyntaxNode?)a.Body ?? a.ExpressionBody,
                    LocalFunctionStatementSyntax l => (SyntaxNode?)l.Body ?? l.ExpressionBody,
                    _ => null,
                };
                if (body is null) continue;
                var span = body.GetLocation().GetLineSpan();
                int lines = span.EndLinePosition.Line - span.StartLinePosition.Line + 1;
                if (lines > MaximumBodyLines)
                    tooLong.Add((lines, $"{Path.GetRelativePath(SourceTree.RepositoryRoot, file)}:{span.StartLinePosition.Line + 1} {Name(node)} ({lines} lines)"));
            }
        }
        Assert.True(tooLong.Count == 0, $"methods over {MaximumBodyLines} lines (split them along their natural steps):\n"
            + string.Join("\n", tooLong.OrderByDescending(t => t.Lines).Select(t => t.Where)));
    }

    private static string Name(SyntaxNode node) => node switch
    {
        MethodDeclarationSyntax m => m.Identifier.ValueText,
        ConstructorDeclarationSyntax c => c.Identifier.ValueText + " (constructor)",
        LocalFunctionStatementSyntax l => l.Identifier.ValueText + " (local function)",
        AccessorDeclarationSyntax a => a.Keyword.ValueText + " accessor",
        _ => node.Kind().ToString(),
    };
}
