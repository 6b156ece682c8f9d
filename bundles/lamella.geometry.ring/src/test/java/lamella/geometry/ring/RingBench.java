package lamella.geometry.ring;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.Layer;
import lamella.api.Stack;

/** Prints the cost of 200 frequencies on large rings; run by hand (not a test). */
final class RingBench {
    public static void main(String[] a) throws Exception {
        Stack s = new Stack(List.of(Layer.isotropicInPlane("al", 80e-9, 180, 180, 2.42e6),
                Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, 1.38, 1.38, 1.6e6)),
                BottomBoundary.SEMI_INFINITE);
        for (double r : new double[] {15e-6, 100e-6, 1e-3}) {
            for (double w : new double[] {0, 2e-6}) {
                GeometryModel m = RingSourceTest.ring(s, r, w, 3e-6);
                double[] out = new double[2];
                for (int rep = 0; rep < 3; rep++) {
                    long t0 = System.nanoTime();
                    for (int i = 0; i < 200; i++) {
                        m.at(1e3 * Math.pow(1e4, i / 199.0), out);
                    }
                    if (rep == 2) {
                        System.out.printf("R %.0f um w %.0f um: 200 frequencies 1 kHz-10 MHz in %.0f ms%n", r * 1e6,
                                w * 1e6, (System.nanoTime() - t0) / 1e6);
                    }
                }
            }
        }
    }
}
