package dev.plumb.ide;

import dev.plumb.present.ValueText;
import dev.plumb.present.CheckText;
import dev.plumb.diagnostics.Printable;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Span;
import java.util.ArrayList;
import java.util.List;

/** The document's outline: sections, each with the definitions, functions and checks under it. */
public final class Outline {
    private Outline() {
    }

    public static List<Symbol> of(Analysis a) {
        List<Symbol> top = new ArrayList<>();
        String section = null;
        Span sectionSpan = null;
        Span heading = null;
        List<Symbol> inSection = new ArrayList<>();
        for (Row r : a.rows()) {
            if (r instanceof Row.SectionRow s) {
                if (section != null) top.add(section(section, sectionSpan, heading, inSection));
                section = s.title();
                sectionSpan = s.span();
                heading = s.span();
                inSection = new ArrayList<>();
                continue;
            }
            Symbol sym = symbol(a, r);
            if (sym == null) continue;
            if (section != null) {
                inSection.add(sym);
                sectionSpan = Span.cover(sectionSpan, r.span());
            } else {
                top.add(sym);
            }
        }
        if (section != null) top.add(section(section, sectionSpan, heading, inSection));
        return top;
    }

    private static Symbol section(String title, Span span, Span heading, List<Symbol> children) {
        return new Symbol(Printable.line(title), Symbol.Kind.SECTION, "", span, heading, children);
    }

    private static Symbol symbol(Analysis a, Row r) {
        if (r instanceof Row.ValueRow v) {
            return new Symbol(v.name(), v.input() ? Symbol.Kind.INPUT : Symbol.Kind.VALUE, ValueText.of(a, v), v.span(), nameSpan(a, v.name(), v.span()),
                List.of());
        }
        if (r instanceof Row.FunctionRow f) {
            String name = f.signature().substring(0, f.signature().indexOf('('));
            return new Symbol(f.signature(), Symbol.Kind.valueOf(f.kind().name()), f.note() == null ? "" : Printable.line(f.note()),
                f.span(), nameSpan(a, name, f.span()),
                List.of());
        }
        if (r instanceof Row.CheckRow c) {
            String mark = CheckText.mark(c);
            return new Symbol(Printable.line("check " + c.source()), Symbol.Kind.CHECK, mark, c.span(), c.span(), List.of());
        }
        return null;
    }

    /** The span of the name where it is defined in this file, else the row's start. */
    private static Span nameSpan(Analysis a, String name, Span row) {
        Binding b = a.scope().lookup(name);
        if (b != null && a.file().equals(b.file()) && b.span().start() >= row.start() && b.span().end() <= row.end()) {
            return b.span();
        }
        return new Span(row.start(), row.start());
    }
}
