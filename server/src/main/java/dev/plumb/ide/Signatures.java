package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.analysis.StdlibCatalog;
import java.util.ArrayList;
import java.util.List;

/** Signature help: the call the cursor is in, its parameters with their dimensions, and its range. */
public final class Signatures {
    private Signatures() {
    }

    public static SignatureInfo at(Analysis a, int offset) {
        String text = a.text();
        int depth = 0;
        int commas = 0;
        for (int i = Math.min(offset, text.length()) - 1; i >= 0; i--) {
            char c = text.charAt(i);
            if (c == '\n') return null;
            if (c == ')') depth++;
            else if (c == ',' && depth == 0) commas++;
            else if (c == '(') {
                if (depth > 0) {
                    depth--;
                    continue;
                }
                int end = i;
                int start = end;
                while (start > 0 && (Character.isLetterOrDigit(text.charAt(start - 1)) || text.charAt(start - 1) == '_'
                    || text.charAt(start - 1) == '.')) start--;
                if (start == end) return null;
                String name = text.substring(start, end);
                Binding b = a.scope().lookup(name);
                if (b == null || b instanceof Binding.ValueBinding) return null;
                List<String> params = parameters(b);
                return new SignatureInfo(label(name, b), params, Math.min(commas, Math.max(0, params.size() - 1)),
                    documentation(b));
            }
        }
        return null;
    }

    /** Parameters as shown: "Re: dimensionless", "T: temperature", "x". */
    static List<String> parameters(Binding b) {
        List<String> out = new ArrayList<>();
        if (b instanceof Binding.CorrelationBinding c) {
            c.def().params().forEach(p -> out.add(p.written()));
        } else if (b instanceof Binding.TableBinding t) {
            out.add(t.def().param().written());
        } else if (b instanceof Binding.FunctionBinding f) {
            f.def().params().forEach(p -> out.add(p.text()));
        } else if (b instanceof Binding.BuiltinFunction f) {
            String sig = f.signature();
            String inner = sig.substring(sig.indexOf('(') + 1, sig.indexOf(')'));
            for (String p : inner.split(",")) if (!p.isBlank()) out.add(p.strip());
        }
        return out;
    }

    static String label(String name, Binding b) {
        return name + "(" + String.join(", ", parameters(b)) + ")";
    }

    private static String documentation(Binding b) {
        StringBuilder d = new StringBuilder();
        if (b instanceof Binding.CorrelationBinding c) {
            if (c.def().title() != null) d.append(c.def().title());
            if (c.def().basis() != null) {
                d.append("\nbasis: ").append(StdlibCatalog.basisText(c.def().basis(), c.def().flow()));
            }
        } else if (b instanceof Binding.TableBinding t && t.def().title() != null) {
            d.append(t.def().title());
        } else if (b instanceof Binding.BuiltinFunction f) {
            d.append(f.signature());
        }
        String valid = StdlibCatalog.validText(b);
        if (!valid.isEmpty()) d.append("\nvalid: ").append(valid);
        // A user's correlation title is shown in the editor: without its control characters.
        return dev.plumb.diagnostics.Printable.text(d.toString().strip());
    }
}
