package barwright.physics.beam;

import barwright.model.AntiRollBar;

import java.util.Optional;

/**
 * Whether a shaped bar can be built into the beam model at every arm hole. The reader looks at the polyline; the
 * beam model needs more of the rounded centreline (bushings on the arcs as rounded, set-backs on the straight
 * before the first bend, bends that fit their segments, equal lever arms), so a car is checked here before it is
 * accepted: a car that loads also analyses.
 */
public final class BeamBuildCheck {
    private BeamBuildCheck() {
    }

    /**
     * Why a bar cannot be built.
     *
     * @param hole   the arm hole (index into the set-backs) that could not be built
     * @param reason what the beam model found, in words
     */
    public record Unbuildable(int hole, String reason) {
    }

    /**
     * @param bar a bar with a shaped centreline
     * @return the first hole whose beam model cannot be built, or empty where every hole builds
     */
    public static Optional<Unbuildable> firstUnbuildableHole(AntiRollBar bar) {
        for (int hole = 0; hole < bar.holeCount(); hole++) {
            try {
                BeamBar.frameOf(bar.withSelectedArm(hole), BeamBar.DEFAULT_ELEMENT_LENGTH);
            } catch (IllegalArgumentException unbuildable) {
                return Optional.of(new Unbuildable(hole, unbuildable.getMessage()));
            }
        }
        return Optional.empty();
    }
}
