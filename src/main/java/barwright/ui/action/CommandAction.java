package barwright.ui.action;

import javax.swing.AbstractAction;
import javax.swing.KeyStroke;
import java.awt.event.ActionEvent;
import java.util.function.BooleanSupplier;

/** A command with its name, key, mnemonic and help, shared by the menu, the toolbar and the keyboard. */
public final class CommandAction extends AbstractAction {
    private final Runnable command;
    private final BooleanSupplier enabled;

    public CommandAction(String name, String help, KeyStroke key, int mnemonic, Runnable command,
                         BooleanSupplier enabled) {
        super(name);
        this.command = command;
        this.enabled = enabled;
        putValue(SHORT_DESCRIPTION, help);
        putValue(ACCELERATOR_KEY, key);
        if (mnemonic != 0) {
            putValue(MNEMONIC_KEY, mnemonic);
        }
        putValue(ACTION_COMMAND_KEY, name);
    }

    public CommandAction(String name, String help, KeyStroke key, int mnemonic, Runnable command) {
        this(name, help, key, mnemonic, command, () -> true);
    }

    /** Re-reads whether the command can run now (undo with nothing to undo cannot). */
    public void refreshEnabled() {
        setEnabled(enabled.getAsBoolean());
    }

    @Override
    public void actionPerformed(ActionEvent event) {
        if (enabled.getAsBoolean()) {
            command.run();
        }
    }
}
