package dev.plumb.units;

import java.util.List;

/**
 * Reads a unit expression such as {@code J/(kg·K)}, {@code m/s^2} or {@code kg/m³} into a
 * {@link Unit}. Hand-written so that division chains left to right ({@code J/kg/K} is
 * J/(kg·K)) and temperatures inside a compound are differences.
 *
 * <pre>
 * unit        = product ;
 * product     = power , { operator , power } ;
 * operator    = "*" | "·" | "⋅" | "/" ;                  (* left-associative *)
 * power       = primary , [ exponent ] ;
 * primary     = atom | "1" | "(" , product , ")" ;
 * exponent    = "^" , integer
 *             | "^" , "(" , integer , ")"
 *             | [ "⁻" ] , superdigit , { superdigit } ;
 * integer     = [ "-" | "−" | "+" ] , digit , { digit } ;
 * atom        = "%" | [ "°" ] , letter , { letter } | "°" ;  (* a spelling in the atom table *)
 * </pre>
 *
 * Blanks may stand between tokens. Only a lone atom that is a temperature ("°C", "K", "°F")
 * is an absolute temperature; anywhere else a temperature atom is a difference, factor only.
 * Input is never trusted: every problem comes back as a {@link UnitResult.Error} with the
 * offending range, never as an exception.
 */
final class UnitExpressionParser {

    /** Larger exponents are typing mistakes, and bounding them keeps the arithmetic exact. */
    static final int MAX_EXPONENT = 99;
    /** Bounds the recursion on nested parentheses. */
    private static final int MAX_DEPTH = 32;

    /** A sub-expression evaluated so far. */
    private record Value(double factor, Dimension dimension, String text, AtomUnit loneAtom) {
    }

    /** Carries an error out of the recursion; never escapes this class. */
    private static final class Failure extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final transient UnitResult.Error error;

