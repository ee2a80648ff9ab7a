package dev.plumb.syntax;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import dev.plumb.grammar.PlumbLexer;
import java.util.ArrayList;
import java.util.List;
import org.antlr.v4.runtime.CommonToken;
import org.antlr.v4.runtime.Token;

/**
 * Decides the line structure of a document on the token list, before parsing:
 * <ul>
 *   <li>a line indented more deeply than the line that started the statement continues it
 *       (its NEWLINE is hidden); inside a {@code correlation} or {@code table} block the inner
 *       lines are statements of their own, and only lines deeper than them continue;</li>
 *   <li>a '#' comment that starts a statement line is NARRATIVE; after a statement it is a
 *       code comment (hidden);</li>
 *   <li>a statement nested too deeply or too long for the parser is dropped with a clear
 *       error, so the parser never recurses without bound.</li>
 * </ul>
 */
final class StatementTokens {
    /** Deeper parentheses than this are an error; calcs never need a tenth of it. */
    static final int MAX_NESTING = 100;
    /** Longer statements than this are an error; split them into named steps. */
    static final int MAX_TOKENS = 4000;

    /** A statement removed before parsing, with the name it defined when it had one. */
    record Dropped(Span span, Ident name) {
    }

    private final LineMap lines;
    private final List<Diagnostic> diagnostics = new ArrayList<>();
    private final List<Dropped> dropped = new ArrayList<>();
    private final List<Integer> freshStarts = new ArrayList<>();
    private boolean blockOpenAtEnd;

    /** Whether the tokens start the document (else they start at one of its fresh starts). */
    private final boolean documentStart;

    StatementTokens(LineMap lines, boolean documentStart) {
        this.lines = lines;
        this.documentStart = documentStart;
    }

    List<Diagnostic> diagnostics() {
        return diagnostics;
    }

    List<Dropped> dropped() {
        return dropped;
    }

    /**
     * Offsets of lines that start at column 0 (no blank or tab first) outside any block: the
     * reading of the text from there on does not depend on anything before it, so an editor's
     * reparse may start or stop there.
     */
    List<Integer> freshStarts() {
        return freshStarts;
    }

    /** Whether a {@code correlation} or {@code table} block is still open at the end of the text. */
    boolean blockOpenAtEnd() {
        return blockOpenAtEnd;
    }

    List<Token> arrange(List<? extends Token> tokens) {
        List<Token> out = new ArrayList<>(tokens.size());
        boolean inStatement = false;
        boolean narrative = false;
        // Byte-order marks before the first line's blanks are an encoding marker at the start of a
        // document only; a fresh start inside it begins at column 0 by definition.
        int statementIndent = documentStart ? leadingIndent(tokens) : 0;
        int statementStart = 0;
        // Block state: opened by a `correlation NAME(` or `table NAME(` line, closed by `end`.
        boolean inBlock = false;
        int blockIndent = -1;
        for (int i = 0; i < tokens.size(); i++) {
            CommonToken t = (CommonToken) tokens.get(i);
            switch (t.getType()) {
                case PlumbLexer.NEWLINE -> {
                    int indent = indentOf(t.getText());
                    int next = nextType(tokens, i);
                    boolean blankOrEnd = next == PlumbLexer.NEWLINE || next == Token.EOF;
                    // Narrative is prose on one line, and a block's head line never continues:
                    // the indented lines after either start statements of their own.
                    boolean head = inStatement && opensBlock(headTypes(out, statementStart));
                    if (inStatement && !narrative && !head && !blankOrEnd && indent > statementIndent) {
                        t.setChannel(Token.HIDDEN_CHANNEL);
                        out.add(t);
                        continue;
                    }
                    if (inStatement) {
                        finishStatement(out, statementStart);
                        List<Integer> first = headTypes(out, statementStart);
                        if (head) {
                            inBlock = true;
                            blockIndent = -1;
                        } else if (first.size() == 1 && first.get(0) == PlumbLexer.END) {
                            inBlock = false;
                        }
                    }
                    out.add(t);
                    inStatement = false;
                    narrative = false;
                    statementStart = out.size();
                    if (!blankOrEnd) {
                        // Inside a block every line at the inner depth (or shallower) starts a statement.
                        // Comment lines say nothing about the block's depth.
                        if (inBlock && blockIndent < 0 && next != PlumbLexer.COMMENT) blockIndent = indent;
                        statementIndent = inBlock && blockIndent >= 0 ? Math.min(indent, blockIndent) : indent;
                    }
                    // Decided by the text before the line and the line's first character only, so
                    // that an edit later in the line cannot move the cut (blank lines count too).
                    int lineStart = lines.fromCodePoint(t.getStopIndex() + 1);
                    if (indent == 0 && !inBlock && lineStart < lines.length()) freshStarts.add(lineStart);
                }
                case PlumbLexer.COMMENT -> {
                    if (inStatement) {
                        t.setChannel(Token.HIDDEN_CHANNEL);
                    } else {
                        t.setType(PlumbLexer.NARRATIVE);
                        inStatement = true;
                        narrative = true;
                    }
                    out.add(t);
                }
                case Token.EOF -> {
                    blockOpenAtEnd = inBlock;
                    if (inStatement) {
                        finishStatement(out, statementStart);
                        out.add(finalNewline(t));
                    }
                    out.add(t);
                }
                default -> {
                    if (t.getChannel() == Token.DEFAULT_CHANNEL) inStatement = true;
                    out.add(t);
                }
            }
        }
        return out;
    }

