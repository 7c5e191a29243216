package barwright.ui.dynamics;

import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;

import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.JFileChooser;
import javax.swing.JTabbedPane;
import javax.swing.SwingUtilities;
import javax.swing.filechooser.FileNameExtensionFilter;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.nio.file.Path;
import java.util.List;

/** The roll in motion's part of the main window: the damper page, the turn-in view and the lap view. */
public final class DynamicsViews implements WindowContribution {
    private final DamperPage dampers;
    private final TurnInView turnIn;
    private final LapView lap;
    private final Action openLap;

    public DynamicsViews(WindowContext context) {
        dampers = new DamperPage(context.document(), context.view());
        turnIn = new TurnInView(context.document(), context.view());
        lap = new LapView(context.document(), context.view(), () -> chooseLog(context));
        openLap = new AbstractAction("Open lap log...") {
            @Override
            public void actionPerformed(ActionEvent event) {
                JTabbedPane tabs = (JTabbedPane) SwingUtilities.getAncestorOfClass(JTabbedPane.class, lap);
                if (tabs != null) {
                    tabs.setSelectedComponent(lap);
                }
                lap.chooseAndOpen();
            }
        };
        openLap.putValue(Action.SHORT_DESCRIPTION, "Replay a logged lap (a CSV of time and lateral g) through the "
                + "roll model of the open car");
        openLap.putValue(Action.MNEMONIC_KEY, KeyEvent.VK_L);
    }

    private static Path chooseLog(WindowContext context) {
        JFileChooser chooser = new JFileChooser();
        chooser.setDialogTitle("Open lap log");
        chooser.setFileFilter(new FileNameExtensionFilter("Lap logs (CSV)", "csv", "txt"));
        return chooser.showOpenDialog(context.owner()) == JFileChooser.APPROVE_OPTION
                ? chooser.getSelectedFile().toPath() : null;
    }

    @Override
    public List<Command> commands() {
        return List.of(new Command(Place.TOOLS, openLap));
    }

    @Override
    public List<Page> pages() {
        return List.of(
                new Page("Dampers", "Each axle's damper curve, at the damper and at the wheel, editable point by point",
                        dampers),
                new Page("Turn-in", "A step of lateral acceleration: roll and wheel loads in the first seconds, "
                        + "played back on the car from behind", turnIn),
                new Page("Lap replay", "A logged lap through the roll model: wheel loads, lift risk, load transfer "
                        + "share and grip used along it", lap));
    }

    public DamperPage dampers() {
        return dampers;
    }

    public TurnInView turnIn() {
        return turnIn;
    }

    public LapView lap() {
        return lap;
    }
}
