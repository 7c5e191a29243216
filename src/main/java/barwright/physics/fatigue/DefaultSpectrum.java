package barwright.physics.fatigue;

import barwright.model.SpectrumLevel;

import java.util.List;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * The lap used where the user gives none (the sizing search's least life, the window's bar page): an invented
 * club-circuit lap of twelve corners, not a measured one. Two hard corners each way at 1.2 g, three each way at
 * 0.9 g and one each way at 0.5 g, in that order, 90 s a lap. Results on it say that they are.
 */
public final class DefaultSpectrum {
    /** The lap's corners (invented). */
    public static final List<SpectrumLevel> CORNERS = List.of(
            new SpectrumLevel(1.2 * STANDARD_GRAVITY, 2), new SpectrumLevel(-1.2 * STANDARD_GRAVITY, 2),
            new SpectrumLevel(0.9 * STANDARD_GRAVITY, 3), new SpectrumLevel(-0.9 * STANDARD_GRAVITY, 3),
            new SpectrumLevel(0.5 * STANDARD_GRAVITY, 1), new SpectrumLevel(-0.5 * STANDARD_GRAVITY, 1));
    /** The lap's duration (s), invented. */
    public static final double LAP_SECONDS = 90;
    /** How outputs name it. */
    public static final String DESCRIPTION = "the default lap (invented: 12 corners, 2 each way at 1.2 g, 3 at "
            + "0.9 g, 1 at 0.5 g; 90 s)";

    private DefaultSpectrum() {
    }
}
