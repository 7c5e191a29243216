package barwright.io;

import barwright.io.csv.CsvFileException;
import barwright.io.csv.CsvReader;
import barwright.io.csv.CsvRow;
import barwright.io.csv.CsvSchema;
import barwright.io.csv.CsvTable;
import barwright.tyrefit.TyreMeasurement;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * A tyre test file (file-format.md, "Tyre test data"): columns {@code loadN}, {@code slipAngleDeg},
 * {@code lateralForceN} and optionally {@code camberDeg}, read with {@link CsvReader} into measurements in SI.
 * The one reader for the command line's {@code tyre-fit} and the window's "Fit from data...".
 */
public final class TyreTestCsv {
    public static final String LOAD_N = "loadN";
    public static final String SLIP_ANGLE_DEG = "slipAngleDeg";
    public static final String LATERAL_FORCE_N = "lateralForceN";
    public static final String CAMBER_DEG = "camberDeg";
    /** The columns of a tyre test file. */
    public static final CsvSchema SCHEMA = new CsvSchema(List.of(LOAD_N, SLIP_ANGLE_DEG, LATERAL_FORCE_N),
            List.of(CAMBER_DEG));

    private TyreTestCsv() {
    }

    /** @return the measurements in file order, each with its line; an empty camber cell is zero */
    public static List<TyreMeasurement> read(Path file) throws CsvFileException, IOException {
        return measurements(CsvReader.read(file, SCHEMA));
    }

    /** @return the measurements of CSV text (for tests) */
    public static List<TyreMeasurement> parse(String text) throws CsvFileException {
        return measurements(CsvReader.parse(text, SCHEMA));
    }

    private static List<TyreMeasurement> measurements(CsvTable table) {
        List<TyreMeasurement> rows = new ArrayList<>(table.rows().size());
        for (CsvRow row : table.rows()) {
            rows.add(new TyreMeasurement(row.line(), row.number(LOAD_N),
                    row.number(SLIP_ANGLE_DEG) * RADIANS_PER_DEGREE, row.number(LATERAL_FORCE_N),
                    row.optionalNumber(CAMBER_DEG).orElse(0) * RADIANS_PER_DEGREE));
        }
        return rows;
    }
}
