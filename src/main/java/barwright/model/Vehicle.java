package barwright.model;

import java.util.Objects;

/**
 * A whole car as analysed: masses, geometry, both axles and the bar check travel.
 *
 * @param name                       a label for people
 * @param mass                       total mass m (kg); with corner masses, their sum
 * @param frontMassFraction          share f of the static weight on the front axle; with corner masses, theirs
 * @param cornerMasses               static mass on each wheel, or null for a car symmetric left to right
 * @param cgHeight                   height of the centre of mass h (m)
 * @param wheelbase                  wheelbase l (m)
 * @param chassisTorsionalStiffness  torsional stiffness of the body between the axles K_c (N m/rad), or
 *                                   null for a rigid chassis
 * @param front                      the front axle
 * @param rear                       the rear axle
 * @param differentialWheelTravel    left-minus-right wheel travel at which bar stresses are checked (m)
 */
public record Vehicle(String name, double mass, double frontMassFraction, CornerMasses cornerMasses,
                      double cgHeight, double wheelbase, Double chassisTorsionalStiffness, Axle front, Axle rear,
                      double differentialWheelTravel) {
    public Vehicle {
        Objects.requireNonNull(name, "name");
        Checks.positive("mass", mass);
        if (!(frontMassFraction > 0 && frontMassFraction < 1)) {
            throw new IllegalArgumentException("frontMassFraction must lie between 0 and 1, was " + frontMassFraction);
        }
        Checks.positive("cgHeight", cgHeight);
        Checks.positive("wheelbase", wheelbase);
        if (chassisTorsionalStiffness != null) {
            Checks.positive("chassisTorsionalStiffness", chassisTorsionalStiffness);
        }
        Objects.requireNonNull(front, "front");
        Objects.requireNonNull(rear, "rear");
        Checks.nonNegative("differentialWheelTravel", differentialWheelTravel);
    }

    public Vehicle withFront(Axle newFront) {
        return new Vehicle(name, mass, frontMassFraction, cornerMasses, cgHeight, wheelbase,
                chassisTorsionalStiffness, newFront, rear, differentialWheelTravel);
    }

    public Vehicle withRear(Axle newRear) {
        return new Vehicle(name, mass, frontMassFraction, cornerMasses, cgHeight, wheelbase,
                chassisTorsionalStiffness, front, newRear, differentialWheelTravel);
    }

    public Vehicle withAxle(AxlePosition position, Axle axle) {
        return position == AxlePosition.FRONT ? withFront(axle) : withRear(axle);
    }

    public Axle axle(AxlePosition position) {
        return position == AxlePosition.FRONT ? front : rear;
    }

    public Vehicle withChassisTorsionalStiffness(Double newStiffness) {
        return new Vehicle(name, mass, frontMassFraction, cornerMasses, cgHeight, wheelbase, newStiffness,
                front, rear, differentialWheelTravel);
    }

    public Vehicle withCgHeight(double newHeight) {
        return new Vehicle(name, mass, frontMassFraction, cornerMasses, newHeight, wheelbase,
                chassisTorsionalStiffness, front, rear, differentialWheelTravel);
    }

    /** A symmetric car with a new mass split (corner masses, if any, are dropped). */
    public Vehicle withMassDistribution(double newMass, double newFrontFraction) {
        return new Vehicle(name, newMass, newFrontFraction, null, cgHeight, wheelbase,
                chassisTorsionalStiffness, front, rear, differentialWheelTravel);
    }
}
