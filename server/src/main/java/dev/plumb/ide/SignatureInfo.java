package dev.plumb.ide;

import java.util.List;

/** The signature of the call around the cursor: label, parameters, which one is being typed, and notes. */
public record SignatureInfo(String label, List<String> parameters, int active, String documentation) {
    public SignatureInfo {
        parameters = List.copyOf(parameters);
    }
}
