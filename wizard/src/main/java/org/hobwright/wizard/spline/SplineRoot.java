package org.hobwright.wizard.spline;

import java.util.Arrays;
import java.util.Optional;

/** The root form of a spline, and of the hob that cuts it. */
public enum SplineRoot {
    /** Flat root: a flat bottom with small corner radii (30° only). */
    FLAT("flat"),
    /** Fillet root: a full radius at the bottom of the space. */
    FILLET("fillet");

    private final String id;

    SplineRoot(String id) {
        this.id = id;
    }

    /** The identifier in job files. */
    public String id() {
        return id;
    }

    /** The root form with this identifier. */
    public static Optional<SplineRoot> of(String id) {
        return Arrays.stream(values()).filter(r -> r.id.equals(id)).findFirst();
    }
}
