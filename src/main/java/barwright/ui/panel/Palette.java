package barwright.ui.panel;

import javax.swing.UIManager;
import java.awt.Color;

/**
 * The few colours the panels use beyond the theme's own, read from the theme's properties
 * (src/main/resources/barwright/ui/*.properties) so that light and dark each get theirs.
 */
public final class Palette {
    private Palette() {
    }

    /** @return the colour of a refused value's message */
    public static Color problem() {
        return colour("Barwright.problemForeground", new Color(0xB0, 0x20, 0x20));
    }

    /** @return the colour of a warning's text */
    public static Color warning() {
        return colour("Barwright.warningForeground", new Color(0x9A, 0x5B, 0x00));
    }

    /** @return the background of the banner shown while results are out of date */
    public static Color staleBackground() {
        return colour("Barwright.staleBackground", new Color(0xFF, 0xF1, 0xC8));
    }

    /** @return the colour of the front axle in pictures and charts */
    public static Color front() {
        return colour("Barwright.frontColor", new Color(0x1F, 0x6F, 0xB5));
    }

    /** @return the colour of the rear axle in pictures and charts */
    public static Color rear() {
        return colour("Barwright.rearColor", new Color(0xC2, 0x4E, 0x1A));
    }

    /** @return muted text */
    public static Color muted() {
        return colour("Label.disabledForeground", Color.GRAY);
    }

    /** @return the theme's colour for the key, or the fallback where the theme has none */
    static Color colour(String key, Color fallback) {
        Color colour = UIManager.getColor(key);
        return colour != null ? colour : fallback;
    }
}
