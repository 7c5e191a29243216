package barwright.ui.workshop;

import javax.swing.AbstractAction;
import javax.swing.JComponent;
import javax.swing.JTable;
import javax.swing.KeyStroke;
import javax.swing.table.DefaultTableModel;
import java.awt.Toolkit;
import java.awt.datatransfer.DataFlavor;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/** Text copied from a spreadsheet (tab-separated, or commas/semicolons) put into a readings table's first columns. */
final class PastedRows {
    private PastedRows() {
    }

    /**
     * @param columns how many of the table's first columns the readings fill (the rest, the page's own output,
     *                are cleared)
     * @param least   the table keeps at least this many rows
     */
    static void fill(DefaultTableModel table, String text, int columns, int least) {
        List<String[]> rows = new ArrayList<>();
        for (String line : text.split("\\R")) {
            if (!line.isBlank()) {
                rows.add(line.trim().split(line.contains("\t") ? "\t" : "[,;]"));
            }
        }
        table.setRowCount(Math.max(least, rows.size()));
        for (int r = 0; r < table.getRowCount(); r++) {
            for (int c = 0; c < table.getColumnCount(); c++) {
                table.setValueAt(r < rows.size() && c < columns && c < rows.get(r).length ? rows.get(r)[c].trim()
                        : null, r, c);
            }
        }
    }

    /**
     * Ctrl+V (Cmd+V) on the table hands the clipboard's text to {@code paste}; {@code nothing} runs when the
     * clipboard holds no text.
     */
    static void bindPaste(JTable table, Consumer<String> paste, Runnable nothing) {
        table.getInputMap(JComponent.WHEN_FOCUSED).put(KeyStroke.getKeyStroke(KeyEvent.VK_V,
                Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx()), "paste-readings");
        table.getActionMap().put("paste-readings", new AbstractAction() {
            @Override
            public void actionPerformed(ActionEvent event) {
                try {
                    paste.accept((String) Toolkit.getDefaultToolkit().getSystemClipboard()
                            .getData(DataFlavor.stringFlavor));
                } catch (Exception nothingToPaste) {
                    nothing.run();
                }
            }
        });
    }
}
