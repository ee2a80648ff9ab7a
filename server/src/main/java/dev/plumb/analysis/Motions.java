package dev.plumb.analysis;

import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** Small facts about a motion statement shared by the passes that plan and run it. */
final class Motions {
    private Motions() {
    }

    /** The names it defines: the time first, then the states. */
    static List<String> names(Statement.Evolve k) {
        List<String> out = new ArrayList<>();
        for (Ident i : k.motion().names()) out.add(i.text());
        return out;
    }

    /** The time's name: its statement integrates the motion, the states follow it. */
    static String leader(Statement.Evolve k) {
        return k.motion().time().text();
    }

    /**
     * Whether every name is defined by this motion's own statement for it (see {@link SeekSystems#ownsAll}); a
     * name written twice in one motion (a state named like the time) is defined by the first only, so it fails.
     */
    static boolean ownsAll(Statement.Evolve k, Map<String, Statement> own) {
        List<Ident> names = k.motion().names();
        for (int i = 0; i < names.size(); i++) {
            if (!(own.get(names.get(i).text()) instanceof Statement.Evolve m) || !m.motion().equals(k.motion())
                || m.index() != i) {
                return false;
            }
        }
        return true;
    }
}
