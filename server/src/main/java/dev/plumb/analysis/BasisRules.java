package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Severity;
import dev.plumb.syntax.Expr;
import dev.plumb.units.Dimension;

/**
 * Carries area tags, coefficient bases and shapes through arithmetic, and warns where a
 * coefficient meets an area of another basis (docs/language.md, "Area basis"):
 * <ul>
 *   <li>a dimensionless factor keeps an area's tag; a sum of areas of one tag keeps it; a product
 *       of lengths is an untagged area whose shape (π·d·L, π·d²/4 …) is known; anything else
 *       drops it;</li>
 *   <li>a product that holds an area (a force Cd·A·q) carries it along, so the check fires
 *       wherever coefficient and area meet, in any order and through intermediate names;</li>
 *   <li>a density tagged {@code body} or {@code fluid} is carried the same way (a dynamic pressure
 *       ½·ρ·V² holds its ρ); a coefficient with a basis that meets a body's density warns, since
 *       force coefficients scale the fluid's dynamic pressure. A difference ρ_body − ρ_fluid is
 *       untagged: it is the buoyancy term, used rightly with the body's density.</li>
 * </ul>
 */
final class BasisRules {
    static final Dimension AREA = Dimension.of(2, 0, 0, 0, 0, 0, 0);
    static final Dimension DENSITY = Dimension.of(-3, 1, 0, 0, 0, 0, 0);

    private final Reporter reporter;
    private final String text;

    BasisRules(Reporter reporter, String text) {
        this.reporter = reporter;
        this.text = text;
    }

    /** A number written in the source: a plain number or a length starts a shape. */
    static BasisNotes quantity(Value v, Expr.Quantity q) {
        if (v.dimension().isDimensionless()) return BasisNotes.NONE.withShape(Shape.number(v.si()));
        if (v.dimension().equals(Dimension.LENGTH)) return BasisNotes.NONE.withShape(Shape.length("#" + q.span().start()));
        return BasisNotes.impure(Shape.number(1));
    }

    /** A value used by name: a length is a symbol of shapes; notes are relabelled with the name. */
    static BasisNotes reference(String name, Value v) {
        BasisNotes n = v.notes() == null ? BasisNotes.NONE : v.notes();
        Shape shape = n.shape();
        boolean pure = n.pure();
        if (v.dimension().equals(Dimension.LENGTH) && (shape == null || plainLength(shape))) {
            // A named plain length is a symbol of shapes; a length built as π·d keeps its shape.
            shape = Shape.length(name);
            pure = true;
        } else if (shape == null && v.dimension().isDimensionless() && n.coefficient() == null) {
            shape = Shape.number(v.si());
            pure = true;
        } else if (shape == null || n.coefficient() != null) {
            // A named quantity of its own (a density, a coefficient) joins products as one factor.
            shape = Shape.number(1);
            pure = false;
        }
        BasisNotes.Area area = n.area() == null ? null
            : new BasisNotes.Area(n.area().tag(), n.area().kind(), name, n.area().frontal(), n.area().flow());
        BasisNotes.Coefficient c = n.coefficient() == null ? null
            : new BasisNotes.Coefficient(n.coefficient().basis(), name, n.coefficient().origin(), n.coefficient().flow());
        return new BasisNotes(area, c, shape, pure, relabelled(n.density(), name, v));
    }

    /** A density is named by its own name; one held in a product by the density and the product's name. */
    private static BasisNotes.Density relabelled(BasisNotes.Density d, String name, Value v) {
        if (d == null) return null;
        if (DENSITY.equals(v.dimension())) return new BasisNotes.Density(d.tag(), name);
        if (d.label().endsWith(")")) return d;
        return new BasisNotes.Density(d.tag(), d.label() + " (in " + name + ")");
    }

    private static boolean plainLength(Shape s) {
        return s.factor() == 1 && s.lengths().size() == 1 && s.lengths().values().iterator().next() == 1;
    }

