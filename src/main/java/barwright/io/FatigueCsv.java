package barwright.io;

import barwright.io.csv.CsvFileException;
import barwright.io.csv.CsvReader;
import barwright.io.csv.CsvRow;
import barwright.io.csv.CsvSchema;
import barwright.io.csv.CsvTable;
import barwright.model.SpectrumLevel;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * The fatigue command's CSV inputs (docs/file-format.md, fatigue inputs), read with {@link CsvReader}: a
 * lateral-acceleration spectrum ({@code lateralAccelerationG}, {@code countPerLap}) and a stress history
 * ({@code stressMPa}). Every refusal names its line and column.
 */
public final class FatigueCsv {
    public static final String LATERAL_ACCELERATION_G = "lateralAccelerationG";
    public static final String COUNT_PER_LAP = "countPerLap";
    public static final String STRESS_MPA = "stressMPa";
    /** Largest |a_y| of a spectrum row (g): past any tyre's grip, so a typing slip rather than a corner. */
    public static final double MAX_LATERAL_G = 5;
    /** Largest |stress| of a history row (MPa): past any bar material's ultimate strength. */
    public static final double MAX_STRESS_MPA = 5000;

    private FatigueCsv() {
    }

    /** @return the spectrum's rows in file order, a_y in m/s^2 */
    public static List<SpectrumLevel> readSpectrum(Path file) throws CsvFileException, IOException {
        return spectrum(CsvReader.read(file, new CsvSchema(List.of(LATERAL_ACCELERATION_G, COUNT_PER_LAP), List.of())));
    }

    /** @return the spectrum of CSV text (for tests) */
    public static List<SpectrumLevel> parseSpectrum(String text) throws CsvFileException {
        return spectrum(CsvReader.parse(text, new CsvSchema(List.of(LATERAL_ACCELERATION_G, COUNT_PER_LAP), List.of())));
    }

    /** @return the stress history in Pa, at least two points */
    public static double[] readStressHistory(Path file) throws CsvFileException, IOException {
        return stressHistory(CsvReader.read(file, new CsvSchema(List.of(STRESS_MPA), List.of())));
    }

    /** @return the stress history of CSV text (for tests) */
    public static double[] parseStressHistory(String text) throws CsvFileException {
        return stressHistory(CsvReader.parse(text, new CsvSchema(List.of(STRESS_MPA), List.of())));
    }

    private static List<SpectrumLevel> spectrum(CsvTable table) throws CsvFileException {
        List<String> problems = new ArrayList<>();
        List<SpectrumLevel> levels = new ArrayList<>();
        long corners = 0;
        for (CsvRow row : table.rows()) {
            double g = row.number(LATERAL_ACCELERATION_G);
            double count = row.number(COUNT_PER_LAP);
            if (Math.abs(g) > MAX_LATERAL_G) {
                problems.add(cell(row, LATERAL_ACCELERATION_G, g, "must be -" + MAX_LATERAL_G + " to "
                        + MAX_LATERAL_G + " g (positive in a left turn)"));
            }
            if (count < 0 || count != Math.rint(count) || count > 100_000) {
                problems.add(cell(row, COUNT_PER_LAP, count, "must be a whole number of corners per lap, 0 to 100000"));
            } else {
                corners += (long) count;
            }
            if (problems.isEmpty()) {
                levels.add(new SpectrumLevel(g * STANDARD_GRAVITY, (int) count));
            }
        }
        if (problems.isEmpty() && corners == 0) {
            problems.add("the spectrum has no corners: give at least one row with countPerLap 1 or more");
        }
        if (problems.isEmpty() && corners > 1_000_000) {
            problems.add("the spectrum has " + corners + " corners per lap: at most 1000000");
        }
        if (!problems.isEmpty()) {
            throw new CsvFileException(problems);
        }
        return levels;
    }

    private static double[] stressHistory(CsvTable table) throws CsvFileException {
        List<String> problems = new ArrayList<>();
        double[] history = new double[table.rows().size()];
        for (int i = 0; i < history.length; i++) {
            CsvRow row = table.rows().get(i);
            double stress = row.number(STRESS_MPA);
            if (Math.abs(stress) > MAX_STRESS_MPA) {
                problems.add(cell(row, STRESS_MPA, stress, "must be -" + MAX_STRESS_MPA + " to " + MAX_STRESS_MPA
                        + " MPa"));
            }
            history[i] = stress * 1e6;
        }
        if (problems.isEmpty() && history.length < 2) {
            problems.add("the stress history has " + history.length + " row" + (history.length == 1 ? "" : "s")
                    + ": at least two are needed to make a cycle");
        }
        if (!problems.isEmpty()) {
            throw new CsvFileException(problems);
        }
        return history;
    }

    private static String cell(CsvRow row, String column, double value, String rule) {
        return "line " + row.line() + ", column " + column + ": " + shown(value) + " " + rule;
    }

    private static String shown(double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? Long.toString((long) value)
                : Double.toString(value);
    }
}
