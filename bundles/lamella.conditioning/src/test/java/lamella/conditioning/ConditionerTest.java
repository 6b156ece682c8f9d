package lamella.conditioning;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.Scan;
import org.junit.jupiter.api.Test;

/**
 * Conditioning on datasets whose right answer is known by construction: a rotation applied and recovered, a
 * reference phase added and removed, means and standard deviations worked by hand.
 */
class ConditionerTest {

    private static final Path FILE = Path.of("data.lx");
    private static final Path REF = Path.of("ref.lx");

    private static Scan scan(double[] x, Map<String, double[]> signals, Map<String, double[]> sigmas) {
        int[] lines = new int[x.length];
        for (int i = 0; i < lines.length; i++) {
            lines[i] = i + 10;
        }
        return new Scan(x, lines, signals, sigmas);
    }

    private static Map<String, double[]> columns(Object... pairs) {
        Map<String, double[]> m = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put((String) pairs[i], (double[]) pairs[i + 1]);
        }
        return m;
    }

    /**
     * TDTR-like signals: X steps up at zero delay and decays, Y is continuous (the lock-in sum of Cahill 2004, in
     * shape only; from memory), then seen through a detection phase offset of −φ.
     */
    private static Dataset tdtr(double offsetDeg) {
        double[] t = new double[40];
        double[] x = new double[t.length];
        double[] y = new double[t.length];
        double p = Math.toRadians(-offsetDeg);
        for (int i = 0; i < t.length; i++) {
            t[i] = -50e-12 + i * 10e-12 + (i >= 5 ? 5e-12 : 0);
            double vin = t[i] > 0 ? 2.0 * Math.exp(-t[i] / 1e-9) + 0.3 : 0.3;
            double vout = -1.0 - 0.1 * t[i] / 1e-9;
            x[i] = vin * Math.cos(p) - vout * Math.sin(p);
            y[i] = vin * Math.sin(p) + vout * Math.cos(p);
        }
        return new Dataset(FILE, "test", "delay_s", List.of(scan(t, columns("in_phase", x, "out_of_phase", y),
                Map.of())), Map.of());
    }

    private static ConditioningOptions options(PhaseCorrection p) {
        return new ConditioningOptions(p, Optional.empty(), List.of(), ConditioningOptions.DEFAULT_OUTLIER_LIMIT);
    }

    @Test
    void theDetectionPhaseFromTheZeroDelayStepUndoesAKnownRotation() throws InputException {
        ConditionedTable t = Conditioner.condition(tdtr(23.0),
                options(PhaseCorrection.fromStep(25e-12)));
        assertEquals(23.0, t.report().detectionPhaseDeg().getAsDouble(), 1e-9);
        double[] vout = t.signals().get("out_of_phase");
        double[] ratio = t.signals().get("ratio");
        assertEquals(-1.0 - 0.1 * 5e-3, vout[5], 1e-12);
        assertEquals(-(2.0 * Math.exp(-5e-3) + 0.3) / (-1.0 - 0.1 * 5e-3), ratio[5], 1e-12);
        assertEquals(List.of("in_phase", "out_of_phase", "ratio", "amplitude", "phase_deg"), t.signalColumns());
    }

    @Test
    void aGivenPhaseIsAppliedAsGivenAndNoneWhenKeptAsRecorded() throws InputException {
        Dataset d = tdtr(10.0);
        ConditionedTable fixed = Conditioner.condition(d, options(PhaseCorrection.fixed(10.0)));
        assertEquals(-1.0 - 0.1 * 5e-3, fixed.signals().get("out_of_phase")[5], 1e-12);
        ConditionedTable kept = Conditioner.condition(d, options(PhaseCorrection.asRecorded()));
        assertArrayEquals(d.scans().get(0).signals().get("in_phase"), kept.signals().get("in_phase"), 0);
        assertTrue(kept.report().detectionPhaseDeg().isEmpty());
    }

    @Test
    void withoutDelaysBeforeZeroThePhaseCannotBeFound() {
        double[] t = {1e-10, 2e-10, 3e-10};
        Dataset d = new Dataset(FILE, "test", "delay_s", List.of(scan(t, columns("in_phase", new double[] {1, 2, 3},
                "out_of_phase", new double[] {-1, -1, -1}), Map.of())), Map.of());
        String m = assertThrows(InputException.class, () -> Conditioner.condition(d,
                options(PhaseCorrection.fromStep(20e-12)))).getMessage();
        assertTrue(m.startsWith("data.lx: cannot find the detection phase: it needs delays within 20.0000 ps both"
                + " before and after zero delay, and the data have 0 before and 0 after"), m);
    }

    private static Dataset fdtr(Path file, double[] f, double[] phaseDeg) {
        return new Dataset(file, "test", "frequency_hz", List.of(scan(f, columns("phase_deg", phaseDeg), Map.of())),
                Map.of());
    }

    @Test
    void theReferencePhaseIsSubtractedFrequencyByFrequencyAcrossTheWrap() throws InputException {
        double[] f = {1e3, 1e4, 1e5, 1e6};
        double[] sample = {-10, -20, -30, -40};
        double[] instrument = {-5, 150, 170, 175};
        double[] measured = new double[4];
        for (int i = 0; i < 4; i++) {
            measured[i] = sample[i] + instrument[i];
            measured[i] = measured[i] > 180 ? measured[i] - 360 : measured[i];
        }
        double[] refF = {1e2, 1e3, 1e4, 1e5, 1e6, 1e7};
        double[] refPhase = {0, -5, 150, 170, 175, 179};
        ConditionedTable t = Conditioner.condition(fdtr(FILE, f, measured), new ConditioningOptions(
                PhaseCorrection.asRecorded(), Optional.of(fdtr(REF, refF, refPhase)), List.of(), 5));
        assertArrayEquals(sample, t.signals().get("phase_deg"), 1e-9);
        assertEquals(List.of("phase_deg"), t.signalColumns());
        assertEquals(-5, t.report().referencePhaseMinDeg(), 1e-9);
        assertEquals(175, t.report().referencePhaseMaxDeg(), 1e-9);
    }

    @Test
    void aFrequencyMissingFromTheReferenceIsAnError() {
        Dataset data = fdtr(FILE, new double[] {1e3, 2e3}, new double[] {-1, -2});
        Dataset ref = fdtr(REF, new double[] {1e3, 3e3}, new double[] {0, 0});
        String m = assertThrows(InputException.class, () -> Conditioner.condition(data, new ConditioningOptions(
                PhaseCorrection.asRecorded(), Optional.of(ref), List.of(), 5))).getMessage();
        assertTrue(m.startsWith("data.lx:11: frequency 2000.00 Hz is not in the reference ref.lx"), m);
    }

    @Test
    void scansAreAveragedWithTheLargerOfScatterAndPropagatedDeviation() throws InputException {
        double[] f = {1e3, 1e4};
        Scan a = scan(f, columns("in_phase", new double[] {1.0, 2.0}, "out_of_phase", new double[] {-1.0, -1.0}),
                columns("in_phase", new double[] {0.01, 0.5}, "out_of_phase", new double[] {0.01, 0.01}));
        Scan b = scan(f, columns("in_phase", new double[] {1.2, 2.0}, "out_of_phase", new double[] {-1.0, -1.0}),
                columns("in_phase", new double[] {0.01, 0.5}, "out_of_phase", new double[] {0.01, 0.01}));
        Dataset d = new Dataset(FILE, "test", "frequency_hz", List.of(a, b), Map.of());
        ConditionedTable t = Conditioner.condition(d, options(PhaseCorrection.asRecorded()));
        assertArrayEquals(new double[] {1.1, 2.0}, t.signals().get("in_phase"), 1e-12);
        // Row 0: scatter s = 0.1414, s/√2 = 0.1; propagated √(2·0.01²)/2 = 0.00707. Row 1: no scatter; 0.5/√2.
        assertArrayEquals(new double[] {0.1, 0.5 / Math.sqrt(2)}, t.sigmas().get("in_phase"), 1e-12);
        assertEquals(2, t.report().scansAveraged());
    }

    @Test
    void scansAtDifferentXAreNotAveraged() {
        Scan a = scan(new double[] {1, 2}, columns("phase_deg", new double[] {1, 2}), Map.of());
        Scan b = scan(new double[] {1, 2.5}, columns("phase_deg", new double[] {1, 2}), Map.of());
        Dataset d = new Dataset(FILE, "test", "frequency_hz", List.of(a, b), Map.of());
        String m = assertThrows(InputException.class, () -> Conditioner.condition(d,
                options(PhaseCorrection.asRecorded()))).getMessage();
        assertTrue(m.startsWith("data.lx:11: x 2.50000 in scan 2 differs from 2.00000 (line 11) in scan 1"), m);
    }

    @Test
    void phasesRecordedAloneAverageAsAnglesAcrossTheWrap() throws InputException {
        Scan a = scan(new double[] {1, 2}, columns("phase_deg", new double[] {179, 10}), Map.of());
        Scan b = scan(new double[] {1, 2}, columns("phase_deg", new double[] {-179, 20}), Map.of());
        Dataset d = new Dataset(FILE, "test", "frequency_hz", List.of(a, b), Map.of());
        double[] phase = Conditioner.condition(d, options(PhaseCorrection.asRecorded())).signals().get("phase_deg");
        assertEquals(180, Math.abs(phase[0]), 1e-9);
        assertEquals(15, phase[1], 1e-9);
    }

    @Test
    void amplitudeAndPhaseGiveTheSameResultAsInPhaseAndOutOfPhase() throws InputException {
        double[] f = {1e3, 1e4, 1e5};
        double[] r = {2, 1, 0.5};
        double[] p = {-10, -45, -80};
        double[] x = new double[3];
        double[] y = new double[3];
        for (int i = 0; i < 3; i++) {
            x[i] = r[i] * Math.cos(Math.toRadians(p[i]));
            y[i] = r[i] * Math.sin(Math.toRadians(p[i]));
        }
        ConditionedTable polar = Conditioner.condition(new Dataset(FILE, "t", "frequency_hz",
                List.of(scan(f, columns("amplitude", r, "phase_deg", p), Map.of())), Map.of()),
                options(PhaseCorrection.asRecorded()));
        ConditionedTable cartesian = Conditioner.condition(new Dataset(FILE, "t", "frequency_hz",
                List.of(scan(f, columns("in_phase", x, "out_of_phase", y), Map.of())), Map.of()),
                options(PhaseCorrection.asRecorded()));
        assertArrayEquals(cartesian.signals().get("in_phase"), polar.signals().get("in_phase"), 1e-15);
        assertArrayEquals(p, polar.signals().get("phase_deg"), 1e-12);
        assertArrayEquals(r, cartesian.signals().get("amplitude"), 1e-15);
    }

    @Test
    void oneSpikeIsMarkedAndKeptWhileAStepIsNot() throws InputException {
        int n = 60;
        double[] f = new double[n];
        double[] phase = new double[n];
        Random noise = new Random(7);
        for (int i = 0; i < n; i++) {
            f[i] = 1e3 * Math.pow(10, i / 15.0);
            phase[i] = -20 - 0.2 * i + (i >= 30 ? -15 : 0) + 0.05 * noise.nextGaussian();
        }
        phase[44] += 3.0;
        Dataset d = new Dataset(FILE, "t", "frequency_hz", List.of(scan(f, columns("phase_deg", phase), Map.of())),
                Map.of());
        ConditionedTable t = Conditioner.condition(d, options(PhaseCorrection.asRecorded()));
        assertEquals(1, t.report().outliers());
        assertTrue(t.outlier()[44]);
        assertEquals(n, t.rows());
        assertEquals(phase[44], t.signals().get("phase_deg")[44], 1e-9);
        ConditionedTable off = Conditioner.condition(d, new ConditioningOptions(PhaseCorrection.asRecorded(),
                Optional.empty(), List.of(), 0));
        assertEquals(0, off.report().outliers());
    }

    @Test
    void excludedRangesAreMarkedAndARangeThatHoldsNoRowIsAnError() throws InputException {
        Dataset d = tdtr(0);
        ConditionedTable t = Conditioner.condition(d, new ConditioningOptions(PhaseCorrection.asRecorded(),
                Optional.empty(), List.of(new XRange(-1e-9, 1e-10)), 5));
        assertEquals(15, t.report().excluded());
        assertTrue(t.excluded()[0]);
        assertFalse(t.excluded()[39]);
        String m = assertThrows(InputException.class, () -> Conditioner.condition(d, new ConditioningOptions(
                PhaseCorrection.asRecorded(), Optional.empty(), List.of(new XRange(1, 100)), 5))).getMessage();
        assertTrue(m.startsWith("--exclude: 1.00000:100.000 holds no row; delay_s runs from -5.00000e-11"), m);
    }

    /**
     * A phase or an amplitude–phase pair goes to X, Y and back with its own σ, at every angle: X and Y made from one
     * R and θ are correlated, and the covariance carried through the working form makes the round trip exact to first
     * order (JCGM 100:2008, the Guide to the expression of uncertainty in measurement, eq. 13). Without it the phase's
     * σ came back as σ·√(sin⁴θ + cos⁴θ), 29 % low at 45°.
     */
    @Test
    void aPhaseAndAnAmplitudeKeepTheirOwnSigmaThroughTheWorkingForm() throws InputException {
        int n = 9;
        double[] f = new double[n];
        double[] phase = new double[n];
        double[] sPhase = new double[n];
        double[] amp = new double[n];
        double[] sAmp = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 1e3 * (i + 1);
            phase[i] = -170 + 40 * i;
            sPhase[i] = 0.1 + 0.05 * i;
            amp[i] = 1e-6 * (1 + i);
            sAmp[i] = 2e-8 * (1 + 0.5 * i);
        }
        ConditioningOptions none = new ConditioningOptions(PhaseCorrection.asRecorded(), Optional.empty(), List.of(),
                0);
        Dataset phaseOnly = new Dataset(FILE, "t", "frequency_hz", List.of(scan(f, columns("phase_deg", phase),
                columns("phase_deg", sPhase))), Map.of());
        ConditionedTable t = Conditioner.condition(phaseOnly, none);
        assertArrayEquals(sPhase, t.sigmas().get("phase_deg"), 1e-12);
        Dataset polar = new Dataset(FILE, "t", "frequency_hz", List.of(scan(f, columns("amplitude", amp, "phase_deg",
                phase), columns("amplitude", sAmp, "phase_deg", sPhase))), Map.of());
        ConditionedTable p = Conditioner.condition(polar, none);
        assertArrayEquals(sPhase, p.sigmas().get("phase_deg"), 1e-12);
        assertArrayEquals(sAmp, p.sigmas().get("amplitude"), 1e-20);
        // two identical scans: the propagated σ of the mean is σ/√2, for the phase as for the amplitude
        Dataset twice = new Dataset(FILE, "t", "frequency_hz", List.of(
                scan(f, columns("amplitude", amp, "phase_deg", phase), columns("amplitude", sAmp, "phase_deg", sPhase)),
                scan(f, columns("amplitude", amp, "phase_deg", phase), columns("amplitude", sAmp, "phase_deg", sPhase))),
                Map.of());
        ConditionedTable m = Conditioner.condition(twice, none);
        for (int i = 0; i < n; i++) {
            assertEquals(sPhase[i] / Math.sqrt(2), m.sigmas().get("phase_deg")[i], 1e-12, "phase row " + i);
            assertEquals(sAmp[i] / Math.sqrt(2), m.sigmas().get("amplitude")[i], 1e-20, "amplitude row " + i);
        }
    }

    /**
     * A rotation is a phase shift: it leaves the amplitude's and the phase's σ as they were, for a pair of unequal σ in
     * X and Y too (Σ' = R Σ Rᵀ, JCGM 100:2008, eq. 13); then rotating back gives X's and Y's own σ again.
     */
    @Test
    void aRotationKeepsTheSigmaOfAmplitudeAndPhase() {
        int n = 5;
        Channels c = new Channels(new double[] {1, 2, 3, 4, 5}, new int[] {1, 2, 3, 4, 5});
        double[] x = {1.0, -0.5, 0.2, 2.0, -1.5};
        double[] y = {0.3, 0.8, -1.1, 0.1, -0.4};
        double[] sx = {0.01, 0.05, 0.02, 0.03, 0.04};
        double[] sy = {0.04, 0.01, 0.03, 0.02, 0.05};
        c.put("in_phase", x.clone(), sx.clone());
        c.put("out_of_phase", y.clone(), sy.clone());
        Map<String, double[]> before = new LinkedHashMap<>();
        Map<String, double[]> beforeSigma = new LinkedHashMap<>();
        Derived.columns(c, false, false, null, before, beforeSigma);
        Rotation.apply(c, 37.0);
        Map<String, double[]> after = new LinkedHashMap<>();
        Map<String, double[]> afterSigma = new LinkedHashMap<>();
        Derived.columns(c, false, false, null, after, afterSigma);
        assertArrayEquals(beforeSigma.get("phase_deg"), afterSigma.get("phase_deg"), 1e-12);
        assertArrayEquals(beforeSigma.get("amplitude"), afterSigma.get("amplitude"), 1e-14);
        Rotation.apply(c, -37.0);
        assertArrayEquals(sx, c.sigmas.get("in_phase"), 1e-14);
        assertArrayEquals(sy, c.sigmas.get("out_of_phase"), 1e-14);
        assertEquals(n, c.rows());
    }
}