    /**
     * The result of a correlation or table with a basis: a coefficient, or a tagged area; either
     * with the flow direction its basis line states (null for none).
     */
    static BasisNotes result(Value v, String basis, String flow, String correlation) {
        if (basis == null || !v.known()) return BasisNotes.NONE;
        if (v.dimension().isDimensionless()) {
            return BasisNotes.NONE.withCoefficient(new BasisNotes.Coefficient(basis, correlation, correlation, flow));
        }
        if (v.dimension().equals(AREA)) {
            return BasisNotes.NONE.withArea(new BasisNotes.Area(basis, null, correlation, null, flow));
        }
        return BasisNotes.NONE;
    }

    /** An `as fluid` or `as body` on a density. */
    static BasisNotes densityTagged(Value v, String tag, String name) {
        BasisNotes n = v.notes() == null ? BasisNotes.NONE : v.notes();
        return n.withDensity(new BasisNotes.Density(tag, name));
    }

    /** An `as TAG` on a definition. */
    static BasisNotes tagged(Value v, String tag, String name) {
        BasisNotes n = v.notes() == null ? BasisNotes.NONE : v.notes();
        Shape.Kind kind = n.shape() == null ? null : n.shape().kind();
        return n.withArea(new BasisNotes.Area(tag, kind, name));
    }

    BasisNotes multiply(Expr.Binary b, Value l, Value r, Dimension result) {
        BasisNotes ln = asFactor(l);
        BasisNotes rn = asFactor(r);
        Shape shape = ln.shape() != null && rn.shape() != null ? ln.shape().times(rn.shape(), 1) : null;
        boolean pure = ln.pure() && rn.pure();
        BasisNotes.Area area;
        if (result.equals(AREA) && pure) {
            area = scaledArea(ln, rn, l, r, shape, b);
        } else {
            area = ln.area() != null && rn.area() == null ? ln.area() : rn.area() != null && ln.area() == null ? rn.area() : null;
        }
        BasisNotes.Coefficient c = ln.coefficient() != null && rn.coefficient() == null ? ln.coefficient()
            : rn.coefficient() != null && ln.coefficient() == null ? rn.coefficient() : null;
        if (ln.coefficient() != null && rn.area() != null) check(ln.coefficient(), rn.area(), b);
        if (rn.coefficient() != null && ln.area() != null) check(rn.coefficient(), ln.area(), b);
        if (ln.coefficient() != null && rn.density() != null) check(ln.coefficient(), rn.density(), b);
        if (rn.coefficient() != null && ln.density() != null) check(rn.coefficient(), ln.density(), b);
        return new BasisNotes(area, c, shape, pure, onlyOne(ln.density(), rn.density()));
    }

    private static BasisNotes.Density onlyOne(BasisNotes.Density a, BasisNotes.Density b) {
        return a != null && b == null ? a : b != null && a == null ? b : null;
    }

    /**
     * A force written out (½·ρ·V²·Cd·π·d·L): at the top of the product, the lengths among its
     * factors are the area. Called once per whole product, so π·d²/4 is judged after the /4.
     */
    void wholeProduct(Expr.Binary b, Value v) {
        BasisNotes n = notes(v);
        if (n.coefficient() == null || n.area() != null || n.pure() || n.shape() == null || !areaLike(n.shape())) return;
        Shape area = n.shape();
        if (area.kind() == null) area = new Shape(area.factor() * 2, area.lengths()); // the ½ of ½·ρ·V²
        if (area.kind() == null) return;
        check(n.coefficient(), new BasisNotes.Area(null, area.kind(), "the area in " + Shown.source(text, b.span()),
            area.frontalFormula()), b);
    }

    private static boolean areaLike(Shape s) {
        return s.lengths().values().stream().mapToInt(Integer::intValue).sum() == 2;
    }

    /** An area times a plain number keeps its tag; lengths times lengths make an untagged area. */
    private BasisNotes.Area scaledArea(BasisNotes ln, BasisNotes rn, Value l, Value r, Shape shape, Expr.Binary b) {
        Shape.Kind kind = shape == null ? null : shape.kind();
        if (ln.area() != null && rn.area() == null && r.dimensionless()) {
            return new BasisNotes.Area(ln.area().tag(), kind, Shown.source(text, b.span()), null, ln.area().flow());
        }
        if (rn.area() != null && ln.area() == null && l.dimensionless()) {
            return new BasisNotes.Area(rn.area().tag(), kind, Shown.source(text, b.span()), null, rn.area().flow());
        }
        if (ln.area() == null && rn.area() == null) {
            return new BasisNotes.Area(null, kind, Shown.source(text, b.span()), shape == null ? null : shape.frontalFormula());
        }
        return null;
    }