        Failure(UnitResult.Error error) {
            super(error.message(), null, false, false);
            this.error = error;
        }
    }

    private final String text;
    private final AtomTable atoms;
    private final UnitSuggestions suggestions;
    private int pos;
    private int depth;

    private UnitExpressionParser(String text, AtomTable atoms, UnitSuggestions suggestions) {
        this.text = text;
        this.atoms = atoms;
        this.suggestions = suggestions;
    }

    static UnitResult parse(String text, AtomTable atoms, UnitSuggestions suggestions) {
        try {
            return new UnitExpressionParser(text, atoms, suggestions).unit();
        } catch (Failure f) {
            return f.error;
        }
    }

    private UnitResult unit() {
        skipBlanks();
        if (atEnd()) {
            throw fail("empty unit", 0, text.length());
        }
        Value v = product();
        if (!atEnd()) {
            throw text.charAt(pos) == ')'
                    ? fail("unmatched ')'", pos, 1)
                    : unexpected();
        }
        return new UnitResult.Ok(toUnit(v));
    }

    private Unit toUnit(Value v) {
        String symbol = stripOuterParentheses(v.text());
        if (symbol.equals("1")) {
            symbol = "";
        }
        AtomUnit lone = v.loneAtom();
        if (lone != null && lone.isTemperature()) {
            return new Unit(symbol, lone.factor(), lone.offset(), lone.dimension(), true);
        }
        return new Unit(symbol, v.factor(), 0, v.dimension(), false);
    }

    private Value product() {
        int start = pos;
        Value left = power();
        while (true) {
            skipBlanks();
            if (atEnd()) {
                return left;
            }
            char c = text.charAt(pos);
            if (isOperator(c)) {
                int operatorAt = pos++;
                skipBlanks();
                if (atEnd()) {
                    throw fail("expected a unit after '" + c + "'", operatorAt, 1);
                }
                if (!startsPrimary(text.charAt(pos))) {
                    throw fail("expected a unit after '" + c + "'", pos, codePointLength());
                }
                Value right = power();
                left = c == '/' ? divide(left, right) : times(left, right);
                checkRange(left, start);
            } else if (startsPrimary(c)) {
                throw fail("missing '·' or '/' between units", pos, 1);
            } else {
                return left;
            }
        }
    }

    private Value power() {
        int start = pos;
        Value base = primary();
        int save = pos;
        skipBlanks();
        if (!atEnd() && text.charAt(pos) == '^') {
            int caret = pos++;
            return checkRange(pow(base, caretExponent(caret)), start);
        }
        pos = save;
        if (!atEnd() && (text.charAt(pos) == Superscripts.MINUS
                || Superscripts.isDigit(text.charAt(pos)))) {
            return checkRange(pow(base, superscriptExponent()), start);
        }
        return base;
    }

    private Value primary() {
        char c = text.charAt(pos);
        if (c == '(') {
            return parenthesised();
        }
        if (isAtomStart(c)) {
            return atom();
        }
        if (isAsciiDigit(c)) {
            return one();
        }
        throw unexpected();
    }

    private Value parenthesised() {
        int open = pos++;
        if (++depth > MAX_DEPTH) {
            throw fail("parentheses nested too deeply", open, 1);
        }
        skipBlanks();
        if (atEnd()) {
            throw fail("missing ')' for this '('", open, 1);
        }
        if (text.charAt(pos) == ')') {
            throw fail("empty parentheses", open, pos - open + 1);
        }
        if (!startsPrimary(text.charAt(pos))) {
            throw unexpected();
        }
        Value inner = product();
        if (atEnd()) {
            throw fail("missing ')' for this '('", open, 1);
        }
        if (text.charAt(pos) != ')') {
            throw unexpected();
        }
        pos++;
        depth--;
        return new Value(inner.factor(), inner.dimension(), "(" + inner.text() + ")",
                inner.loneAtom());
    }

    private Value atom() {
        int start = pos;
        if (text.charAt(pos) == '%') {
            pos++;
        } else {
            if (text.charAt(pos) == '°') {
                pos++;
            }
            while (!atEnd() && Character.isLetter(text.charAt(pos))) {
                pos++;
            }
            // A water column names the molecule: "inH2O". A 2 after a capital H belongs to the
            // atom, with what follows it ("inH20" is then an unknown unit near inH2O).
            if (pos > start && text.charAt(pos - 1) == 'H'
                    && (text.startsWith("2O", pos) || text.startsWith("20", pos))) {
                pos += 2;
                while (!atEnd() && Character.isLetterOrDigit(text.charAt(pos))) {
                    pos++;
                }
            }
        }
        String spelling = text.substring(start, pos);
        if (!atEnd() && isAsciiDigit(text.charAt(pos))) {
            int digits = pos;
            while (!atEnd() && isAsciiDigit(text.charAt(pos))) {
                pos++;
            }
            String exponent = text.substring(digits, pos);
            throw fail("write the exponent with '^', as in " + spelling + "^" + exponent,
                    digits, pos - digits);
        }
        AtomUnit unit = atoms.find(spelling);
        if (unit == null) {
            String refusal = GaugePressures.refusal(spelling);
            if (refusal != null) {
                throw fail(refusal, start, pos - start);
            }
            throw new Failure(new UnitResult.Error("unknown unit '" + spelling + "'", start,
                    pos - start, suggestions.suggest(spelling, atoms)));
        }
        return new Value(unit.factor(), unit.dimension(), unit.symbol(), unit);
    }

    /** The number 1, as in "1/s"; any other number is an error. */
    private Value one() {
        int start = pos;
        while (!atEnd() && (isAsciiDigit(text.charAt(pos)) || text.charAt(pos) == '.')) {
            pos++;
        }
        if (!text.substring(start, pos).equals("1")) {
            throw fail("the only number allowed in a unit is 1, as in 1/s", start, pos - start);
        }
        return new Value(1, Dimension.NONE, "1", null);
    }

    private int caretExponent(int caret) {
        skipBlanks();
        boolean parenthesised = !atEnd() && text.charAt(pos) == '(';
        int open = pos;
        if (parenthesised) {
            pos++;
            skipBlanks();
        }
        int n = signedInteger(caret);
        if (parenthesised) {
            skipBlanks();
            if (atEnd() || text.charAt(pos) != ')') {
                throw fail("missing ')' for this '('", open, 1);
            }
            pos++;
        }
        return n;
    }

    private int signedInteger(int caret) {
        int start = pos;
        int sign = 1;
        if (!atEnd() && "-−+".indexOf(text.charAt(pos)) >= 0) {
            sign = text.charAt(pos) == '+' ? 1 : -1;
            pos++;
        }
        int digits = pos;
        while (!atEnd() && isAsciiDigit(text.charAt(pos))) {
            pos++;
        }
        if (pos == digits) {
            int at = atEnd() ? caret : pos;
            throw fail("expected a whole-number exponent after '^'", at, 1);
        }
        return sign * boundedExponent(text.substring(digits, pos), start);
    }

    private int superscriptExponent() {
        int start = pos;
        int sign = 1;
        if (text.charAt(pos) == Superscripts.MINUS) {
            sign = -1;
            pos++;
        }
        StringBuilder digits = new StringBuilder();
        while (!atEnd() && Superscripts.isDigit(text.charAt(pos))) {
            digits.append(Superscripts.digitValue(text.charAt(pos++)));
        }
        if (digits.length() == 0) {
            throw fail("expected a superscript digit after '⁻'", start, 1);
        }
        return sign * boundedExponent(digits.toString(), start);
    }

    private int boundedExponent(String digits, int start) {
        if (digits.length() > 2) {
            throw fail("exponent too large (at most " + MAX_EXPONENT + ")", start, pos - start);
        }
        return Integer.parseInt(digits);
    }

    private static Value times(Value a, Value b) {
        return new Value(a.factor() * b.factor(), a.dimension().times(b.dimension()),
                a.text() + "·" + b.text(), null);
    }

    private static Value divide(Value a, Value b) {
        return new Value(a.factor() / b.factor(), a.dimension().divide(b.dimension()),
                a.text() + "/" + b.text(), null);
    }

    private static Value pow(Value base, int n) {
        String text = n == 1 ? base.text() : base.text() + Superscripts.of(n);
        return new Value(Math.pow(base.factor(), n), base.dimension().pow(n), text, null);
    }

    /** Rejects results whose exponents or factor leave the range a double handles exactly. */
    private Value checkRange(Value v, int start) {
        for (int i = 0; i < Dimension.BASE_COUNT; i++) {
            if (Math.abs(v.dimension().exponent(i)) > MAX_EXPONENT) {
                throw fail("exponent too large (at most " + MAX_EXPONENT + ")", start,
                        pos - start);
            }
        }
        if (!Double.isFinite(v.factor()) || v.factor() == 0) {
            throw fail("unit too large or too small to compute with", start, pos - start);
        }
        return v;
    }

    private static String stripOuterParentheses(String s) {
        while (s.startsWith("(") && s.endsWith(")") && closesAtEnd(s)) {
            s = s.substring(1, s.length() - 1);
        }
        return s;
    }

    /** True when the '(' at index 0 is closed by the last character. */
    private static boolean closesAtEnd(String s) {
        int level = 0;
        for (int i = 0; i < s.length(); i++) {
            level += s.charAt(i) == '(' ? 1 : s.charAt(i) == ')' ? -1 : 0;
            if (level == 0) {
                return i == s.length() - 1;
            }
        }
        return false;
    }

    private Failure unexpected() {
        int length = codePointLength();
        return fail("unexpected '" + text.substring(pos, pos + length) + "' in unit", pos,
                length);
    }

    /** UTF-16 length of the character at pos, so a range never splits a surrogate pair. */
    private int codePointLength() {
        return Character.charCount(text.codePointAt(pos));
    }

    private static Failure fail(String message, int offset, int length) {
        return new Failure(new UnitResult.Error(message, offset, length, List.of()));
    }

    private void skipBlanks() {
        while (!atEnd() && Character.isWhitespace(text.charAt(pos))) {
            pos++;
        }
    }

    private boolean atEnd() {
        return pos >= text.length();
    }

    private static boolean isOperator(char c) {
        return c == '*' || c == '·' || c == '⋅' || c == '/';
    }

    private static boolean startsPrimary(char c) {
        return c == '(' || isAtomStart(c) || isAsciiDigit(c);
    }

    private static boolean isAtomStart(char c) {
        return Character.isLetter(c) || c == '°' || c == '%';
    }

    private static boolean isAsciiDigit(char c) {
        return c >= '0' && c <= '9';
    }
}
