package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Checks what a correlation or table declares (parameter dimensions, basis, regime, accuracy,
 * the units and numbers of a table) and builds the tables' interpolated columns.
 */
final class BlockChecks {
    static final Set<String> BASES = Set.of("frontal", "wetted", "planform");
    /** The flow directions a frontal basis may name: across a long body's axis, or along it. */
    private static final Set<String> FLOWS = Set.of("crossflow", "axial");
    /** Whose density a value is: the fluid's (drag, lift, Reynolds number) or the body's (weight). */
    static final Set<String> DENSITY_TAGS = Set.of("fluid", "body");
    /**
     * A boundary-layer formula's regime: laminar, turbulent, or tripped (turbulent because the
     * layer is stimulated at the leading edge, as on towed ship models, so Re_crit does not apply).
     */
    private static final Set<String> REGIMES = Set.of("laminar", "turbulent", "tripped");
    private static final Set<String> INTERPOLATIONS = Set.of("linear", "loglog");

    private final Reporter reporter;
    private final UnitRegistry units;

    BlockChecks(Reporter reporter, UnitRegistry units) {
        this.reporter = reporter;
        this.units = units;
    }

    void correlation(Statement.Correlation c) {
        Set<String> seen = new HashSet<>();
        for (Statement.Param p : c.params()) {
            if (!seen.add(p.name().text())) {
                reporter.report(Code.NAME_DUPLICATE, p.name().span(), "parameter " + p.name().text() + " is listed twice");
            }
            dimension(p);
            role(p);
        }
        word(c.basis(), BASES, Code.BASIS_UNKNOWN, "area basis");
        word(c.flow(), FLOWS, Code.BASIS_UNKNOWN, "flow direction");
        word(c.regime(), REGIMES, Code.BLOCK_INVALID, "regime");
    }

    /** The dimension a parameter declares, or null (none declared, or an unknown word, reported). */
    Dimension dimension(Statement.Param p) {
        if (p.dimension() == null) return null;
        Dimension d = ParameterDimensions.of(p.dimension().text());
        if (d == null) {
            reporter.report(Code.BLOCK_INVALID, p.dimension().span(), "unknown dimension '" + p.dimension().text() + "'"
                + Suggestions.didYouMean(Suggestions.closest(p.dimension().text(), ParameterDimensions.words(), 2))
                + ": use a word such as length, temperature, velocity, pressure, density or dimensionless");
        }
        return d;
    }

    /** {@code rho: density as fluid}: a known role, on a parameter declared a density. */
    private void role(Statement.Param p) {
        if (p.role() == null) return;
        String r = p.role().text();
        if (!DENSITY_TAGS.contains(r)) {
            reporter.report(Code.BLOCK_INVALID, p.role().span(), "unknown role '" + r + "'"
                + Suggestions.didYouMean(Suggestions.closest(r, DENSITY_TAGS, 1))
                + ": a density parameter is `as fluid` or `as body`");
        } else if (p.dimension() == null || !p.dimension().text().equals("density")) {
            reporter.report(Code.BLOCK_INVALID, p.role().span(), "`as " + r + "` says whose density "
                + p.name().text() + " is: declare it a density, `" + p.name().text() + ": density as " + r + "`");
        }
    }

    private void word(Ident word, Set<String> allowed, Code code, String what) {
        if (word == null || allowed.contains(word.text())) return;
        reporter.report(code, word.span(), "unknown " + what + " '" + word.text() + "'"
            + Suggestions.didYouMean(Suggestions.closest(word.text(), allowed, 1)) + ": use "
            + String.join(" or ", allowed.stream().sorted().toList()));
    }

    /** Checks an `accuracy` line: a plain number such as {@code 5 %}. */
    void accuracy(Statement.Correlation c, Scope scope, String text) {
        if (c.accuracy() == null) return;
        Value v = new Evaluator(scope, Map.of(), reporter, text, units).eval(c.accuracy());
        if (v.known() && (!v.dimensionless() || v.si() <= 0)) {
            reporter.report(Code.BLOCK_INVALID, c.accuracy().span(), "accuracy is a positive percentage, e.g. "
                + "`accuracy 5 %`, but this is " + Shown.value(v));
        }
    }