    BasisNotes divide(Value l, Value r, Dimension result) {
        BasisNotes ln = asFactor(l);
        BasisNotes rn = asFactor(r);
        Shape shape = ln.shape() != null && rn.shape() != null ? ln.shape().times(rn.shape(), -1) : null;
        boolean plainDivisor = rn.area() == null && rn.coefficient() == null;
        BasisNotes.Area area = ln.area() != null && plainDivisor && (!result.equals(AREA) || r.dimensionless())
            ? new BasisNotes.Area(ln.area().tag(), shape == null ? ln.area().kind() : shape.kind(), ln.area().label(), null,
                ln.area().flow())
            : null;
        if (area == null && result.equals(AREA) && ln.area() == null && shape != null && ln.pure() && rn.pure()) {
            area = new BasisNotes.Area(null, shape.kind(), null);
        }
        BasisNotes.Coefficient c = ln.coefficient() != null && plainDivisor ? ln.coefficient() : null;
        // ρ/2 is still that density; ρ_body/ρ_fluid is a ratio of two, and belongs to neither.
        BasisNotes.Density density = rn.density() == null ? ln.density() : null;
        return new BasisNotes(area, c, shape, ln.pure() && rn.pure(), density);
    }

    static BasisNotes sum(Value l, Value r) {
        BasisNotes ln = notes(l);
        BasisNotes rn = notes(r);
        BasisNotes.Area area = ln.area() != null && rn.area() != null && ln.area().tag() != null
            && ln.area().tag().equals(rn.area().tag()) ? new BasisNotes.Area(ln.area().tag(), null, null, null,
                java.util.Objects.equals(ln.area().flow(), rn.area().flow()) ? ln.area().flow() : null) : null;
        BasisNotes.Coefficient c = ln.coefficient() != null && rn.coefficient() != null
            && ln.coefficient().basis().equals(rn.coefficient().basis()) ? ln.coefficient() : null;
        BasisNotes.Density density = ln.density() != null && rn.density() != null
            && ln.density().tag().equals(rn.density().tag()) ? ln.density() : null;
        return new BasisNotes(area, c, null, true, density);
    }

    static BasisNotes power(Value base, double n) {
        BasisNotes bn = notes(base);
        boolean whole = n == Math.rint(n) && Math.abs(n) <= 8;
        return new BasisNotes(null, null, bn.shape() != null && whole ? bn.shape().pow((int) n) : null, bn.pure());
    }

    static BasisNotes negate(Value v) {
        BasisNotes n = notes(v);
        return n.withShape(n.shape() == null ? null : n.shape().negate());
    }

    /**
     * A value without a shape as a factor of a product, the way {@link #reference} treats a name:
     * a coefficient or another quantity written inline (a correlation's result, Cd·π·d·L·q)
     * joins as one factor of its own, so the lengths around it still make up the product's
     * shape; a plain number scales the shape. A length of unknown form stays unknown: the
     * product's shape cannot be told then.
     */
    private static BasisNotes asFactor(Value v) {
        BasisNotes n = notes(v);
        if (n.shape() != null || Dimension.LENGTH.equals(v.dimension())) return n;
        if (v.dimensionless() && n.coefficient() == null) return n.withShape(Shape.number(v.si()));
        return new BasisNotes(n.area(), n.coefficient(), Shape.number(1), false, n.density());
    }

    private static BasisNotes notes(Value v) {
        return v.notes() == null ? BasisNotes.NONE : v.notes();
    }

