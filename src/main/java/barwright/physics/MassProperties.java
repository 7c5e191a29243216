package barwright.physics;

import barwright.model.CornerMasses;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * Masses, centres of mass and the roll axis (model.md 4).
 *
 * @param mass               total mass m (kg)
 * @param frontMassFraction  share f of the static weight on the front axle
 * @param cgToFrontAxle      a = l (1 - f) (m)
 * @param cgToRearAxle       b = l f (m)
 * @param sprungMass         m_s = m - m_uf - m_ur (kg)
 * @param sprungCgHeight     h_s (m)
 * @param sprungCgToFrontAxle a_s (m)
 * @param frontSprungMass    m_sf = m_s (l - a_s) / l (kg)
 * @param rearSprungMass     m_sr = m_s a_s / l (kg)
 * @param rollAxisHeightAtCg z_a, the roll axis height under the sprung CG (m)
 * @param rollArm            h' = h_s - z_a (m)
 * @param staticLoads        static vertical load of each wheel (N)
 */
public record MassProperties(double mass, double frontMassFraction, double cgToFrontAxle, double cgToRearAxle,
                             double sprungMass, double sprungCgHeight, double sprungCgToFrontAxle,
                             double frontSprungMass, double rearSprungMass, double rollAxisHeightAtCg,
                             double rollArm, StaticWheelLoads staticLoads) {

    /** Static vertical load of each wheel (N). */
    public record StaticWheelLoads(double leftFront, double rightFront, double leftRear, double rightRear) {
        /** @return the static load of the front wheel on the inside of a turn (N) */
        public double frontInside(TurnDirection turn) {
            return turn == TurnDirection.LEFT ? leftFront : rightFront;
        }

        public double frontOutside(TurnDirection turn) {
            return turn == TurnDirection.LEFT ? rightFront : leftFront;
        }

        public double rearInside(TurnDirection turn) {
            return turn == TurnDirection.LEFT ? leftRear : rightRear;
        }

        public double rearOutside(TurnDirection turn) {
            return turn == TurnDirection.LEFT ? rightRear : leftRear;
        }

        /** @return true where each axle's two wheels carry exactly the same static load */
        public boolean symmetric() {
            return leftFront == rightFront && leftRear == rightRear;
        }

        public double frontAxle() {
            return leftFront + rightFront;
        }

        public double rearAxle() {
            return leftRear + rightRear;
        }
    }

    /** @return the mass properties of a vehicle; corner masses, where given, set m, f and each wheel's load */
    public static MassProperties of(Vehicle vehicle) {
        CornerMasses corners = vehicle.cornerMasses();
        double mass = corners != null ? corners.total() : vehicle.mass();
        double frontFraction = corners != null ? corners.frontFraction() : vehicle.frontMassFraction();
        double wheelbase = vehicle.wheelbase();
        double cgToFront = wheelbase * (1 - frontFraction);
        double cgToRear = wheelbase * frontFraction;

        double unsprungFront = vehicle.front().unsprungMass();
        double unsprungRear = vehicle.rear().unsprungMass();
        double sprungMass = mass - unsprungFront - unsprungRear;
        if (!(sprungMass > 0)) {
            throw new ImpossibleVehicleException(String.format(
                    "The unsprung masses (front %.1f kg + rear %.1f kg) are not less than the car's mass %.1f kg: "
                            + "there is no sprung mass to roll.", unsprungFront, unsprungRear, mass));
        }
        double sprungCgHeight = (mass * vehicle.cgHeight() - unsprungFront * vehicle.front().unsprungCgHeight()
                - unsprungRear * vehicle.rear().unsprungCgHeight()) / sprungMass;
        if (!(sprungCgHeight > 0)) {
            throw new ImpossibleVehicleException(String.format(
                    "The sprung mass's centre comes out %.0f mm above the ground, at or below it: the unsprung "
                            + "masses and their heights do not fit the car's CG height of %.0f mm.",
                    sprungCgHeight * 1e3, vehicle.cgHeight() * 1e3));
        }
        double sprungCgToFront = (mass * cgToFront - unsprungRear * wheelbase) / sprungMass;
        if (sprungCgToFront < 0 || sprungCgToFront > wheelbase) {
            throw new ImpossibleVehicleException(String.format(
                    "The sprung mass's centre lies %.0f mm behind the front axle, outside the wheelbase (%.0f mm): "
                            + "the unsprung masses do not fit the weight split.",
                    sprungCgToFront * 1e3, wheelbase * 1e3));
        }
        double frontSprung = sprungMass * (wheelbase - sprungCgToFront) / wheelbase;
        double rearSprung = sprungMass * sprungCgToFront / wheelbase;
        double frontRollCentre = vehicle.front().rollCentreHeight();
        double rearRollCentre = vehicle.rear().rollCentreHeight();
        double rollAxisHeight = frontRollCentre + (rearRollCentre - frontRollCentre) * sprungCgToFront / wheelbase;
        double rollArm = sprungCgHeight - rollAxisHeight;

        double g = STANDARD_GRAVITY;
        StaticWheelLoads loads = corners != null
                ? new StaticWheelLoads(corners.leftFront() * g, corners.rightFront() * g,
                corners.leftRear() * g, corners.rightRear() * g)
                : new StaticWheelLoads(mass * g * frontFraction / 2, mass * g * frontFraction / 2,
                mass * g * (1 - frontFraction) / 2, mass * g * (1 - frontFraction) / 2);
        return new MassProperties(mass, frontFraction, cgToFront, cgToRear, sprungMass, sprungCgHeight,
                sprungCgToFront, frontSprung, rearSprung, rollAxisHeight, rollArm, loads);
    }

    /**
     * The same car under a steady longitudinal acceleration as well: m a_x h / l of load moves from the front
     * axle to the rear, half from each wheel, before the lateral calculation (model.md 7, lift envelope only).
     * The masses, the roll axis and so the lateral load transfer per a_y stay as they are.
     *
     * @param longitudinalAcceleration a_x, forward positive (m/s^2)
     * @param cgHeight                 height of the car's centre of mass h (m)
     */
    public MassProperties withLongitudinalAcceleration(double longitudinalAcceleration, double cgHeight) {
        double wheelbase = cgToFrontAxle + cgToRearAxle;
        double perWheel = mass * longitudinalAcceleration * cgHeight / wheelbase / 2;
        StaticWheelLoads shifted = new StaticWheelLoads(staticLoads.leftFront() - perWheel,
                staticLoads.rightFront() - perWheel, staticLoads.leftRear() + perWheel,
                staticLoads.rightRear() + perWheel);
        return new MassProperties(mass, frontMassFraction, cgToFrontAxle, cgToRearAxle, sprungMass, sprungCgHeight,
                sprungCgToFrontAxle, frontSprungMass, rearSprungMass, rollAxisHeightAtCg, rollArm, shifted);
    }

    /** @return m_s g h', the roll stiffness the gravity term takes away (N m/rad) */
    public double gravityRollMoment() {
        return sprungMass * STANDARD_GRAVITY * rollArm;
    }
}
