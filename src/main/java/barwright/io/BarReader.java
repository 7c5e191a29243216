package barwright.io;

import barwright.model.AntiRollBar;
import barwright.model.BarCentreline;
import barwright.model.BarSection;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.model.Point3;
import barwright.model.RateCalibration;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.UBarDimensions;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.io.VehicleKeys.DENSITY_KG_PER_M3;
import static barwright.io.VehicleKeys.MATERIAL;
import static barwright.io.VehicleKeys.MATERIAL_PROPERTIES;
import static barwright.io.VehicleKeys.NAME;
import static barwright.io.VehicleKeys.OUTER_DIAMETER_MM;
import static barwright.io.VehicleKeys.SECTION;
import static barwright.io.VehicleKeys.SELECTED_ARM;
import static barwright.io.VehicleKeys.SHAPE;
import static barwright.io.VehicleKeys.SHEAR_MODULUS_GPA;
import static barwright.io.VehicleKeys.SOLID;
import static barwright.io.VehicleKeys.TUBE;
import static barwright.io.VehicleKeys.WALL_MM;
import static barwright.io.VehicleKeys.YIELD_STRENGTH_MPA;
import static barwright.io.VehicleKeys.YOUNGS_MODULUS_GPA;

/** Reads a {@code bar} object: material, section, U-bar dimensions and/or a shaped centreline. */
final class BarReader {
    static final Range DIAMETER = Range.between(3, 200, "mm");
    static final Range ARM = Range.between(10, 1000, "mm");
    static final int MAX_HOLES = 20;
    /** A bushing may sit this far off the centreline polyline and still count as on it (mm). */
    static final double ON_CENTRELINE_TOLERANCE_MM = 1.0;

    private BarReader() {
    }

    static AntiRollBar read(JsonNode node, String path, NodeReader reader) {
        int before = reader.problems().size();
        Material material = readMaterial(node, path, reader);
        BarSection section = readSection(node, path, reader);
        JsonNode geometryNode = reader.object(node, path, "geometry", false);
        BarCentreline centreline = geometryNode == null ? null
                : readCentreline(geometryNode, path + ".geometry", reader);
        boolean closedFormGiven = !NodeReader.isAbsent(node, "torsionLengthMm") || geometryNode == null;
        UBarDimensions dimensions = closedFormGiven ? readDimensions(node, path, reader) : null;
        int holes = centreline != null ? centreline.holeSetbacks().size()
                : dimensions != null ? dimensions.armLengths().size() : 1;
        int selected = reader.integer(node, path, SELECTED_ARM, 0, holes - 1);
        double linkRatio = reader.number(node, path, "linkMotionRatio", Range.between(0.1, 3, ""));
        RateCalibration calibration = RateCalibrationKeys.read(node, path, reader);
        if (reader.problems().size() > before || material == null || section == null) {
            return null;
        }
        AntiRollBar bar = new AntiRollBar(material, section, dimensions, centreline, selected, linkRatio, calibration);
        if (centreline != null) {
            reader.problems(reader.buildChecks().ofShapedBar(bar, path));
        }
        return reader.problems().size() > before ? null : bar;
    }

    private static Material readMaterial(JsonNode node, String path, NodeReader reader) {
        String materialPath = path + ".material";
        JsonNode materialNode = reader.object(node, path, MATERIAL, true);
        if (materialNode == null) {
            return null;
        }
        String name = reader.text(materialNode, materialPath, NAME, true);
        // a material is named (a built-in one) where none of its four properties is given; other keys are kept
        boolean nameOnly = MATERIAL_PROPERTIES.stream().allMatch(key -> NodeReader.isAbsent(materialNode, key));
        if (nameOnly) {
            if (name.isEmpty()) {
                return null;
            }
            return MaterialLibrary.byName(name).orElseGet(() -> {
                reader.problem(materialPath + ".name", "= \"" + name + "\": not a built-in material; use one of "
                        + String.join(", ", MaterialLibrary.names()) + ", or give youngsModulusGPa, "
                        + "shearModulusGPa, densityKgPerM3 and yieldStrengthMPa");
                return null;
            });
        }
        double youngs = reader.number(materialNode, materialPath, YOUNGS_MODULUS_GPA, Range.between(1, 1000, "GPa"));
        double shear = reader.number(materialNode, materialPath, SHEAR_MODULUS_GPA, Range.between(1, 500, "GPa"));
        double density = reader.number(materialNode, materialPath, DENSITY_KG_PER_M3, Range.between(500, 25000, "kg/m³"));
        double yield = reader.number(materialNode, materialPath, YIELD_STRENGTH_MPA, Range.between(10, 5000, "MPa"));
        return new Material(name, youngs * 1e9, shear * 1e9, density, yield * 1e6);
    }

