/*
 * Statements and expressions of the Plumb calc language (see docs/language.md).
 * The engine's token filter has already turned continuation lines into one line and
 * narrative comments into NARRATIVE tokens, so every statement ends at a NEWLINE.
 */
parser grammar PlumbParser;

options { tokenVocab = PlumbLexer; }

/**
 * The token filter guarantees a NEWLINE before EOF, so each line is decided by one token.
 * Every line is a rule of its own: an error is recovered inside its line and can never end
 * the document early.
 */
document  : line* EOF;
line      : statement? NEWLINE;

statement
    : header
    | narrative
    | section
    | useFile
    | input
    | functionDef
    | definition
    | check
    | seek
    | seekSystem
    | evolve
    | oldSolve
    | accept
    | transition
    | sweep
    | caseDef
    | correlationHead
    | tableHead
    | blockLine
    ;

header      : key=( TITLE | AUTHOR | REVIEWER | REVISION ) STRING;
narrative   : NARRATIVE;
section     : SECTION STRING;
useFile     : USE STRING;
input       : INPUT name ASSIGN expr tolerance? tail;
/** How far an input may lie from its value: `± 2 m/s`, `+- 2 m/s`, `± 10 %` (a percentage of the value). */
tolerance   : PLUSMINUS expr;
definition  : name ASSIGN value tail;
functionDef : name LPAREN ( name ( COMMA name )* )? RPAREN ASSIGN value note?;
/**
 * A formula, or a piecewise one: `a when COND otherwise b`, or, as in correlation blocks, one
 * branch a line (`= a when COND` … `= b otherwise`; the lines after the first are indented, so
 * the token filter has joined them).
 */
value       : expr ( WHEN condition ( ( OTHERWISE | ASSIGN ) expr WHEN condition )*
                     ( OTHERWISE expr | ASSIGN expr OTHERWISE )? )?;
condition   : expr ( comparator expr )+;
/** `with spread`: the check must hold at the sides' bounds (each value moved by its spread the unfavourable way). */
check       : CHECK expr ( comparator expr )+ ( WITH SPREAD )? note?;
seek        : SEEK name ( IN expr DOTDOT expr | FROM expr ) WHERE expr ASSIGN expr tail;
/**
 * Several unknowns at once: `seek U, a from 2 m/s, 10 deg where D = T_x, L = W - T_y`, or a
 * bracket per unknown (`in 1 m/s .. 5 m/s, 0 deg .. 30 deg`). The counts are not fixed here: a
 * mismatch is the engine's finding, worded in the calc's terms. A lone unknown with a lone
 * equation reads as `seek` (listed first), so only the new forms reach this rule.
 */
seekSystem  : SEEK name ( COMMA name )* ( IN bracket ( COMMA bracket )* | FROM expr ( COMMA expr )* )
              WHERE equation ( COMMA equation )* note?;
/**
 * Motion over time: `evolve v, y from 0 m/s, 0 m over t rates a, v until y >= 20 m every 0.5 s`.
 * The states, their start values, the time's name, one rate (time derivative) per state, the stop
 * condition and, optionally, the interval of the trajectory table and the states the report plots. Counts are the engine's finding.
 */
evolve      : EVOLVE name ( COMMA name )* FROM expr ( COMMA expr )* OVER name
              RATES expr ( COMMA expr )* UNTIL expr comparator expr ( EVERY expr )? ( DRAW name ( COMMA name )* )? note?;
bracket     : expr DOTDOT expr;
equation    : expr ASSIGN expr;
/**
 * A reviewer accepts one finding: its code, the value whose statement it is on, and why. The
 * reason is optional here only so that the engine can say clearly that it is missing.
 */
accept      : ACCEPT findingCode AT name note?;
/** Where the boundary layer turns from laminar to turbulent in this calc: `transition Re = 3e5 "why"`. */
transition  : TRANSITION name ASSIGN NUMBER note?;
/**
 * A study that varies one value over a range and tabulates results: `sweep V over 10 m/s .. 40 m/s
 * by 5 m/s show F_D in kN, Re` (the `show` part usually on an indented line); `in 7 steps` gives
 * seven values from end to end, `in 7 log steps` spaces them evenly in the logarithm (the word
 * before `steps` must be `log`, which the engine checks). A second value after a comma,
 * `…, d over 0.1 m .. 0.3 m in 3 steps`, makes a grid: every pair of values.
 */
