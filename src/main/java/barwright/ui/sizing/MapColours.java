package barwright.ui.sizing;

import barwright.ui.panel.Palette;

import javax.swing.Icon;
import javax.swing.JComponent;
import javax.swing.UIManager;
import java.awt.Color;
import java.awt.Component;
import java.awt.Graphics;

/**
 * The arm-hole map's tints: a cell whose front share of load transfer lies above the reference takes on the
 * front axle's colour, one below it the rear axle's, by how far it lies from it (full at 5 points); near the
 * reference it stays the background. Mixed with the theme's background, so light and dark themes both read.
 */
final class MapColours {
    /** The tint is full this far from the reference share (a fraction: 5 percentage points). */
    static final double FULL_TINT = 0.05;
    /** How much of the axle colour a full tint mixes in. */
    private static final double STRENGTH = 0.45;

    private MapColours() {
    }

    /** @param difference the cell's front share minus the reference (a fraction) */
    static Color tint(double difference) {
        Color toward = difference >= 0 ? Palette.front() : Palette.rear();
        double share = Math.min(1, Math.abs(difference) / FULL_TINT) * STRENGTH;
        return mix(background(), toward, share);
    }

    /**
     * @param difference a front share minus the reference (a fraction)
     * @return a square of the tint a cell that far from the reference takes, as high as the owner's text, in the
     *     theme's colours of the moment (for the map's key)
     */
    static Icon swatch(JComponent owner, double difference) {
        return new Icon() {
            @Override
            public void paintIcon(Component component, Graphics graphics, int x, int y) {
                int size = getIconWidth();
                graphics.setColor(tint(difference));
                graphics.fillRect(x, y, size, size);
                Color line = UIManager.getColor("Label.foreground");
                graphics.setColor(mix(background(), line != null ? line : Color.BLACK, 0.5));
                graphics.drawRect(x, y, size - 1, size - 1);
            }

            @Override
            public int getIconWidth() {
                return Math.round(owner.getFont().getSize2D() * 0.9f);
            }

            @Override
            public int getIconHeight() {
                return getIconWidth();
            }
        };
    }

    /** @return the colour of a lift warning */
    static Color lift() {
        return Palette.problem();
    }

    static Color background() {
        Color colour = UIManager.getColor("Table.background");
        return colour != null ? colour : Color.WHITE;
    }

    static Color mix(Color base, Color other, double share) {
        return new Color(channel(base.getRed(), other.getRed(), share), channel(base.getGreen(), other.getGreen(), share),
                channel(base.getBlue(), other.getBlue(), share));
    }

    private static int channel(int base, int other, double share) {
        return (int) Math.round(base + (other - base) * share);
    }
}
