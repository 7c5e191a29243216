package barwright.model;

/**
 * An anti-roll bar: its section, material and shape, the link hole in use and how the links move with the
 * wheels. Either {@code dimensions} (a plain U-bar, closed form) or {@code centreline} (any shape, beam
 * elements) is present; where both are, the centreline wins.
 *
 * @param material        the bar's material
 * @param section         its cross-section
 * @param dimensions      plain U-bar dimensions, or null
 * @param centreline      general shape, or null
 * @param selectedArm     0-based index of the link hole in use
 * @param linkMotionRatio link travel / wheel travel at the wheel centre
 * @param rateCalibration the measured factor on the model's link rate, or null for the model alone
 *                        (model.md 12.1); it stays with the bar when its section, material or hole changes
 */
public record AntiRollBar(Material material, BarSection section, UBarDimensions dimensions,
                          BarCentreline centreline, int selectedArm, double linkMotionRatio,
                          RateCalibration rateCalibration) {
    /** A bar with no measured rate: the model's rate is used as it is. */
    public AntiRollBar(Material material, BarSection section, UBarDimensions dimensions, BarCentreline centreline,
                       int selectedArm, double linkMotionRatio) {
        this(material, section, dimensions, centreline, selectedArm, linkMotionRatio, null);
    }

    public AntiRollBar {
        if (dimensions == null && centreline == null) {
            throw new IllegalArgumentException("a bar needs U-bar dimensions or a centreline");
        }
        if (selectedArm < 0 || selectedArm >= holeCount(dimensions, centreline)) {
            throw new IllegalArgumentException("selectedArm " + selectedArm + " is not one of the "
                    + holeCount(dimensions, centreline) + " holes");
        }
        Checks.positive("linkMotionRatio", linkMotionRatio);
    }

    private static int holeCount(UBarDimensions dimensions, BarCentreline centreline) {
        return centreline != null ? centreline.holeSetbacks().size() : dimensions.armLengths().size();
    }

    /** @return how many link holes the arms have */
    public int holeCount() {
        return holeCount(dimensions, centreline);
    }

    /** @return true where the beam-element solver is needed (a centreline is given) */
    public boolean isShaped() {
        return centreline != null;
    }

    /** @return the effective arm length of the selected hole (m); for U-bar dimensions only */
    public double selectedArmLength() {
        return dimensions.armLengths().get(selectedArm);
    }

    public AntiRollBar withSection(BarSection newSection) {
        return new AntiRollBar(material, newSection, dimensions, centreline, selectedArm, linkMotionRatio,
                rateCalibration);
    }

    public AntiRollBar withMaterial(Material newMaterial) {
        return new AntiRollBar(newMaterial, section, dimensions, centreline, selectedArm, linkMotionRatio,
                rateCalibration);
    }

    public AntiRollBar withSelectedArm(int newArm) {
        return new AntiRollBar(material, section, dimensions, centreline, newArm, linkMotionRatio, rateCalibration);
    }

    /** @param newCalibration the measured factor, or null to use the model's rate alone */
    public AntiRollBar withRateCalibration(RateCalibration newCalibration) {
        return new AntiRollBar(material, section, dimensions, centreline, selectedArm, linkMotionRatio,
                newCalibration);
    }

    /** @return the factor on the model's link rate: the measured one, or 1 */
    public double effectiveRateFactor() {
        return rateCalibration == null ? 1 : rateCalibration.effectiveRateFactor();
    }
}
