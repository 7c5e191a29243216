package barwright.io.csv;

import java.util.Map;
import java.util.OptionalDouble;

/**
 * One data row of a CSV file, its numbers already checked.
 *
 * @param line    the row's line in the file, counting from 1 (what an editor shows)
 * @param numbers the numeric cells by column; an empty optional cell is absent
 * @param texts   every cell as written, by column
 */
public record CsvRow(int line, Map<String, Double> numbers, Map<String, String> texts) {
    public CsvRow {
        numbers = Map.copyOf(numbers);
        texts = Map.copyOf(texts);
    }

    /** @return the number of a required column (or an optional one known to be present) */
    public double number(String column) {
        Double value = numbers.get(column);
        if (value == null) {
            throw new IllegalArgumentException("line " + line + " has no number in column " + column);
        }
        return value;
    }

    /** @return the number of an optional column, empty where the column is absent or its cell is empty */
    public OptionalDouble optionalNumber(String column) {
        Double value = numbers.get(column);
        return value == null ? OptionalDouble.empty() : OptionalDouble.of(value);
    }

    /** @return the cell as written, "" where the column is absent */
    public String text(String column) {
        return texts.getOrDefault(column, "");
    }
}
