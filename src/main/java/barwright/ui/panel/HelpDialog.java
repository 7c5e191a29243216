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
            - Small screen or projector: the editor folds away with the small arrows on its divider; labels \
            go above their fields when the column is narrow; the figures move below the charts and the \
            results scroll rather than cut a number. View > Larger text (Ctrl+=) for a class.
            - A number typed key by key is applied on Enter, when you leave the field, or after a short pause; \
            the Up and Down arrow keys (Shift: ten times) and the mouse wheel step it.

            The pictures and charts (middle)
            - Car from behind: the car in a steady turn at the slider's lateral acceleration, its body roll \
            drawn five times larger about the rear roll centre (the labelled dot), the inertial force m·a_y \
            on the centre of mass (the arrow), and each tyre's load as a column; a lifted wheel leaves the \
            ground. Save it as PNG or SVG with the buttons under it.
            - Wheel loads: each wheel's load against lateral acceleration, with the points where an inside \
            wheel lifts.
            - Body roll: roll angle against lateral acceleration, with and without the bars.
            - Load transfer parts: each axle's lateral load transfer split into its unsprung, geometric \
            (through the roll centre) and elastic (through springs, bar and tyres) parts.
            - Handling: front minus rear slip angle against lateral acceleration up to each axle's limit; \
            rising is understeer.
            - "Bar sweep" shows how the front share of load transfer and the roll gradient move as one bar's \
            diameter, wall or arm hole changes, with the car's present value marked.
            - "Linkage" draws each axle's suspension seen from behind, to scale, at the slider's lateral \
            acceleration: the arm lines to each side's instant centre, the lines from the tyres through them, the \
            roll centre where those meet, and each wheel's camber to the road. Type a pickup point in its table or \
            drag its circle; Edit > Undo takes the change back. An axle without a linkage uses its typed \
            roll-centre height, and the page says how to add one.
            - Lift, balance, chassis: where an inside wheel lifts with braking or power added; which input \
            moves the balance most (sensitivity); how stiff the body must be before the bars act as if it \
            were rigid.
            - Workshop: a bar's rate from load and deflection readings against the model's rate, a motion \
            ratio from travel readings, the centre-of-mass height by raising one axle, and the corner weights \
            with the cross weight; each result goes into the car as one undoable edit.
            - Tools > Presentation mode (F11): the car or a chart over the whole screen with large text, \
            steppers for the bars and springs, and a pinned setup beside the car (before / after).

            The key figures (right, or below on a small screen)
            - Roll stiffness of springs, bar and tyres per axle, and the axle as a whole (tyres in series, so \
            it can be below the bar alone); both roll gradients (tyres included, and springs and bars only); \
            the front share of load transfer beside the static front weight; the static understeer gradient \
            (a bar does not move it); per turn, the grip limit, the balance at it, the grip each axle loses \
            to load transfer and where each inside wheel lifts; per bar, link rate, mass, stress, safety \
            factor and bushing load. Click any of them for its working.

            The sizing window (Tools menu)
            - Size a bar to a target: searches stock sizes and holes for a bar that gives the front share \
            you ask for, with mass and safety factor; Apply puts the chosen bar on the car.
            - Tube or solid bar of the same rate: tubes from a catalogue that match a solid bar's rate, \
            lighter and with their stress.
            - Arm-hole map: every front hole against every rear hole, coloured by the front share.
            - Compare setups: the car against variants of it, figures and charts side by side.
            - Link preload and cross weight: what a link set to the wrong length does to the corner weights.
            - File > Export setup sheet as PDF: a sheet to take to the track.
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

    /** @return the help text with the index of every contributed view and tool appended */
    public static String text(java.util.List<String> index) {
        StringBuilder text = new StringBuilder(TEXT).append("\nEvery view and tool added to this window\n");
        index.forEach(line -> text.append("- ").append(line).append('\n'));
        return text.toString();
    }

    /**
     * @param index a line for every view and tool the window's contributions add (their own descriptions),
     *              listed after the text so that Help names each one
     */
    public static void show(Window owner, java.util.List<String> index) {
        JTextArea area = new JTextArea(text(index), 30, 80);
        area.setName("help.text");
        TextDialog.show(owner, "Barwright help and cautions", "help.dialog", area);
    }
}
