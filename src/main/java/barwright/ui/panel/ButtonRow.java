package barwright.ui.panel;

import javax.swing.JComponent;
import javax.swing.JPanel;
import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.Insets;
import java.awt.LayoutManager;

/**
 * Buttons side by side, left to right, that go on to a new row where the width given runs out (a large text
 * on a small screen) rather than making the page wider.
 */
final class ButtonRow extends JPanel {
    /** Between two buttons, and between two rows (pixels). */
    private static final int GAP = 6;

    ButtonRow(JComponent... buttons) {
        super(new Rows());
        setOpaque(false);
        for (JComponent button : buttons) {
            add(button);
        }
    }

    /** Lays the buttons in rows at the container's width; asks for one row, or the rows that width needs. */
    private static final class Rows implements LayoutManager {
        @Override
        public void addLayoutComponent(String name, Component component) {
        }

        @Override
        public void removeLayoutComponent(Component component) {
        }

        @Override
        public Dimension preferredLayoutSize(Container parent) {
            Insets insets = parent.getInsets();
            int inside = parent.getWidth() - insets.left - insets.right;
            return place(parent, parent.getWidth() > 0 ? Math.max(1, inside) : Integer.MAX_VALUE, false);
        }

        /** The widest button whole; the rows that width needs. */
        @Override
        public Dimension minimumLayoutSize(Container parent) {
            int widest = 0;
            for (Component button : parent.getComponents()) {
                if (button.isVisible()) {
                    widest = Math.max(widest, button.getPreferredSize().width);
                }
            }
            Insets insets = parent.getInsets();
            Dimension rows = place(parent, widest, false);
            return new Dimension(widest + insets.left + insets.right, rows.height);
        }

        @Override
        public void layoutContainer(Container parent) {
            Insets insets = parent.getInsets();
            place(parent, Math.max(1, parent.getWidth() - insets.left - insets.right), true);
        }

        /**
         * Goes through the buttons in rows no wider than the width (a button wider than it has a row of its own),
         * placing them if asked.
         *
         * @return the size of the rows, insets included (pixels)
         */
        private static Dimension place(Container parent, int width, boolean apply) {
            Insets insets = parent.getInsets();
            int x = 0;
            int y = 0;
            int rowHeight = 0;
            int widest = 0;
            for (Component button : parent.getComponents()) {
                if (!button.isVisible()) {
                    continue;
                }
                Dimension size = button.getPreferredSize();
                if (x > 0 && (long) x + GAP + size.width > width) {
                    y += rowHeight + GAP;
                    x = 0;
                    rowHeight = 0;
                }
                int left = x == 0 ? 0 : x + GAP;
                if (apply) {
                    button.setBounds(insets.left + left, insets.top + y, size.width, size.height);
                }
                x = left + size.width;
                widest = Math.max(widest, x);
                rowHeight = Math.max(rowHeight, size.height);
            }
            return new Dimension(widest + insets.left + insets.right, y + rowHeight + insets.top + insets.bottom);
        }
    }
}
