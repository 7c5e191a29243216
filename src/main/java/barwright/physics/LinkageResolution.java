package barwright.physics;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.linkage.AxleKinematics;
import barwright.physics.linkage.LinkageLimitException;
import barwright.physics.linkage.RollState;
import java.util.Locale;

/**
 * Where the analysis meets the linkages (model.md 12): the car the analysis sees at its ride height, each
 * linkage axle's roll centre computed instead of typed, and the centre of mass moved with the ride-height
 * changes. An axle without a linkage is left exactly as it is.
 */
public final class LinkageResolution {
    private LinkageResolution() {
    }

    /**
     * @return the car with each linkage axle's roll-centre height set to its static load-transfer height (the
     *         kinematic roll centre's height, at rest) and its CG height moved by the ride-height changes; the
     *         same car where no axle has a linkage
     * @throws ImpossibleVehicleException where a linkage cannot be put together at its ride height
     */
    public static Vehicle atRideHeight(Vehicle vehicle) {
        if (!vehicle.front().hasLinkage() && !vehicle.rear().hasLinkage()) {
            return vehicle;
        }
        return atRideHeight(vehicle, vehicle.front().hasLinkage() ? kinematics(vehicle, AxlePosition.FRONT) : null,
                vehicle.rear().hasLinkage() ? kinematics(vehicle, AxlePosition.REAR) : null);
    }

    /**
     * As {@link #atRideHeight(Vehicle)} with each linkage axle's kinematics already worked out.
     *
     * @param front the front linkage's kinematics, null where the front has none
     * @param rear  the rear's, null where it has none
     */
    static Vehicle atRideHeight(Vehicle vehicle, AxleKinematics front, AxleKinematics rear) {
        if (front == null && rear == null) {
            return vehicle;
        }
        Vehicle resolved = vehicle;
        for (AxlePosition position : AxlePosition.values()) {
            Axle axle = vehicle.axle(position);
            AxleKinematics kinematics = position == AxlePosition.FRONT ? front : rear;
            if (kinematics != null) {
                double height = kinematics.atRideHeight().loadTransferHeight();
                resolved = resolved.withAxle(position, axle.withRollCentreHeight(height));
            }
        }
        return resolved.withCgHeight(vehicle.cgHeight() + cgHeightChange(vehicle));
    }

    /**
     * The body's ride-height changes move only the sprung mass: at its centre the body moves by the front and
     * rear changes mixed by the weight split, d = f d_front + (1 - f) d_rear (a straight line between the axles),
     * and the whole car's centre by m_s / m of that.
     *
     * @return the change of the car's CG height (m)
     */
    static double cgHeightChange(Vehicle vehicle) {
        double front = vehicle.front().suspension().rideHeightChange();
        double rear = vehicle.rear().suspension().rideHeightChange();
        if (front == 0 && rear == 0) {
            return 0;
        }
        double f = vehicle.frontMassFraction();
        double sprungShare = (vehicle.mass() - vehicle.front().unsprungMass() - vehicle.rear().unsprungMass())
                / vehicle.mass();
        return sprungShare * (f * front + (1 - f) * rear);
    }

    /**
     * @return the axle's kinematics
     * @throws ImpossibleVehicleException naming the axle's linkage where it cannot be put together
     */
    public static AxleKinematics kinematics(Vehicle vehicle, AxlePosition position) {
        try {
            return AxleKinematics.of(vehicle.axle(position));
        } catch (LinkageLimitException beyond) {
            throw new ImpossibleVehicleException(position.key() + ".linkage: " + beyond.getMessage());
        }
    }

    /**
     * @return the roll state of an axle's linkage at a roll angle
     * @throws ImpossibleVehicleException naming the axle's linkage where a wheel cannot travel that far
     */
    static RollState roll(AxleKinematics kinematics, AxlePosition position, double roll) {
        try {
            return kinematics.roll(roll);
        } catch (LinkageLimitException beyond) {
            throw new ImpossibleVehicleException(position.key() + ".linkage: at " + String.format(Locale.ROOT,
                    "%.1f", Math.toDegrees(Math.abs(roll))) + " deg of body roll " + beyond.getMessage());
        }
    }
}
