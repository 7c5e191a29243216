package barwright.cli;

import barwright.io.AtomicFileWriter;
import barwright.io.JsonInput;
import barwright.io.JsonInputException;
import barwright.io.Problem;
import barwright.io.VehicleDocument;
import barwright.io.VehicleEdits;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.report.sizing.MapOutput;
import barwright.report.sizing.MapText;
import barwright.report.sizing.SizingJson;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.map.AdjustmentMap.LabelledBar;
import barwright.solver.Progress;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.PrintStream;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static barwright.io.VehicleKeys.BAR;
import static barwright.io.VehicleKeys.MATERIAL;
import static barwright.io.VehicleKeys.SECTION;
import static barwright.io.VehicleKeys.SELECTED_ARM;

/**
 * {@code map FILE ...}: every front arm hole against every rear one, for the car's bars or for the candidates
 * of a sizing result.
 */
final class MapCommand implements Command {
    @Override
    public String name() {
        return "map";
    }

    @Override
    public String synopsis() {
        return "map FILE [--candidates SIZING.json] [--csv OUT.csv] [--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "the adjustment map: front share, roll gradient, limit balance and lift for every pair of arm "
                + "holes, with the current setting marked; --candidates maps the bars of a 'size --json' result";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("candidates", "csv", "units"));
        VehicleDocument document = VehicleInput.read(parsed.onlyPositional("vehicle file"));
        var units = parsed.units();
        Map<AxlePosition, List<LabelledBar>> bars = new EnumMap<>(AxlePosition.class);
        for (AxlePosition axle : AxlePosition.values()) {
            bars.put(axle, new ArrayList<>(List.of(new LabelledBar("current", document.vehicle().axle(axle).bar()))));
        }
        String candidates = parsed.option("candidates", null);
        if (candidates != null) {
            addCandidates(document, Path.of(candidates), bars);
        }
        AdjustmentMap map = AdjustmentMap.of(document.vehicle(), bars.get(AxlePosition.FRONT),
                bars.get(AxlePosition.REAR), Progress.NONE);
        String csv = parsed.option("csv", null);
        if (csv != null) {
            StringWriter text = new StringWriter();
            MapOutput.csv(map, text);
            AtomicFileWriter.writeText(Path.of(csv), text.toString());
        }
        Printed.jsonOrTextWithCaution(out, parsed, () -> MapOutput.json(map), () -> MapText.of(map, units));
        return Cli.OK;
    }

    /** Adds the bars of a sizing result's candidates to the axles they were sized for. */
    private static void addCandidates(VehicleDocument document, Path file, Map<AxlePosition, List<LabelledBar>> bars)
            throws UsageException, VehicleFileException {
        JsonNode root;
        try {
            root = JsonInput.read(file, "a sizing result");
        } catch (JsonInputException refused) {
            throw new UsageException("--candidates " + file + ": " + refused.getMessage());
        }
        if (!SizingJson.FORMAT.equals(root.path("format").asText())) {
            throw new UsageException("--candidates " + file + ": not a sizing result (format \"" + SizingJson.FORMAT
                    + "\", as 'size --json' prints)");
        }
        int index = 0;
        for (JsonNode candidate : root.path("candidates")) {
            for (AxlePosition axle : AxlePosition.values()) {
                JsonNode choice = candidate.path("axle").asText().equals(axle.key()) ? candidate : candidate.path(axle.key());
                if (choice.isObject() && choice.has(SECTION)) {
                    bars.get(axle).add(new LabelledBar("#" + candidate.path("rank").asInt(index + 1) + " "
                            + choice.path("sizeLabel").asText(""), barFrom(document, axle, choice, index)));
                }
            }
            index++;
        }
    }

    /** @return the vehicle's bar with the candidate's material, section and hole, validated as a file would be */
    private static AntiRollBar barFrom(VehicleDocument document, AxlePosition axle, JsonNode choice, int index)
            throws VehicleFileException {
        ObjectNode tree = document.editableTree();
        try {
            VehicleEdits.putBar(tree, axle, choice.path(MATERIAL), choice.path(SECTION), choice.path(SELECTED_ARM));
        } catch (VehicleFileException noBar) {
            throw new VehicleFileException(List.of(new Problem(axle.key() + "." + BAR, "is missing: candidate "
                    + (index + 1) + " needs the bar's geometry from the vehicle file")));
        }
        return VehicleLoader.fromTree(tree).vehicle().axle(axle).bar();
    }
}
