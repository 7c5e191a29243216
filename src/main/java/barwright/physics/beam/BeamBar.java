package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.physics.bar.BarResult;

/** Rate and stresses of a bar of any shape from the beam-element frame. (Being built: issue 3.) */
public final class BeamBar {
    private BeamBar() {
    }

    /**
     * @param bar                a bar with a centreline
     * @param relativeLinkTravel relative displacement of the two link points along z (m)
     */
    public static BarResult analyse(AntiRollBar bar, double relativeLinkTravel) {
        throw new UnsupportedOperationException("the beam-element bar model is not built yet");
    }
}
