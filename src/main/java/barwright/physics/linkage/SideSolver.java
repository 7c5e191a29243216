package barwright.physics.linkage;

import barwright.solver.RootFinder;

import java.util.ArrayList;
import java.util.List;

/**
 * Solves a side's loop closure for a wheel travel. The side's coordinate is followed from its measured value in
 * small steps each way, as far as the linkage goes together and the travel keeps rising (or falling); that
 * table brackets any reachable travel, and a Brent solve (Commons Math) finds the coordinate between two
 * neighbouring entries.
 */
final class SideSolver {
    /** Travel followed each way from the measured position (m). */
    static final double RANGE = 0.25;
    /** Accuracy of a solved coordinate (rad): about 3e-14 m at the contact point of a 300 mm arm. */
    static final double COORDINATE_ACCURACY = 1e-13;
    /** A Brent solve to 1e-13 within one quarter-degree step of the table takes some 10 to 20 evaluations. */
    private static final RootFinder COORDINATE_ROOT =
            RootFinder.of("the linkage's arm angle at a wheel travel", COORDINATE_ACCURACY, 200);
    private static final int MAX_STEPS = 720;

    private final SideLinkage side;
    private final double[] coordinates;
    private final double[] travels;
    private final TravelLimit bump;
    private final TravelLimit droop;
    private final double staticZ;

    SideSolver(SideLinkage side) {
        this.side = side;
        double start = side.staticCoordinate();
        this.staticZ = side.contactAt(start)[1];
        double step = side.coordinateStep();
        List<double[]> up = follow(start, step);
        List<double[]> down = follow(start, -step);
        // which way of the coordinate is bump
        boolean upIsBump = up.size() > 1 ? up.get(1)[1] > 0 : down.size() > 1 && down.get(1)[1] < 0;
        List<double[]> bumpSide = upIsBump ? up : down;
        List<double[]> droopSide = upIsBump ? down : up;
        int n = bumpSide.size() + droopSide.size() - 1;
        coordinates = new double[n];
        travels = new double[n];
        int i = 0;
        for (int k = droopSide.size() - 1; k >= 0; k--, i++) {
            coordinates[i] = droopSide.get(k)[0];
            travels[i] = droopSide.get(k)[1];
        }
        for (int k = 1; k < bumpSide.size(); k++, i++) {
            coordinates[i] = bumpSide.get(k)[0];
            travels[i] = bumpSide.get(k)[1];
        }
        bump = limit(bumpSide, travels[n - 1]);
        droop = limit(droopSide, travels[0]);
    }

    private TravelLimit limit(List<double[]> run, double last) {
        double reason = run.get(run.size() - 1)[2];
        return new TravelLimit(last, reason > 0 ? side.whyItLocks() : TravelLimit.BEYOND_RANGE);
    }

    /** @return rows {coordinate, travel, stoppedByLinkage (1) or range (0)} from the start, while monotonic */
    private List<double[]> follow(double start, double step) {
        List<double[]> run = new ArrayList<>();
        double staticTravel = side.contactAt(start)[1];
        run.add(new double[] {start, 0, 0});
        double direction = 0;
        for (int k = 1; k <= MAX_STEPS; k++) {
            double coordinate = start + k * step;
            double[] contact = side.contactAt(coordinate);
            double[] last = run.get(run.size() - 1);
            if (contact == null) {
                last[2] = 1;
                return run;
            }
            double travel = contact[1] - staticTravel;
            double change = travel - last[1];
            if (direction == 0) {
                direction = Math.signum(change);
            }
            if (change * direction <= 0) {
                last[2] = 1; // the travel turns back: the linkage has locked
                return run;
            }
            run.add(new double[] {coordinate, travel, 0});
            if (Math.abs(travel) > RANGE) {
                return run;
            }
        }
        return run;
    }

    TravelLimit bumpLimit() {
        return bump;
    }

    TravelLimit droopLimit() {
        return droop;
    }

    boolean reaches(double travel) {
        return travel >= droop.travel() && travel <= bump.travel();
    }

    /**
     * @param travel the contact point's rise relative to the body from the measured position (m)
     * @return the side's pose there
     * @throws LinkageLimitException where the linkage cannot reach that travel
     */
    SidePose pose(double travel) {
        return side.poseAt(coordinate(travel));
    }

    /**
     * @param travel the contact point's rise relative to the body from the measured position (m)
     * @return the contact point's distance from the centreline there (m)
     * @throws LinkageLimitException where the linkage cannot reach that travel
     */
    double contactY(double travel) {
        return side.contactAt(coordinate(travel))[0];
    }

    private double coordinate(double travel) {
        if (!reaches(travel)) {
            TravelLimit limit = travel > 0 ? bump : droop;
            throw new LinkageLimitException(travel, limit);
        }
        // binary search for the first entry at or above the travel
        int low = 0;
        int high = travels.length - 1;
        while (low < high) {
            int mid = (low + high) >>> 1;
            if (travels[mid] < travel) {
                low = mid + 1;
            } else {
                high = mid;
            }
        }
        int upper = Math.max(low, 1);
        if (travels[upper] == travel) {
            return coordinates[upper];
        }
        double a = coordinates[upper - 1];
        double b = coordinates[upper];
        return COORDINATE_ROOT.solve(c -> side.contactAt(c)[1] - staticZ - travel, Math.min(a, b), Math.max(a, b));
    }
}
