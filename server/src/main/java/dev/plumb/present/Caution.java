package dev.plumb.present;

/** The notice every result carries: these calcs size things that can hurt people. */
public final class Caution {
    public static final String TEXT = "Plumb checks arithmetic, units and stated limits. Its results support, and never "
        + "replace, the judgement of a licensed engineer and the codes and standards that apply locally.";

    private Caution() {
    }
}
