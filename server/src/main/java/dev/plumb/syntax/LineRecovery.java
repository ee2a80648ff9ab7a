package dev.plumb.syntax;

import dev.plumb.grammar.PlumbLexer;
import dev.plumb.grammar.PlumbParser;
import org.antlr.v4.runtime.DefaultErrorStrategy;
import org.antlr.v4.runtime.InputMismatchException;
import org.antlr.v4.runtime.NoViableAltException;
import org.antlr.v4.runtime.Parser;
import org.antlr.v4.runtime.RecognitionException;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.TokenStream;

/**
 * Editor-grade error recovery: a syntax error costs at most the rest of its own line, so one
 * typo never hides the rest of the document. Errors are phrased for engineers.
 */
final class LineRecovery extends DefaultErrorStrategy {
    /** Where the errors go; told which of them a `*` before the offending token would mend. */
    private final SyntaxErrors errors;

    LineRecovery(SyntaxErrors errors) {
        this.errors = errors;
    }

    @Override
    public void recover(Parser parser, RecognitionException e) {
        skipToEndOfLine(parser);
    }

    private static void skipToEndOfLine(Parser parser) {
        TokenStream in = parser.getInputStream();
        while (in.LA(1) != PlumbLexer.NEWLINE && in.LA(1) != Token.EOF) parser.consume();
    }

    /** Only between statements: skip a line that cannot start a statement, with one error. */
    @Override
    public void sync(Parser parser) {
        if (!(parser.getContext() instanceof PlumbParser.DocumentContext)) return;
        int la = parser.getInputStream().LA(1);
        if (la == Token.EOF || la == PlumbLexer.NEWLINE || parser.getExpectedTokens().contains(la)) return;
        if (!inErrorRecoveryMode(parser)) {
            beginErrorCondition(parser);
            Token t = parser.getCurrentToken();
            parser.notifyErrorListeners(t, startMessage(t), null);
        }
        skipToEndOfLine(parser);
    }

    private static String startMessage(Token t) {
        if (t.getType() == PlumbLexer.UNTERMINATED_STRING) return unterminated();
        if (t.getType() == PlumbLexer.ERROR_CHAR) return unexpectedCharacter(t);
        return "a statement cannot start with " + TokenWords.describe(t)
            + ": write `name = value`, `input name = value`, `check …`, `section \"…\"` or a '#' comment";
    }

    @Override
    protected Token singleTokenDeletion(Parser parser) {
        if (parser.getInputStream().LA(1) == PlumbLexer.NEWLINE) return null;
        return super.singleTokenDeletion(parser);
    }

    /** Never conjure a line break: the rest of this line would be read as a new statement. */
    @Override
    protected boolean singleTokenInsertion(Parser parser) {
        if (getExpectedTokens(parser).contains(PlumbLexer.NEWLINE)) return false;
        return super.singleTokenInsertion(parser);
    }

    @Override
    protected void reportNoViableAlternative(Parser parser, NoViableAltException e) {
        report(parser, e.getOffendingToken(), e.getExpectedTokens());
    }

    @Override
    protected void reportInputMismatch(Parser parser, InputMismatchException e) {
        report(parser, e.getOffendingToken(), e.getExpectedTokens());
    }

    @Override
    protected void reportUnwantedToken(Parser parser) {
        if (inErrorRecoveryMode(parser)) return;
        beginErrorCondition(parser);
        report(parser, parser.getCurrentToken(), getExpectedTokens(parser));
    }

    @Override
    protected void reportMissingToken(Parser parser) {
        if (inErrorRecoveryMode(parser)) return;
        beginErrorCondition(parser);
        report(parser, parser.getCurrentToken(), getExpectedTokens(parser));
    }

    private void report(Parser parser, Token offending, org.antlr.v4.runtime.misc.IntervalSet expected) {
        String message = message(parser, offending, expected);
        // Two operands side by side: the repair is the missing `*`, handed on as data, not in words.
        if (message.startsWith(MISSING_OPERATOR)) errors.insertBeforeNext("Insert '*'", "* ");
        parser.notifyErrorListeners(offending, message, null);
    }

    private static final String MISSING_OPERATOR = "missing operator between ";

    private static String message(Parser parser, Token t, org.antlr.v4.runtime.misc.IntervalSet expected) {
        if (t.getType() == PlumbLexer.UNTERMINATED_STRING) return unterminated();
        Token previous = parser.getInputStream().LT(-1);
        if (".".equals(t.getText()) && previous != null
            && previous.getType() == PlumbLexer.UNIT) {
            return "unexpected '.' after the unit '" + previous.getText() + "': units multiply with '*' or '·' (write `"
                + previous.getText() + "*m`, not `" + previous.getText() + ".m`)";
        }
        if (t.getType() == PlumbLexer.ERROR_CHAR) return unexpectedCharacter(t);
        if (t.getType() == PlumbLexer.UNIT && parser.getInputStream().LT(2) != null
            && parser.getInputStream().LT(2).getType() == PlumbLexer.STEPS) {
            return "a sweep's steps are even (`in 7 steps`) or even in the logarithm (`in 7 log steps`); '" + t.getText()
                + "' is neither";
        }
        if (t.getType() == PlumbLexer.PLUSMINUS) {
            return "a tolerance (±) goes only after an input's value, once: write `input NAME = VALUE ± AMOUNT`; a "
                + "computed value gets its ± from the inputs it uses";
        }
        if (previous != null && previous.getType() == PlumbLexer.UNIT && TokenWords.isNameToken(t.getType())) {
            return "a unit has no spaces inside: write `" + previous.getText() + "*" + t.getText()
                + "` for a compound unit, or `" + previous.getText() + " * " + t.getText() + "` to multiply by a value named "
                + t.getText();
        }
        if (previous != null && endsOperand(previous) && startsOperand(t)) {
            return MISSING_OPERATOR + "'" + previous.getText() + "' and '" + t.getText()
                + "': write `" + previous.getText() + " * " + t.getText() + "` to multiply";
        }
        if (t.getType() == PlumbLexer.NUMBER && previous != null && previous.getType() == PlumbLexer.NUMBER) {
            return "two numbers in a row: join them with an operator";
        }
        String wanted = TokenWords.expected(expected);
        String found = TokenWords.describe(t);
        return wanted.isEmpty() ? "unexpected " + found : "expected " + wanted + " but found " + found;
    }

    private static String unterminated() {
        return "this text is not closed: add a closing '\"' before the end of the line";
    }

    private static String unexpectedCharacter(Token t) {
        String text = t.getText();
        String hint = switch (text) {
            case ";" -> ": statements end at the end of the line, remove the ';'";
            case "'" -> ": quoted text goes in double quotes \"…\"";
            case "[", "]", "{", "}" -> ": group with round brackets ( )";
            case "." -> ": numbers are written like 0.5 or .5; ranges use '..'";
            case "²", "³", "¹", "⁻" -> ": a value's power is written with '^', e.g. `d^2` (superscripts belong to units only, `m²`)";
            default -> ": remove it or put it inside a \"quoted text\" or a '#' comment";
        };
        return "unexpected character " + TokenWords.character(text) + hint;
    }

    private static boolean endsOperand(Token t) {
        int type = t.getType();
        return type == PlumbLexer.NUMBER || type == PlumbLexer.UNIT || type == PlumbLexer.RPAREN
            || TokenWords.isNameToken(type);
    }

    private static boolean startsOperand(Token t) {
        int type = t.getType();
        return type == PlumbLexer.NUMBER || type == PlumbLexer.LPAREN || TokenWords.isNameToken(type);
    }
}
