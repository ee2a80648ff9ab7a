package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Fix;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * What to use instead when a call is outside what its correlation holds for: the standard
 * library's members of the same family that cover the arguments (named in the message and
 * offered as repairs), and the boundary-layer regime check that points to the other regime's
 * formulas.
 */
final class RangeAdvice {
    private final Evaluator caller;
    private final Reporter reporter;
    private final UnitRegistry units;

    RangeAdvice(Evaluator caller, Reporter reporter, UnitRegistry units) {
        this.caller = caller;
        this.reporter = reporter;
        this.units = units;
    }

    /**
     * Warns when a laminar formula meets a Reynolds number above Re_crit, or a turbulent one below.
     * A tripped formula is turbulent because the layer is stimulated, whatever Re_crit says: its
     * valid lines alone bound it.
     */
    void regime(Expr.Call c, Binding.CorrelationBinding b, Map<String, Value> params, List<Value> args) {
        Statement.Correlation def = b.def();
        if (def.regime() == null || def.regime().text().equals("tripped")) return;
        String reName = def.params().stream().map(p -> p.name().text()).filter(n -> n.startsWith("Re")).findFirst()
            .orElse(null);
        if (reName == null) return;
        // Order: the calc's `transition` statement, then the settings', then the library's Re_crit.
        // A value that merely happens to be named Re_crit moves nothing.
        Double set = caller.scope().criticalReynolds();
        Value critical;
        if (set != null) {
            critical = Value.number(set);
        } else if (caller.scope().fromLibraryOnly("Re_crit") instanceof Binding.ValueBinding crit && crit.value().known()
            && crit.value().dimensionless()) {
            critical = crit.value();
        } else {
            return;
        }
        double re = params.get(reName).si();
        double reCrit = critical.si();
        boolean laminar = def.regime().text().equals("laminar");
        if (laminar ? re <= reCrit : re >= reCrit) return;
        String name = def.name().text();
        String shownRe = Shown.value(params.get(reName), DisplayUnits.defaultFor(Dimension.NONE), 4);
        String shownCrit = Shown.value(critical, DisplayUnits.defaultFor(Dimension.NONE), 4);
        String message = laminar
            ? name + " assumes a laminar boundary layer, but " + reName + " = " + shownRe + " is above the critical "
                + "Reynolds number Re_crit = " + shownCrit + ": the layer is likely transitional or turbulent there"
            : name + " assumes a turbulent boundary layer, but " + reName + " = " + shownRe + " is below the critical "
                + "Reynolds number Re_crit = " + shownCrit + ": the layer is likely laminar there";
        List<String> better = new ArrayList<>();
        for (Binding other : familyMembers(b)) {
            if (other instanceof Binding.CorrelationBinding oc && covers(oc, args) && suitsOtherRegime(oc, laminar)) {
                better.add(oc.def().name().text());
            }
        }
        String fix = better.isEmpty() ? "; use a correlation for that regime"
            : "; use " + (laminar ? "a mixed-flow or turbulent" : "a laminar or mixed-flow") + " correlation: "
                + listed(better);
        reporter.report(Code.RANGE_REGIME, c.span(), message + fix);
    }

    /**
     * Whether a correlation fits where a laminar (or turbulent) one was warned: one for the other
     * regime, or for both (mixed flow). A tripped one never replaces a turbulent one below
     * Re_crit: the layer there is laminar unless someone trips it.
     */
    private static boolean suitsOtherRegime(Binding.CorrelationBinding other, boolean warnedLaminar) {
        String regime = other.def().regime() == null ? null : other.def().regime().text();
        if (regime == null) return true;
        return warnedLaminar ? !regime.equals("laminar") : regime.equals("laminar");
    }

    /** The library's members of the same family that cover the arguments, and how the message words them. */
    record Alternatives(String words, List<String> names) {
    }

    /** A call outside its range: the message names the alternatives, and each is a repair of the call. */
    void outside(Expr.Call c, String message, Alternatives alternatives) {
        List<Fix> fixes = new ArrayList<>();
        for (String alt : alternatives.names()) fixes.add(new Fix("Use " + alt + ", valid here", c.callee().span(), alt));
        reporter.report(Code.RANGE_OUTSIDE, c.span(), message + alternatives.words(), fixes, List.of());
    }

    /** "; within range: a, b" — the library's members of the same family that cover these arguments. */
    Alternatives alternatives(Binding self, List<Value> args) {
        String family = Stdlib.familyOf(self);
        if (family == null) return new Alternatives("", List.of());
        List<String> names = new ArrayList<>();
        for (Binding other : familyMembers(self)) {
            boolean fits = other instanceof Binding.CorrelationBinding oc ? covers(oc, args)
                : other instanceof Binding.TableBinding ot && covers(ot, args);
            if (fits) names.add(nameOf(other));
        }
        return new Alternatives(names.isEmpty() ? "; no standard-library correlation of family " + family + " covers it"
            : "; within range: " + listed(names), names);
    }

    private static String listed(List<String> names) {
        return String.join(", ", names);
    }

    private List<Binding> familyMembers(Binding self) {
        String family = Stdlib.familyOf(self);
        if (family == null) return List.of();
        List<Binding> out = new ArrayList<>();
        for (Binding b : caller.scope().family(family)) {
            if (!nameOf(b).equals(nameOf(self))) out.add(b);
        }
        return out;
    }

    private static String nameOf(Binding b) {
        return b instanceof Binding.CorrelationBinding c ? c.def().name().text() : ((Binding.TableBinding) b).name();
    }

    private boolean covers(Binding.CorrelationBinding other, List<Value> args) {
        List<Statement.Param> params = other.def().params();
        if (other.circular() || params.size() != args.size()) return false;
        for (int i = 0; i < params.size(); i++) {
            Statement.Param p = params.get(i);
            Dimension wanted = p.dimension() == null ? null : ParameterDimensions.of(p.dimension().text());
            if (wanted != null && !wanted.equals(args.get(i).dimension())) return false;
        }
        Evaluator silent = new Evaluator(other.scope(), Environment.NONE, RangeCheck.bind(params, args), Reporter.discarding(),
            other.scope().text(), units, caller.budget());
        return RangeCheck.within(other.def().valid(), silent);
    }

    private boolean covers(Binding.TableBinding other, List<Value> args) {
        if (args.size() != 1 || !args.get(0).dimension().equals(other.data().argument)) return false;
        if (!other.data().covers(args.get(0).si())) return false;
        Evaluator silent = new Evaluator(other.scope(), Environment.NONE, Map.of(other.def().param().name().text(),
            args.get(0)), Reporter.discarding(), other.scope().text(), units, caller.budget());
        return RangeCheck.within(other.def().valid(), silent);
    }
}
