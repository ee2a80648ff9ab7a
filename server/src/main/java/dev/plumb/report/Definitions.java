package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Solution;
import dev.plumb.analysis.Value;
import dev.plumb.present.CallText;
import dev.plumb.present.ValueText;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;

/**
 * One defined value as a reviewer checks it: the formula in symbols, the same formula with the
 * values put in and the result, then its note, tag and where a library value comes from. A solved
 * value shows its equation, its bracket or start, the root, the residual and the iterations.
 */
final class Definitions {
    /** More trials than this are summarised: the table is for checking, not for reading in full. */
    private static final int STEPS_SHOWN = 24;
    /** Characters of a formula that fit one printed line at the report's size (A4, 10.5 pt). */
    private static final int LINE = 95;

    private Definitions() {
    }

    static String html(Analysis a, Row.ValueRow v, ReportValues values, FormulaMath math, References references,
                       String change) {
        StringBuilder out = new StringBuilder("<div class=\"definition" + (change == null ? "" : " changed") + "\" id=\"").append(Anchors.of(v.name())).append("\"")
            .append(Data.of(v.name(), v.value(), values.shown(v.value(), v.display()))).append(">");
        ShownValue result = values.shown(v.value(), v.display());
        if (v.statement() instanceof Statement.Definition d) {
            String symbols = Html.formula(math.definition(d, ValueSource.none()));
            boolean namesInside = !math.formula(d.expr(), values).equals(math.formula(d.expr(), ValueSource.none()));
            boolean loneQuantity = Expr.inner(d.expr()) instanceof Expr.Quantity;
            String substituted = math.definition(d, values, result);
            if (namesInside && readLength(substituted) <= LINE) {
                out.append(symbols).append(Html.formula(substituted));
            } else if (namesInside) {
                // Too long for one printed line (formulas do not wrap): the values are listed instead.
                out.append(symbols).append(where(d, values, math));
                out.append(Html.element("p", "root", math.symbol(d.name().text()) + " = " + math.inlineQuantity(result)));
            } else {
                out.append(Html.formula(math.definition(d, ValueSource.none(), loneQuantity ? null : result)));
            }
        } else if (v.statement() instanceof Statement.Seek s) {
            out.append(solved(a, v, s, values, math));
        } else if (v.statement() instanceof Statement.SeekSystem k) {
            out.append(SystemBlock.html(a, v, k, values, math));
        } else if (v.statement() instanceof Statement.Evolve k) {
            out.append(MotionBlock.html(a, v, k, values, math));
        } else {
            out.append(Html.element("p", "broken", math.symbol(v.name()) + " — this line could not be read; see the findings"));
        }
        if (!v.value().known()) {
            out.append(Html.element("p", "unknown", "Not computed: the findings below say why."));
        }
        // How far it may lie from its value, and how much the choice of formula matters: apart from the formula.
        if (v.spread() != null) {
            out.append(Html.element("p", "spread", Html.text(v.name() + " = " + ValueText.of(a, v) + ValueText.spread(v) + " to first order; shares of "
                + "the variance: " + ValueText.shares(v.spread()) + (v.spread().sampled() == null ? ""
                : ". " + ValueText.sampled(v)))));
        }
        if (v.modelForm() != null) out.append(Html.element("p", "model-form", Html.text(ValueText.modelForm(v))));
        if (change != null) out.append(Html.element("p", "changed-from", ChangesBlock.mark(change)));
        out.append(meta(a, v, references));
        return out.append("</div>").toString();
    }

    /** Characters a formula reads as, markup aside, with room for its spacing: a measure of its printed width. */
    private static int readLength(String mathml) {
        int characters = mathml.replaceAll("<[^>]*>", "").replaceAll("&[a-z#0-9]+;", "x").length();
        // An operator is set with space either side, a unit after a thin space.
        return characters + count(mathml, "<mo") + count(mathml, "<mspace") / 2;
    }

    private static int count(String s, String part) {
        int n = 0;
        for (int at = s.indexOf(part); at >= 0; at = s.indexOf(part, at + 1)) n++;
        return n;
    }

