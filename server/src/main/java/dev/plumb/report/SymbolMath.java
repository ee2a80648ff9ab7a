package dev.plumb.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A name of a calc as a typeset symbol. The rule, so that the reader can always get back to the
 * name as written:
 * <ul>
 *   <li>The part before the first {@code _} is the symbol, the rest its subscript: {@code F_D} is
 *       F with subscript D.</li>
 *   <li>Further underscores separate parts of the one subscript, shown with commas:
 *       {@code T_wall_max} is T with subscript "wall,max". Commas cannot occur in a name, so no two
 *       names look alike; a subscript of a subscript would be too small to read in print.</li>
 *   <li>A symbol that is the whole English name of a Greek letter is that letter ({@code rho} is
 *       ρ, {@code Delta_p} is Δ with subscript p); subscripts and longer words stay as written
 *       ({@code rho0}, {@code Re_theta}). Capital Greek letters stand upright, as a difference Δ
 *       or a sum Σ is usually printed.</li>
 *   <li>A name with an empty part ({@code _x}, {@code x_}, {@code a__b}) is shown exactly as
 *       written, underscores included.</li>
 * </ul>
 * Single letters are italic and longer words upright, MathML's own rule; subscripts made of digits
 * are numbers.
 */
final class SymbolMath {
    private SymbolMath() {
    }

    static String of(String name) {
        String[] parts = name.split("_", -1);
        for (String part : parts) {
            if (part.isEmpty()) return MathElements.mi(name);
        }
        String base = base(parts[0]);
        if (parts.length == 1) return base;
        List<String> index = new ArrayList<>();
        for (int i = 1; i < parts.length; i++) {
            if (i > 1) index.add(MathElements.mo(",", "0", "0.05"));
            index.add(part(parts[i]));
        }
        String subscript = index.size() == 1 ? index.get(0) : MathElements.row(index.toArray(String[]::new));
        return MathElements.sub(base, subscript);
    }

    private static String base(String word) {
        String greek = GreekLetters.named(word);
        if (greek == null) return MathElements.mi(word);
        return GreekLetters.isCapital(greek) ? MathElements.upright(greek) : MathElements.mi(greek);
    }

    private static String part(String word) {
        return word.chars().allMatch(c -> c >= '0' && c <= '9') ? MathElements.mn(word) : MathElements.mi(word);
    }
}
