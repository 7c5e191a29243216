package barwright.io.csv;

import java.util.List;

/**
 * A CSV file as read: its columns in order and its data rows.
 *
 * @param columns the header's column names
 * @param rows    the data rows in file order
 */
public record CsvTable(List<String> columns, List<CsvRow> rows) {
    public CsvTable {
        columns = List.copyOf(columns);
        rows = List.copyOf(rows);
    }

    public boolean hasColumn(String column) {
        return columns.contains(column);
    }
}
