package barwright.ui.present;

import barwright.ui.panel.CarBehindView;
import barwright.ui.panel.Palette;

import javax.swing.Icon;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.UIManager;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Component;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;

/**
 * The key of presentation mode's car pictures, once for both: what the coloured columns, the grey dot and the
 * arrow are, and that the roll is drawn larger. Each picture then spends its height on the car, not on words
 * (with the largest text on a 1024x768 projector its own key left the car a sliver). Its items wrap between
 * them, each kept whole.
 */
final class PictureKey extends JPanel {
    PictureKey() {
        super(new WrappingRows());
        setName("presentation.key");
        add(item(Mark.FRONT, "front"));
        add(item(Mark.REAR, "rear wheel load"));
        add(item(Mark.ROLL_CENTRE, "rear roll centre"));
        add(item(Mark.FORCE, "m\u00b7a_y, inertial force"));
        add(item(null, "(roll drawn " + (int) CarBehindView.ROLL_DRAWN_LARGER + "\u00d7 larger)"));
    }

    private static JLabel item(Mark mark, String words) {
        JLabel label = new JLabel(words);
        label.setName("presentation.key.item");
        if (mark != null) {
            label.setIcon(new MarkIcon(mark, label));
        }
        return label;
    }

    /** The marks the pictures draw. */
    private enum Mark { FRONT, REAR, ROLL_CENTRE, FORCE }

    /** A mark as the pictures draw it, sized to its label's text. */
    private record MarkIcon(Mark mark, JLabel owner) implements Icon {
        private int size() {
            return owner.getFontMetrics(owner.getFont()).getAscent() * 3 / 4;
        }

        @Override
        public int getIconWidth() {
            return mark == Mark.FORCE ? size() * 2 : size();
        }

        @Override
        public int getIconHeight() {
            return size();
        }

        @Override
        public void paintIcon(Component component, Graphics graphics, int x, int y) {
            Graphics2D g = (Graphics2D) graphics.create();
            try {
                g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                int size = size();
                switch (mark) {
                    case FRONT -> fill(g, Palette.front(), x, y, size);
                    case REAR -> fill(g, Palette.rear(), x, y, size);
                    case ROLL_CENTRE -> {
                        g.setColor(Palette.muted());
                        int dot = Math.max(6, size / 2);
                        g.fillOval(x + (size - dot) / 2, y + (size - dot) / 2, dot, dot);
                    }
                    case FORCE -> {
                        Color text = UIManager.getColor("Label.foreground");
                        g.setColor(text != null ? text : component.getForeground());
                        g.setStroke(new BasicStroke(2.5f));
                        int middle = y + size / 2;
                        int end = x + 2 * size;
                        g.drawLine(x, middle, end - 6, middle);
                        g.fillPolygon(new int[]{end, end - 9, end - 9}, new int[]{middle, middle - 6, middle + 6}, 3);
                    }
                    default -> throw new IllegalStateException("unknown mark " + mark);
                }
            } finally {
                g.dispose();
            }
        }

        private static void fill(Graphics2D g, Color colour, int x, int y, int size) {
            g.setColor(colour);
            g.fillRect(x, y, size, size);
        }
    }
}
