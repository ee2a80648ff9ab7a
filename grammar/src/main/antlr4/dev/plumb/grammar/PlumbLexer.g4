/*
 * Tokens of the Plumb calc language.
 *
 * Two things need more than plain rules:
 *  - A unit follows a number with no spaces inside the unit ("2 m", "1.2 kg/m^3", "15 °C").
 *    After a NUMBER (and after the keyword `in`) the lexer looks ahead; when a unit starts
 *    there it enters UNIT_MODE, which takes the whole unit text as one UNIT token. The exact
 *    end of the unit (balanced parentheses, `^-1`, superscripts) is found by scanUnit().
 *  - Line structure (statement continuation, narrative vs. trailing comments) is decided
 *    after lexing, by the engine's token filter: COMMENT tokens become NARRATIVE when they
 *    start a statement line, and NEWLINEs followed by a deeper-indented line are hidden.
 */
lexer grammar PlumbLexer;

tokens { NARRATIVE }

@members {
    /** Absolute char index just past the unit that UNIT_MODE must take. */
    private int unitEnd = -1;

    /**
     * Words that end an expression; after a number they are keywords, not units. `so`, `within`
     * and `guess` belong to the solve statement's former spelling, still read so that its error
     * can show the new one; `over`, `rates`, `until`, `every` and `draw` are the motion statement's;
     * `by`, `steps`, `log` and `show` belong to a sweep's head (`sweep V over 10 .. 40 by 5`,
     * `in 7 log steps`), `with` to a check held with its spread.
     */
    private static final java.util.Set<String> CLAUSE_WORDS =
        java.util.Set.of("in", "as", "when", "otherwise", "where", "so", "within", "guess", "over", "rates", "until",
            "every", "draw", "by", "steps", "log", "show", "with");

    /** The words of a sweep's head, never units: `in 7 log steps`. */
    private static final java.util.Set<String> SWEEP_WORDS = java.util.Set.of("by", "steps", "log", "show");

    /**
     * Where the current line stands in a solve statement's head `seek NAME in`: 0 elsewhere, 1
     * after `seek` as the line's first token, 2 after the name that follows it. At 2, `in` starts
     * the search range (`seek V in V_lo .. V_hi`), not a unit. A comma after the name goes back to
     * 1: another unknown follows (`seek U, a in …`).
     */
    private int seekHead = 0;
    /** Whether no token but blanks and comments has been read on the current line yet. */
    private boolean lineStart = true;
    /** Whether the current statement is an `input`: there `+-` is a tolerance (`31 m/s +- 2 m/s`), not `+ -`. */
    private boolean inputLine = false;

    @Override
    public Token nextToken() {
        Token t = super.nextToken();
        int type = t.getType();
        if (type == NEWLINE) {
            // An indented line may continue the statement: the head carries on across it.
            boolean continues = t.getText().endsWith(" ") || t.getText().endsWith("\t");
            if (!continues) {
                seekHead = 0;
                inputLine = false;
            }
            lineStart = true;
        } else if (t.getChannel() == Token.DEFAULT_CHANNEL && type != COMMENT) {
            if (type == INPUT && lineStart) inputLine = true;
            if (type == SEEK && lineStart) seekHead = 1;
            else if (seekHead == 1 && (type == IDENT || type >= TITLE && type <= INTERPOLATE)) seekHead = 2;
            else if (seekHead == 2 && type == COMMA) seekHead = 1;   // `seek U, a in …`: another unknown
            else seekHead = 0;
            lineStart = false;
        }
        return t;
    }

    private static boolean isUnitStart(int c) {
        return Character.isLetter(c) || c == '°' || c == '%';
    }

    private static boolean isSuperscript(int c) {
        return c == '²' || c == '³' || c == '¹' || c == '⁰' || (c >= '⁴' && c <= '⁹') || c == '⁻';
    }

    private static boolean isUnitChar(int c) {
        return isUnitStart(c) || Character.isDigit(c) || isSuperscript(c)
            || c == '^' || c == '*' || c == '/' || c == '·' || c == '⋅' || c == '_';
    }

    /** Returns the LA offset just past the unit that starts at LA offset {@code i}. */
    private int scanUnit(int i) {
        int depth = 0;
        while (true) {
            int c = _input.LA(i);
            if (c == '(') { depth++; i++; continue; }
            if (c == ')') { if (depth == 0) return i; depth--; i++; continue; }
            if (c == '-' && (_input.LA(i - 1) == '^' || (_input.LA(i - 1) == '(' && _input.LA(i - 2) == '^'))) { i++; continue; }
            if (isUnitChar(c)) { i++; continue; }
            return i;
        }
    }

    /** The word (letters only) starting at LA offset i. */
    private String wordAt(int i) {
        StringBuilder b = new StringBuilder();
        while (Character.isLetter(_input.LA(i)) && b.length() < 12) { b.appendCodePoint(_input.LA(i)); i++; }
        return b.toString();
    }

    private int skipBlanks(int i) {
        while (_input.LA(i) == ' ' || _input.LA(i) == '\t') i++;
        return i;
    }

    /** After a number: enter UNIT_MODE when a unit follows (not a clause keyword such as `in mm`). */
    private void unitAfterNumber() {
        int i = skipBlanks(1);
        if (!isUnitStart(_input.LA(i))) return;
        String word = wordAt(i);
        if (CLAUSE_WORDS.contains(word)) {
            int after = i + word.length();
            int next = _input.LA(after);
            boolean standsAlone = !isUnitChar(next) && next != '(';
            if (standsAlone) {
                // `5 in in mm`: the first `in` is inches, the second the keyword.
                if (CLAUSE_WORDS.contains(wordAt(skipBlanks(after))) && !SWEEP_WORDS.contains(word)) standsAlone = false;
            }
            if (standsAlone) {
                // `40 in 7 steps`: inches are never followed by a number, so `in` is the keyword there.
                int following = _input.LA(skipBlanks(after));
                boolean keyword = !word.equals("in") && !word.equals("as")
                    || isUnitStart(following) && skipBlanks(after) > after
                    || word.equals("in") && following >= '0' && following <= '9';
                if (keyword) return;
            }
        }
        unitEnd = _input.index() + scanUnit(i) - 1;
        pushMode(UNIT_MODE);
    }

    /** After the keyword `in` (a display unit or a table column's unit) or a '[' (the old column form): a unit follows. */
    private void unitAfterKeyword() {
        int i = skipBlanks(1);
        boolean reciprocal = _input.LA(i) == '1' && _input.LA(i + 1) == '/';   // `in 1/s`
        boolean needsGap = getText().equals("in");
        if (needsGap && seekHead == 2) return;   // `seek V in LOW .. HIGH`: a value follows
        if ((needsGap && i == 1) || !(isUnitStart(_input.LA(i)) || reciprocal)) return;
        unitEnd = _input.index() + scanUnit(i) - 1;
        pushMode(UNIT_MODE);
    }

    /** Takes the rest of the unit found by scanUnit() into the current UNIT token. */
    private void takeUnit() {
        while (_input.index() < unitEnd) getInterpreter().consume(_input);
        popMode();
    }
}

