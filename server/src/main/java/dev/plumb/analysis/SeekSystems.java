package dev.plumb.analysis;

import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** Small facts about a several-unknown solve shared by the passes that plan and run it. */
final class SeekSystems {
    private SeekSystems() {
    }

    /** The unknowns' names, in the order written. */
    static List<String> unknowns(Statement.SeekSystem k) {
        List<String> out = new ArrayList<>();
        for (Ident i : k.system().unknowns()) out.add(i.text());
        return out;
    }

    /** The first unknown: its statement solves the system, the others follow it. */
    static String leader(Statement.SeekSystem k) {
        return k.system().unknowns().get(0).text();
    }

    /**
     * Whether every unknown is defined by this system's own statements. When one is defined
     * elsewhere first (name.duplicate, reported there), binding trial values to it would change
     * another definition's value: the system is then not solved.
     */
    static boolean ownsAll(Statement.SeekSystem k, Map<String, Statement> own) {
        List<Ident> unknowns = k.system().unknowns();
        for (int i = 0; i < unknowns.size(); i++) {
            // An unknown written twice is defined by its first statement only: the system is then not solved.
            if (!(own.get(unknowns.get(i).text()) instanceof Statement.SeekSystem m) || !m.system().equals(k.system())
                || m.index() != i) {
                return false;
            }
        }
        return true;
    }
}
