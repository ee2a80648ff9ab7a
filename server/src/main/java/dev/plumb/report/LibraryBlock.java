package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.analysis.EntryCurve;
import dev.plumb.analysis.StdlibCatalog;
import dev.plumb.present.CallText;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** The library entries and tables the calc relies on: what each is, its range, and where each call sits in it. */
final class LibraryBlock {
    private LibraryBlock() {
    }

    /** Samples per curve: smooth at the size printed. */
    private static final int POINTS = 90;

    static String html(Analysis a, References references, dev.plumb.units.UnitRegistry units) {
        Map<String, List<Analysis.CallSite>> byEntry = new LinkedHashMap<>();
        List<Analysis.CallSite> calls = new java.util.ArrayList<>(a.calls());
        calls.sort(java.util.Comparator.comparingInt(c -> c.callee().start()));
        for (Analysis.CallSite c : calls) byEntry.computeIfAbsent(c.name(), k -> new java.util.ArrayList<>()).add(c);
        if (byEntry.isEmpty()) return "";
        StringBuilder out = new StringBuilder("<section class=\"library\"><h2>Library entries used</h2>");
        for (var e : byEntry.entrySet()) {
            Binding b = a.scope().lookup(e.getKey());
            out.append("<div class=\"entry\">");
            out.append(Html.element("h3", null, Html.element("code", null, Html.text(e.getKey())) + " — "
                + Html.text(title(b)) + references.cite(e.getKey())));
            String valid = b == null ? "" : StdlibCatalog.validText(b);
            String accuracy = b == null ? null : StdlibCatalog.accuracyText(b);
            out.append(Html.element("p", "range", (valid.isEmpty() ? "No stated range." : "Valid: " + Html.text(valid))
                + (accuracy == null ? "" : (valid.isEmpty() ? " " : ". ") + "Accuracy: ±" + Html.text(accuracy) + ".")));
            out.append("<ul class=\"calls\">");
            for (Analysis.CallSite c : e.getValue()) {
                boolean outside = c.standing() == Analysis.Standing.OUTSIDE || c.standing() == Analysis.Standing.OUTSIDE_DOMAIN
                    || c.standing() == Analysis.Standing.TABLE_BEYOND;
                String line = "line " + a.lines().line(c.callee().start()) + ": " + CallText.arguments(c) + " — "
                    + CallText.standing(c) + (c.used() == null ? "" : "; fit used: " + c.used());
                // Drawn where the entry states a range: the plot is there to show where the call sits in it.
                var curve = EntryCurve.of(a, c, units, POINTS)
                    .filter(k -> !Double.isNaN(k.low()) || !Double.isNaN(k.high()));
                String plot = curve.map(k -> "<figure class=\"plot\">" + CurvePlot.svg(k)
                    + Html.element("figcaption", null, Html.text(CurvePlot.caption(k))) + "</figure>").orElse("");
                // A ranged call without its picture says why, rather than leaving the reader to wonder.
                if (curve.isEmpty() && c.standing() != Analysis.Standing.NO_RANGE) {
                    plot = Html.element("p", "no-plot", "Not drawn: the entry could not be sampled around this call "
                        + "(more work than a picture is given).");
                }
                out.append(Html.element("li", outside ? "outside" : "inside", (outside ? "⚠ " : "") + Html.text(line) + plot));
            }
            out.append("</ul></div>");
        }
        return out.append("</section>").toString();
    }

    private static String title(Binding b) {
        if (b instanceof Binding.CorrelationBinding c && c.def().title() != null) return c.def().title();
        if (b instanceof Binding.TableBinding t && t.def().title() != null) return t.def().title();
        return "";
    }
}