    private static BarSection readSection(JsonNode node, String path, NodeReader reader) {
        String sectionPath = path + ".section";
        JsonNode sectionNode = reader.object(node, path, SECTION, true);
        if (sectionNode == null) {
            return null;
        }
        String shape = reader.text(sectionNode, sectionPath, SHAPE, true);
        int beforeDiameter = reader.problems().size();
        double diameter = reader.number(sectionNode, sectionPath, OUTER_DIAMETER_MM, DIAMETER);
        switch (shape) {
            case SOLID -> {
                if (sectionNode.has(WALL_MM) && !sectionNode.get(WALL_MM).isNull()) {
                    reader.problem(sectionPath + ".wallMm", "is given for a solid bar: remove it, or set shape to "
                            + "\"tube\"");
                }
                return new SolidSection(diameter * 1e-3);
            }
            case TUBE -> {
                // the wall is judged against the diameter only where both were accepted
                int beforeWall = reader.problems().size();
                double wall = reader.number(sectionNode, sectionPath, WALL_MM, Range.above(0, 100, "mm"));
                PracticalMinimum.WALL.check(reader, sectionPath, wall, beforeWall);
                int before = beforeDiameter;
                if (reader.problems().size() == before && !(wall < diameter / 2)) {
                    reader.problem(sectionPath + ".wallMm", "= " + Range.format(wall) + " mm: must be less than half "
                            + "of outerDiameterMm (" + Range.format(diameter / 2) + " mm)");
                    return null;
                }
                return reader.problems().size() == before ? new TubeSection(diameter * 1e-3, wall * 1e-3) : null;
            }
            default -> {
                if (!shape.isEmpty()) {
                    reader.problem(sectionPath + ".shape", "= \"" + shape + "\": must be \"solid\" or \"tube\"");
                }
                return null;
            }
        }
    }

    private static UBarDimensions readDimensions(JsonNode node, String path, NodeReader reader) {
        int before = reader.problems().size();
        double length = reader.number(node, path, "torsionLengthMm", Range.between(50, 3000, "mm"));
        double span = length;
        if (!NodeReader.isAbsent(node, "bushingSpanMm")) {
            span = reader.number(node, path, "bushingSpanMm", Range.above(0, 3000, "mm"));
            PracticalMinimum.BUSHING_SPAN.check(reader, path, span, before);
            if (reader.problems().size() == before && span > length) {
                reader.problem(path + ".bushingSpanMm", "= " + Range.format(span) + " mm: must not exceed "
                        + "torsionLengthMm (" + Range.format(length) + " mm)");
            }
        }
        JsonNode arms = reader.array(node, path, "armLengthsMm", 1, MAX_HOLES, true);
        List<Double> armLengths = arms == null ? List.of() : reader.numbers(arms, path + ".armLengthsMm", ARM);
        if (reader.problems().size() > before) {
            return null;
        }
        return new UBarDimensions(length * 1e-3, span * 1e-3, armLengths.stream().map(a -> a * 1e-3).toList());
    }

