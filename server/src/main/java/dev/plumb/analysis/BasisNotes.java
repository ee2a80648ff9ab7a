package dev.plumb.analysis;

/**
 * What a value knows about reference areas, for the basis check (docs/language.md, "Area
 * basis"): the tag and shape of an area it is or holds as a factor, the basis of a coefficient
 * it is or holds as a factor, and the shape of a product of lengths.
 *
 * @param area an area this value is, or holds as a factor (a force Cd·A·q holds A); null for none
 * @param coefficient a coefficient with a basis this value is, or holds as a factor; null for none
 * @param shape the canonical product of the lengths and numbers among this value's factors (π·d·L in
 *     ½·ρ·V²·Cd·π·d·L); null when it is not a product
 * @param pure true when the value is nothing but that product of lengths and numbers
 * @param density a tagged density this value is, or holds as a factor (a dynamic pressure ½·ρ·V²
 *     holds ρ); null for none
 */
record BasisNotes(Area area, Coefficient coefficient, Shape shape, boolean pure, Density density) {
    static final BasisNotes NONE = new BasisNotes(null, null, null, true);

    BasisNotes(Area area, Coefficient coefficient, Shape shape, boolean pure) {
        this(area, coefficient, shape, pure, null);
    }

    BasisNotes(Area area, Coefficient coefficient, Shape shape) {
        this(area, coefficient, shape, true);
    }

    /** @param tag fluid or body; @param label how the message names it */
    record Density(String tag, String label) {
    }

    /**
     * @param tag frontal, wetted or planform, or null
     * @param label how the message names it
     * @param frontal the frontal area's formula in the same names (d * L for π·d·L), or null
     * @param flow the flow direction a frontal area faces, crossflow or axial (the projected area d·L
     *     of a cylinder, or its end π·d²/4); null when not stated
     */
    record Area(String tag, Shape.Kind kind, String label, String frontal, String flow) {
        Area(String tag, Shape.Kind kind, String label, String frontal) {
            this(tag, kind, label, frontal, null);
        }

        Area(String tag, Shape.Kind kind, String label) {
            this(tag, kind, label, null, null);
        }
    }

    /**
     * @param name the value's name where it is used; @param origin the correlation it came from
     * @param flow the flow direction its basis faces (basis frontal crossflow), or null
     */
    record Coefficient(String basis, String name, String origin, String flow) {
        String label() {
            return origin == null || origin.equals(name) ? name : name + " (from " + origin + ")";
        }
    }

    BasisNotes withArea(Area a) {
        return new BasisNotes(a, coefficient, shape, pure, density);
    }

    BasisNotes withCoefficient(Coefficient c) {
        return new BasisNotes(area, c, shape, pure, density);
    }

    BasisNotes withShape(Shape s) {
        return new BasisNotes(area, coefficient, s, pure, density);
    }

    BasisNotes withDensity(Density d) {
        return new BasisNotes(area, coefficient, shape, pure, d);
    }

    /** A factor that is not a length or a number: it joins products without adding to their shape. */
    static BasisNotes impure(Shape shape) {
        return new BasisNotes(null, null, shape, false);
    }

    boolean empty() {
        return area == null && coefficient == null && shape == null && density == null;
    }
}
