package barwright.ui.app;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;

import javax.swing.UIManager;
import javax.swing.plaf.FontUIResource;
import java.awt.Font;

/**
 * Light and dark themes and the text size, through FlatLaf. Barwright's own colours live in the properties
 * files under src/main/resources/barwright/ui/. The only place FlatLaf is used.
 */
public final class Themes {
    public enum Theme { LIGHT, DARK }

    /** Text sizes offered, in points. */
    static final int[] TEXT_SIZES = {10, 11, 12, 13, 14, 15, 16, 18, 20, 22, 24, 28};
    private static Font baseFont;

    private Themes() {
    }

    /**
     * Sets the theme and the text size; every open window follows.
     *
     * @param textSize points, or 0 for the system's size
     */
    public static void apply(Theme theme, int textSize) {
        FlatLaf.registerCustomDefaultsSource("barwright.ui");
        if (baseFont == null) {
            UIManager.put("defaultFont", null);
            setup(theme);
            FlatLaf.updateUI();
            baseFont = UIManager.getFont("defaultFont");
            if (baseFont == null) {
                baseFont = UIManager.getFont("Label.font");
            }
            if (textSize <= 0) {
                return; // the system's size: one set-up is enough (it counts at start-up)
            }
        }
        UIManager.put("defaultFont", textSize > 0 && baseFont != null
                ? new FontUIResource(baseFont.deriveFont((float) textSize)) : null);
        setup(theme);
        FlatLaf.updateUI();
    }

    private static void setup(Theme theme) {
        if (theme == Theme.DARK) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
    }

    /** @return every text size offered (points), smallest first */
    public static int[] offeredTextSizes() {
        return TEXT_SIZES.clone();
    }

    /** @return the largest text size offered (points) */
    public static int largestTextSize() {
        return TEXT_SIZES[TEXT_SIZES.length - 1];
    }

    /** @return the size the text has with no setting (points) */
    public static int systemTextSize() {
        return baseFont == null ? 13 : baseFont.getSize();
    }

    /** @return the next size up or down from the current one, within the offered sizes */
    public static int step(int current, int direction) {
        int size = current > 0 ? current : systemTextSize();
        if (direction > 0) {
            for (int offered : TEXT_SIZES) {
                if (offered > size) {
                    return offered;
                }
            }
            return TEXT_SIZES[TEXT_SIZES.length - 1];
        }
        for (int i = TEXT_SIZES.length - 1; i >= 0; i--) {
            if (TEXT_SIZES[i] < size) {
                return TEXT_SIZES[i];
            }
        }
        return TEXT_SIZES[0];
    }
}
