package barwright.ui.sizing;

import barwright.ui.action.CommandAction;
import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;

import java.awt.event.KeyEvent;
import java.util.List;

/**
 * The sizing and setup views' part of the main window: a Tools command that opens each view in a window of its
 * own, and the setup sheet and map exports among the File menu's exports.
 */
public final class SizingViews implements WindowContribution {
    private final WindowContext window;
    private final SizingContext context;
    private final Exports exports;
    private SizingWindow views;
    private String lastMessage;

    public SizingViews(WindowContext window) {
        this.window = window;
        this.context = new SizingContext(window.document(), window.view(), window.dialogs(), window.owner());
        this.exports = new Exports(context);
    }

    @Override
    public List<Command> commands() {
        return List.of(
                open(SizingWindow.Tab.SEARCH, "Size a bar to a target…", KeyEvent.VK_S),
                open(SizingWindow.Tab.TUBES, "Tube or solid bar of the same rate…", KeyEvent.VK_T),
                open(SizingWindow.Tab.MAP, "Arm-hole map…", KeyEvent.VK_M),
                open(SizingWindow.Tab.COMPARE, "Compare setups…", KeyEvent.VK_C),
                open(SizingWindow.Tab.PRELOAD, "Link preload and cross weight…", KeyEvent.VK_L),
                new Command(Place.FILE_EXPORTS, new CommandAction("Export setup sheet as PDF…", "Write the setup "
                        + "sheet of the car as it stands to take to the track", null, KeyEvent.VK_D,
                        () -> exports.setupSheet(this::said))),
                new Command(Place.FILE_EXPORTS, new CommandAction("Export arm-hole map as CSV…", "Write every front "
                        + "hole against every rear hole as a table for a spreadsheet", null, KeyEvent.VK_M,
                        () -> exports.mapCsv(this::said))));
    }

    /** Keeps what an export said, and shows it on the views' map tab where their window has been opened. */
    private void said(String message) {
        if (views != null) {
            views.map().work().say(message, false);
        }
        lastMessage = message;
    }

    private Command open(SizingWindow.Tab tab, String name, int mnemonic) {
        return new Command(Place.TOOLS, new CommandAction(name, tab.help, null, mnemonic, () -> views().open(tab)));
    }

    /** @return the views' window, made on first use */
    SizingWindow views() {
        if (views == null) {
            views = new SizingWindow(window.owner(), context, exports);
        }
        return views;
    }

    /** @return what the last export said, e.g. "Wrote /tmp/car-setup-sheet.pdf", or null */
    String lastMessage() {
        return lastMessage;
    }
}
