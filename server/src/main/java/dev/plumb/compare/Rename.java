package dev.plumb.compare;

/** A value whose name changed between the revisions while its formula stayed the same. */
public record Rename(String before, String after) {
}
