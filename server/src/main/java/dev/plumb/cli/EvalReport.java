package dev.plumb.cli;

import dev.plumb.present.ValueText;
import dev.plumb.present.CheckText;
import dev.plumb.present.CallText;
import dev.plumb.present.SweepText;
import dev.plumb.present.CaseText;
import dev.plumb.present.UsedValues;
import dev.plumb.diagnostics.Printable;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Solution;
import dev.plumb.analysis.SystemSolution;
import dev.plumb.analysis.Trajectory;
import dev.plumb.analysis.Value;
import dev.plumb.present.TrajectoryText;
import dev.plumb.syntax.Statement;
import dev.plumb.present.SystemText;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.Unit;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

/** The body of `plumb eval`: header, then each section's values and checks, aligned. */
final class EvalReport {
    private EvalReport() {
    }

    static void write(Analysis a, PrintWriter out, Style style, boolean steps) {
        write(a, out, style, steps, null);
    }

    /** @param sensitivity the value whose sources' shares of its variance to list under it, or null */
    static void write(Analysis a, PrintWriter out, Style style, boolean steps, String sensitivity) {
        // The calc's own text is neutralised before colours are added (NeutralWriter keeps those).
        String title = Printable.line(a.headers().getOrDefault("title", Location.path(a.file())));
        out.println(style.bold(title));
        for (String key : new String[] {"author", "reviewer", "revision", "transition"}) {
            String v = a.headers().get(key);
            if (v != null && !v.isEmpty()) out.println(key + ": " + Printable.line(v));
        }
        List<Used> used = usedValues(a);
        int nameWidth = 0;
        int valueWidth = 0;
        for (Row r : a.rows()) {
            if (r instanceof Row.ValueRow v) {
                nameWidth = Math.max(nameWidth, width(v.name()));
                valueWidth = Math.max(valueWidth, width(ValueText.of(a, v) + ValueText.spread(v)));
            }
        }
        for (Used u : used) {
            nameWidth = Math.max(nameWidth, width(u.name()));
            valueWidth = Math.max(valueWidth, width(u.shown()));
        }
        boolean usedShown = used.isEmpty();
        for (Row r : a.rows()) {
            // The values that come from used files, after the calc's opening prose: they are its inputs too.
            if (!usedShown && !(r instanceof Row.NarrativeRow)) {
                usedShown = true;
                out.println();
                out.println(style.bold("From used files"));
                for (Used u : used) {
                    out.println(Printable.line("  " + pad(u.name(), nameWidth) + " = " + pad(u.shown(), valueWidth) + "  ("
                        + u.file() + ")" + (u.note() == null ? "" : "  " + u.note())).stripTrailing());
                }
                // Without a section of its own next, the calc's values would read as the used files'.
                if (!(r instanceof Row.SectionRow)) {
                    out.println();
                    out.println(style.bold("In this calc"));
                }
            }
            if (r instanceof Row.SectionRow s) {
                out.println();
                out.println(style.bold(Printable.line(s.title())));
            } else if (r instanceof Row.NarrativeRow n) {
                // The calc's prose, in its place: the evaluation reads like the calc it evaluates.
                out.println(Printable.line("  " + n.text()).stripTrailing());
            } else if (r instanceof Row.ValueRow v) {
                String note = v.note() == null ? "" : "  " + v.note();
                String basis = tag(v) + used(a, v);
                out.println(Printable.line("  " + pad(v.name(), nameWidth) + " = " + pad(ValueText.of(a, v) + ValueText.spread(v),
                    valueWidth) + basis + solved(v) + evolved(a, v) + note).stripTrailing());
                if (v.modelForm() != null) out.println(Printable.line("      " + ValueText.modelForm(v)));
                if (v.spread() != null && v.spread().sampled() != null) {
                    out.println(Printable.line("      " + ValueText.sampled(v)));
                }
                if (v.spread() != null && v.name().equals(sensitivity)) {
                    out.println(Printable.line("      shares of the variance: " + ValueText.shares(v.spread())));
                }
                if (steps && v.solution() != null) writeSteps(out, v.solution(), v);
                if (v.statement() instanceof Statement.Evolve k && k.index() == 0 && a.trajectory(v.name()) != null) {
                    writeTrajectory(out, a.trajectory(v.name()), a.settings().significantFigures());
                }
            } else if (r instanceof Row.FunctionRow f) {
                out.println(Printable.line("  " + f.signature() + "  (" + f.kind().word() + ")" + (f.note() == null ? "" : "  " + f.note())));
            } else if (r instanceof Row.CheckRow c) {
                String mark = c.passed() == null ? style.bad("? not evaluated") : c.passed() ? style.good("✓ pass")
                    : c.verdict() == Row.Verdict.FAILS_AT_BOUND ? style.bad("✗ FAIL at its bound") : style.bad("✗ FAIL");
                String why = c.note() == null ? "" : "  " + c.note();
                out.println("  " + mark + Printable.line("  check " + c.source() + "   [" + CheckText.detail(c) + "]" + why));
            } else if (r instanceof Row.CaseRow k) {
                int digits = a.settings().significantFigures();
                out.println(Printable.line("  " + CaseText.title(k, digits)));
                for (String line : CaseText.lines(k, digits)) out.println(Printable.line("      " + line));
                for (Row.CheckRow c : k.checks()) {
                    String mark = c.passed() == null ? style.bad("?") : c.passed() ? style.good("✓")
                        : c.verdict() == Row.Verdict.FAILS_AT_BOUND ? style.bad("✗ FAIL at its bound") : style.bad("✗ FAIL");
                    out.println("      " + mark + Printable.line("  check " + c.source() + "   [" + CheckText.detail(c) + "]"));
                }
            } else if (r instanceof Row.SweepRow w) {
                out.println(Printable.line("  " + SweepText.title(w)));
                for (String line : SweepText.table(w, a.settings().significantFigures())) {
                    out.println(Printable.line("      " + line));
                }
            }
        }
    }

