package lamella.geometry.ring;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

/**
 * Values of a function of the wavenumber kept for the next spectral integral of the same geometry: an annulus'
 * transform G(k) costs tens of Bessel functions per wavenumber and does not depend on the frequency, and when the
 * panels of successive integrals start from the same grid most of their nodes coincide exactly. Open addressing on
 * the exact bits of k, allocation-free after creation; when half full it is emptied and refilled, so its memory is
 * bounded ({@value #CAPACITY} entries, 4 MiB). One instance per thread.
 */
final class WavenumberMemo {

    static final int CAPACITY = 1 << 18;
    private static final long EMPTY = Double.doubleToRawLongBits(Double.NaN) ^ 0x5555L;

    private final DoubleUnaryOperator fn;
    private final long[] keys = new long[CAPACITY];
    private final double[] values = new double[CAPACITY];
    private int size;
    private long hits;
    private long misses;

    WavenumberMemo(DoubleUnaryOperator fn) {
        this.fn = fn;
        Arrays.fill(keys, EMPTY);
    }

    double at(double k) {
        long bits = Double.doubleToRawLongBits(k);
        int mask = CAPACITY - 1;
        int i = mix(bits) & mask;
        while (true) {
            long key = keys[i];
            if (key == bits) {
                hits++;
                return values[i];
            }
            if (key == EMPTY) {
                break;
            }
            i = (i + 1) & mask;
        }
        misses++;
        double v = fn.applyAsDouble(k);
        if (size >= CAPACITY / 2) {
            Arrays.fill(keys, EMPTY);
            size = 0;
            i = mix(bits) & mask;
        }
        keys[i] = bits;
        values[i] = v;
        size++;
        return v;
    }

    long hits() {
        return hits;
    }

    long misses() {
        return misses;
    }

    private static int mix(long bits) {
        long h = bits * 0x9E3779B97F4A7C15L;
        return (int) (h ^ (h >>> 29));
    }
}
