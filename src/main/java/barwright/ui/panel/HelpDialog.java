package barwright.ui.panel;

import barwright.report.Cautions;

import javax.swing.JTextArea;
import java.awt.Window;

/** Help: what the program does, how to use it, what it leaves out, and the cautions. */
public final class HelpDialog {
    /** The help text, plain. */
    public static final String TEXT = """
            Barwright works out what an anti-roll bar does to a car in a steady turn.

            Using it
            - The pages on the left hold everything in the vehicle file. Hover over a field for what it is \
            and how to measure it; its unit is beside it. Type a value and every figure and chart follows.
            - A value the program refuses is outlined in red, with the reason under it. Until it is fixed, \
            the figures and charts keep showing the last car it accepted, marked "Out of date".
            - Click any figure on the right to see how it is worked out: the formula, the numbers put in, \
            the result and the published method behind it.
            - The slider under "Car from behind" sets the lateral acceleration, from driving straight to the \
            grip limit; the picture shows each wheel's load at that point.
            - "Bar sweep" shows how the front share of load transfer and the roll gradient move as one bar's \
            diameter, wall or arm hole changes.
            - "Linkage" draws each axle's suspension seen from behind, to scale, at the slider's lateral \
            acceleration: the arm lines to each side's instant centre, the lines from the tyres through them, the \
            roll centre where those meet, and each wheel's camber to the road. Type a pickup point in its table or \
            drag its circle; Edit > Undo takes the change back. An axle without a linkage uses its typed \
            roll-centre height, and the page says how to add one.
            - View > Units switches every field, figure, chart and export between SI and US customary units. \
            Numbers are read and written the way your computer's language settings write them.
            - Keyboard: Tab moves between fields, Ctrl+Page Up / Page Down between pages, Alt with the \
            underlined letter opens a menu; every command has a key shown in the menus.

            """ + "What the model leaves out\n" + Cautions.NOT_MODELLED + "\n\n"
            + "Be careful\n" + Cautions.SHORT + " A bar, a drop link or a mount that fails at speed can put a car "
            + "off the road: check every part against its maker's data, and changes to a competition car against "
            + "the event's rules.\n";

    private HelpDialog() {
    }

    public static void show(Window owner) {
        JTextArea area = new JTextArea(TEXT, 30, 80);
        area.setName("help.text");
        TextDialog.show(owner, "Barwright help and cautions", "help.dialog", area);
    }
}