    /** The columns of a table as functions; none when its numbers cannot be read. */
    List<Binding.TableBinding> table(Statement.Table t, Path file, Scope scope) {
        word(t.basis(), BASES, Code.BASIS_UNKNOWN, "area basis");
        word(t.flow(), FLOWS, Code.BASIS_UNKNOWN, "flow direction");
        word(t.interpolate(), INTERPOLATIONS, Code.BLOCK_INVALID, "interpolation");
        boolean logLog = t.interpolate() != null && t.interpolate().text().equals("loglog");
        Dimension declared = dimension(t.param());
        role(t.param());
        List<Statement.Column> columns = t.columns();
        if (columns.size() < 2 || t.rows().size() < 2) return List.of();
        Evaluator resolver = new Evaluator(scope, reporter, scope.text(), units);
        List<Unit> columnUnits = new ArrayList<>();
        for (Statement.Column col : columns) {
            Unit u = col.unit() == null ? Unit.PLAIN_NUMBER : resolver.resolveUnit(col.unit(), false);
            if (u == null) return List.of();
            columnUnits.add(u);
        }
        Unit xUnit = columnUnits.get(0);
        if (declared != null && !declared.equals(xUnit.dimension())) {
            Statement.Column x = columns.get(0);
            reporter.report(Code.UNIT_MISMATCH, x.unit() != null ? x.unit().span() : x.name().span(), "the first column of "
                + t.name().text() + " is its argument " + t.param().name().text() + ", declared as "
                + declared.describe() + ", but its numbers are in " + xUnit.dimension().describe());
            return List.of();
        }
        int n = t.rows().size();
        double[][] si = new double[columns.size()][n];
        for (int r = 0; r < n; r++) {
            Statement.Row row = t.rows().get(r);
            for (int k = 0; k < columns.size(); k++) {
                double number = row.numbers().get(k);
                si[k][r] = columnUnits.get(k).toSi(number);
                if (logLog && si[k][r] <= 0) {
                    reporter.report(Code.BLOCK_INVALID, row.span(), "table " + t.name().text() + " interpolates log–log, "
                        + "so every number must be positive, but " + columns.get(k).name().text() + " is "
                        + dev.plumb.units.QuantityFormat.number(number, 6)
                        + " here: use `interpolate linear`, or leave out this row");
                    return List.of();
                }
            }
        }
        List<Binding.TableBinding> out = new ArrayList<>();
        boolean single = columns.size() == 2;
        for (int k = 1; k < columns.size(); k++) {
            TableData data = new TableData(si[0], si[k], logLog, xUnit.dimension(), columnUnits.get(k).dimension(), xUnit);
            String name = single ? t.name().text() : t.name().text() + "." + columns.get(k).name().text();
            out.add(new Binding.TableBinding(file, t.name().span(), name, t, data, scope));
        }
        return out;
    }

    /** A definition whose formula is a call of a correlation or table column carries that origin. */
    static Origin origin(Expr e, Scope scope, UnitRegistry units) {
        if (!(Expr.inner(e) instanceof Expr.Call c)) return null;
        Binding b = scope.lookup(c.callee().text());
        if (b instanceof Binding.CorrelationBinding cb) {
            Statement.Correlation def = cb.def();
            return new Origin(def.name().text(), def.basis() == null ? null : def.basis().text(),
                accuracyOf(def.accuracy(), cb.scope(), units), def.flow() == null ? null : def.flow().text());
        }
        if (b instanceof Binding.TableBinding tb) {
            Statement.Table def = tb.def();
            return new Origin(tb.name(), def.basis() == null ? null : def.basis().text(),
                accuracyOf(def.accuracy(), tb.scope(), units), def.flow() == null ? null : def.flow().text());
        }
        return null;
    }

    private static Double accuracyOf(Expr accuracy, Scope scope, UnitRegistry units) {
        if (accuracy == null) return null;
        Value v = new Evaluator(scope, Map.of(), Reporter.discarding(), scope.text(), units).eval(accuracy);
        return v.known() && v.dimensionless() ? v.si() : null;
    }
}
