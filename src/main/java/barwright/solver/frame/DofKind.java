package barwright.solver.frame;

/** The two kinds of freedom of a frame node, three components each. */
public enum DofKind {
    /** Displacement (m); its conjugate load is a force (N). */
    TRANSLATION,
    /** Small rotation (rad); its conjugate load is a moment (N m). */
    ROTATION
}
