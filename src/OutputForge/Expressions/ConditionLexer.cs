using System.Globalization;
using System.Text;

namespace OutputForge.Expressions;

/// <summary>Splits condition text into tokens. Keywords are case-insensitive; variable names are kept as written.</summary>
internal static class ConditionLexer
{
    private static readonly Dictionary<string, TokenKind> Keywords = new(StringComparer.OrdinalIgnoreCase)
    {
        ["and"] = TokenKind.And,
        ["or"] = TokenKind.Or,
        ["not"] = TokenKind.Not,
        ["in"] = TokenKind.In,
        ["is"] = TokenKind.Is,
        ["null"] = TokenKind.Null,
    };

    public static List<Token> Tokenize(string text)
    {
        var tokens = new List<Token>();
        var i = 0;
        while (i < text.Length)
        {
            var c = text[i];
            var position = i + 1;
            if (char.IsWhiteSpace(c))
            {
                i++;
                continue;
            }
            if (c is '\'' or '"')
            {
                tokens.Add(ReadText(text, ref i, c));
                continue;
            }
            if (char.IsDigit(c) || (c is '-' or '.' && i + 1 < text.Length && (char.IsDigit(text[i + 1]) || text[i + 1] == '.')))
            {
                tokens.Add(ReadNumber(text, ref i));
                continue;
            }
            if (char.IsLetter(c) || c == '_')
            {
                var start = i;
                while (i < text.Length && (char.IsLetterOrDigit(text[i]) || text[i] == '_'))
                {
                    i++;
                }
                var word = text[start..i];
                tokens.Add(Keywords.TryGetValue(word, out var keyword)
                    ? new Token(keyword, word, position)
                    : new Token(TokenKind.Identifier, word, position));
                continue;
            }
            var two = i + 1 < text.Length ? text.Substring(i, 2) : string.Empty;
            switch (two)
            {
                case "!=":
                case "<>":
                    tokens.Add(new Token(TokenKind.NotEqual, two, position));
                    i += 2;
                    continue;
                case "<=":
                    tokens.Add(new Token(TokenKind.LessOrEqual, two, position));
                    i += 2;
                    continue;
                case ">=":
                    tokens.Add(new Token(TokenKind.GreaterOrEqual, two, position));
                    i += 2;
                    continue;
            }
            var single = c switch
            {
                '=' => TokenKind.Equal,
                '<' => TokenKind.Less,
                '>' => TokenKind.Greater,
                '(' => TokenKind.OpenParen,
                ')' => TokenKind.CloseParen,
                ',' => TokenKind.Comma,
                _ => throw new ConditionSyntaxException($"unexpected character '{c}'", position),
            };
            tokens.Add(new Token(single, c.ToString(), position));
            i++;
        }
        tokens.Add(new Token(TokenKind.End, string.Empty, text.Length + 1));
        return tokens;
    }

    private static Token ReadText(string text, ref int i, char quote)
    {
        var position = i + 1;
        var value = new StringBuilder();
        i++;
        while (i < text.Length)
        {
            if (text[i] == quote)
            {
                // A doubled quote inside a quoted text stands for the quote itself.
                if (i + 1 < text.Length && text[i + 1] == quote)
                {
                    value.Append(quote);
                    i += 2;
                    continue;
                }
                i++;
                return new Token(TokenKind.Text, value.ToString(), position);
            }
            value.Append(text[i]);
            i++;
        }
        throw new ConditionSyntaxException($"text starting here has no closing {quote}", position);
    }

    private static Token ReadNumber(string text, ref int i)
    {
        var start = i;
        if (text[i] == '-')
        {
            i++;
        }
        while (i < text.Length && (char.IsDigit(text[i]) || text[i] == '.' || text[i] is 'e' or 'E'
                                   || (text[i] is '+' or '-' && text[i - 1] is 'e' or 'E')))
        {
            i++;
        }
        var raw = text[start..i];
        if (!double.TryParse(raw, NumberStyles.Float, CultureInfo.InvariantCulture, out var number))
        {
            throw new ConditionSyntaxException($"'{raw}' is not a number", start + 1);
        }
        return new Token(TokenKind.Number, raw, start + 1, number);
    }
}