    /** For a solved `seek`: how many evaluations and the residual left at the root. */
    private static String solved(Row.ValueRow v) {
        if (v.solution() == null) return "";
        if (v.solution().system() != null) return "  [solved " + SystemText.summary(v.solution().system(), v.name()) + "]";
        Unit unit = DisplayUnits.defaultFor(v.solution().residualDimension());
        return "  [solved: " + v.solution().iterations() + " iterations, residual "
            + QuantityFormat.format(v.solution().residual(), unit, 2) + "]";
    }

    /** The refinement's record: each trial, its residual and the bracket after it, in the unit the root is shown in. */
    private static void writeSteps(PrintWriter out, Solution s, Row.ValueRow root) {
        if (s.system() != null) {
            writeSystemSteps(out, s.system(), root);
            return;
        }
        Unit unit = DisplayUnits.defaultFor(s.residualDimension());
        Unit x = root.display() != null ? root.display() : DisplayUnits.defaultFor(root.value().dimension());
        for (Solution.Step step : s.steps()) {
            out.printf("      %3d  %s = %-16s residual = %-14s bracket %s .. %s%n", step.n(), Printable.line(root.name()),
                QuantityFormat.format(step.x(), x, 10), QuantityFormat.format(step.residual(), unit, 3),
                QuantityFormat.format(step.low(), x, 10), QuantityFormat.format(step.high(), x, 10));
        }
    }

    /** For a motion: how it ran, on its time's row; the time a state's value is at, on each state's row. */
    private static String evolved(Analysis a, Row.ValueRow v) {
        if (!(v.statement() instanceof Statement.Evolve k)) return "";
        Trajectory t = a.trajectory(v.name());
        if (t == null) return "";
        if (k.index() == 0) return "  [" + TrajectoryText.summary(t) + "]";
        return "  [at " + t.names().get(0) + " = " + ValueText.of(Value.of(t.end(), t.dimensions().get(0)), t.units().get(0),
            a.settings().significantFigures()) + "]";
    }

