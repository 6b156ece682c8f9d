package lamella.fit;

import java.util.Arrays;

/**
 * The last few model evaluations of one fit, by point (the fitting variables and the uncertain inputs' values, compared
 * exactly): the search asks for the value at a point more than once, and each reweighting pass, the residual σ and
 * the final model start from the point the search ended at. Thread-safe; a Monte Carlo refit's points, each with its
 * own drawn inputs, simply pass through.
 */
final class ModelMemo {

    private static final int SIZE = 8;

    private final double[][] us = new double[SIZE][];
    private final double[][] uncs = new double[SIZE][];
    private final double[][] models = new double[SIZE][];
    private int next;

    synchronized double[] get(double[] u, double[] unc) {
        for (int i = 0; i < SIZE; i++) {
            if (models[i] != null && Arrays.equals(us[i], u) && Arrays.equals(uncs[i], unc)) {
                return models[i];
            }
        }
        return null;
    }

    synchronized void put(double[] u, double[] unc, double[] model) {
        us[next] = u.clone();
        uncs[next] = unc.clone();
        models[next] = model;
        next = (next + 1) % SIZE;
    }
}
