package lamella.geometry.ring;

/**
 * Gauss–Legendre and Gauss–Hermite nodes and weights by Newton's method on the three-term recurrences (Press,
 * Teukolsky, Vetterling & Flannery, Numerical Recipes, 3rd ed., 2007, §4.6, routines gauleg and gauher).
 */
final class GaussRules {

    private GaussRules() {
    }

    /** {nodes, weights} of the n-point Gauss–Legendre rule on [−1, 1]. */
    static double[][] legendre(int n) {
        double[] x = new double[n];
        double[] w = new double[n];
        int m = (n + 1) / 2;
        for (int i = 0; i < m; i++) {
            double z = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            double pp;
            while (true) {
                double p1 = 1.0;
                double p2 = 0.0;
                for (int j = 0; j < n; j++) {
                    double p3 = p2;
                    p2 = p1;
                    p1 = ((2.0 * j + 1.0) * z * p2 - j * p3) / (j + 1);
                }
                pp = n * (z * p1 - p2) / (z * z - 1.0);
                double z1 = z;
                z = z1 - p1 / pp;
                if (Math.abs(z - z1) <= 1e-15) {
                    break;
                }
            }
            x[i] = -z;
            x[n - 1 - i] = z;
            w[i] = 2.0 / ((1.0 - z * z) * pp * pp);
            w[n - 1 - i] = w[i];
        }
        return new double[][] {x, w};
    }

    /** {nodes, weights} of the n-point Gauss–Hermite rule for the weight exp(−x²) on the real line. */
    static double[][] hermite(int n) {
        final double pim4 = Math.pow(Math.PI, -0.25);
        double[] x = new double[n];
        double[] w = new double[n];
        int m = (n + 1) / 2;
        double z = 0;
        for (int i = 0; i < m; i++) {
            if (i == 0) {
                z = Math.sqrt(2.0 * n + 1) - 1.85575 * Math.pow(2.0 * n + 1, -0.16667);
            } else if (i == 1) {
                z -= 1.14 * Math.pow(n, 0.426) / z;
            } else if (i == 2) {
                z = 1.86 * z - 0.86 * x[0];
            } else if (i == 3) {
                z = 1.91 * z - 0.91 * x[1];
            } else {
                z = 2.0 * z - x[i - 2];
            }
            double pp = 0;
            for (int its = 0; its < 200; its++) {
                double p1 = pim4;
                double p2 = 0.0;
                for (int j = 0; j < n; j++) {
                    double p3 = p2;
                    p2 = p1;
                    p1 = z * Math.sqrt(2.0 / (j + 1)) * p2 - Math.sqrt((double) j / (j + 1)) * p3;
                }
                pp = Math.sqrt(2.0 * n) * p2;
                double z1 = z;
                z = z1 - p1 / pp;
                if (Math.abs(z - z1) <= 3e-14 * Math.max(1, Math.abs(z))) {
                    break;
                }
            }
            x[i] = z;
            x[n - 1 - i] = -z;
            w[i] = 2.0 / (pp * pp);
            w[n - 1 - i] = w[i];
        }
        return new double[][] {x, w};
    }
}