    private static BarCentreline readCentreline(JsonNode node, String path, NodeReader reader) {
        int before = reader.problems().size();
        List<Point3> points = points(node, path, "centrelineMm", 2, 200, reader);
        int beforeRadius = reader.problems().size();
        double bendRadius = reader.number(node, path, "bendRadiusMm", Range.between(0, 500, "mm"));
        PracticalMinimum.BEND_RADIUS.check(reader, path, bendRadius, beforeRadius);
        List<Point3> bushings = points(node, path, "bushingsMm", 2, 8, reader);
        Double bushingRate = NodeReader.isAbsent(node, "bushingRadialRateNPerMm") ? null
                : reader.number(node, path, "bushingRadialRateNPerMm", Range.between(1, 1e7, "N/mm")) * 1e3;
        JsonNode setbacksNode = reader.array(node, path, "holeSetbacksMm", 1, MAX_HOLES, true);
        List<Double> setbacks = setbacksNode == null ? List.of()
                : reader.numbers(setbacksNode, path + ".holeSetbacksMm", Range.between(0, 1000, "mm"));
        if (reader.problems().size() > before) {
            return null;
        }
        checkCentreline(points, bushings, setbacks, path, reader);
        if (reader.problems().size() > before) {
            return null;
        }
        return new BarCentreline(points.stream().map(p -> p.times(1e-3)).toList(), bendRadius * 1e-3,
                bushings.stream().map(p -> p.times(1e-3)).toList(), bushingRate,
                setbacks.stream().map(s -> s * 1e-3).toList());
    }

    /** Segments must have length, bushings must lie on the polyline, set-backs must fit on the end segments. */
    private static void checkCentreline(List<Point3> points, List<Point3> bushings, List<Double> setbacks,
                                        String path, NodeReader reader) {
        for (int i = 1; i < points.size(); i++) {
            if (points.get(i).distanceTo(points.get(i - 1)) < 1) {
                reader.problem(path + ".centrelineMm[" + i + "]", "is less than 1 mm from the point before it: "
                        + "consecutive points must be apart");
                return;
            }
        }
        for (int b = 0; b < bushings.size(); b++) {
            double distance = distanceToPolyline(bushings.get(b), points);
            if (distance > ON_CENTRELINE_TOLERANCE_MM) {
                reader.problem(path + ".bushingsMm[" + b + "]", String.format(Locale.ROOT,
                        "is %.1f mm off the centreline: a bushing must lie on it (within %.0f mm)", distance,
                        ON_CENTRELINE_TOLERANCE_MM));
            }
        }
        double shortestEnd = Math.min(points.get(1).distanceTo(points.get(0)),
                points.get(points.size() - 1).distanceTo(points.get(points.size() - 2)));
        for (int h = 0; h < setbacks.size(); h++) {
            if (setbacks.get(h) >= shortestEnd) {
                reader.problem(path + ".holeSetbacksMm[" + h + "]", "= " + Range.format(setbacks.get(h))
                        + " mm: must be less than the shorter end segment (" + Range.format(shortestEnd) + " mm)");
            }
        }
    }

    private static double distanceToPolyline(Point3 point, List<Point3> polyline) {
        double best = Double.POSITIVE_INFINITY;
        for (int i = 1; i < polyline.size(); i++) {
            Point3 start = polyline.get(i - 1);
            Point3 segment = polyline.get(i).minus(start);
            double along = Math.max(0, Math.min(1, point.minus(start).dot(segment) / segment.dot(segment)));
            best = Math.min(best, point.distanceTo(start.plus(segment.times(along))));
        }
        return best;
    }

    private static List<Point3> points(JsonNode node, String path, String key, int min, int max,
                                       NodeReader reader) {
        String arrayPath = NodeReader.child(path, key);
        JsonNode array = reader.array(node, path, key, min, max, true);
        if (array == null) {
            return List.of();
        }
        Range coordinate = Range.between(-5000, 5000, "mm");
        List<Point3> points = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            JsonNode point = array.get(i);
            String pointPath = arrayPath + "[" + i + "]";
            if (!point.isArray() || point.size() != 3) {
                reader.problem(pointPath, "= " + NodeReader.shown(point) + ": must be a point [x, y, z] in mm");
                continue;
            }
            List<Double> xyz = reader.numbers(point, pointPath, coordinate);
            points.add(new Point3(xyz.get(0), xyz.get(1), xyz.get(2)));
        }
        return points;
    }
}
