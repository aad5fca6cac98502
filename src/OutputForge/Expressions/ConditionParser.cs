namespace OutputForge.Expressions;

/// <summary>
/// Reads OutputForge's condition language:
/// <code>
/// condition  := either ("or" either)*
/// either     := single ("and" single)*
/// single     := "not" single | "(" condition ")" | test
/// test       := VARIABLE compare literal
///             | VARIABLE ["not"] "in" "(" literal ("," literal)* ")"
///             | VARIABLE "is" ["not"] "null"
/// compare    := "=" | "!=" | "&lt;&gt;" | "&lt;" | "&lt;=" | "&gt;" | "&gt;="
/// literal    := 'text' | "text" | number
/// </code>
/// "and" binds tighter than "or"; keywords are case-insensitive. The missing-value test takes ISO
/// SQL's words (ISO/IEC 9075-2, null predicate); the earlier word "missing" in place of "null"
/// gets an error that names the new form, so that old specs are quick to fix.
/// </summary>
public sealed class ConditionParser
{
    /// <summary>The deepest nesting of '(' and 'not' read: a real condition nests a few levels; a deeper one would exhaust the stack.</summary>
    public const int MaxNesting = 100;

    /// <summary>The most tests joined by 'and' and 'or' in one condition (each join deepens the tree that evaluates it).</summary>
    public const int MaxJoins = 1_000;

    private readonly List<Token> _tokens;
    private int _next;
    private int _nesting;
    private int _joins;

    private ConditionParser(string text)
    {
        _tokens = ConditionLexer.Tokenize(text);
    }