    /** Where a coefficient meets an area: the check itself. */
    private void check(BasisNotes.Coefficient c, BasisNotes.Area a, Expr.Binary b) {
        String area = a.label() == null ? "the area" : a.label();
        if (a.tag() != null) {
            if (a.tag().equals(c.basis())) {
                if (c.flow() != null && a.flow() != null && !c.flow().equals(a.flow())) {
                    warn(b, c.label() + " is referenced to " + c.basis() + " area in " + flowWords(c.flow()) + ", but "
                        + area + " is the " + a.tag() + " area in " + flowWords(a.flow()) + ": " + flowFix(c.flow()),
                        Severity.WARNING);
                }
                return;
            }
            warn(b, c.label() + " is referenced to " + c.basis() + " area, but " + area + " is tagged " + a.tag()
                + ": use the " + c.basis() + " area" + what(c.basis()), Severity.WARNING);
            return;
        }
        if (a.kind() == null) return;
        Shape.Kind k = a.kind();
        boolean wettedShape = k == Shape.Kind.LATERAL_SURFACE || k == Shape.Kind.SPHERE_SURFACE || k == Shape.Kind.BOTH_FACES;
        if (!c.basis().equals("wetted") && wettedShape) {
            String here = a.frontal() == null ? "" : " (here `" + a.frontal() + "`)";
            // When the area is a definition of the document, its formula can be replaced by the frontal one.
            java.util.List<FixRequest> fix = a.frontal() == null || a.label() == null ? java.util.List.of()
                : java.util.List.of(new FixRequest.Formula("Use the " + (c.basis().equals("planform") ? "planform" : "frontal")
                    + " area " + a.frontal() + " for " + a.label(), a.label(),
                    a.frontal()));
            reporter.report(Code.BASIS_AREA, b.span(), c.label() + " is referenced to " + c.basis() + " area, but " + area
                + " has the shape of " + k.words + ", a wetted area: " + frontalFix(k, c.basis()) + here, java.util.List.of(), fix);
        } else if ("crossflow".equals(c.flow()) && k == Shape.Kind.CIRCLE) {
            warn(b, c.label() + " is referenced to " + c.basis() + " area in cross-flow, but " + area + " has the shape of "
                + k.words + ", the end of a cylinder, which faces axial flow: " + flowFix(c.flow()), Severity.WARNING);
        } else if (c.basis().equals("wetted") && k == Shape.Kind.CIRCLE) {
            warn(b, c.label() + " is referenced to wetted area, but " + area + " has the shape of " + k.words
                + ", a frontal area: use the surface the flow runs over", Severity.WARNING);
        } else if (c.basis().equals("wetted") && k == Shape.Kind.RECTANGLE) {
            warn(b, c.label() + " is referenced to wetted area, and " + area + " is one rectangle: if the flow wets "
                + "both faces of a plate, the wetted area is 2·b·L", Severity.HINT);
        }
    }

    /** Where a coefficient meets a tagged density: a body's density does not belong there. */
    private void check(BasisNotes.Coefficient c, BasisNotes.Density d, Expr.Binary b) {
        if (!d.tag().equals("body")) return;
        reporter.report(Code.BASIS_DENSITY, Severity.WARNING, b.span(), c.label() + " scales the dynamic pressure of the "
            + "fluid, ½·ρ·V² with the fluid's ρ, but " + d.label() + " is tagged body: use the density of the fluid "
            + "around the body (the body's own density belongs in its weight)");
    }

    private static String frontalFix(Shape.Kind k, String basis) {
        return switch (k) {
            case LATERAL_SURFACE -> "for a cylinder in cross-flow use the projected area d·L";
            case SPHERE_SURFACE -> "for a sphere use the frontal area π·d²/4";
            // A lift coefficient's planform area, like a drag coefficient's frontal one, is one face of the plate.
            default -> basis.equals("planform") ? "the planform area of a wing or plate is one face, span times chord"
                : "the frontal area of a plate is one face, b·h";
        };
    }

    private static String flowWords(String flow) {
        return flow.equals("crossflow") ? "cross-flow (axis across the stream)" : "axial flow (along the axis)";
    }

    /** The area that faces a flow direction, and the library's helper for a cylinder. */
    private static String flowFix(String flow) {
        return flow.equals("crossflow") ? "use the projected area d·L, cylinder_projected_area(d, L)"
            : "use the end area π·d²/4, cylinder_end_area(d)";
    }

    private static String what(String basis) {
        return switch (basis) {
            case "frontal" -> " (the area projected on a plane normal to the flow)";
            case "wetted" -> " (the surface the flow runs over)";
            default -> " (the plan area of the wing or plate)";
        };
    }

    private void warn(Expr.Binary b, String message, Severity severity) {
        reporter.report(Code.BASIS_AREA, severity, b.span(), message);
    }
}
