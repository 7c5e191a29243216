package barwright.report.linkage;

import barwright.model.DoubleWishbone;
import barwright.model.Linkage;
import barwright.model.LiveAxlePanhard;
import barwright.model.LiveAxleWatts;
import barwright.model.SemiTrailingArm;
import barwright.model.Strut;
import barwright.model.TrailingArm;
import barwright.physics.linkage.InstantCentre;
import barwright.physics.linkage.RollState;
import barwright.physics.linkage.TravelState;
import barwright.report.Cautions;
import barwright.report.heading.TextHeading;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;

/** The geometry tables in words and columns, in the chosen units. */
public final class GeometryText {
    private final UnitSystem units;

    public GeometryText(UnitSystem units) {
        this.units = units;
    }

    public String of(String vehicleName, GeometryTables front, GeometryTables rear) {
        StringBuilder out = new StringBuilder();
        out.append(TextHeading.of("suspension geometry", vehicleName, units)).append('\n');
        out.append("Roll: positive for a left turn, the body leaning right, the right wheel in bump. Camber: SAE J670, "
                + "top leaning away from the car's centre positive.\n");
        axle(out, "Front", front);
        axle(out, "Rear", rear);
        out.append('\n').append(Cautions.SHORT).append('\n');
        return out.toString();
    }

    private void axle(StringBuilder out, String label, GeometryTables tables) {
        out.append('\n').append(label).append(" axle: ");
        if (tables.linkage() == null) {
            out.append("no linkage given; roll-centre height typed in as ")
                    .append(length(tables.staticRollCentreHeight())).append(".\n");
            return;
        }
        out.append(describe(tables.linkage())).append(". Static roll centre ")
                .append(tables.staticRollCentreHeight() == null ? "none (the lines are parallel)"
                        : length(tables.staticRollCentreHeight()) + " above the ground")
                .append(".\n");
        out.append(String.format(Locale.ROOT, "  %9s %22s %22s %14s %14s %12s%n", "roll", "roll-centre height",
                "roll-centre offset", "left camber", "right camber", "track"));
        for (GeometryTables.RollRow row : tables.roll()) {
            String roll = angle(row.roll());
            RollState state = row.state();
            if (state == null) {
                out.append(String.format(Locale.ROOT, "  %9s   %s%n", roll, row.unreachable()));
            } else if (!state.hasRollCentre()) {
                out.append(String.format(Locale.ROOT, "  %9s %45s %14s %14s %12s%n", roll,
                        "none: the lines are parallel", angle(state.leftCamber()), angle(state.rightCamber()),
                        length(state.track())));
            } else {
                out.append(String.format(Locale.ROOT, "  %9s %22s %22s %14s %14s %12s%n", roll,
                        length(state.rollCentre().height()), length(state.rollCentre().offset()),
                        angle(state.leftCamber()), angle(state.rightCamber()), length(state.track())));
            }
        }
        out.append(String.format(Locale.ROOT, "  %12s %14s %34s %20s%n", "wheel travel", "camber",
                "instant centre (across, up)", "swing arm"));
        for (GeometryTables.TravelRow row : tables.travel()) {
            String travel = length(row.travel());
            TravelState state = row.state();
            if (state == null) {
                out.append(String.format(Locale.ROOT, "  %12s   %s%n", travel, row.unreachable()));
                continue;
            }
            InstantCentre centre = state.instantCentre();
            String where = centre.atInfinity() ? "at infinity (parallel arms)"
                    : length(centre.y()) + ", " + length(centre.z());
            String arm = centre.atInfinity() ? "endless" : length(state.swingArmLength());
            out.append(String.format(Locale.ROOT, "  %12s %14s %34s %20s%n", travel, angle(state.camber()), where, arm));
        }
    }

    private static String describe(Linkage linkage) {
        if (linkage instanceof DoubleWishbone) {
            return "double wishbone";
        }
        if (linkage instanceof Strut) {
            return "strut";
        }
        if (linkage instanceof LiveAxlePanhard) {
            return "beam axle with a Panhard rod (camber to the road does not change in roll; one-wheel travel tilts "
                    + "the axle about the other wheel)";
        }
        if (linkage instanceof LiveAxleWatts watts) {
            return "beam axle with a Watt's linkage, centre pivot on the "
                    + (watts.centrePivotMount() == LiveAxleWatts.Mount.AXLE ? "axle" : "body");
        }
        if (linkage instanceof TrailingArm) {
            return "trailing arms";
        }
        if (linkage instanceof SemiTrailingArm) {
            return "semi-trailing arms";
        }
        return "linkage";
    }

    private String length(double metres) {
        return Figures.format(metres + 0.0, Quantity.LENGTH, units, units == UnitSystem.US ? 2 : 1);
    }

    private String angle(double radians) {
        return Figures.format(radians + 0.0, Quantity.ANGLE, units, 2);
    }
}
