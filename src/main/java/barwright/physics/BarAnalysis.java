package barwright.physics;

import barwright.model.AntiRollBar;
import barwright.physics.bar.BarResult;
import barwright.physics.bar.ClosedFormBar;
import barwright.physics.beam.BeamBar;

/**
 * Picks the bar model: the beam-element frame where a centreline is given, else the closed form; a measured
 * rate factor on the bar (model.md 12.1) scales either model's result.
 */
public final class BarAnalysis {
    private BarAnalysis() {
    }

    /**
     * @param bar                     the bar
     * @param differentialWheelTravel left-minus-right wheel travel of the stress check (m)
     */
    public static BarResult analyse(AntiRollBar bar, double differentialWheelTravel) {
        return model(bar, differentialWheelTravel).calibrated(bar.effectiveRateFactor());
    }

    /** @return the model's result alone, without the bar's measured rate factor (for comparing with a measurement) */
    public static BarResult model(AntiRollBar bar, double differentialWheelTravel) {
        double relativeLinkTravel = bar.linkMotionRatio() * differentialWheelTravel;
        return bar.isShaped() ? BeamBar.analyse(bar, relativeLinkTravel)
                : ClosedFormBar.analyse(bar, relativeLinkTravel);
    }
}
