package lamella.conditioning;

/**
 * What to do about the detection phase of TDTR data.
 *
 * @param mode        how the correction is found
 * @param fixedDeg    the rotation in degrees for {@link Mode#FIXED}
 * @param stepWindowS the half-width of the delay windows before and after zero delay for {@link Mode#FROM_STEP}, s
 */
public record PhaseCorrection(Mode mode, double fixedDeg, double stepWindowS) {

    /** The half-width of the zero-delay windows unless set: 20 ps. Common practice, no source. */
    public static final double DEFAULT_STEP_WINDOW_S = 20e-12;

    public enum Mode {
        /** Rotate so that the out-of-phase signal has no step across zero delay. */
        FROM_STEP,
        /** Rotate by a phase the user gives. */
        FIXED,
        /** Keep the signals as recorded. */
        AS_RECORDED
    }

    public PhaseCorrection {
        if (!Double.isFinite(fixedDeg) || !(stepWindowS > 0) || !Double.isFinite(stepWindowS)) {
            throw new IllegalArgumentException("phase " + fixedDeg + " deg, window " + stepWindowS + " s");
        }
    }

    public static PhaseCorrection fromStep(double windowS) {
        return new PhaseCorrection(Mode.FROM_STEP, 0, windowS);
    }

    public static PhaseCorrection fixed(double deg) {
        return new PhaseCorrection(Mode.FIXED, deg, DEFAULT_STEP_WINDOW_S);
    }

    public static PhaseCorrection asRecorded() {
        return new PhaseCorrection(Mode.AS_RECORDED, 0, DEFAULT_STEP_WINDOW_S);
    }
}
