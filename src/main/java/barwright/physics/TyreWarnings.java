package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.LoadTable;
import barwright.model.TurnDirection;
import barwright.model.Tyre;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Warnings about the tyres at the limit (model.md 8.1): loads past a tyre's points, where the grip is the
 * model's continuation rather than data, and a friction law that would fall below its floor.
 */
final class TyreWarnings {
    /** A load this far outside the points (as a share of the end load) is warned about. */
    static final double OUTSIDE_DATA_MARGIN = 0.10;
    static final String LOAD_OUTSIDE_DATA = "TYRE_LOAD_OUTSIDE_DATA";
    static final String FRICTION_AT_FLOOR = "TYRE_FRICTION_AT_FLOOR";

    private TyreWarnings() {
    }

    static List<Warning> of(AnalysisResult result) {
        List<Warning> warnings = new ArrayList<>();
        for (AxlePosition axle : AxlePosition.values()) {
            Tyre tyre = result.vehicle().axle(axle).tyre();
            TyreModel model = result.grip(axle).tyre(); // the analysis's own tyre model
            List<String> outside = new ArrayList<>();
            boolean onlyBelow = true;
            List<String> floored = new ArrayList<>();
            for (TurnDirection direction : TurnDirection.values()) {
                TurnResult turn = result.turn(direction);
                WheelLoads loads = turn.cornering().wheelLoads(turn.limit());
                double outer = axle == AxlePosition.FRONT ? loads.frontOutside() : loads.rearOutside();
                double inner = axle == AxlePosition.FRONT ? loads.frontInside() : loads.rearInside();
                double[] wheelLoads = {outer, inner};
                for (int wheelIndex = 0; wheelIndex < 2; wheelIndex++) {
                    double load = wheelLoads[wheelIndex];
                    String wheel = String.format(Locale.ROOT, "%s tyre %.0f N in a %s turn",
                            wheelIndex == 0 ? "outside" : "inside", load, direction.word());
                    if (load > 0 && (outsideData(tyre.frictionByLoad(), load)
                            || outsideData(tyre.corneringStiffnessByLoad(), load))) {
                        outside.add(wheel);
                        onlyBelow &= load < lowestLoad(tyre);
                    }
                    if (load > 0 && !tyre.hasFrictionPoints() && model.unfloredFriction(load) < model.frictionFloor()) {
                        floored.add(String.format(Locale.ROOT, "%s (the law gives %.2f)", wheel,
                                model.unfloredFriction(load)));
                    }
                }
            }
            if (!outside.isEmpty()) {
                warnings.add(new Warning(LOAD_OUTSIDE_DATA, String.format(Locale.ROOT,
                        "The %s tyres' loads at the limit lie outside their measured points (%s) by more than "
                                + "10 %%: %s. There the grip is an estimate carried on from the points, not "
                                + "data: treat the limit and balance with care, and measure the tyre at these "
                                + "loads if you can.%s", axle.key(), range(tyre), String.join("; ", outside),
                        onlyBelow ? " Only light loads are outside: a lightly loaded inside tyre adds little grip, "
                                + "so this matters less than a load above the points." : "")));
            }
            if (!floored.isEmpty()) {
                warnings.add(new Warning(FRICTION_AT_FLOOR, String.format(Locale.ROOT,
                        "The %s tyres' friction law falls below %.2f (half its friction at the reference load) "
                                + "at the loads of the limit: %s. The program holds the friction at %.2f there, "
                                + "but the tyre is used far outside what the law was made for: give the tyre as "
                                + "points measured at these loads.", axle.key(), model.frictionFloor(),
                        String.join("; ", floored), model.frictionFloor())));
            }
        }
        return warnings;
    }

    private static boolean outsideData(LoadTable table, double load) {
        return table != null && (load > (1 + OUTSIDE_DATA_MARGIN) * table.highestLoad()
                || load < (1 - OUTSIDE_DATA_MARGIN) * table.lowestLoad());
    }

    private static double lowestLoad(Tyre tyre) {
        double lowest = Double.POSITIVE_INFINITY;
        for (LoadTable table : new LoadTable[]{tyre.frictionByLoad(), tyre.corneringStiffnessByLoad()}) {
            if (table != null) {
                lowest = Math.min(lowest, table.lowestLoad());
            }
        }
        return lowest;
    }

    private static String range(Tyre tyre) {
        LoadTable table = tyre.hasFrictionPoints() ? tyre.frictionByLoad() : tyre.corneringStiffnessByLoad();
        String text = String.format(Locale.ROOT, "%.0f to %.0f N", table.lowestLoad(), table.highestLoad());
        if (tyre.hasFrictionPoints() && tyre.hasStiffnessPoints()
                && (tyre.corneringStiffnessByLoad().lowestLoad() != table.lowestLoad()
                || tyre.corneringStiffnessByLoad().highestLoad() != table.highestLoad())) {
            text += String.format(Locale.ROOT, " for the friction, %.0f to %.0f N for the cornering stiffness",
                    tyre.corneringStiffnessByLoad().lowestLoad(), tyre.corneringStiffnessByLoad().highestLoad());
        }
        return text;
    }
}
