package dev.plumb.lsp;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Printable;
import dev.plumb.report.CalcReport;
import java.io.IOException;
import java.net.URI;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.eclipse.lsp4j.jsonrpc.CancelChecker;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;

/**
 * The command {@value #COMMAND}: the printable report of an open calc, made from the text the
 * editor has (saved or not) and written where a client can open it ({@link ReportFiles}). Its
 * one argument is the document's URI (a string, or an object with a {@code uri}); it answers
 * {@code {uri, path, beside, message}}. Anything else is refused with a sentence that says what
 * to send instead.
 */
final class WriteReport {
    static final String COMMAND = "plumb.writeReport";
    /** A run that an edit made pointless is tried again this often before the engineer is asked to retry. */
    private static final int ATTEMPTS = 3;

    private final DocumentStore documents;
    private final Analyses analyses;
    private final ReportFiles files;

    WriteReport(DocumentStore documents, Analyses analyses, ReportFiles files) {
        this.documents = documents;
        this.analyses = analyses;
        this.files = files;
    }

    /** The commit the calc's file is at, and whether the editor's text is that file's (an unsaved edit is not). */
    private static String revision(Path calc, Analysis analysis) {
        // Read as every calc is read (inside the workspace, regular files, within the size limit).
        dev.plumb.analysis.FileSources disk = new dev.plumb.analysis.FileSources();
        boolean unsaved = !(disk.load(calc, disk.workspaceRoot(calc)) instanceof dev.plumb.analysis.Sources.Text t
            && t.text().equals(analysis.text()));
        String head = dev.plumb.revisions.HeadState.of(calc).map(dev.plumb.revisions.HeadState::words).orElse(null);
        if (!unsaved) return head;
        return (head == null ? "" : head + "; ") + "made from the editor's unsaved text";
    }

    JsonObject run(List<Object> arguments, CancelChecker cancel) {
        String uri = uriArgument(arguments);
        Path calc = fileOf(uri);
        Analysis analysis = analysisOf(uri, cancel);
        String name = Printable.line(calc.getFileName().toString());
        String html;
        try {
            html = CalcReport.html(analysis, analysis.diagnostics(),
                new CalcReport.Context(files.shownPath(calc), LocalDate.now().toString(), revision(calc, analysis)));
        } catch (RuntimeException | StackOverflowError e) {
            System.err.println("plumb lsp: the report of " + uri + " failed: " + e);
            throw failed("Plumb could not make the report of " + name + " (" + e.getClass().getSimpleName()
                + "); please report it, with the calc");
        }
        cancel.checkCanceled();
        ReportFiles.Written written;
        try {
            written = files.write(calc, html);
        } catch (IOException | SecurityException e) {
            throw failed("Plumb could not write the report of " + name + ", beside it or to a temporary file: "
                + Printable.line(String.valueOf(e.getMessage())));
        }
        String where = Printable.line(written.file().toString());
        JsonObject result = new JsonObject();
        result.addProperty("uri", written.file().toUri().toString());
        result.addProperty("path", written.file().toString());
        result.addProperty("beside", written.beside());
        result.addProperty("message", written.beside()
            ? "Wrote the report of " + name + " beside it: " + where
            : "Wrote the report of " + name + " to a temporary file, " + where + ", because " + written.whyNotBeside());
        return result;
    }

    /** The document's URI from the command's arguments: a string, or an object with a string {@code uri}. */
    static String uriArgument(List<Object> arguments) {
        if (arguments == null || arguments.isEmpty() || arguments.get(0) == null) {
            throw invalid(COMMAND + " needs the calc's document URI as its argument, e.g. [\"file:///work/pod.plumb\"]");
        }
        Object first = arguments.get(0);
        if (first instanceof String s) return s;
        if (first instanceof JsonElement e) {
            if (e.isJsonPrimitive() && e.getAsJsonPrimitive().isString()) return e.getAsString();
            JsonElement u = e.isJsonObject() ? e.getAsJsonObject().get("uri") : null;
            if (u != null && u.isJsonPrimitive() && u.getAsJsonPrimitive().isString()) return u.getAsString();
        }
        throw invalid(COMMAND + " takes the calc's document URI, a string (or an object with a \"uri\"), "
            + "as its first argument, not " + Printable.line(shortened(String.valueOf(first))));
    }

    /** The file a URI names; a URI that names no file is refused (the report is written beside its calc). */
    private static Path fileOf(String uri) {
        URI u;
        try {
            u = new URI(uri);
        } catch (java.net.URISyntaxException e) {
            throw invalid(quoted(uri) + " is not a URI: give the calc's document URI, e.g. file:///work/pod.plumb");
        }
        if (!"file".equalsIgnoreCase(u.getScheme())) {
            throw invalid(quoted(uri) + " is not a file: save the calc as a .plumb file, then write its report");
        }
        try {
            return Path.of(u).toAbsolutePath().normalize();
        } catch (IllegalArgumentException | java.nio.file.FileSystemNotFoundException | SecurityException e) {
            throw invalid(quoted(uri) + " names no file on this machine: give a URI such as file:///work/pod.plumb");
        }
    }

    /** The analysis of the document's current text: the server's own, made now if the last one is out of date. */
    private Analysis analysisOf(String uri, CancelChecker cancel) {
        for (int attempt = 0; attempt < ATTEMPTS; attempt++) {
            if (documents.get(uri) == null) {
                throw invalid(quoted(uri) + " is not open in the editor: the report is made from the text the editor has, "
                    + "so open the calc first");
            }
            Analysis a = analyses.current(uri);
            cancel.checkCanceled();
            if (a != null) return a;
        }
        throw failed("the calc changed while its report was being made: write it again once the edits have settled");
    }

    private static String quoted(String uri) {
        return "\"" + Printable.line(shortened(uri)) + "\"";
    }

    /** Long arguments are cut: a message repeats what was sent only so far as it helps to recognise it. */
    private static String shortened(String s) {
        return s.codePointCount(0, s.length()) <= 200 ? s : s.substring(0, s.offsetByCodePoints(0, 200)) + "…";
    }

    private static ResponseErrorException invalid(String message) {
        return new ResponseErrorException(new ResponseError(ResponseErrorCode.InvalidParams, message, null));
    }

    private static ResponseErrorException failed(String message) {
        return new ResponseErrorException(new ResponseError(ResponseErrorCode.RequestFailed, message, null));
    }
}
