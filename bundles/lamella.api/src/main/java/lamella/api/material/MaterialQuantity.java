package lamella.api.material;

/**
 * The properties a library entry may state, each under a key that carries its SI unit. Conductivity is stated in one
 * of three ways: isotropic ({@link #K}), relative to the sample surface ({@link #K_THROUGH}, {@link #K_IN_PLANE}:
 * films whose texture is fixed by growth), or relative to the c axis of a uniaxial crystal ({@link #K_PARALLEL_C},
 * {@link #K_PERPENDICULAR_C}), whose orientation the case's layer then gives. Heat capacity is stated volumetric or
 * as density and specific heat, from which it is derived.
 */
public enum MaterialQuantity {
    K("k_w_mk", "thermal conductivity (isotropic)", 1e-3, 1e5),
    K_THROUGH("k_through_w_mk", "through-plane thermal conductivity of a film", 1e-3, 1e5),
    K_IN_PLANE("k_in_plane_w_mk", "in-plane thermal conductivity of a film", 1e-3, 1e5),
    K_PARALLEL_C("k_parallel_c_w_mk", "thermal conductivity along the c axis", 1e-3, 1e5),
    K_PERPENDICULAR_C("k_perpendicular_c_w_mk", "thermal conductivity perpendicular to the c axis", 1e-3, 1e5),
    HEAT_CAPACITY("heat_capacity_j_m3k", "volumetric heat capacity", 1e4, 1e7),
    DENSITY("density_kg_m3", "density", 50, 3e4),
    SPECIFIC_HEAT("specific_heat_j_kgk", "specific heat capacity", 1, 2e4);

    private final String key;
    private final String description;
    private final double plausibleLow;
    private final double plausibleHigh;

    MaterialQuantity(String key, String description, double plausibleLow, double plausibleHigh) {
        this.key = key;
        this.description = description;
        this.plausibleLow = plausibleLow;
        this.plausibleHigh = plausibleHigh;
    }

    /** The library-file key, with its unit in its name. */
    public String key() {
        return key;
    }

    public String description() {
        return description;
    }

    /**
     * The range outside which a value almost certainly has a unit mistake (W/(cm K), J/(g K), g/cm³); values outside
     * it are reported by a library check, not refused. Common practice, no source: it spans aerogels to cryogenic
     * diamond for conductivity, and every solid for density.
     */
    public double plausibleLow() {
        return plausibleLow;
    }

    public double plausibleHigh() {
        return plausibleHigh;
    }

    public static java.util.Optional<MaterialQuantity> ofKey(String key) {
        for (MaterialQuantity q : values()) {
            if (q.key.equals(key)) {
                return java.util.Optional.of(q);
            }
        }
        return java.util.Optional.empty();
    }
}
