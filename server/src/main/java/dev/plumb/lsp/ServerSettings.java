package dev.plumb.lsp;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * What the editor may set (initializationOptions or workspace/configuration section "plumb"):
 * significant figures, which value channels are on, the debounce delay, diagnostics on save only,
 * the critical Reynolds number of the regime checks, the size limit of one calc, and how many
 * Monte Carlo samples of the tolerances to draw (none by default) from which seed.
 */
record ServerSettings(int digits, boolean inlayHints, boolean codeLens, boolean valueDiagnostics, int debounceMs,
                      boolean onSaveOnly, Double criticalReynolds, long maxFileBytes, int monteCarloSamples,
                      long monteCarloSeed) {
    static final ServerSettings DEFAULT = new ServerSettings(4, true, true, false, 100, false, null,
        dev.plumb.analysis.DiskReads.DEFAULT_MAX_BYTES, 0, dev.plumb.analysis.Settings.DEFAULT_SEED);

    ServerSettings withChannels(boolean inlayHints, boolean codeLens, boolean valueDiagnostics) {
        return new ServerSettings(digits, inlayHints, codeLens, valueDiagnostics, debounceMs, onSaveOnly, criticalReynolds,
            maxFileBytes, monteCarloSamples, monteCarloSeed);
    }

    /** Reads known keys from a JSON object; unknown keys and wrong types keep the current value. */
    ServerSettings with(Object json) {
        if (json instanceof com.google.gson.JsonElement e && e.isJsonObject()) json = e.getAsJsonObject();
        if (!(json instanceof JsonObject o)) return this;
        if (o.has("plumb") && o.get("plumb").isJsonObject()) o = o.getAsJsonObject("plumb");
        return new ServerSettings(
            Math.max(1, Math.min(15, integer(o, "significantFigures", digits))),
            bool(o, "inlayHints", inlayHints),
            bool(o, "codeLens", codeLens),
            bool(o, "valueDiagnostics", valueDiagnostics),
            Math.max(0, Math.min(5000, integer(o, "debounceMs", debounceMs))),
            bool(o, "diagnosticsOnSaveOnly", onSaveOnly),
            positive(o, "criticalReynolds", criticalReynolds),
            Math.max(1024, (long) integer(o, "maxFileBytes", (int) Math.min(Integer.MAX_VALUE, maxFileBytes))),
            // Clamped like the others: every Monte Carlo line says how many samples it drew.
            Math.max(0, Math.min(dev.plumb.analysis.Settings.MAX_SAMPLES, integer(o, "monteCarloSamples", monteCarloSamples))),
            longInteger(o, "monteCarloSeed", monteCarloSeed));
    }

    private static Double positive(JsonObject o, String key, Double fallback) {
        JsonElement e = o.get(key);
        try {
            double v = e != null && e.isJsonPrimitive() ? e.getAsDouble() : Double.NaN;
            return v > 0 && Double.isFinite(v) ? Double.valueOf(v) : fallback;
        } catch (NumberFormatException ex) {
            return fallback;
        }
    }

    private static int integer(JsonObject o, String key, int fallback) {
        JsonElement e = o.get(key);
        try {
            return e != null && e.isJsonPrimitive() ? e.getAsInt() : fallback;
        } catch (NumberFormatException ex) {
            return fallback;
        }
    }

    private static long longInteger(JsonObject o, String key, long fallback) {
        JsonElement e = o.get(key);
        try {
            return e != null && e.isJsonPrimitive() && e.getAsJsonPrimitive().isNumber() ? e.getAsLong() : fallback;
        } catch (NumberFormatException ex) {
            return fallback;
        }
    }

    private static boolean bool(JsonObject o, String key, boolean fallback) {
        JsonElement e = o.get(key);
        return e != null && e.isJsonPrimitive() && e.getAsJsonPrimitive().isBoolean() ? e.getAsBoolean() : fallback;
    }
}
