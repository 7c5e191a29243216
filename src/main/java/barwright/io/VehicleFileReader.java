package barwright.io;

import barwright.model.Axle;
import barwright.model.CornerMasses;
import barwright.model.Tyre;
import barwright.model.Vehicle;
import com.fasterxml.jackson.databind.JsonNode;

import java.nio.file.Path;
import java.util.Locale;

import static barwright.io.VehicleKeys.CG_HEIGHT_MM;
import static barwright.io.VehicleKeys.CORNER_MASSES_KG;
import static barwright.io.VehicleKeys.FRONT_MASS_FRACTION;
import static barwright.io.VehicleKeys.LEFT_FRONT;
import static barwright.io.VehicleKeys.LEFT_REAR;
import static barwright.io.VehicleKeys.MASS_KG;
import static barwright.io.VehicleKeys.RIGHT_FRONT;
import static barwright.io.VehicleKeys.RIGHT_REAR;
import static barwright.io.VehicleKeys.VEHICLE;
import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * Reads a vehicle file (files.md, versions 1 and 2; version 2 adds the tyre's points and camber keys and reads
 * every version-1 file unchanged): refuses it whole, with every problem and its key path, or
 * returns the car in SI with the tree as read (unknown keys included, to be kept on save).
 */
public final class VehicleFileReader {
    /** The file format's name, the value of the key {@code format}. */
    public static final String FORMAT = "barwright.vehicle";
    /** The newest file version this program reads and writes ({@link FileVersion}). */
    public static final int VERSION = FileVersion.CURRENT;
    /** The largest vehicle file read (bytes), the limit of every file the program reads. */
    public static final long MAX_BYTES = JsonInput.MAX_BYTES;
    /** The bar stress check travel where the file gives none (mm), files.md. */
    public static final double DEFAULT_DIFFERENTIAL_TRAVEL_MM = 60;

    private static final String KIND = "a vehicle file";

    private VehicleFileReader() {
    }

    /**
     * Reads and validates a file; nothing is returned unless the whole file is good.
     *
     * @param checks the checks that need the calculation ({@code barwright.loading.VehicleLoader} has them)
     */
    public static VehicleDocument read(Path file, BuildChecks checks) throws VehicleFileException {
        try {
            return parse(JsonInput.readBytes(file, KIND), checks);
        } catch (JsonInputException refused) {
            throw new VehicleFileException(refused.problems());
        }
    }

    /** Parses and validates the bytes of a vehicle file (UTF-8, with or without a byte-order mark). */
    public static VehicleDocument parse(byte[] content, BuildChecks checks) throws VehicleFileException {
        JsonNode tree;
        try {
            if (JsonInput.decode(content).isBlank()) {
                throw new VehicleFileException("the file is empty: a vehicle file is a JSON object");
            }
            tree = JsonInput.parse(content, KIND);
        } catch (JsonInputException refused) {
            throw new VehicleFileException(refused.problems());
        }
        return fromTree(tree, checks);
    }

    /** Validates a tree (for example the open document after an edit) and builds the car from it. */
    public static VehicleDocument fromTree(JsonNode tree, BuildChecks checks) throws VehicleFileException {
        if (tree == null || !tree.isObject()) {
            throw new VehicleFileException("the file must hold one JSON object {...}, not "
                    + (tree == null ? "nothing" : tree.getNodeType().toString().toLowerCase(Locale.ROOT)));
        }
        NodeReader reader = new NodeReader(checks);
        checkHeader(tree, reader);
        TyreReader.refuseNewKeysInVersion1(tree, reader);
        if (reader.hasProblems()) {
            throw new VehicleFileException(reader.problems()); // a wrong format or version: say only that
        }
        Vehicle vehicle = readVehicle(tree, reader);
        DynamicsInputReader.read(tree, reader); // dampers and roll inertia: a bad one refuses the file too
        BarFatigueReader.check(tree, reader); // fatigue strengths, surface and K_f: likewise
        if (reader.hasProblems() || vehicle == null) {
            throw new VehicleFileException(reader.problems());
        }
        return new VehicleDocument(FileVersion.upgrade(tree), vehicle);
    }

    private static void checkHeader(JsonNode tree, NodeReader reader) {
        String format = reader.text(tree, "", "format", true);
        if (!format.isEmpty() && !FORMAT.equals(format)) {
            reader.problem("format", "= \"" + format + "\": must be \"" + FORMAT + "\"");
        }
        JsonNode version = tree.get("version");
        if (version != null && version.isNumber() && Double.isFinite(version.doubleValue())
                && version.doubleValue() > VERSION && version.doubleValue() == Math.rint(version.doubleValue())) {
            reader.problem("version", "= " + version.asText() + ": this file was written by a newer Barwright "
                    + "(file version " + version.asText() + "); this program reads versions up to " + VERSION
                    + ". Update Barwright to open it.");
            return;
        }
        reader.integer(tree, "", "version", FileVersion.OLDEST, VERSION);
    }

