package lamella.engine;

/** A complex-valued function of one real variable, written into a caller's array as (re, im). */
@FunctionalInterface
public interface ComplexIntegrand {
    void value(double x, double[] out);
}
