package lamella.fit;

import lamella.api.ParameterRef;

/**
 * An input the fit adjusts. Positive quantities are fitted as u = ln p, so that steps are relative and the value
 * cannot change sign; others as u = p / scale.
 *
 * @param ref     which input
 * @param initial the starting value
 * @param min     lower bound (−∞ if none)
 * @param max     upper bound (+∞ if none)
 * @param logScale whether u = ln p
 * @param scale   for linear inputs, the size of a unit step in u
 * @param path    JSON path of its entry, for messages
 */
record FreeInput(ParameterRef ref, double initial, double min, double max, boolean logScale, double scale,
                 String path) {

    double toU(double p) {
        return logScale ? Math.log(p) : p / scale;
    }

    double toP(double u) {
        return logScale ? Math.exp(u) : u * scale;
    }

    /** dp/du at u. */
    double dPdU(double u) {
        return logScale ? Math.exp(u) : scale;
    }

    double uMin() {
        return min == Double.NEGATIVE_INFINITY || (logScale && min <= 0) ? Double.NEGATIVE_INFINITY : toU(min);
    }

    double uMax() {
        return max == Double.POSITIVE_INFINITY ? Double.POSITIVE_INFINITY : toU(max);
    }

    boolean bounded() {
        return Double.isFinite(uMin()) && Double.isFinite(uMax());
    }
}