    private static Vehicle readVehicle(JsonNode tree, NodeReader reader) {
        String name = reader.text(tree, "", "name", true);
        reader.text(tree, "", "notes", false);
        JsonNode body = reader.object(tree, "", VEHICLE, true);
        JsonNode frontNode = reader.object(tree, "", "front", true);
        JsonNode rearNode = reader.object(tree, "", "rear", true);
        JsonNode analysis = reader.object(tree, "", "analysis", false);
        int beforeTravel = reader.problems().size();
        double travelMm = analysis == null ? DEFAULT_DIFFERENTIAL_TRAVEL_MM
                : reader.optionalNumber(analysis, "analysis", "differentialWheelTravelMm",
                Range.above(0, 500, "mm"), DEFAULT_DIFFERENTIAL_TRAVEL_MM);
        PracticalMinimum.CHECK_TRAVEL.check(reader, "analysis", travelMm, beforeTravel);

        Axle front = frontNode == null ? null : AxleReader.read(frontNode, "front", reader, FileVersion.of(tree));
        Axle rear = rearNode == null ? null : AxleReader.read(rearNode, "rear", reader, FileVersion.of(tree));
        if (body == null) {
            return null;
        }
        int beforeCorners = reader.problems().size();
        CornerMasses corners = readCornerMasses(body, reader);
        boolean cornersAccepted = reader.problems().size() == beforeCorners;
        double mass;
        double frontFraction;
        if (corners != null) {
            mass = corners.total();
            frontFraction = corners.frontFraction();
            checkAgrees(body, MASS_KG, mass, Range.between(50, 20000, "kg"), cornersAccepted, reader);
            checkAgrees(body, FRONT_MASS_FRACTION, frontFraction, Range.between(0.05, 0.95, ""), cornersAccepted,
                    reader);
        } else {
            mass = reader.number(body, VEHICLE, MASS_KG, Range.between(50, 20000, "kg"));
            frontFraction = reader.number(body, VEHICLE, FRONT_MASS_FRACTION, Range.between(0.05, 0.95, ""));
        }
        double cgHeight = reader.number(body, VEHICLE, CG_HEIGHT_MM, Range.between(50, 3000, "mm")) * 1e-3;
        double wheelbase = reader.number(body, VEHICLE, "wheelbaseMm", Range.between(500, 10000, "mm")) * 1e-3;
        Double chassis = NodeReader.isAbsent(body, "chassisTorsionalStiffnessNmPerDeg") ? null
                : reader.number(body, VEHICLE, "chassisTorsionalStiffnessNmPerDeg",
                Range.between(10, 1e8, "N·m/deg")) / RADIANS_PER_DEGREE;
        if (reader.hasProblems() || front == null || rear == null) {
            return null;
        }
        return new Vehicle(name, mass, frontFraction, corners, cgHeight, wheelbase, chassis, front, rear,
                travelMm * 1e-3);
    }

    private static CornerMasses readCornerMasses(JsonNode body, NodeReader reader) {
        JsonNode node = reader.object(body, VEHICLE, CORNER_MASSES_KG, false);
        if (node == null) {
            return null;
        }
        String path = NodeReader.child(VEHICLE, CORNER_MASSES_KG);
        Range range = Range.between(5, 10000, "kg");
        double leftFront = reader.number(node, path, LEFT_FRONT, range);
        double rightFront = reader.number(node, path, RIGHT_FRONT, range);
        double leftRear = reader.number(node, path, LEFT_REAR, range);
        double rightRear = reader.number(node, path, RIGHT_REAR, range);
        return new CornerMasses(leftFront, rightFront, leftRear, rightRear);
    }

    /** Where corner masses are given, massKg and frontMassFraction may be absent or must agree within 0.5 %. */
    private static void checkAgrees(JsonNode body, String key, double fromCorners, Range range,
                                    boolean cornersAccepted, NodeReader reader) {
        if (NodeReader.isAbsent(body, key)) {
            return;
        }
        int before = reader.problems().size();
        double given = reader.number(body, VEHICLE, key, range);
        // compared only where both the value and the corner masses were accepted, whatever else is wrong
        if (cornersAccepted && reader.problems().size() == before
                && Math.abs(given - fromCorners) > 0.005 * fromCorners) {
            reader.problem(NodeReader.child(VEHICLE, key), "= " + Range.format(given) + ": must agree within 0.5 % with the "
                    + "corner masses, which give " + Range.format(Math.round(fromCorners * 1e4) / 1e4)
                    + " (or leave it out)");
        }
    }

    /** Reads a tyre object; package-private for the axle reader. */
    static Tyre readTyre(JsonNode node, String path, NodeReader reader) {
        return TyreReader.read(node, path, reader);
    }
}
