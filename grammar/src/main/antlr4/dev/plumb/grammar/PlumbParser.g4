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
    ;

header      : key=( TITLE | AUTHOR | REVIEWER | REVISION ) STRING;
narrative   : NARRATIVE;
section     : SECTION STRING;
useFile     : USE STRING;
input       : INPUT name ASSIGN expr tail;
definition  : name ASSIGN expr tail;
functionDef : name LPAREN ( name ( COMMA name )* )? RPAREN ASSIGN expr note?;
check       : CHECK expr ( comparator expr )+ note?;

tail        : ( IN UNIT )? ( AS name )? note?;
note        : STRING;
comparator  : LT | LE | GT | GE | EQ | NE;

expr
    : <assoc=right> expr CARET expr                         # power
    | op=( MINUS | PLUS ) expr                              # unary
    | expr op=( STAR | SLASH ) expr                         # multiplicative
    | expr op=( PLUS | MINUS ) expr                         # additive
    | NUMBER UNIT?                                          # quantity
    | name LPAREN ( expr ( COMMA expr )* )? RPAREN          # call
    | name                                                  # reference
    | LPAREN expr RPAREN                                    # parenthesized
    ;

/** Statement keywords are reserved only where a statement starts; elsewhere they are names. */
name
    : IDENT | TITLE | AUTHOR | REVIEWER | REVISION | SECTION | INPUT | CHECK | USE | FIND
    | WITHIN | GUESS | SO | THAT | CORRELATION | TABLE | END | WHEN | OTHERWISE
    ;