TITLE       : 'title';
AUTHOR      : 'author';
REVIEWER    : 'reviewer';
REVISION    : 'revision';
SECTION     : 'section';
INPUT       : 'input';
CHECK       : 'check';
USE         : 'use';
SEEK        : 'seek';
FROM        : 'from';
WHERE       : 'where';
FIND        : 'find';
WITHIN      : 'within';
GUESS       : 'guess';
SO          : 'so';
THAT        : 'that';
CORRELATION : 'correlation';
TABLE       : 'table';
END         : 'end';
WHEN        : 'when';
OTHERWISE   : 'otherwise';
SOURCE      : 'source';
FAMILY      : 'family';
BASIS       : 'basis';
VALID       : 'valid';
REGIME      : 'regime';
ACCURACY    : 'accuracy';
DOMAIN      : 'domain';
ACCEPT      : 'accept';
AT          : 'at';
TRANSITION  : 'transition';
EVOLVE      : 'evolve';
OVER        : 'over';
RATES       : 'rates';
UNTIL       : 'until';
EVERY       : 'every';
DRAW        : 'draw';
SWEEP       : 'sweep';
BY          : 'by';
STEPS       : 'steps';
SHOW        : 'show';
CASE        : 'case';
WITH        : 'with';
SPREAD      : 'spread';
INTERPOLATE : 'interpolate';
IN          : 'in' { unitAfterKeyword(); };
AS          : 'as';

NUMBER : ( DIGITS ('.' DIGITS)? | '.' DIGITS ) EXPONENT? { unitAfterNumber(); };

IDENT  : [\p{L}_] [\p{L}\p{Nd}_]*;

STRING              : '"' ( '\\' ~[\r\n] | ~["\\\r\n] )* '"';
UNTERMINATED_STRING : '"' ( '\\' ~[\r\n] | ~["\\\r\n] )*;

PLUSMINUS : '±' | '+-' {inputLine}?;
PLUS    : '+';
MINUS   : '-' | '−';
STAR    : '*' | '·' | '×' | '⋅';
SLASH   : '/';
CARET   : '^';
LPAREN  : '(';
RPAREN  : ')';
LBRACK  : '[' { unitAfterKeyword(); };
RBRACK  : ']';
COMMA   : ',';
COLON   : ':';
DOTDOT  : '..';
DOT     : '.';
LE      : '<=' | '≤';
GE      : '>=' | '≥';
NE      : '!=' | '≠';
EQ      : '==';
LT      : '<';
GT      : '>';
ASSIGN  : '=';

COMMENT : '#' ~[\r\n]*;
NEWLINE : ( '\r'? '\n' | '\r' ) [ \t]*;
WS      : [ \t]+ -> channel(HIDDEN);
BOM     : '\uFEFF' -> channel(HIDDEN);

/** Anything else: the parser reports it with a clear message. */
ERROR_CHAR : .;

fragment DIGITS   : [0-9]+;
fragment EXPONENT : [eE] [+\-]? DIGITS;

mode UNIT_MODE;
UNIT_GAP : [ \t]+ -> channel(HIDDEN);
UNIT     : . { takeUnit(); };
