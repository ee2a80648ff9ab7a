package dev.plumb.compare;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import java.util.Set;

/**
 * One file at one revision: its analysis with the findings that stand (after the whole set was
 * looked at), or nothing when the file does not exist there. A file that exists but could not be
 * read (not UTF-8, too large, out of memory) keeps why in {@code unreadable}: its values are then
 * not known at that revision, which is not the same as removed.
 *
 * @param analysis the analysis, null when the file does not exist at this revision
 * @param findings the findings that stand
 * @param unreadable why the file could not be analysed at all, or null
 */
public record Side(Analysis analysis, List<Diagnostic> findings, String unreadable) {
    /** Codes that mean the engine never got to the file's statements. */
    private static final Set<Code> UNREAD = Set.of(Code.FILE_UNREADABLE, Code.FILE_NOT_TEXT, Code.LIMIT_MEMORY,
        Code.SYNTAX_NESTING);

    public Side {
        findings = List.copyOf(findings);
    }

    /** The file does not exist at this revision. */
    public static Side absent() {
        return new Side(null, List.of(), null);
    }

    /** A file's analysis with the findings that stand for it. */
    public static Side of(Analysis a, List<Diagnostic> findings) {
        String why = null;
        if (a.rows().isEmpty()) {
            for (Diagnostic d : findings) {
                if (UNREAD.contains(d.code())) {
                    why = d.message();
                    break;
                }
            }
        }
        return new Side(a, findings, why);
    }

    public boolean exists() {
        return analysis != null;
    }

    /** Exists and was analysed: its values and checks can be compared. */
    public boolean readable() {
        return analysis != null && unreadable == null;
    }
}
