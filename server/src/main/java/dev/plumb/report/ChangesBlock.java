package dev.plumb.report;

/**
 * A report made against an earlier revision: a box after the opening prose saying what it was
 * compared with and which checks flipped, and beside each changed value its former reading,
 * marked with Δ (a mark, not a colour, so it survives black-and-white printing).
 */
final class ChangesBlock {
    private ChangesBlock() {
    }

    static String html(CalcReport.Changes changes) {
        if (changes == null) return "";
        StringBuilder out = new StringBuilder("<section class=\"changes\">");
        out.append(Html.element("h2", null, "Changes since " + Html.text(changes.against())));
        out.append(Html.element("p", null, changes.values().size() + " value" + (changes.values().size() == 1 ? "" : "s")
            + " changed (marked Δ below, each with its former value); " + changes.flipped().size() + " check"
            + (changes.flipped().size() == 1 ? "" : "s") + " flipped."));
        if (!changes.flipped().isEmpty()) {
            out.append("<ul>");
            changes.flipped().forEach(f -> out.append(Html.element("li", null, Html.text(f))));
            out.append("</ul>");
        }
        return out.append("</section>").toString();
    }

    /** The former reading of a value that changed, or null. */
    static String of(CalcReport.Changes changes, String name) {
        return changes == null ? null : changes.values().get(name);
    }

    /** " Δ was …" after a changed value; "" for one that did not change. */
    static String mark(String change) {
        return change == null ? "" : " " + Html.element("span", "change", "Δ " + Html.text(change));
    }
}
