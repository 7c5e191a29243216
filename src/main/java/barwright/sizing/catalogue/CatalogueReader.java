package barwright.sizing.catalogue;

import barwright.io.JsonInput;
import barwright.io.JsonInputException;
import barwright.io.Problem;
import barwright.io.Range;
import barwright.model.BarSection;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import com.fasterxml.jackson.databind.JsonNode;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static barwright.io.VehicleKeys.OUTER_DIAMETER_MM;
import static barwright.io.VehicleKeys.SHAPE;
import static barwright.io.VehicleKeys.SOLID;
import static barwright.io.VehicleKeys.TUBE;
import static barwright.io.VehicleKeys.WALL_MM;

/**
 * Reads a catalogue file (docs/sizing.md gives the format): refused whole with every problem and its key
 * path, e.g. {@code sizes[3].wallMm = 14 mm: must be less than half of outerDiameterMm (12.5 mm)}.
 */
public final class CatalogueReader {
    public static final String FORMAT = "barwright.catalogue";
    public static final int VERSION = 1;
    /** The same diameter range as a bar in the vehicle file (mm). */
    static final Range DIAMETER = Range.between(3, 200, "mm");
    static final int MAX_SIZES = 5000;
    private static final String KIND = "a catalogue file";

    private CatalogueReader() {
    }

    /** Reads a catalogue file within the limits every file the program reads keeps ({@link JsonInput}). */
    public static Catalogue read(Path file) throws CatalogueFileException {
        try {
            return parse(file.toString(), JsonInput.readBytes(file, KIND));
        } catch (JsonInputException refused) {
            throw new CatalogueFileException(refused.problems());
        }
    }

    /**
     * @param id what the catalogue is called by (its path or built-in name)
     */
    public static Catalogue parse(String id, byte[] content) throws CatalogueFileException {
        JsonNode tree;
        try {
            tree = JsonInput.parse(content, KIND);
        } catch (JsonInputException refused) {
            throw new CatalogueFileException(refused.problems());
        }
        if (tree == null || !tree.isObject()) {
            throw refused("", "a catalogue file must hold one JSON object {...}");
        }
        List<Problem> problems = new ArrayList<>();
        if (!FORMAT.equals(tree.path("format").asText(null))) {
            problems.add(new Problem("format", "= " + tree.path("format") + ": must be \"" + FORMAT + "\""));
        }
        JsonNode version = tree.path("version");
        if (!version.isIntegralNumber() || version.intValue() < 1 || version.intValue() > VERSION) {
            problems.add(new Problem("version", "= " + version + ": must be a whole number from 1 to " + VERSION));
        }
        String name = text(tree, "name", problems);
        String basis = text(tree, "basis", problems);
        JsonNode sizesNode = tree.path("sizes");
        List<StockSize> sizes = new ArrayList<>();
        if (!sizesNode.isArray() || sizesNode.isEmpty() || sizesNode.size() > MAX_SIZES) {
            problems.add(new Problem("sizes", (sizesNode.isMissingNode() ? "is missing" : "= " + shorten(sizesNode))
                    + ": must be a list of 1 to " + MAX_SIZES + " sections"));
        } else {
            for (int i = 0; i < sizesNode.size(); i++) {
                StockSize size = size(sizesNode.get(i), "sizes[" + i + "]", problems);
                if (size != null) {
                    sizes.add(size);
                }
            }
        }
        if (!problems.isEmpty()) {
            throw new CatalogueFileException(problems);
        }
        return new Catalogue(id, name, basis, sizes);
    }

    private static StockSize size(JsonNode node, String path, List<Problem> problems) {
        if (!node.isObject()) {
            problems.add(new Problem(path, "= " + shorten(node) + ": must be a section object {\"shape\": ...}"));
            return null;
        }
        int before = problems.size();
        String shape = node.path(SHAPE).asText("");
        double diameter = number(node, path, OUTER_DIAMETER_MM, DIAMETER, problems);
        BarSection section = null;
        switch (shape) {
            case SOLID -> {
                if (node.has(WALL_MM)) {
                    problems.add(new Problem(path + ".wallMm", "is given for a solid bar: remove it, or set shape "
                            + "to \"tube\""));
                }
                if (problems.size() == before) {
                    section = new SolidSection(diameter * 1e-3);
                }
            }
            case TUBE -> {
                double wall = number(node, path, WALL_MM, Range.above(0, 100, "mm"), problems);
                if (problems.size() == before && !(wall < diameter / 2)) {
                    problems.add(new Problem(path + ".wallMm", "= " + Range.format(wall)
                            + " mm: must be less than half of outerDiameterMm (" + Range.format(diameter / 2) + " mm)"));
                }
                if (problems.size() == before) {
                    section = new TubeSection(diameter * 1e-3, wall * 1e-3);
                }
            }
            default -> problems.add(new Problem(path + ".shape", "= " + shorten(node.path(SHAPE))
                    + ": must be \"solid\" or \"tube\""));
        }
        if (section == null) {
            return null;
        }
        JsonNode label = node.get("label");
        if (label != null && !label.isTextual()) {
            problems.add(new Problem(path + ".label", "= " + shorten(label) + ": must be a text in quotes"));
            return null;
        }
        return new StockSize(label != null ? label.textValue() : defaultLabel(section), section);
    }

    /** @return "22 mm" or "25.4 x 3 mm" */
    public static String defaultLabel(BarSection section) {
        String outer = Range.format(Math.round(section.outerDiameter() * 1e7) / 1e4);
        if (section instanceof TubeSection tube) {
            return outer + " x " + Range.format(Math.round(tube.wall() * 1e7) / 1e4) + " mm";
        }
        return outer + " mm";
    }

    private static double number(JsonNode node, String path, String key, Range range, List<Problem> problems) {
        JsonNode value = node.get(key);
        String keyPath = path + "." + key;
        if (value == null || value.isNull()) {
            problems.add(new Problem(keyPath, "is missing: a number is required (" + range.describe() + ")"));
            return Double.NaN;
        }
        if (!value.isNumber() || !range.contains(value.doubleValue())) {
            String shown = value.isNumber() ? Range.format(value.doubleValue()) + " " + range.unit() : shorten(value);
            problems.add(new Problem(keyPath, "= " + shown + ": " + range.describe()));
            return Double.NaN;
        }
        return value.doubleValue();
    }

    private static String text(JsonNode tree, String key, List<Problem> problems) {
        JsonNode value = tree.get(key);
        if (value == null || !value.isTextual() || value.textValue().isBlank()) {
            problems.add(new Problem(key, (value == null ? "is missing" : "= " + shorten(value))
                    + ": a text in quotes is required"));
            return "";
        }
        return value.textValue();
    }

    private static CatalogueFileException refused(String path, String message) {
        return new CatalogueFileException(List.of(new Problem(path, message)));
    }

    private static String shorten(JsonNode node) {
        String text = node.toString();
        return text.length() > 40 ? text.substring(0, 37) + "..." : text;
    }
}
