package lamella.engine;

import org.osgi.annotation.versioning.ConsumerType;

/** A complex-valued function of one real variable, written into a caller's array as (re, im). */
@ConsumerType
@FunctionalInterface
public interface ComplexIntegrand {
    void value(double x, double[] out);
}
