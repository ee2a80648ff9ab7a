package dev.plumb.syntax;

import dev.plumb.grammar.PlumbLexer;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.misc.IntervalSet;

/** How syntax messages name tokens: in the words an engineer uses, not ANTLR's. */
final class TokenWords {
    private TokenWords() {
    }

    static String describe(Token t) {
        String text = t.getText() == null ? "" : t.getText();
        return switch (t.getType()) {
            case Token.EOF -> "the end of the file";
            case PlumbLexer.NEWLINE -> "the end of the line";
            case PlumbLexer.STRING, PlumbLexer.UNTERMINATED_STRING -> "the text " + shorten(text);
            case PlumbLexer.NUMBER -> "the number " + text;
            case PlumbLexer.UNIT -> "the unit '" + text + "'";
            case PlumbLexer.IDENT -> "the name '" + text + "'";
            case PlumbLexer.NARRATIVE -> "a comment";
            case PlumbLexer.ERROR_CHAR -> "the character " + character(text);
            default -> "'" + text + "'";
        };
    }

    static String character(String text) {
        int cp = text.isEmpty() ? 0 : text.codePointAt(0);
        String shown = Character.isISOControl(cp) || Character.isWhitespace(cp) ? "" : "'" + text + "' ";
        return shown + String.format("(U+%04X)", cp);
    }

    private static String shorten(String text) {
        return text.length() > 24 ? text.substring(0, 21) + "…" : text;
    }

    /** A readable list of what the parser would have accepted. */
    static String expected(IntervalSet set) {
        if (set == null || set.isNil()) return "";
        List<Integer> types = set.toList();
        Set<String> words = new LinkedHashSet<>();
        boolean value = types.contains(PlumbLexer.NUMBER) && types.contains(PlumbLexer.IDENT);
        if (value) words.add("a value, a name or '('");
        for (int type : types) {
            if (value && (type == PlumbLexer.NUMBER || type == PlumbLexer.LPAREN || type == PlumbLexer.MINUS
                || type == PlumbLexer.PLUS || isNameToken(type))) continue;
            String w = word(type);
            if (w != null) words.add(w);
        }
        List<String> list = new ArrayList<>(words);
        if (list.size() > 5) list = list.subList(0, 5);
        return String.join(" or ", list);
    }

    static boolean isNameToken(int type) {
        return type == PlumbLexer.IDENT || (type >= PlumbLexer.TITLE && type <= PlumbLexer.INTERPOLATE);
    }

    private static String word(int type) {
        return switch (type) {
            case Token.EOF -> "the end of the file";
            case PlumbLexer.NEWLINE -> "the end of the line";
            case PlumbLexer.STRING -> "a quoted text";
            case PlumbLexer.NUMBER -> "a number";
            case PlumbLexer.UNIT -> "a unit";
            case PlumbLexer.IDENT -> "a name";
            case PlumbLexer.ASSIGN -> "'='";
            case PlumbLexer.LPAREN -> "'('";
            case PlumbLexer.RPAREN -> "')'";
            case PlumbLexer.COMMA -> "','";
            case PlumbLexer.LT, PlumbLexer.LE, PlumbLexer.GT, PlumbLexer.GE, PlumbLexer.EQ, PlumbLexer.NE ->
                "a comparison ('<', '<=', '>', '>=', '==', '!=')";
            case PlumbLexer.PLUS, PlumbLexer.MINUS, PlumbLexer.STAR, PlumbLexer.SLASH, PlumbLexer.CARET ->
                "an operator";
            case PlumbLexer.IN -> "'in UNIT'";
            case PlumbLexer.AS -> "'as BASIS'";
            default -> {
                String literal = PlumbLexer.VOCABULARY.getLiteralName(type);
                yield literal == null ? null : literal;
            }
        };
    }
}
