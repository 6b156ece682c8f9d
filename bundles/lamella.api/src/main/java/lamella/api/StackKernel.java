package lamella.api;

import org.osgi.annotation.versioning.ProviderType;

/**
 * The point response of a layered stack in transform space: the surface temperature per unit surface heat-flux
 * density for a harmonic heating exp(+iωt) with in-plane wavenumbers (sx, sy), in K m² W⁻¹. Implementations are
 * immutable, thread-safe and allocation-free; results are written into a caller's array as (re, im).
 *
 * <p><b>Transform convention.</b> Wavenumbers are angular, in rad/m (a period of λ in the plane is k = 2π/λ). A surface field f(x, y) has the
 * transform F(sx, sy) = ∫∫ f(x, y) e^{−i(sx x + sy y)} dx dy, and f = (1/4π²) ∫∫ F e^{+i(sx x + sy y)} dsx dsy. For an
 * axisymmetric field the pair is the Hankel transform of order zero:
 * F(k) = 2π ∫₀^∞ f(r) J₀(k r) r dr and f(r) = (1/2π) ∫₀^∞ F(k) J₀(k r) k dk.
 * A heat source's transform at k = 0 is its total power, so a source of unit power has transform 1 at k = 0, and so
 * does a probe whose weighting integrates to one. With those, the probe-weighted temperature per watt is
 * H(ω) = (1/2π) ∫₀^∞ Z(k, ω) S(k) P(k) k dk for an axisymmetric source S and probe P (for Gaussian beams of 1/e²
 * radius w, S or P = exp(−k² w²/8)), and (1/4π²) ∫∫ Z(sx, sy, ω) S(sx, sy) P*(sx, sy) dsx dsy in general. Z at
 * k = 0 is the one-dimensional response of the stack to uniform heating.
 */
@ProviderType
public interface StackKernel {

    /** The stack this kernel was compiled from. */
    Stack stack();

    /**
     * Response for in-plane wavenumbers sx, sy (rad/m) at angular frequency omega (rad/s, ≥ 0).
     *
     * @param out receives the real part at out[0] and the imaginary part at out[1]
     */
    void response(double sx, double sy, double omega, double[] out);

    /**
     * Response for radial wavenumber k (rad/m) of an axisymmetric heating. Only for stacks that are in-plane
     * isotropic: on any other it throws {@link ModelEvaluationException} naming the first layer that is not, so a
     * geometry refuses such a stack in {@code bind} first (with the case file's JSON path) or integrates
     * {@link #response} instead.
     */
    void radialResponse(double k, double omega, double[] out);

    /**
     * Response of a half-space made of the top layer's material, the high-wavenumber limit of
     * {@link #radialResponse}: the two differ by a term that decays like exp(−2 k d₁) for top-layer thickness d₁.
     * Refused like {@link #radialResponse} on a stack that is not in-plane isotropic.
     */
    void topHalfSpaceRadialResponse(double k, double omega, double[] out);

    /**
     * Characteristic in-plane wavenumbers (rad/m) of the response at this frequency: inverse layer thicknesses and
     * inverse thermal penetration depths, sorted ascending, finite and at least a factor of two apart. Quadratures place break points at them.
     */
    double[] featureWavenumbers(double omega);
}
