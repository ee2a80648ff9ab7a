package dev.plumb.report;

import dev.plumb.analysis.Value;

/**
 * The value behind what a reader sees, as attributes for tools (and for the tests that hold the
 * page to `plumb eval --format json`): the name, the SI number and the text shown.
 */
final class Data {
    private Data() {
    }

    static String of(String name, Value v, ShownValue shown) {
        String si = v.known() ? " data-si=\"" + v.si() + "\"" : "";
        String text = dev.plumb.units.QuantityFormat.join(shown.number(), shown.unit());
        return " data-name=\"" + Html.text(name) + "\"" + si + " data-shown=\""
            + Html.text(text) + "\"";
    }
}
