package lamella.api;

import java.util.Arrays;
import java.util.Optional;

/** What lies beneath the last layer of a stack. */
public enum BottomBoundary {
    /** The last layer extends to infinite depth (it has no thickness). */
    SEMI_INFINITE("semi-infinite"),
    /** No heat leaves through the bottom face of the last layer. */
    ADIABATIC("adiabatic"),
    /** The bottom face of the last layer is held at the ambient temperature. */
    ISOTHERMAL("isothermal");

    private final String caseName;

    BottomBoundary(String caseName) {
        this.caseName = caseName;
    }

    /** The spelling used in case files. */
    public String caseName() {
        return caseName;
    }

    public static Optional<BottomBoundary> fromCaseName(String s) {
        return Arrays.stream(values()).filter(b -> b.caseName.equals(s)).findFirst();
    }
}
