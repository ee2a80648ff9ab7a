package dev.plumb.report;

import dev.plumb.syntax.SourceParser;
import dev.plumb.syntax.Statement;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A page of typeset formulas for the browser test: the kinds a report shows, in symbols and with
 * values, and a script that measures a fraction, a root and a power as the browser laid them out
 * and writes the numbers into {@code <pre id="layout">}.
 */
final class FormulaPage {
    private static final String CALC = String.join("\n",
        "Re_L = V_tow * L_wl / nu_sw",
        "q = 0.5 * rho * V^2",
        "w = sqrt(2 * F_free / (rho * C_D * A_b))",
        "cf = 0.664 / sqrt(Re) when Re <= 5e5 otherwise 0.0592 / Re^0.2",
        "Cd = 1.18 + 6.8 / Re^0.89 + 1.96 / Re^0.5 - 0.0004 * Re / (1 + 3.64e-7 * Re^2)",
        "Delta_T = abs(T_wall - T_0) / (log10(Re))^2.58 + Re^(-2/3)",
        "check 1e5 < Re_L <= 1e7",
        "");

    private static final ValueSource VALUES = ValueSource.of(Map.ofEntries(
        Map.entry("rho", new ShownValue("1.204", "kg/m^3")),
        Map.entry("V", new ShownValue("31", "m/s")),
        Map.entry("F_free", new ShownValue("4.82", "N")),
        Map.entry("C_D", ShownValue.plain("0.47")),
        Map.entry("A_b", new ShownValue("2.01", "m^2")),
        Map.entry("T_wall", new ShownValue("61", "degC")),
        Map.entry("T_0", new ShownValue("-4", "degC")),
        Map.entry("Re", ShownValue.plain("8.4e5")),
        Map.entry("V_tow", new ShownValue("3.6", "m/s")),
        Map.entry("L_wl", new ShownValue("45", "m")),
        Map.entry("nu_sw", new ShownValue("1.19e-6", "m^2/s")),
        Map.entry("Re_L", ShownValue.plain("1.36e8"))));

    private static final String MEASURE = """
        <script>
        function box(e) { return e.getBoundingClientRect(); }
        const f = document.querySelector('#fraction mfrac');
        const r = document.querySelector('#root msqrt');
        const s = document.querySelector('#power msup');
        const m = {
          fraction: box(f).height, numerator: box(f.children[0]).height, denominator: box(f.children[1]).height,
          root: box(r).height, radicand: box(r.children[0]).height,
          rootWidth: box(r).width, radicandWidth: box(r.children[0]).width,
          exponentBottom: box(s.children[1]).bottom, baseBottom: box(s.children[0]).bottom };
        document.getElementById('layout').textContent =
          Object.entries(m).map(([k, v]) => k + '=' + v.toFixed(2)).join(' ');
        </script>
        """;

    private FormulaPage() {
    }

    static String html() {
        FormulaMath math = Written.MATH;
        List<Statement> s = SourceParser.parse(CALC).statements();
        Statement.Definition reynolds = (Statement.Definition) s.get(0);
        Statement.Definition dynamic = (Statement.Definition) s.get(1);
        Statement.Definition ascent = (Statement.Definition) s.get(2);
        Statement.Check check = (Statement.Check) s.get(6);
        Map<String, String> sections = new LinkedHashMap<>();
        sections.put("fraction", math.definition(reynolds, ValueSource.none())
            + math.definition(reynolds, VALUES, ShownValue.plain("1.36e8")));
        sections.put("power", math.definition(dynamic, ValueSource.none())
            + math.definition(dynamic, VALUES, new ShownValue("578.5", "Pa")));
        sections.put("root", math.definition(ascent, ValueSource.none())
            + math.definition(ascent, VALUES, new ShownValue("2.86", "m/s")));
        sections.put("pieces", math.definition((Statement.Definition) s.get(3), ValueSource.none()));
        sections.put("chain", math.definition((Statement.Definition) s.get(4), ValueSource.none()));
        sections.put("calls", math.definition((Statement.Definition) s.get(5), ValueSource.none())
            + math.definition((Statement.Definition) s.get(5), VALUES, new ShownValue("65", "K")));
        sections.put("check", math.comparison(check.operands(), check.comparators(), ValueSource.none())
            + math.comparison(check.operands(), check.comparators(), VALUES));
        StringBuilder body = new StringBuilder();
        sections.forEach((id, formulas) -> body.append("<section id=\"").append(id).append("\">").append(formulas)
            .append("</section>\n"));
        return """
            <!DOCTYPE html>
            <html lang="en"><head><meta charset="utf-8"><title>Plumb: typeset formulas</title>
            <style>
            body { font: 15px/1.4 serif; margin: 20px 48px; color: #111; }
            section { border-bottom: 1px solid #ddd; padding: 4px 0; }
            math { font-size: 19px; text-align: left;
                   font-family: "STIX Two Math", "Cambria Math", "Latin Modern Math", "DejaVu Math TeX Gyre", math; }
            pre { font: 11px monospace; color: #666; white-space: pre-wrap; }
            </style></head><body>
            """ + body + "<pre id=\"layout\"></pre>\n" + MEASURE + "</body></html>\n";
    }
}
