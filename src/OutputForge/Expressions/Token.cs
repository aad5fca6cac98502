namespace OutputForge.Expressions;

internal enum TokenKind
{
    Identifier,
    Text,
    Number,
    Equal,
    NotEqual,
    Less,
    LessOrEqual,
    Greater,
    GreaterOrEqual,
    OpenParen,
    CloseParen,
    Comma,
    And,
    Or,
    Not,
    In,
    Is,
    Null,
    End,
}

/// <summary>A lexical token with its 1-based start position in the condition text.</summary>
internal readonly record struct Token(TokenKind Kind, string Text, int Position, double Number = 0);
