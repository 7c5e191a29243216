package barwright.ui.present;

import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;

import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.KeyStroke;
import java.awt.GraphicsConfiguration;
import java.awt.Rectangle;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.util.List;

/** Presentation mode's part of the main window: Tools > Presentation mode (F11). */
public final class PresentationViews implements WindowContribution {
    private final WindowContext context;
    private PresentationFrame open;

    public PresentationViews(WindowContext context) {
        this.context = context;
    }

    @Override
    public List<Command> commands() {
        Action action = new AbstractAction("Presentation mode") {
            @Override
            public void actionPerformed(ActionEvent event) {
                toggle();
            }
        };
        action.putValue(Action.ACCELERATOR_KEY, KeyStroke.getKeyStroke(KeyEvent.VK_F11, 0));
        action.putValue(Action.SHORT_DESCRIPTION, "The car and the charts over the whole screen with large text, "
                + "quick steppers and a pinned setup for before / after (F11 or Esc goes back)");
        return List.of(new Command(Place.TOOLS, action));
    }

    /** Opens presentation mode over the main window's screen, or closes it where it is open. */
    public PresentationFrame toggle() {
        if (open != null && open.isDisplayable()) {
            open.close();
            open = null;
            return null;
        }
        open = new PresentationFrame(context.document(), context.view(), context.results());
        GraphicsConfiguration screen = context.owner() != null ? context.owner().getGraphicsConfiguration() : null;
        Rectangle bounds = screen != null ? screen.getBounds() : new Rectangle(0, 0, 1280, 800);
        open.setBounds(bounds);
        open.setVisible(true);
        return open;
    }
}