    /** The types of a statement's first default-channel tokens (at most three). */
    private static List<Integer> headTypes(List<Token> out, int from) {
        List<Integer> types = new ArrayList<>(3);
        for (int i = from; i < out.size() && types.size() < 3; i++) {
            if (out.get(i).getChannel() == Token.DEFAULT_CHANNEL) types.add(out.get(i).getType());
        }
        return types;
    }

    /** {@code correlation NAME(} or {@code table NAME(}: the keyword used as a keyword. */
    private static boolean opensBlock(List<Integer> head) {
        return head.size() == 3 && (head.get(0) == PlumbLexer.CORRELATION || head.get(0) == PlumbLexer.TABLE)
            && TokenWords.isNameToken(head.get(1)) && head.get(2) == PlumbLexer.LPAREN;
    }

    /** The parser expects every statement to end with a NEWLINE, the last one too. */
    private static Token finalNewline(CommonToken eof) {
        CommonToken newline = new CommonToken(eof);
        newline.setType(PlumbLexer.NEWLINE);
        newline.setText("");
        newline.setChannel(Token.DEFAULT_CHANNEL);
        return newline;
    }

    private static int leadingIndent(List<? extends Token> tokens) {
        for (Token t : tokens) {
            if (t.getType() == PlumbLexer.BOM) continue;
            return t.getType() == PlumbLexer.WS ? t.getText().length() : 0;
        }
        return 0;
    }

    private static int indentOf(String newline) {
        int i = 0;
        while (i < newline.length() && (newline.charAt(i) == '\r' || newline.charAt(i) == '\n')) i++;
        return newline.length() - i;
    }

    private static int nextType(List<? extends Token> tokens, int i) {
        for (int j = i + 1; j < tokens.size(); j++) {
            Token t = tokens.get(j);
            if (t.getChannel() == Token.DEFAULT_CHANNEL || t.getType() == PlumbLexer.COMMENT) return t.getType();
        }
        return Token.EOF;
    }

    /** Checks the statement's size limits; an oversized statement is hidden from the parser. */
    private void finishStatement(List<Token> out, int from) {
        int depth = 0;
        int maxDepth = 0;
        int count = 0;
        int unary = 0;
        Token deepest = null;
        for (int i = from; i < out.size(); i++) {
            Token t = out.get(i);
            if (t.getChannel() != Token.DEFAULT_CHANNEL) continue;
            count++;
            int type = t.getType();
            if (type == PlumbLexer.LPAREN) depth++;
            if (type == PlumbLexer.RPAREN) depth--;
            // A run of signs nests like parentheses in the parser.
            unary = (type == PlumbLexer.MINUS || type == PlumbLexer.PLUS || type == PlumbLexer.CARET) ? unary + 1 : 0;
            if (depth + unary > maxDepth) {
                maxDepth = depth + unary;
                deepest = t;
            }
        }
        if (maxDepth <= MAX_NESTING && count <= MAX_TOKENS) return;
        Token first = firstDefault(out, from);
        int start = lines.fromCodePoint(first.getStartIndex());
        int end = lines.fromCodePoint(out.get(out.size() - 1).getStopIndex() + 1);
        Span span = new Span(start, end);
        String message = maxDepth > MAX_NESTING
            ? "this expression is nested " + maxDepth + " levels deep; Plumb accepts at most " + MAX_NESTING
                + ": give inner parts names of their own"
            : "this statement has " + count + " tokens; Plumb accepts at most " + MAX_TOKENS
                + ": split it into named steps";
        Span at = deepest != null && maxDepth > MAX_NESTING
            ? new Span(lines.fromCodePoint(deepest.getStartIndex()), lines.fromCodePoint(deepest.getStopIndex() + 1))
            : span;
        diagnostics.add(Diagnostic.of(Code.SYNTAX_NESTING, at, message));
        dropped.add(new Dropped(span, definedName(out, from)));
        for (int i = from; i < out.size(); i++) ((CommonToken) out.get(i)).setChannel(Token.HIDDEN_CHANNEL);
    }

    private static Token firstDefault(List<Token> out, int from) {
        for (int i = from; i < out.size(); i++) {
            if (out.get(i).getChannel() == Token.DEFAULT_CHANNEL) return out.get(i);
        }
        return out.get(from);
    }

    /** The name a statement defines, judged from its first tokens ({@code [input] NAME =|(}). */
    private Ident definedName(List<Token> out, int from) {
        List<Token> head = new ArrayList<>(3);
        for (int i = from; i < out.size() && head.size() < 3; i++) {
            if (out.get(i).getChannel() == Token.DEFAULT_CHANNEL) head.add(out.get(i));
        }
        return nameFromHead(head, lines);
    }

    static Ident nameFromHead(List<Token> head, LineMap lines) {
        int first = head.isEmpty() ? -1 : head.get(0).getType();
        int k = first == PlumbLexer.INPUT || first == PlumbLexer.SEEK ? 1 : 0;
        if (head.size() < k + 2) return null;
        Token name = head.get(k);
        int after = head.get(k + 1).getType();
        boolean nameLike = name.getType() == PlumbLexer.IDENT;
        // `seek NAME in|from …`: the name is the unknown being solved for.
        boolean solved = first == PlumbLexer.SEEK && (after == PlumbLexer.IN || after == PlumbLexer.FROM);
        if (!nameLike || (after != PlumbLexer.ASSIGN && after != PlumbLexer.LPAREN && !solved)) return null;
        Span span = new Span(lines.fromCodePoint(name.getStartIndex()), lines.fromCodePoint(name.getStopIndex() + 1));
        return new Ident(name.getText(), span);
    }
}
