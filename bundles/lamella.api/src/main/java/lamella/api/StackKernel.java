package lamella.api;

/**
 * The point response of a layered stack in transform space: the surface temperature per unit surface heat-flux
 * density for a harmonic heating exp(+iωt) with in-plane wavenumbers (sx, sy), in K m² W⁻¹. Implementations are
 * immutable, thread-safe and allocation-free; results are written into a caller's array as (re, im).
 */
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
     * isotropic; the caller checks {@link Stack#isInPlaneIsotropic()} first.
     */
    void radialResponse(double k, double omega, double[] out);

    /**
     * Response of a half-space made of the top layer's material, the high-wavenumber limit of
     * {@link #radialResponse}: the two differ by a term that decays like exp(−2 k d₁) for top-layer thickness d₁.
     */
    void topHalfSpaceRadialResponse(double k, double omega, double[] out);

    /**
     * Characteristic in-plane wavenumbers (rad/m) of the response at this frequency: inverse layer thicknesses and
     * inverse thermal penetration depths, sorted ascending, finite and at least a factor of two apart. Quadratures place break points at them.
     */
    double[] featureWavenumbers(double omega);
}
