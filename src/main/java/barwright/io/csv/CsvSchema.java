package barwright.io.csv;

import java.util.List;

/**
 * The numeric columns a CSV file must or may have. Other columns are allowed and kept as text.
 *
 * @param required columns that must be present, with a finite number in every row
 * @param optional columns that may be present; a cell may then be empty (no value)
 */
public record CsvSchema(List<String> required, List<String> optional) {
    public CsvSchema {
        required = List.copyOf(required);
        optional = List.copyOf(optional);
    }

    /** @return true where the column holds numbers */
    public boolean isNumeric(String column) {
        return required.contains(column) || optional.contains(column);
    }
}
