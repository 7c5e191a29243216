package barwright.ui.tyre;

import barwright.model.AxlePosition;
import barwright.ui.app.MainWindow;

import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

/**
 * The tyre page and the fit dialog for the window tests and the screenshot tool: finding them in the main window,
 * waiting for them, and writing their pictures. The tyre data is the shipped, invented data set.
 */
public final class TyreScreens {
    /** The invented tyre test data shipped with the samples (sample-vehicles/tyre-data/). */
    public static final Path SAMPLE_DATA = Path.of("sample-vehicles", "tyre-data", "invented-club-tyre.csv");

    private TyreScreens() {
    }

    /** Writes a picture of a component to a PNG file. */
    @FunctionalInterface
    public interface Picture {
        void write(JComponent component, Path file) throws Exception;
    }

    /** Shows the tyre page of the main window and waits for it. */
    static TyrePage select(MainWindow window) throws Exception {
        AtomicReference<TyrePage> page = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            TyrePage found = window.contribution(TyreViews.class).page();
            window.tabs().setSelectedComponent(found);
            page.set(found);
        });
        settle(window, null);
        return page.get();
    }

    /** Waits (up to 20 s) for the analysis and the fit dialog's work, then for painting. */
    static void settle(MainWindow window, TyreFitDialog dialog) throws Exception {
        boolean[] idle = new boolean[1];
        for (int i = 0; i < 1000 && !idle[0]; i++) {
            SwingUtilities.invokeAndWait(() -> idle[0] = window.analysis().isIdle() && window.results().shown() != null
                    && (dialog == null || dialog.isIdle()));
            if (!idle[0]) {
                Thread.sleep(20);
            }
        }
        if (!idle[0]) {
            throw new AssertionError("the window did not settle within 20 s");
        }
        SwingUtilities.invokeAndWait(() -> { });
        Thread.sleep(150);
    }

    /**
     * Writes the tyre page on the sample's law tyre, the fit dialog on the shipped data, and the page with the fitted
     * tyre applied to both axles; then takes both applications back.
     *
     * @param suffix added to each file name, e.g. "-dark-text20-1024x768"
     * @param write  writes a component's picture to a file (the screenshot tool's own way)
     */
    public static void shoot(MainWindow window, Path folder, String suffix, Picture write) throws Exception {
        select(window);
        write.write(window.getRootPane(), folder.resolve("tyres-law" + suffix + ".png"));
        TyreViews views = window.contribution(TyreViews.class);
        AtomicReference<TyreFitDialog> holder = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            TyreFitDialog dialog = views.fitDialog();
            dialog.setSize(window.getWidth() - 40, window.getHeight() - 40);
            dialog.setLocation(window.getX() + 20, window.getY() + 20);
            dialog.setVisible(true);
            dialog.fit(SAMPLE_DATA.toAbsolutePath());
            holder.set(dialog);
        });
        TyreFitDialog dialog = holder.get();
        settle(window, dialog);
        write.write(dialog.getRootPane(), folder.resolve("tyre-fit" + suffix + ".png"));
        SwingUtilities.invokeAndWait(() -> {
            dialog.apply(AxlePosition.FRONT);
            dialog.apply(AxlePosition.REAR);
            dialog.dispose();
        });
        settle(window, null);
        write.write(window.getRootPane(), folder.resolve("tyres-points" + suffix + ".png"));
        SwingUtilities.invokeAndWait(() -> {
            window.document().undo();
            window.document().undo();
        });
        settle(window, null);
    }
}
