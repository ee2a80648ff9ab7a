package dev.plumb.analysis;

import dev.plumb.units.Dimension;
import dev.plumb.units.Unit;
import java.util.Set;

/**
 * Which values are angles. Angles are dimensionless in Plumb (rad is 1, deg is π/180), so the
 * dimension cannot tell 30 (radians, 1719°) from 30 deg; a value is an angle when it was written
 * in an angle unit or computed by an inverse trigonometric function, and stays one through
 * names, unary minus, sums of angles and plain-number factors (2·θ, θ/2).
 */
final class Angles {
    /** The angle units a quantity may be written in; `sr` is a solid angle and not among them. */
    private static final Set<String> UNITS = Set.of("rad", "mrad", "µrad", "μrad", "urad", "deg", "°");

    private Angles() {
    }

    static boolean isAngleUnit(String written, Unit unit) {
        return unit.dimension().equals(Dimension.NONE) && UNITS.contains(written);
    }

    /** An angle times (or over) a plain number that is not itself an angle is still an angle. */
    static boolean scaled(Value angle, Value factor) {
        return angle.angle() && !factor.angle() && factor.dimensionless();
    }
}
