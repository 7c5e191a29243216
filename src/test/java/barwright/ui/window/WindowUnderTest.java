package barwright.ui.window;

import barwright.ui.app.Themes;
import org.junit.jupiter.api.extension.AfterEachCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * The main window a window test opens, closed after each test whatever the test did (and its text size put
 * back): a test class registers one with {@code @RegisterExtension} and opens the window where it needs it.
 */
public final class WindowUnderTest implements AfterEachCallback {
    private WindowFixture open;

    /** @return the window on a projector or a shop laptop: 1024x768 with the largest text size offered */
    public WindowFixture onProjector() {
        return open(1024, 768, Themes.largestTextSize());
    }

    /**
     * Closes the window open before, if any, and opens one.
     *
     * @param textSize points, or 0 for the system's size
     */
    public WindowFixture open(int width, int height, int textSize) {
        close();
        open = new WindowFixture(width, height, textSize);
        return open;
    }

    /** Closes the open window, if any. */
    public void close() {
        if (open != null) {
            open.close();
            open = null;
        }
    }

    @Override
    public void afterEach(ExtensionContext context) {
        close();
    }
}
