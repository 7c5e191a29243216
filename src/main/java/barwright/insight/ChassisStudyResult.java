package barwright.insight;

import java.util.List;

/**
 * What a flexible chassis costs one car (model.md 6).
 *
 * @param vehicleName        the car's name
 * @param totalRollStiffness K_f + K_r, axles with tyres (N m/rad)
 * @param barChange          the bar change the delivered share is for, in words
 * @param sweep              chassis stiffness from {@link ChassisStudy#LOWEST} to {@link ChassisStudy#HIGHEST}
 *                           times the total roll stiffness, evenly on a log scale
 * @param rigid              the rigid chassis (stiffness infinite, delivered share 1)
 * @param decoupled          the limit of no chassis stiffness, each body end on its own axle; null where an end
 *                           alone cannot hold its share of the sprung mass
 * @param current            the car's own chassis, or null where its file gives none (rigid)
 * @param stiffnessForTarget the chassis stiffness at which the bar change delivers
 *                           {@link ChassisStudy#DELIVERED_TARGET} of its rigid effect (N m/rad), or null where
 *                           none was found
 * @param notes              what a reader must know to use the figures
 */
public record ChassisStudyResult(String vehicleName, double totalRollStiffness, String barChange,
                                 List<ChassisPoint> sweep, ChassisPoint rigid, ChassisPoint decoupled,
                                 ChassisPoint current, Double stiffnessForTarget, List<String> notes) {
    public ChassisStudyResult {
        sweep = List.copyOf(sweep);
        notes = List.copyOf(notes);
    }
}
