package barwright.io.csv;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Reads a CSV file against a {@link CsvSchema} (file-format.md, "CSV files"): UTF-8 with or without a byte
 * order mark, comma-separated, cells optionally in double quotes, lines starting with {@code #} and blank
 * lines ignored, the first other line the header. Numbers are plain decimals (a point, an optional exponent):
 * text, NaN and Infinity are refused. A file is refused whole, with every problem up to
 * {@link #MAX_PROBLEMS}, each naming its line and column.
 */
public final class CsvReader {
    /** Files past this size are refused before reading (bytes): a tyre test of 200,000 rows is about 6 MB. */
    public static final long MAX_BYTES = 16L * 1024 * 1024;
    public static final int MAX_ROWS = 200_000;
    public static final int MAX_COLUMNS = 64;
    /** Past this many problems the rest are counted, not listed. */
    public static final int MAX_PROBLEMS = 20;

    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d{1,3})?");
    private static final char BYTE_ORDER_MARK = '\uFEFF';

    private CsvReader() {
    }

    public static CsvTable read(Path file, CsvSchema schema) throws CsvFileException, IOException {
        long size;
        try {
            size = Files.size(file);
        } catch (NoSuchFileException missing) {
            throw new CsvFileException("file not found: " + file);
        }
        if (size > MAX_BYTES) {
            throw new CsvFileException(String.format(Locale.ROOT, "the file is %.1f MB: a CSV file must be under "
                    + "%d MB", size / 1048576.0, MAX_BYTES / 1048576));
        }
        try (InputStream in = Files.newInputStream(file)) {
            return parse(new String(in.readNBytes((int) MAX_BYTES + 1), StandardCharsets.UTF_8), schema);
        }
    }

    public static CsvTable parse(String text, CsvSchema schema) throws CsvFileException {
        if (text.length() > MAX_BYTES) {
            throw new CsvFileException("the file is larger than " + MAX_BYTES / 1048576 + " MB");
        }
        if (!text.isEmpty() && text.charAt(0) == BYTE_ORDER_MARK) {
            text = text.substring(1);
        }
        String[] lines = text.split("\r\n|\n|\r", -1);
        List<String> problems = new ArrayList<>();
        int[] overflow = {0};
        List<String> columns = null;
        List<CsvRow> rows = new ArrayList<>();
        for (int index = 0; index < lines.length; index++) {
            String line = lines[index];
            int lineNumber = index + 1;
            if (line.isBlank() || line.stripLeading().startsWith("#")) {
                continue;
            }
            List<String> cells = split(line, lineNumber, problems, overflow);
            if (cells == null) {
                continue;
            }
            if (columns == null) {
                columns = header(cells, lineNumber, schema);
                continue;
            }
            if (rows.size() == MAX_ROWS) {
                throw new CsvFileException("the file has more than " + MAX_ROWS + " data rows (line " + lineNumber
                        + "): split it into smaller files");
            }
            CsvRow row = row(cells, columns, lineNumber, schema, problems, overflow);
            if (row != null) {
                rows.add(row);
            }
        }
        if (columns == null) {
            throw new CsvFileException("the file has no header row: the first line that is not blank or a # "
                    + "comment must name the columns, e.g. " + String.join(",", schema.required()));
        }
        if (rows.isEmpty() && problems.isEmpty()) {
            problems.add("the file has a header but no data rows");
        }
        if (overflow[0] > 0) {
            problems.add("... and " + overflow[0] + " more problems");
        }
        if (!problems.isEmpty()) {
            throw new CsvFileException(problems);
        }
        return new CsvTable(columns, rows);
    }

    private static List<String> header(List<String> cells, int line, CsvSchema schema) throws CsvFileException {
        List<String> names = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        List<String> problems = new ArrayList<>();
        if (cells.size() > MAX_COLUMNS) {
            throw new CsvFileException("line " + line + " (the header) has " + cells.size() + " columns: at most "
                    + MAX_COLUMNS + " are read");
        }
        for (int i = 0; i < cells.size(); i++) {
            String name = cells.get(i).strip();
            if (name.isEmpty()) {
                problems.add("line " + line + " (the header), column " + (i + 1) + ": the column has no name");
            } else if (!seen.add(name)) {
                problems.add("line " + line + " (the header): column \"" + name + "\" appears twice");
            }
            names.add(name);
        }
        for (String required : schema.required()) {
            if (!seen.contains(required)) {
                problems.add("line " + line + " (the header): the column \"" + required + "\" is missing; the "
                        + "file needs " + String.join(", ", schema.required())
                        + (schema.optional().isEmpty() ? "" : " (and may have " + String.join(", ", schema.optional()) + ")")
                        + ", and has " + String.join(", ", names));
            }
        }
        if (!problems.isEmpty()) {
            throw new CsvFileException(problems);
        }
        return names;
    }

    private static CsvRow row(List<String> cells, List<String> columns, int line, CsvSchema schema,
                              List<String> problems, int[] overflow) {
        if (cells.size() != columns.size()) {
            add(problems, overflow, "line " + line + " has " + cells.size() + " cells: the header has "
                    + columns.size() + " columns");
            return null;
        }
        Map<String, Double> numbers = new HashMap<>();
        Map<String, String> texts = new HashMap<>();
        boolean good = true;
        for (int i = 0; i < cells.size(); i++) {
            String column = columns.get(i);
            String cell = cells.get(i).strip();
            texts.put(column, cell);
            if (!schema.isNumeric(column)) {
                continue;
            }
            if (cell.isEmpty()) {
                if (schema.required().contains(column)) {
                    add(problems, overflow, "line " + line + ", column " + column + ": the cell is empty; a number "
                            + "is required");
                    good = false;
                }
                continue;
            }
            Double value = number(cell);
            if (value == null) {
                add(problems, overflow, "line " + line + ", column " + column + " = \"" + shortened(cell)
                        + "\": must be a finite number written with a decimal point (like 1250 or -3.5e2)");
                good = false;
            } else {
                numbers.put(column, value);
            }
        }
        return good ? new CsvRow(line, numbers, texts) : null;
    }

    /** @return the cell as a finite number, or null: NaN, Infinity, hexadecimal and text are refused */
    private static Double number(String cell) {
        if (!DECIMAL.matcher(cell).matches()) {
            return null;
        }
        double value = Double.parseDouble(cell);
        return Double.isFinite(value) ? value : null;
    }

    /** Splits one line at commas; a cell in double quotes may hold commas, and "" stands for one quote. */
    private static List<String> split(String line, int lineNumber, List<String> problems, int[] overflow) {
        List<String> cells = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    cell.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    cell.append(c);
                }
            } else if (c == '"' && cell.toString().isBlank()) {
                quoted = true;
            } else if (c == ',') {
                cells.add(cell.toString());
                cell.setLength(0);
            } else {
                cell.append(c);
            }
        }
        if (quoted) {
            add(problems, overflow, "line " + lineNumber + ": a quoted cell is not closed (a \" is missing)");
            return null;
        }
        cells.add(cell.toString());
        return cells;
    }

    private static void add(List<String> problems, int[] overflow, String problem) {
        if (problems.size() < MAX_PROBLEMS) {
            problems.add(problem);
        } else {
            overflow[0]++;
        }
    }

    private static String shortened(String cell) {
        return cell.length() > 30 ? cell.substring(0, 27) + "..." : cell;
    }
}
