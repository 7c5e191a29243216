package barwright.report.sizing;

import barwright.report.ReportJson;
import barwright.report.heading.OutputDocument;
import barwright.sizing.BarFigures;
import barwright.sizing.SetupFigures;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.map.BarOption;
import barwright.sizing.map.MapCell;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import static barwright.units.Conversions.toDegreesPerG;
import static barwright.units.Conversions.toG;
import static barwright.units.Conversions.toMillimetres;

/** The adjustment map for scripts: JSON ({@code map FILE --json}) and CSV, one entry per hole pair. */
public final class MapOutput {
    public static final String FORMAT = "barwright.map";
    public static final int VERSION = 1;
    /** The CSV columns, in order. */
    public static final List<String> CSV_COLUMNS = List.of("frontBar", "frontSelectedArm", "frontArmMm", "rearBar",
            "rearSelectedArm", "rearArmMm", "current", "frontLoadTransferShare", "rollGradientDegPerG", "limitG",
            "limitBalance", "frontInsideLiftG", "rearInsideLiftG", "frontLiftsBeforeLimit", "rearLiftsBeforeLimit",
            "frontBarSafetyFactor", "rearBarSafetyFactor", "problem");

    private MapOutput() {
    }

    public static ObjectNode json(AdjustmentMap map) {
        ObjectNode root = OutputDocument.start(FORMAT, VERSION);
        root.put("vehicle", map.vehicle().name());
        root.put("rows", map.rows().size());
        root.put("columns", map.columns().size());
        ArrayNode entries = root.putArray("entries");
        for (MapCell cell : map.cells()) {
            ObjectNode entry = entries.addObject();
            option(entry, "front", cell.front());
            option(entry, "rear", cell.rear());
            entry.put("current", cell.current());
            if (cell.figures() == null) {
                entry.put("problem", cell.problem());
                continue;
            }
            Json.putFigures(entry, cell.figures());
            ReportJson.putOrNull(entry, "frontBarSafetyFactor", safety(cell.figures().frontBar()));
            ReportJson.putOrNull(entry, "rearBarSafetyFactor", safety(cell.figures().rearBar()));
        }
        return root;
    }

    private static void option(ObjectNode entry, String axle, BarOption option) {
        entry.put(axle + "Bar", option.bar() == null ? "no bar" : option.barLabel());
        if (option.bar() == null) {
            entry.putNull(axle + "SelectedArm");
        } else {
            entry.put(axle + "SelectedArm", option.hole());
        }
        ReportJson.putOrNull(entry, axle + "ArmMm",
                Double.isNaN(option.armLength()) ? null : toMillimetres(option.armLength()));
    }

    private static Double safety(BarFigures bar) {
        return bar == null ? null : bar.safetyFactor();
    }

    /** Writes the map as CSV (RFC 4180, a header line, then one line per hole pair). */
    public static void csv(AdjustmentMap map, Appendable out) throws IOException {
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.RFC4180.builder()
                .setHeader(CSV_COLUMNS.toArray(String[]::new)).get())) {
            for (MapCell cell : map.cells()) {
                List<Object> row = new ArrayList<>();
                addOption(row, cell.front());
                addOption(row, cell.rear());
                row.add(cell.current());
                SetupFigures figures = cell.figures();
                if (figures == null) {
                    for (int i = 0; i < 10; i++) {
                        row.add("");
                    }
                    row.add(cell.problem());
                } else {
                    row.add(figures.frontLoadTransferShare());
                    row.add(toDegreesPerG(figures.rollGradient()));
                    row.add(toG(figures.limit()));
                    row.add(figures.balance().key());
                    row.add(orEmpty(ReportJson.liftInG(figures.frontInsideLift())));
                    row.add(orEmpty(ReportJson.liftInG(figures.rearInsideLift())));
                    row.add(figures.frontLiftsBeforeLimit());
                    row.add(figures.rearLiftsBeforeLimit());
                    row.add(orEmpty(safety(figures.frontBar())));
                    row.add(orEmpty(safety(figures.rearBar())));
                    row.add("");
                }
                printer.printRecord(row);
            }
        }
    }

    private static void addOption(List<Object> row, BarOption option) {
        row.add(option.bar() == null ? "no bar" : option.barLabel());
        row.add(option.bar() == null ? "" : option.hole());
        row.add(Double.isNaN(option.armLength()) ? "" : toMillimetres(option.armLength()));
    }

    static Object orEmpty(Double value) {
        return value == null ? "" : value;
    }
}
