package lamella.api;

import java.util.List;

/**
 * A heating and sensing geometry — how heat enters the surface and how the temperature is read — offered as a
 * service. It declares its case-file parameters and turns them into a {@link GeometryModel}.
 * A case file selects a geometry by {@link #type()} in {@code geometry.type}.
 */
public interface HeatingGeometry {

    /** The case-file name, such as {@code gaussian}. Unique among live geometries. */
    String type();

    /** One line saying what this geometry models. */
    String summary();

    /** The keys of its case-file block (besides {@code type}). */
    List<ParameterSpec> parameters();

    /** The unit of its response. */
    ResponseUnit unit();

    /**
     * Builds the model for validated parameters and a stack. Throws when the two cannot go together (for example an
     * in-plane anisotropic layer under an axisymmetric geometry), naming the JSON path.
     */
    GeometryModel bind(Parameters parameters, StackKernel stack) throws InputException;
}
