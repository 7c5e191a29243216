package barwright.sizing;

import barwright.io.BarSetting;
import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.sizing.catalogue.StockSize;

/**
 * One bar a search picked: which axle, material, stock size and arm hole; the rest of the bar (torsion
 * length, arms, bushings, link motion ratio) stays as the vehicle has it.
 *
 * @param axle        the axle
 * @param material    the material
 * @param size        the stock size
 * @param selectedArm the 0-based arm hole
 */
public record BarChoice(AxlePosition axle, Material material, StockSize size, int selectedArm) {
    /** @return what goes into the vehicle file for this bar */
    public BarSetting setting() {
        return new BarSetting(axle, material, size.section(), selectedArm);
    }

    /** @return the vehicle's bar with this material, section and hole */
    public AntiRollBar applyTo(AntiRollBar bar) {
        return bar.withMaterial(material).withSection(size.section()).withSelectedArm(selectedArm);
    }
}
