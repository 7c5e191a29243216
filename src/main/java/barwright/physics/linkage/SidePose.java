package barwright.physics.linkage;

import barwright.model.FrontViewPoint;

import java.util.List;

/**
 * One side's linkage at a wheel travel, in the body's axes (left side).
 *
 * @param travel          the contact point's rise relative to the body from where the points were measured (m)
 * @param contact         the tyre contact point, moved as a rigid point of the upright (m)
 * @param uprightRotation the upright's rotation from its measured position (rad), positive turning y towards
 *                        z: for the left wheel, camber changes by minus this
 * @param instantCentre   the upright's front-view instant centre relative to the body
 * @param joints          the upright's joints in the order the linkage lists them (double wishbone: upper
 *                        and lower ball joints; strut: the strut's lower point and the lower ball joint;
 *                        swinging arm: none)
 */
public record SidePose(double travel, FrontViewPoint contact, double uprightRotation, InstantCentre instantCentre,
                       List<FrontViewPoint> joints) {
    public SidePose {
        joints = List.copyOf(joints);
    }
}