    /** The trajectory table under the motion's time, columns aligned, then where its correlations' arguments went. */
    private static void writeTrajectory(PrintWriter out, Trajectory t, int sig) {
        List<String> heads = TrajectoryText.heads(t);
        int[] widths = new int[heads.size()];
        for (int j = 0; j < heads.size(); j++) {
            widths[j] = width(heads.get(j));
            for (int i = 0; i < t.times().length; i++) widths[j] = Math.max(widths[j], width(TrajectoryText.cell(t, i, j, sig)));
        }
        StringBuilder head = new StringBuilder("     ");
        for (int j = 0; j < heads.size(); j++) head.append("  ").append(pad(heads.get(j), widths[j]));
        out.println(Printable.line(head.toString()).stripTrailing());
        for (int i = 0; i < t.times().length; i++) {
            StringBuilder row = new StringBuilder("     ");
            for (int j = 0; j < heads.size(); j++) row.append("  ").append(pad(TrajectoryText.cell(t, i, j, sig), widths[j]));
            out.println(Printable.line(row.toString()).stripTrailing());
        }
        if (t.widened()) out.println("       (interval widened to keep the table within " + Trajectory.MAX_ROWS + " rows)");
        for (String visited : t.visited()) out.println(Printable.line("       over the motion, " + visited));
    }

    /** A system's iterates, under its first unknown only: the unknowns, then each equation's residual. */
    private static void writeSystemSteps(PrintWriter out, SystemSolution s, Row.ValueRow row) {
        if (!s.unknowns().get(0).equals(row.name())) return;
        for (SystemSolution.Iterate it : s.record()) {
            List<String> parts = new ArrayList<>();
            for (int j = 0; j < s.unknowns().size(); j++) {
                parts.add(s.unknowns().get(j) + " = " + SystemText.unknown(s, j, it.x().get(j), 10));
            }
            List<String> residuals = new ArrayList<>();
            for (int i = 0; i < it.residual().size(); i++) {
                residuals.add(SystemText.residual(it.residual().get(i), s.residuals().get(i).dimension()));
            }
            out.println(Printable.line(String.format("      %3d  %s   residuals %s", it.n(), String.join(", ", parts),
                String.join(", ", residuals))));
        }
    }

    /** "[frontal]" for a tagged area; "[cd_x: frontal basis, ±5 %]" for a correlation's result. */
    private static String tag(Row.ValueRow v) {
        if (v.basis() != null) return "  [" + v.basis() + "]";
        if (v.origin() == null) return "";
        List<String> parts = new ArrayList<>();
        if (v.origin().basis() != null) parts.add(v.origin().basisWords());
        if (v.origin().accuracy() != null) parts.add("±" + QuantityFormat.number(v.origin().accuracy() * 100, 3) + " %");
        return "  [" + v.origin().correlation() + (parts.isEmpty() ? "" : ": " + String.join(", ", parts)) + "]";
    }

    /** "[used: cd_sphere_morrison (Re = 3e5)]": which fit of a selector gave the value on this line. */
    private static String used(Analysis a, Row.ValueRow v) {
        List<String> parts = new ArrayList<>();
        for (Analysis.CallSite c : a.callsIn(v.span())) {
            if (c.used() != null) parts.add(c.used() + " at " + CallText.arguments(c));
        }
        return parts.isEmpty() ? "" : "  [used: " + String.join("; ", parts) + "]";
    }

    /** A value of a used file that this calc uses, as eval shows it. */
    private record Used(String name, String shown, String file, String note) {
    }

    private static List<Used> usedValues(Analysis a) {
        return UsedValues.of(a).stream().map(u -> new Used(u.name(), ValueText.of(u.binding().value(), u.binding().display(),
            a.settings().significantFigures()), UsedValues.relative(a, u.file()), u.binding().note())).toList();
    }

    private static int width(String s) {
        return s.codePointCount(0, s.length());
    }

    private static String pad(String s, int width) {
        return s + " ".repeat(Math.max(0, width - width(s)));
    }
}
