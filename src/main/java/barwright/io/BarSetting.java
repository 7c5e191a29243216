package barwright.io;

import barwright.model.AxlePosition;
import barwright.model.BarSection;
import barwright.model.Material;

import java.util.Objects;

/**
 * What a sizing puts into a vehicle file's bar: material, section and arm hole; the rest of the bar (its
 * geometry, link, bushings) stays as the file has it.
 *
 * @param axle        the axle whose bar changes
 * @param material    the material
 * @param section     the cross-section (SI)
 * @param selectedArm the 0-based arm hole
 */
public record BarSetting(AxlePosition axle, Material material, BarSection section, int selectedArm) {
    public BarSetting {
        Objects.requireNonNull(axle, "axle");
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(section, "section");
    }
}