    public static ConditionNode Parse(string text)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            throw new ConditionSyntaxException("the condition is empty", 1);
        }
        var parser = new ConditionParser(text);
        var node = parser.ParseOr();
        var rest = parser.Peek();
        if (rest.Kind != TokenKind.End)
        {
            throw new ConditionSyntaxException($"expected 'and', 'or' or the end of the condition but found '{rest.Text}'", rest.Position);
        }
        return node;
    }

    private Token Peek(int ahead = 0) => _tokens[Math.Min(_next + ahead, _tokens.Count - 1)];

    private Token Take() => _tokens[_next++];

    private Token Expect(TokenKind kind, string what)
    {
        var token = Peek();
        if (token.Kind != kind)
        {
            throw new ConditionSyntaxException($"expected {what} but found {Describe(token)}", token.Position);
        }
        return Take();
    }

    private static string Describe(Token token) =>
        token.Kind == TokenKind.End ? "the end of the condition" : $"'{token.Text}'";

    private ConditionNode ParseOr()
    {
        var left = ParseAnd();
        while (Peek().Kind == TokenKind.Or)
        {
            var op = Take();
            Join(op);
            left = new OrNode(left, ParseAnd(), op.Position);
        }
        return left;
    }

    private ConditionNode ParseAnd()
    {
        var left = ParseSingle();
        while (Peek().Kind == TokenKind.And)
        {
            var op = Take();
            Join(op);
            left = new AndNode(left, ParseSingle(), op.Position);
        }
        return left;
    }

    private void Nest(Token token)
    {
        if (++_nesting > MaxNesting)
        {
            throw new ConditionSyntaxException($"the condition nests '(' and 'not' more than {MaxNesting} levels deep", token.Position);
        }
    }

    private void Join(Token token)
    {
        if (++_joins > MaxJoins)
        {
            throw new ConditionSyntaxException($"the condition joins more than {MaxJoins} tests with 'and' and 'or'", token.Position);
        }
    }

    private ConditionNode ParseSingle()
    {
        var token = Peek();
        switch (token.Kind)
        {
            case TokenKind.Not:
                Take();
                Nest(token);
                var negated = new NotNode(ParseSingle(), token.Position);
                _nesting--;
                return negated;
            case TokenKind.OpenParen:
                Take();
                Nest(token);
                var inner = ParseOr();
                Expect(TokenKind.CloseParen, "')'");
                _nesting--;
                return inner;
            case TokenKind.Identifier:
                return ParseTest();
            default:
                throw new ConditionSyntaxException($"expected a variable name, 'not' or '(' but found {Describe(token)}", token.Position);
        }
    }

    private ConditionNode ParseTest()
    {
        var variable = Take();
        var op = Peek();
        switch (op.Kind)
        {
            case TokenKind.Is:
                var written = Take().Text;
                var negated = false;
                if (Peek().Kind == TokenKind.Not)
                {
                    written += " " + Take().Text;
                    negated = true;
                }
                RejectOldMissingTest(written, negated);
                Expect(TokenKind.Null, negated ? "'null' after 'is not'" : "'null' or 'not null' after 'is'");
                return new MissingTestNode(variable.Text, negated, variable.Position);
            case TokenKind.In:
                Take();
                return new InListNode(variable.Text, ParseList(), false, variable.Position);
            case TokenKind.Not when Peek(1).Kind == TokenKind.In:
                Take();
                Take();
                return new InListNode(variable.Text, ParseList(), true, variable.Position);
        }
        var comparison = op.Kind switch
        {
            TokenKind.Equal => ComparisonOperator.Equal,
            TokenKind.NotEqual => ComparisonOperator.NotEqual,
            TokenKind.Less => ComparisonOperator.Less,
            TokenKind.LessOrEqual => ComparisonOperator.LessOrEqual,
            TokenKind.Greater => ComparisonOperator.Greater,
            TokenKind.GreaterOrEqual => ComparisonOperator.GreaterOrEqual,
            _ => throw new ConditionSyntaxException(
                $"expected a comparison (=, !=, <, <=, >, >=), 'in', 'not in' or 'is null' after {variable.Text} but found {Describe(op)}",
                op.Position),
        };
        Take();
        return new ComparisonNode(variable.Text, comparison, ParseLiteral(), variable.Position);
    }

    /// <summary>The word "missing" where "null" belongs: the test's earlier wording, answered with the one to write.</summary>
    /// <param name="written">"is" or "is not" as the condition spells it.</param>
    private void RejectOldMissingTest(string written, bool negated)
    {
        var word = Peek();
        if (word.Kind == TokenKind.Identifier && string.Equals(word.Text, "missing", StringComparison.OrdinalIgnoreCase))
        {
            throw new ConditionSyntaxException(
                $"the missing-value test is written '{(negated ? "is not null" : "is null")}', not '{written} {word.Text}'", word.Position, ConditionProblem.MissingValueTest);
        }
    }

    private List<Literal> ParseList()
    {
        Expect(TokenKind.OpenParen, "'(' to start the list");
        var values = new List<Literal> { ParseLiteral() };
        while (Peek().Kind == TokenKind.Comma)
        {
            Take();
            values.Add(ParseLiteral());
        }
        Expect(TokenKind.CloseParen, "',' or ')' in the list");
        return values;
    }

    private Literal ParseLiteral()
    {
        var token = Peek();
        switch (token.Kind)
        {
            case TokenKind.Text:
                Take();
                return new Literal(token.Text, null, token.Position);
            case TokenKind.Number:
                Take();
                return new Literal(null, token.Number, token.Position);
            case TokenKind.Identifier:
                throw new ConditionSyntaxException(
                    $"expected a quoted text or a number but found '{token.Text}' (put text values in quotes: '{token.Text}')",
                    token.Position);
            case TokenKind.Null:
                throw new ConditionSyntaxException(
                    $"expected a quoted text or a number but found '{token.Text}' (a comparison with a missing value is false; test for one with 'is null' or 'is not null')",
                    token.Position);
            default:
                throw new ConditionSyntaxException($"expected a quoted text or a number but found {Describe(token)}", token.Position);
        }
    }
}
