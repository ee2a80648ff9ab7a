package dev.plumb.report;

import java.util.Map;

/**
 * Greek letters by their English names, as calcs written in ASCII spell them ({@code rho},
 * {@code mu}, {@code Delta}). Left out are the names whose letter looks like a Latin one
 * (omicron, and capital Alpha, Beta, Epsilon, Zeta, Eta, Iota, Kappa, Mu, Nu, Omicron, Rho, Tau,
 * Upsilon, Chi): shown as a Greek letter they would read as a different Latin symbol.
 */
final class GreekLetters {
    private static final Map<String, String> LETTERS = Map.ofEntries(
        Map.entry("alpha", "α"), Map.entry("beta", "β"), Map.entry("gamma", "γ"), Map.entry("delta", "δ"),
        Map.entry("epsilon", "ε"), Map.entry("zeta", "ζ"), Map.entry("eta", "η"), Map.entry("theta", "θ"),
        Map.entry("iota", "ι"), Map.entry("kappa", "κ"), Map.entry("lambda", "λ"), Map.entry("mu", "μ"),
        Map.entry("nu", "ν"), Map.entry("xi", "ξ"), Map.entry("pi", "π"), Map.entry("rho", "ρ"),
        Map.entry("sigma", "σ"), Map.entry("tau", "τ"), Map.entry("upsilon", "υ"), Map.entry("phi", "φ"),
        Map.entry("chi", "χ"), Map.entry("psi", "ψ"), Map.entry("omega", "ω"),
        Map.entry("Gamma", "Γ"), Map.entry("Delta", "Δ"), Map.entry("Theta", "Θ"), Map.entry("Lambda", "Λ"),
        Map.entry("Xi", "Ξ"), Map.entry("Pi", "Π"), Map.entry("Sigma", "Σ"), Map.entry("Phi", "Φ"),
        Map.entry("Psi", "Ψ"), Map.entry("Omega", "Ω"));

    private GreekLetters() {
    }

    /** The letter a whole word names, or null when the word is no Greek letter's name. */
    static String named(String word) {
        return LETTERS.get(word);
    }

    /** Whether a letter is a capital Greek one, shown upright (see {@link SymbolMath}). */
    static boolean isCapital(String letter) {
        return letter.length() == 1 && letter.charAt(0) >= 'Α' && letter.charAt(0) <= 'Ω';
    }
}
