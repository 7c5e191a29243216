package barwright.io;

import barwright.io.csv.CsvFileException;
import barwright.io.csv.CsvReader;
import barwright.io.csv.CsvRow;
import barwright.io.csv.CsvSchema;
import barwright.io.csv.CsvTable;
import barwright.model.LapLog;
import barwright.units.Conversions;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a logged lap (file-format.md, "Logged lap"): columns {@code timeS} and {@code lateralAccelerationG},
 * optional {@code longitudinalAccelerationG} and {@code speedKph}; a log is refused whole, each problem with
 * its line.
 */
public final class LapLogReader {
    public static final String TIME = "timeS";
    public static final String LATERAL = "lateralAccelerationG";
    public static final String LONGITUDINAL = "longitudinalAccelerationG";
    public static final String SPEED = "speedKph";
    public static final CsvSchema SCHEMA = new CsvSchema(List.of(TIME, LATERAL), List.of(LONGITUDINAL, SPEED));
    /** Accelerations beyond this many g are refused: no car on tyres corners or brakes at 5 g. */
    static final double MAX_ACCELERATION_G = 5;
    static final double MAX_SPEED_KPH = 600;

    private LapLogReader() {
    }

    public static LapLog read(Path file) throws CsvFileException, IOException {
        return fromTable(CsvReader.read(file, SCHEMA));
    }

    public static LapLog parse(String text) throws CsvFileException {
        return fromTable(CsvReader.parse(text, SCHEMA));
    }

    private static LapLog fromTable(CsvTable table) throws CsvFileException {
        List<CsvRow> rows = table.rows();
        List<String> problems = new ArrayList<>();
        int count = rows.size();
        double[] times = new double[count];
        double[] lateral = new double[count];
        double[] longitudinal = new double[count];
        boolean hasSpeed = table.hasColumn(SPEED);
        double[] speeds = hasSpeed ? new double[count] : null;
        for (int i = 0; i < count; i++) {
            CsvRow row = rows.get(i);
            times[i] = row.number(TIME);
            if (i > 0 && !(times[i] > times[i - 1])) {
                problems.add("line " + row.line() + ", column " + TIME + " = " + Range.format(times[i])
                        + ": time must increase from row to row (the row before has " + Range.format(times[i - 1])
                        + ")");
            }
            lateral[i] = Conversions.fromG(checked(row, LATERAL, row.number(LATERAL), problems));
            longitudinal[i] = Conversions.fromG(checked(row, LONGITUDINAL,
                    row.optionalNumber(LONGITUDINAL).orElse(0), problems));
            if (hasSpeed) {
                double kph = row.optionalNumber(SPEED).orElse(0);
                if (kph < 0 || kph > MAX_SPEED_KPH) {
                    problems.add("line " + row.line() + ", column " + SPEED + " = " + Range.format(kph)
                            + ": must be between 0 and " + Range.format(MAX_SPEED_KPH) + " km/h");
                }
                speeds[i] = Conversions.fromKilometresPerHour(kph);
            }
            if (problems.size() >= CsvReader.MAX_PROBLEMS) {
                problems.add("... and possibly more problems after line " + row.line());
                break;
            }
        }
        if (count < 2) {
            problems.add("a log needs at least 2 rows of data, it has " + count);
        }
        if (!problems.isEmpty()) {
            throw new CsvFileException(problems);
        }
        return new LapLog(times, lateral, longitudinal, speeds);
    }

    private static double checked(CsvRow row, String column, double value, List<String> problems) {
        if (Math.abs(value) > MAX_ACCELERATION_G) {
            problems.add("line " + row.line() + ", column " + column + " = " + Range.format(value)
                    + ": must be between -" + Range.format(MAX_ACCELERATION_G) + " and "
                    + Range.format(MAX_ACCELERATION_G) + " g");
        }
        return value;
    }
}
