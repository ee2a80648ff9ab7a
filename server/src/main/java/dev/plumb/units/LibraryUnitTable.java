package dev.plumb.units;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The units that come from the unit library ({@link LibraryUnits}), written out once as a table
 * that ships in the jar ({@value #RESOURCE}): reading them from the library costs a fresh process
 * about a quarter of a second of its start, the table a millisecond. {@code LibraryUnitTableTest}
 * compares the table with what the library says, so the two cannot drift; it rewrites the table
 * with {@code -Dupdate.golden=true}.
 *
 * <p>One unit per line, tab-separated: the spellings (comma-separated, canonical first), the name
 * in words, the factor and offset to SI (as Java prints a double, so they read back exactly), the
 * exponents of the seven SI base dimensions, and whether SI prefixes attach. Lines starting with
 * {@code #} are comments.
 */
final class LibraryUnitTable {
    static final String RESOURCE = "library-units.tsv";

    private LibraryUnitTable() {
    }

    /** The table's text for these definitions. */
    static String text(List<AtomDefinition> definitions) {
        StringBuilder b = new StringBuilder();
        b.append("# Generated from the unit library by LibraryUnitTableTest (-Dupdate.golden=true); do not edit.\n");
        b.append("# spellings\tname\tfactor\toffset\tm kg s A K mol cd\tprefixes\n");
        for (AtomDefinition d : definitions) {
            AtomUnit u = d.unit();
            int[] e = new int[Dimension.BASE_COUNT];
            for (int i = 0; i < e.length; i++) e[i] = u.dimension().exponent(i);
            b.append(String.join(",", d.spellings())).append('\t').append(u.name()).append('\t')
                .append(Double.toString(u.factor())).append('\t').append(Double.toString(u.offset())).append('\t')
                .append(String.join(" ", Arrays.stream(e).mapToObj(Integer::toString).toList())).append('\t')
                .append(d.prefixable() ? "yes" : "no").append('\n');
        }
        return b.toString();
    }

    /** The definitions the table holds; a table that cannot be read is a fault of the build. */
    static List<AtomDefinition> read() {
        try (InputStream in = LibraryUnitTable.class.getResourceAsStream(RESOURCE)) {
            if (in == null) throw new IllegalStateException("the unit table " + RESOURCE + " is missing from the build");
            return parse(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new IllegalStateException("cannot read the unit table " + RESOURCE, e);
        }
    }

    static List<AtomDefinition> parse(String text) {
        List<AtomDefinition> out = new ArrayList<>();
        for (String line : text.split("\n")) {
            if (line.isBlank() || line.startsWith("#")) continue;
            String[] f = line.split("\t", -1);
            if (f.length != 6) throw new IllegalStateException("a broken line in the unit table: " + line);
            List<String> spellings = List.of(f[0].split(","));
            int[] e = Arrays.stream(f[4].split(" ")).mapToInt(Integer::parseInt).toArray();
            Dimension dimension = Dimension.of(e[0], e[1], e[2], e[3], e[4], e[5], e[6]);
            AtomUnit unit = new AtomUnit(spellings.get(0), f[1], Double.parseDouble(f[2]), Double.parseDouble(f[3]),
                dimension);
            out.add(new AtomDefinition(spellings, unit, f[5].toLowerCase(Locale.ROOT).equals("yes")));
        }
        return out;
    }
}
