package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.model.BarCentreline;
import barwright.model.BarSection;
import barwright.model.Material;
import barwright.model.Point3;
import barwright.model.UBarDimensions;

import java.util.ArrayList;
import java.util.List;

/**
 * Bars for the tests, in vehicle axes (x forward, y left, z up): a torsion tube along y with its middle at
 * the origin and arms pointing rearwards (-x) from its ends. Dimensions are invented but typical of a
 * small car's front bar.
 */
final class BarShapes {
    /**
     * Steel: E = 205 GPa and G = 80 GPa as in docs/validation.md, section "Bar rate, series
     * model"; density 7850 kg/m^3 (common practice for carbon steel); the yield strength is a test
     * value, used only through ratios.
     */
    static final Material STEEL = new Material("steel (test values)", 205e9, 80e9, 7850, 1100e6);
    static final double LINK_MOTION_RATIO = 0.7;

    private BarShapes() {
    }

    /**
     * A plain U-bar given both ways: as closed-form dimensions and as the equivalent centreline.
     *
     * @param torsionLength L between the arm bends (m)
     * @param span          bushing span s (m)
     * @param arms          effective arm length of each hole, longest first (m); the arms are as long as the
     *                      first, and each other hole sits back from the end by the difference
     * @param bendRadius    radius of the two arm bends (m)
     * @param hole          the hole in use
     */
    static AntiRollBar uBar(BarSection section, double torsionLength, double span, List<Double> arms,
                            double bendRadius, int hole) {
        double arm = arms.get(0);
        double half = torsionLength / 2;
        List<Point3> points = List.of(new Point3(-arm, half, 0), new Point3(0, half, 0), new Point3(0, -half, 0),
                new Point3(-arm, -half, 0));
        List<Double> setbacks = arms.stream().map(each -> arm - each).toList();
        BarCentreline centreline = new BarCentreline(points, bendRadius,
                List.of(new Point3(0, span / 2, 0), new Point3(0, -span / 2, 0)), null, setbacks);
        return new AntiRollBar(STEEL, section, new UBarDimensions(torsionLength, span, arms), centreline, hole,
                LINK_MOTION_RATIO);
    }

    /** A plain U-bar with one hole at the arm ends. */
    static AntiRollBar uBar(BarSection section, double torsionLength, double span, double arm, double bendRadius) {
        return uBar(section, torsionLength, span, List.of(arm), bendRadius, 0);
    }

    /** The same bar with bushings of a finite radial rate (N/m). */
    static AntiRollBar withBushingRate(AntiRollBar bar, double radialRate) {
        BarCentreline line = bar.centreline();
        return new AntiRollBar(bar.material(), bar.section(), bar.dimensions(), new BarCentreline(line.points(),
                line.bendRadius(), line.bushings(), radialRate, line.holeSetbacks()), bar.selectedArm(),
                bar.linkMotionRatio());
    }

    /**
     * A U-bar whose arms are swept outwards by {@code sweep} (rad) from the fore-aft direction, keeping the
     * arm reach (the fore-aft distance from the tube axis to the link point) at {@code reach}.
     */
    static AntiRollBar sweptBar(BarSection section, double torsionLength, double span, double reach, double sweep,
                                double bendRadius) {
        double half = torsionLength / 2;
        double outward = reach * Math.tan(sweep);
        List<Point3> points = List.of(new Point3(-reach, half + outward, 0), new Point3(0, half, 0),
                new Point3(0, -half, 0), new Point3(-reach, -half - outward, 0));
        return shaped(section, points, span, bendRadius);
    }

    /**
     * A U-bar whose middle part drops by {@code drop} (m) through two 45-degree doglegs that begin at
     * y = +-{@code doglegAt}, between the bushings.
     */
    static AntiRollBar droppedCentreBar(BarSection section, double torsionLength, double span, double reach,
                                        double doglegAt, double drop, double bendRadius) {
        double half = torsionLength / 2;
        List<Point3> points = new ArrayList<>();
        points.add(new Point3(-reach, half, 0));
        points.add(new Point3(0, half, 0));
        if (drop > 0) {
            points.add(new Point3(0, doglegAt, 0));
            points.add(new Point3(0, doglegAt - drop, -drop));
            points.add(new Point3(0, -doglegAt + drop, -drop));
            points.add(new Point3(0, -doglegAt, 0));
        }
        points.add(new Point3(0, -half, 0));
        points.add(new Point3(-reach, -half, 0));
        return shaped(section, points, span, bendRadius);
    }

    private static AntiRollBar shaped(BarSection section, List<Point3> points, double span, double bendRadius) {
        BarCentreline centreline = new BarCentreline(points, bendRadius,
                List.of(new Point3(0, span / 2, 0), new Point3(0, -span / 2, 0)), null, List.of(0.0));
        return new AntiRollBar(STEEL, section, null, centreline, 0, LINK_MOTION_RATIO);
    }
}
