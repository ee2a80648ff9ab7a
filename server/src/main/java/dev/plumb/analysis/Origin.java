package dev.plumb.analysis;

/**
 * Where a value comes from when it is a correlation's result: what later checks need (the
 * area basis of a coefficient, the accuracy for uncertainty). Null parts are not stated.
 *
 * @param accuracy relative accuracy as a fraction (0.05 for "accuracy 5 %")
 * @param flow the flow direction its frontal basis faces (crossflow or axial), or null
 */
public record Origin(String correlation, String basis, Double accuracy, String flow) {
    public Origin(String correlation, String basis, Double accuracy) {
        this(correlation, basis, accuracy, null);
    }

    /** "frontal basis, cross-flow" as a reviewer reads it; null when no basis is stated. */
    public String basisWords() {
        if (basis == null) return null;
        if (flow == null) return basis + " basis";
        return basis + " basis, " + (flow.equals("crossflow") ? "cross-flow" : flow.equals("axial") ? "axial flow" : flow);
    }
}
