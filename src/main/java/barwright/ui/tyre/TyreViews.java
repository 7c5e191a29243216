package barwright.ui.tyre;

import barwright.ui.action.CommandAction;
import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;

import java.awt.event.KeyEvent;
import java.util.List;

/**
 * The tyres' part of the main window: the tyre page (a tab per axle) among the results, and "Fit a tyre from
 * data..." in the Tools menu, which the page's own button also opens.
 */
public final class TyreViews implements WindowContribution {
    private final WindowContext window;
    private final TyrePage page;
    private TyreFitDialog fitDialog;

    public TyreViews(WindowContext window) {
        this.window = window;
        page = new TyrePage(window.results(), window.view(), this::fitFromData);
    }

    @Override
    public List<Page> pages() {
        return List.of(new Page("Tyres", "Each axle's tyre: grip against load with the loads at the limit, force "
                + "against slip angle, the camber effect; fit a tyre from measured data", page));
    }

    @Override
    public List<Command> commands() {
        return List.of(new Command(Place.TOOLS, new CommandAction("Fit a tyre from data…", "Fit a tyre to measured "
                + "lateral force curves (CSV) and put it on an axle", null, KeyEvent.VK_F, this::fitFromData)));
    }

    /** Opens the fit dialog (one for the window, kept between uses) and asks for a file. */
    void fitFromData() {
        TyreFitDialog dialog = fitDialog();
        dialog.setVisible(true);
        dialog.chooseAndFit();
    }

    /** @return the fit dialog, made on first use */
    TyreFitDialog fitDialog() {
        if (fitDialog == null || !fitDialog.isDisplayable()) {
            fitDialog = new TyreFitDialog(window.owner(), window.document(), window.view(), window.dialogs());
        }
        return fitDialog;
    }

    public TyrePage page() {
        return page;
    }
}