sweep       : SWEEP axis ( COMMA across=axis )? SHOW shown ( COMMA shown )* note?;
/** One value a sweep varies and its values: `V over 10 m/s .. 40 m/s by 5 m/s`; a second one, after a comma, makes a grid. */
axis        : varied=name OVER expr DOTDOT expr ( BY expr | IN NUMBER spacing=name? STEPS );
shown       : name ( IN UNIT )?;
/** A named variation of the calc: `case storm: V = 45 m/s, T = -10 degC` (right sides see the base values). */
caseDef     : CASE label=name COLON setting ( COMMA setting )* note?;
setting     : name ASSIGN expr;
/** A diagnostic code as written, `range.outside`, `math.division-by-zero`. */
findingCode : name ( DOT name | MINUS name )*;
/** The solve statement's former spelling: read only to say how it is written now. */
oldSolve    : FIND name ( WITHIN expr DOTDOT expr | GUESS expr ) SO THAT expr ASSIGN expr tail;

/*
 * Correlation and table blocks. The parser reads their lines one by one; the engine groups
 * them into blocks, so a missing `end` or a stray line costs only a clear message.
 */
correlationHead : CORRELATION name LPAREN param ( COMMA param )* RPAREN;
tableHead       : TABLE name LPAREN param RPAREN;
param           : id=name ( COLON dim=name )? ( AS role=name )?;

blockLine
    : SOURCE STRING                                         # sourceLine
    | FAMILY name                                           # familyLine
    | BASIS name                                            # basisLine
    | BASIS basis=name flow=name                            # basisFlowLine
    | VALID expr ( comparator expr )+                       # validLine
    | DOMAIN expr ( comparator expr )+                      # domainLine
    | REGIME name                                           # regimeLine
    | ACCURACY expr                                         # accuracyLine
    | INTERPOLATE name                                      # interpolateLine
    | ASSIGN expr ( WHEN expr ( comparator expr )+ | OTHERWISE )?  # pieceLine
    | column column+                                        # columnsLine
    | signedNumber+                                         # rowLine
    | END                                                   # endLine
    ;
/** A column and the unit of its numbers; `T[degC]` is the former spelling, read only to say so. */
column          : name ( IN UNIT | LBRACK UNIT RBRACK )?;
signedNumber    : MINUS? NUMBER;

tail        : ( IN UNIT )? ( AS name )? note?;
note        : STRING;
comparator  : LT | LE | GT | GE | EQ | NE;

expr
    : <assoc=right> expr CARET expr                         # power
    | op=( MINUS | PLUS ) expr                              # unary
    | expr op=( STAR | SLASH ) expr                         # multiplicative
    | expr op=( PLUS | MINUS ) expr                         # additive
    | NUMBER UNIT?                                          # quantity
    | name ( DOT name )? LPAREN ( expr ( COMMA expr )* )? RPAREN   # call
    | name                                                  # reference
    | LPAREN expr RPAREN                                    # parenthesized
    ;

/** Statement keywords are reserved only where a statement starts; elsewhere they are names. */
name
    : IDENT | TITLE | AUTHOR | REVIEWER | REVISION | SECTION | INPUT | CHECK | USE | SEEK | FROM | WHERE | FIND
    | WITHIN | GUESS | SO | THAT | CORRELATION | TABLE | END | WHEN | OTHERWISE
    | SOURCE | FAMILY | BASIS | VALID | REGIME | ACCURACY | INTERPOLATE
    | DOMAIN | ACCEPT | AT | TRANSITION | EVOLVE | OVER | RATES | UNTIL | EVERY | DRAW | SWEEP | BY | STEPS | SHOW
    | CASE | WITH | SPREAD
    ;
