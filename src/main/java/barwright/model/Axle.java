package barwright.model;

import java.util.Objects;

/**
 * One axle's suspension, tyres and anti-roll bar.
 *
 * @param track              track width t (m)
 * @param rollCentreHeight   roll centre height above the ground z (m)
 * @param unsprungMass       unsprung mass of the whole axle (kg)
 * @param unsprungCgHeight   height of the unsprung centre of mass (m)
 * @param springRate         rate of one spring at the spring (N/m)
 * @param springMotionRatio  spring travel / wheel travel
 * @param tyreVerticalRate   vertical rate of one tyre (N/m)
 * @param tyre               the tyre's grip model
 * @param bar                the anti-roll bar, or null for none
 * @param suspension         the linkage, ride-height change and static camber; {@link SuspensionGeometry#NONE}
 *                           where the roll-centre height is typed in
 */
public record Axle(double track, double rollCentreHeight, double unsprungMass, double unsprungCgHeight,
                   double springRate, double springMotionRatio, double tyreVerticalRate, Tyre tyre,
                   AntiRollBar bar, SuspensionGeometry suspension) {
    public Axle {
        Checks.positive("track", track);
        Checks.finite("rollCentreHeight", rollCentreHeight);
        Checks.nonNegative("unsprungMass", unsprungMass);
        Checks.nonNegative("unsprungCgHeight", unsprungCgHeight);
        Checks.positive("springRate", springRate);
        Checks.positive("springMotionRatio", springMotionRatio);
        Checks.positive("tyreVerticalRate", tyreVerticalRate);
        Objects.requireNonNull(tyre, "tyre");
        Objects.requireNonNull(suspension, "suspension");
    }

    /** An axle with no linkage: the roll-centre height as typed. */
    public Axle(double track, double rollCentreHeight, double unsprungMass, double unsprungCgHeight,
                double springRate, double springMotionRatio, double tyreVerticalRate, Tyre tyre, AntiRollBar bar) {
        this(track, rollCentreHeight, unsprungMass, unsprungCgHeight, springRate, springMotionRatio,
                tyreVerticalRate, tyre, bar, SuspensionGeometry.NONE);
    }

    /** @return true where the axle has a linkage whose roll centre is computed */
    public boolean hasLinkage() {
        return suspension.hasLinkage();
    }

    public Axle withSuspension(SuspensionGeometry newSuspension) {
        return new Axle(track, rollCentreHeight, unsprungMass, unsprungCgHeight, springRate, springMotionRatio,
                tyreVerticalRate, tyre, bar, newSuspension);
    }

    /** @return true where the axle has an anti-roll bar */
    public boolean hasBar() {
        return bar != null;
    }

    public Axle withBar(AntiRollBar newBar) {
        return new Axle(track, rollCentreHeight, unsprungMass, unsprungCgHeight, springRate, springMotionRatio,
                tyreVerticalRate, tyre, newBar, suspension);
    }

    public Axle withSpringRate(double newRate) {
        return new Axle(track, rollCentreHeight, unsprungMass, unsprungCgHeight, newRate, springMotionRatio,
                tyreVerticalRate, tyre, bar, suspension);
    }

    public Axle withRollCentreHeight(double newHeight) {
        return new Axle(track, newHeight, unsprungMass, unsprungCgHeight, springRate, springMotionRatio,
                tyreVerticalRate, tyre, bar, suspension);
    }

    public Axle withTyreVerticalRate(double newRate) {
        return new Axle(track, rollCentreHeight, unsprungMass, unsprungCgHeight, springRate, springMotionRatio,
                newRate, tyre, bar, suspension);
    }
}