    /** "where ρ = 1.2 kg/m³, V = 31 m/s": the values a long formula uses, in the order it uses them. */
    private static String where(Statement.Definition d, ReportValues values, FormulaMath math) {
        java.util.LinkedHashSet<String> names = new java.util.LinkedHashSet<>();
        dev.plumb.syntax.ExprWalk.each(d.expr(), node -> {
            if (node instanceof Expr.Reference r) names.add(r.name());
        });
        List<String> each = new ArrayList<>();
        for (String n : names) {
            values.find(n).ifPresent(v -> each.add(math.symbol(n) + " = " + math.inlineQuantity(v)));
        }
        return Html.element("p", "values-used", "where " + String.join(", ", each));
    }

    private static String meta(Analysis a, Row.ValueRow v, References references) {
        List<String> parts = new ArrayList<>();
        if (v.note() != null) parts.add(Html.text(v.note()));
        if (v.basis() != null) parts.add("tag: " + Html.element("span", "tag", Html.text(v.basis())));
        if (v.origin() != null) {
            String from = "from " + Html.element("code", null, Html.text(v.origin().correlation()))
                + references.cite(v.origin().correlation());
            if (v.origin().basis() != null) from += ", " + Html.text(v.origin().basisWords());
            if (v.origin().accuracy() != null) {
                from += ", ±" + Html.text(dev.plumb.units.QuantityFormat.number(v.origin().accuracy() * 100, 3)) + " %";
            }
            parts.add(from);
        }
        for (Analysis.CallSite c : a.callsIn(v.span())) {
            if (c.used() != null) parts.add("fit used: " + Html.text(c.used() + " at " + CallText.arguments(c)));
        }
        return parts.isEmpty() ? "" : Html.element("p", "meta", String.join(" · ", parts));
    }

    private static String solved(Analysis a, Row.ValueRow v, Statement.Seek s, ReportValues values, FormulaMath math) {
        StringBuilder out = new StringBuilder();
        out.append(Html.element("p", "solve-head", math.symbol(v.name()) + " is solved so that"));
        out.append(Html.formula(math.equation(s.lhs(), s.rhs(), ValueSource.none())));
        String where = s.low() != null
            ? "searched between " + math.inlineFormula(s.low()) + " and " + math.inlineFormula(s.high())
            : "searched from " + math.inlineFormula(s.start());
        out.append(Html.element("p", "solve-range", where));
        ShownValue root = values.shown(v.value(), v.display());
        out.append(Html.element("p", "root", math.symbol(v.name()) + " = " + math.inlineQuantity(root)));
        Solution solution = v.solution();
        if (solution == null) return out.append(Html.element("p", "unknown", "No root was found: see the findings.")).toString();
        out.append(Html.formula(math.equation(s.lhs(), s.rhs(), values)));
        int sig = a.settings().significantFigures();
        String residual = ValueText.of(Value.of(solution.residual(), solution.residualDimension()), null, 3);
        out.append(Html.element("p", "solve-summary", "residual " + Html.text(residual) + " after "
            + solution.iterations() + " evaluations"));
        out.append(steps(v, solution, sig));
        return out.toString();
    }

    private static String steps(Row.ValueRow v, Solution solution, int sig) {
        StringBuilder rows = new StringBuilder();
        List<Solution.Step> steps = solution.steps();
        for (int i = 0; i < steps.size(); i++) {
            if (steps.size() > STEPS_SHOWN && i == STEPS_SHOWN / 2) {
                rows.append("<tr><td colspan=\"4\">… ").append(steps.size() - STEPS_SHOWN).append(" more …</td></tr>");
                i = steps.size() - STEPS_SHOWN / 2;
            }
            Solution.Step step = steps.get(i);
            rows.append("<tr><td>").append(step.n()).append("</td><td>").append(at(v, step.x(), sig)).append("</td><td>")
                .append(Html.text(ValueText.of(Value.of(step.residual(), solution.residualDimension()), null, 3)))
                .append("</td><td>").append(at(v, step.low(), sig)).append(" … ").append(at(v, step.high(), sig))
                .append("</td></tr>");
        }
        return "<table class=\"steps\"><thead><tr><th>#</th><th>trial</th><th>residual</th><th>bracket after</th></tr>"
            + "</thead><tbody>" + rows + "</tbody></table>";
    }

    private static String at(Row.ValueRow v, double si, int sig) {
        if (!Double.isFinite(si)) return "—";
        return Html.text(ValueText.of(Value.of(si, v.value().dimension()), v.display(), sig));
    }
}
