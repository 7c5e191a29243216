package barwright.physics;

import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.io.VehicleFileReader;
import barwright.io.VehicleFileWriter;
import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.report.ReportJson;
import barwright.report.TextSummary;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Random cars with every key of the vehicle file drawn inside its allowed range (docs/file-format.md), read
 * by the same reader as a file and analysed: each is refused as impossible with its cause, or analysed with
 * figures a racer can trust or a warning that says why not. Seeded: the seed of a failing car is in the
 * failure message, and {@link #car(Random)} rebuilds it.
 */
class RandomValidCarPropertyTest {
    private static final int CARS = 1000;
    private static final long FIRST_SEED = 20261202;
    /**
     * The wheel loads must add up to the car's weight at every lateral acceleration (vertical equilibrium;
     * model.md 7 says so): 1e-9 of the weight is round-off of sums of a few terms.
     */
    private static final double WEIGHT_TOLERANCE = 1e-9;

    @Test
    void everyRandomValidCarIsRefusedWithItsCauseOrAnalysedWithFiguresOrWarnings() throws Exception {
        int analysed = 0;
        int impossible = 0;
        List<String> failures = new ArrayList<>();
        for (int i = 0; i < CARS; i++) {
            long seed = FIRST_SEED + i;
            VehicleDocument document;
            try {
                document = VehicleLoader.fromTree(car(new Random(seed)));
            } catch (VehicleFileException refused) {
                // only the one cross-key rule (bushing span within the torsion length) can refuse a car drawn
                // inside every range; that is kept out by construction, so any refusal is a failure here
                failures.add("seed " + seed + ": refused when read: " + refused.getMessage());
                continue;
            }
            AnalysisResult result;
            try {
                result = VehicleAnalysis.analyse(document.vehicle());
            } catch (ImpossibleVehicleException cause) {
                impossible++;
                if (cause.getMessage() == null || cause.getMessage().isBlank()) {
                    failures.add("seed " + seed + ": refused as impossible with no cause");
                }
                continue;
            }
            analysed++;
            check(seed, result, failures);
            if (failures.size() > 20) {
                break;
            }
        }
        System.out.println("random valid cars: " + CARS + ", analysed " + analysed + ", impossible " + impossible);
        assertThat(failures).as("cars that broke a property (rebuild with car(new Random(seed)))").isEmpty();
        // the test must look at many analysed cars, not pass by refusing them all: about one in five of these
        // cars has no stable roll position or no sprung mass (402 of 2,000 when this was written)
        assertThat(analysed).as("analysed of %d (impossible %d)", CARS, impossible).isGreaterThan(CARS / 2);
    }

    private static void check(long seed, AnalysisResult result, List<String> failures) {
        String where = "seed " + seed + ": ";
        List<String> codes = result.warnings().stream().map(Warning::code).toList();
        try {
            VehicleFileWriter.toJson(ReportJson.of(result)); // throws on NaN or Infinity anywhere in the report
            TextSummary.of(result, UnitSystem.SI); // the same for every row of the summary
        } catch (IllegalStateException nonFinite) {
            failures.add(where + nonFinite.getMessage());
        }
        double share = result.frontLoadTransferShare();
        if (!(share >= 0 && share <= 1) && codes.stream().noneMatch(code -> code.endsWith("LOAD_TRANSFER_REVERSED"))) {
            failures.add(where + "front share of load transfer " + share + " with no warning " + codes);
        }
        if (result.rollGradient() < 0 && !codes.contains("BODY_LEANS_INTO_TURN")) {
            failures.add(where + "negative roll gradient with no warning " + codes);
        }
        double weight = result.masses().mass() * STANDARD_GRAVITY;
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            if (!(turn.limit() >= 0.05 * STANDARD_GRAVITY) && !codes.contains("GRIP_LIMIT_VERY_LOW")) {
                failures.add(where + "limit " + turn.limit() / STANDARD_GRAVITY + " g with no warning " + codes);
            }
            for (int step = 0; step <= 40; step++) {
                double accel = turn.limit() * step / 40;
                WheelLoads loads = turn.cornering().wheelLoads(accel);
                if (Math.abs(loads.total() - weight) > WEIGHT_TOLERANCE * weight) {
                    failures.add(where + "wheel loads add up to " + loads.total() + " N, not the weight " + weight);
                }
                for (AxlePosition axle : AxlePosition.values()) {
                    double outside = axle == AxlePosition.FRONT ? loads.frontOutside() : loads.rearOutside();
                    double inside = axle == AxlePosition.FRONT ? loads.frontInside() : loads.rearInside();
                    String code = axle.key().toUpperCase(java.util.Locale.ROOT) + "_OUTSIDE_WHEEL_UNLOADED_BEFORE_LIMIT";
                    if (outside < 0 && !codes.contains(code)) {
                        failures.add(where + "outside " + axle.key() + " wheel at " + outside + " N in a "
                                + direction.word() + " turn at " + accel / STANDARD_GRAVITY + " g with no warning " + codes);
                    }
                    if (inside < 0) {
                        failures.add(where + "inside " + axle.key() + " wheel below zero: " + inside + " N");
                    }
                }
            }
        }
    }

    /** @return a vehicle tree with every key drawn inside its range of docs/file-format.md */
    static ObjectNode car(Random random) {
        JsonNodeFactory nodes = JsonNodeFactory.instance;
        ObjectNode car = nodes.objectNode();
        car.put("format", VehicleFileReader.FORMAT).put("version", 1).put("name", "random valid car (invented)");
        ObjectNode vehicle = car.putObject("vehicle");
        double mass = logUniform(random, 50, 20000);
        double cgHeight = logUniform(random, 50, 3000);
        vehicle.put("massKg", mass);
        vehicle.put("frontMassFraction", uniform(random, 0.05, 0.95));
        vehicle.put("cgHeightMm", cgHeight);
        vehicle.put("wheelbaseMm", logUniform(random, 500, 10000));
        if (random.nextBoolean()) {
            vehicle.put("chassisTorsionalStiffnessNmPerDeg", logUniform(random, 10, 1e8));
        } else {
            vehicle.putNull("chassisTorsionalStiffnessNmPerDeg");
        }
        car.set("front", axle(random, mass, cgHeight));
        car.set("rear", axle(random, mass, cgHeight));
        car.putObject("analysis").put("differentialWheelTravelMm", uniform(random, 1, 500));
        return car;
    }

    /**
     * Unsprung masses and their heights are drawn inside their ranges but below a quarter of the car's mass
     * and its CG height: drawn over the whole range nearly every car has more unsprung mass than mass, which
     * is refused before anything else is looked at.
     */
    private static ObjectNode axle(Random random, double carMass, double cgHeight) {
        ObjectNode axle = JsonNodeFactory.instance.objectNode();
        axle.put("trackMm", uniform(random, 300, 4000));
        axle.put("rollCentreHeightMm", uniform(random, -500, 1500));
        axle.put("unsprungMassKg", uniform(random, 0, Math.min(2000, carMass / 4)));
        axle.put("unsprungCgHeightMm", uniform(random, 0, Math.min(2000, cgHeight)));
        axle.put("springRateNPerMm", logUniform(random, 0.5, 2000));
        axle.put("springMotionRatio", uniform(random, 0.1, 3));
        axle.put("tyreVerticalRateNPerMm", logUniform(random, 10, 10000));
        ObjectNode tyre = axle.putObject("tyre");
        tyre.put("nominalLoadN", logUniform(random, 100, 100000));
        tyre.put("frictionAtNominalLoad", uniform(random, 0.1, 5));
        tyre.put("frictionLoadSensitivity", uniform(random, -1, 0.5));
        tyre.put("corneringStiffnessPerLoad", uniform(random, 1, 100));
        tyre.put("corneringStiffnessPeakLoadRatio", uniform(random, 0.5, 10));
        tyre.put("shapeFactor", uniform(random, 1, 2));
        tyre.put("curvatureFactor", uniform(random, -10, 1));
        if (random.nextInt(4) == 0) {
            axle.putNull("bar");
            return axle;
        }
        ObjectNode bar = axle.putObject("bar");
        bar.putObject("material").put("name", "spring steel");
        ObjectNode section = bar.putObject("section");
        double diameter = uniform(random, 3, 200);
        if (random.nextBoolean()) {
            section.put("shape", "solid").put("outerDiameterMm", diameter);
        } else {
            section.put("shape", "tube").put("outerDiameterMm", diameter)
                    .put("wallMm", uniform(random, 0.5, Math.nextDown(diameter / 2)));
        }
        double length = uniform(random, 50, 3000);
        bar.put("torsionLengthMm", length);
        bar.put("bushingSpanMm", uniform(random, Math.min(20, length), length));
        bar.putArray("armLengthsMm").add(uniform(random, 10, 1000));
        bar.put("selectedArm", 0);
        bar.put("linkMotionRatio", uniform(random, 0.1, 3));
        return axle;
    }

    private static double uniform(Random random, double low, double high) {
        return low + (high - low) * random.nextDouble();
    }

    /** Spread evenly over the orders of magnitude of a range that spans several. */
    private static double logUniform(Random random, double low, double high) {
        return Math.exp(Math.log(low) + (Math.log(high) - Math.log(low)) * random.nextDouble());
    }
}
