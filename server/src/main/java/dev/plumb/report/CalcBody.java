package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Span;
import dev.plumb.present.CheckText;
import dev.plumb.present.CaseText;
import dev.plumb.present.ValueText;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;

/** The calc's body in its own order: sections, prose, definitions, solved values, functions, checks, cases and sweeps. */
final class CalcBody {
    private CalcBody() {
    }

    static final class Writer {
        private final Analysis a;
        private final ReportValues values;
        private final FormulaMath math;
        private final References references;
        private final StringBuilder out;
        private final List<String> prose = new ArrayList<>();
        /** Inputs written here, listed in place (their sources are in the inputs table). */
        private final List<Row.ValueRow> inputs = new ArrayList<>();
        private boolean inSection;
        /** The statements by their place, to find a check's or function's own statement in one step. */
        private final java.util.Map<Span, Statement> statements = new java.util.HashMap<>();

        private final CalcReport.Changes changes;

        Writer(Analysis a, ReportValues values, FormulaMath math, References references, StringBuilder out,
               CalcReport.Changes changes) {
            this.changes = changes;
            this.a = a;
            this.values = values;
            this.math = math;
            this.references = references;
            this.out = out;
            for (Statement s : a.syntax().statements()) statements.putIfAbsent(s.span(), s);
        }

        void row(Row r) {
            if (r instanceof Row.NarrativeRow n) {
                prose.add(n.text());
                return;
            }
            if (r instanceof Row.ValueRow v && v.input()) {
                inputs.add(v);
                return;
            }
            flush();
            if (r instanceof Row.SectionRow s) {
                if (inSection) out.append("</section>");
                out.append("<section class=\"part\">").append(Html.element("h2", null, Html.text(s.title())));
                inSection = true;
            } else if (r instanceof Row.ValueRow v) {
                out.append(Definitions.html(a, v, values, math, references, ChangesBlock.of(changes, v.name())));
            } else if (r instanceof Row.FunctionRow f) {
                out.append(function(f));
            } else if (r instanceof Row.CheckRow c) {
                out.append(check(c));
            } else if (r instanceof Row.CaseRow k) {
                out.append(variation(k));
            } else if (r instanceof Row.SweepRow w) {
                out.append(SweepPlot.html(w, a.settings().significantFigures()));
            }
        }

        void finish() {
            flush();
            if (inSection) out.append("</section>");
        }

        /** What was held back to be shown together: prose, then a run of inputs. */
        private void flush() {
            out.append(Narrative.html(prose));
            prose.clear();
            if (inputs.isEmpty()) return;
            List<String> each = new ArrayList<>();
            for (Row.ValueRow v : inputs) {
                each.add(math.symbol(v.name()) + " = " + math.inlineQuantity(values.shown(v.value(), v.display()))
                    + Html.text(ValueText.spread(v)) + ChangesBlock.mark(ChangesBlock.of(changes, v.name())));
            }
            out.append(Html.element("p", "inputs-here", "Inputs: " + String.join(" · ", each)));
            inputs.clear();
        }

        private String function(Row.FunctionRow f) {
            Statement s = statements.get(f.span());
            String head = s instanceof Statement.Function fn ? Html.formula(math.function(fn))
                : Html.element("p", "signature", Html.element("code", null, Html.text(f.signature())) + " — "
                    + Html.text(f.kind().word()));
            String note = f.note() == null ? "" : Html.element("p", "note", Html.text(f.note()));
            return Html.element("div", "function", head + note);
        }

        /** A case: what it sets, each value it changes beside the base with the ratio, and its checks. */
        private String variation(Row.CaseRow k) {
            int digits = a.settings().significantFigures();
            StringBuilder rows = new StringBuilder("<tr><th>Value</th><th>Base</th><th>This case</th><th>Ratio</th></tr>");
            for (Row.CaseValue v : k.changed()) {
                rows.append("<tr>").append(Html.element("td", null, Html.text(v.name())))
                    .append(Html.element("td", null, Html.text(ValueText.of(v.base(), v.display(), digits))))
                    .append(Html.element("td", null, Html.text(ValueText.of(v.value(), v.display(), digits))))
                    .append(Html.element("td", null, Html.text(CaseText.ratio(v, digits)))).append("</tr>");
            }
            StringBuilder checks = new StringBuilder();
            for (Row.CheckRow c : k.checks()) {
                String kind = c.verdict() == Row.Verdict.PASSED ? "pass" : c.passed() == Boolean.FALSE ? "fail" : "unjudged";
                checks.append(Html.element("p", "case-check " + kind, Html.text(CheckText.mark(c) + " check " + c.source()
                    + " — " + CheckText.detail(c))));
            }
            return Html.element("div", "case", Html.element("p", "case-title", Html.text(CaseText.title(k, digits)))
                + Html.element("table", "case-table", rows.toString()) + checks);
        }

        private String check(Row.CheckRow c) {
            String kind = c.verdict() == Row.Verdict.PASSED ? "pass" : c.passed() == Boolean.FALSE ? "fail" : "unjudged";
            String words = c.verdict() == Row.Verdict.PASSED ? "passes" : c.verdict() == Row.Verdict.FAILED ? "FAILS"
                : c.verdict() == Row.Verdict.FAILS_AT_BOUND ? "FAILS AT ITS BOUND"
                : "NOT EVALUATED";
            Statement s = statements.get(c.span());
            String comparison = s instanceof Statement.Check check
                ? Html.formula(math.comparison(check.operands(), check.comparators(), ValueSource.none()))
                : Html.element("code", null, Html.text(c.source()));
            String mark = Html.element("span", "mark", Html.text(CheckText.mark(c)) + " Check " + words);
            String detail = Html.element("p", "detail", Html.text(CheckText.detail(c)) + (c.note() == null ? ""
                : " — " + Html.text(c.note())));
            return Html.element("div", "check " + kind, mark + comparison + detail);
        }
    }
}
