package dev.plumb.analysis;

/**
 * Where a value comes from when it is a correlation's result: what later checks need (the
 * area basis of a coefficient, the accuracy for uncertainty). Null parts are not stated.
 *
 * @param accuracy relative accuracy as a fraction (0.05 for "accuracy 5 %")
 */
public record Origin(String correlation, String basis, Double accuracy) {
}
