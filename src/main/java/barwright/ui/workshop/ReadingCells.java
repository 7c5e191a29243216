package barwright.ui.workshop;

/** A readings table's cells: blank, as text, as a finite number (a comma taken as the decimal mark). */
final class ReadingCells {
    private ReadingCells() {
    }

    static boolean blank(Object cell) {
        return cell == null || cell.toString().isBlank();
    }

    static String text(Object cell) {
        return cell == null ? "" : cell.toString();
    }

    /** @throws NumberFormatException where the cell is not a finite number */
    static double number(Object cell) {
        double value = Double.parseDouble(text(cell).trim().replace(',', '.'));
        if (!Double.isFinite(value)) {
            throw new NumberFormatException();
        }
        return value;
    }
}
