package barwright.ui.sizing;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.sizing.preload.CornerLoads;
import barwright.sizing.preload.GainingDiagonal;
import barwright.sizing.preload.LinkPreload;
import barwright.sizing.preload.PreloadResult;
import barwright.ui.panel.FigureFormat;
import barwright.ui.panel.WrappingText;
import barwright.units.Constants;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import java.awt.BorderLayout;
import java.awt.Font;
import java.util.List;
import java.util.function.ToDoubleFunction;

/**
 * Link preload (model.md 9): what making one bar link longer or shorter does to the car at rest, each corner's
 * load and the cross weight, the diagonal said in words, and the common practice for setting links. Worked out
 * again off the event thread whenever the car or a setting changes. Event thread.
 */
final class PreloadView extends JPanel {
    /** Short headers (each column's tooltip says it in full): all four in view with the largest text. */
    static final String[] COLUMNS = {"Wheel", "Load, link neutral", "Change per length", "Load, link changed"};
    private final SizingContext context;
    private final FigureFormat format;
    private final JComboBox<String> axle = new JComboBox<>(new String[]{"front bar", "rear bar"});
    private final JComboBox<String> diagonal = new JComboBox<>(new String[]{
        GainingDiagonal.LEFT_FRONT_RIGHT_REAR.gains(), GainingDiagonal.RIGHT_FRONT_LEFT_REAR.gains()});
    private final QuantityField change;
    private final WrappingText words = new WrappingText(" ");
    private final WrappingText cross = new WrappingText(" ");
    private final WorkStrip work = new WorkStrip("preload");
    private final Wheels wheels = new Wheels();
    private PreloadResult shown;

    PreloadView(SizingContext context) {
        super(new BorderLayout());
        setName("preload.view");
        this.context = context;
        this.format = new FigureFormat(context.view());
        change = new QuantityField("preload.change", "Link made longer by", Quantity.LENGTH, context.view(), -50e-3,
                50e-3, 2e-3, false);
        change.setToolTipText("How much longer the link is made; a negative length makes it shorter");
        axle.setName("preload.axle");
        diagonal.setName("preload.diagonal");
        diagonal.setToolTipText("Which pair of wheels gains load as the link gets longer: it depends on which link "
                + "(left or right) you turn and on how the bar end sits. Check it once on the scales with a small "
                + "change.");
        words.setName("preload.words");
        cross.setName("preload.cross");
        words.setFont(words.getFont().deriveFont(Font.BOLD));
        for (WrappingText text : List.of(words, cross)) {
            // new words show from their start: setting them moves no scroll pane to their end
            ((javax.swing.text.DefaultCaret) text.getCaret()).setUpdatePolicy(javax.swing.text.DefaultCaret.NEVER_UPDATE);
        }

        Rows settings = new Rows();
        settings.heading("The link you change");
        settings.line("The link of the", axle, null);
        settings.line("made longer by", Rows.inLine(0, change, change.unitLabel(),
                new JLabel("(a negative length: shorter)")), null);
        settings.line("loads rise on the", diagonal, new JLabel("wheels"));
        settings.end();

        WrappingText advice = new WrappingText("Before you set the links: " + LinkPreload.ADVICE);
        advice.setName("preload.advice");
        advice.setBorder(BorderFactory.createCompoundBorder(
                BorderFactory.createMatteBorder(0, 4, 0, 0, barwright.ui.panel.Palette.warning()),
                BorderFactory.createEmptyBorder(4, 8, 4, 8)));
        FigureTable table = new FigureTable("preload.wheels", wheels, new String[]{"Each corner of the car",
            "Corner load at rest, the bar link at its neutral length", "Load change per unit of link length",
            "Corner load with the link changed by the length given"}, new int[]{120, 200, 220, 200});
        Rows results = new Rows();
        results.across(words);
        table.fitColumnsToTexts(); // each column as wide as its header and figures: no name or figure cut
        JScrollPane scroll = new JScrollPane(table) {
            @Override
            public java.awt.Dimension getPreferredSize() {
                // the header and the four corners in full at any text size, with room for a sideways scroll bar
                java.awt.Insets insets = getInsets();
                int height = table.getTableHeader().getPreferredSize().height + 4 * table.getRowHeight()
                        + getHorizontalScrollBar().getPreferredSize().height + insets.top + insets.bottom;
                // no wider than the page: the words around it wrap at the page's width, the table scrolls sideways
                return new java.awt.Dimension(Math.min(table.getPreferredSize().width, 300) + insets.left
                        + insets.right, height);
            }

            @Override
            public java.awt.Dimension getMinimumSize() {
                return getPreferredSize();
            }
        };
        results.across(scroll);
        results.across(cross);
        results.across(advice);
        results.end();
        JPanel top = new JPanel(new BorderLayout());
        top.add(settings, BorderLayout.WEST);
        add(top, BorderLayout.NORTH);
        add(new JScrollPane(results), BorderLayout.CENTER);
        add(work, BorderLayout.SOUTH);

        WhileShown updates = new WhileShown(this, this::recompute);
        axle.addActionListener(event -> recompute());
        diagonal.addActionListener(event -> recompute());
        change.addActionListener(event -> recompute());
        change.addFocusListener(new java.awt.event.FocusAdapter() {
            @Override
            public void focusLost(java.awt.event.FocusEvent event) {
                recompute();
            }
        });
        context.document().addListener(event -> updates.request());
        context.view().addListener(this::describe);
        updates.request();
    }

    /** Works the preload out again for the settings and the car as they stand. */
    void recompute() {
        Vehicle vehicle;
        double length;
        AxlePosition position = axle.getSelectedIndex() == 0 ? AxlePosition.FRONT : AxlePosition.REAR;
        GainingDiagonal gaining = GainingDiagonal.values()[diagonal.getSelectedIndex()];
        try {
            vehicle = context.currentCar().vehicle();
            length = change.value();
            if (vehicle.axle(position).bar() == null) {
                throw new IllegalArgumentException("The " + position.key() + " axle has no bar: its links cannot "
                        + "preload anything.");
            }
        } catch (IllegalArgumentException | IllegalStateException refused) {
            work.say(refused.getMessage(), true);
            return;
        }
        work.run("Working out the preload", "", "The preload could not be worked out",
                progress -> LinkPreload.of(vehicle, position, gaining, length), result -> {
                    shown = result;
                    describe();
                });
    }

    private void describe() {
        if (shown == null) {
            return;
        }
        CornerLoads step = shown.changePerLength().times(shown.linkChange());
        boolean longer = shown.linkChange() >= 0;
        String length = format.text(Math.abs(shown.linkChange()), Quantity.LENGTH);
        words.setText("Making the " + shown.axle().key() + " bar link " + length + (longer ? " longer" : " shorter")
                + " loads the " + (longer ? shown.diagonal().gains() : shown.diagonal().loses()) + " wheels (front by "
                + format.text(Math.abs(step.leftFront()), Quantity.FORCE) + ", rear by "
                + format.text(Math.abs(step.leftRear()), Quantity.FORCE) + ") and unloads the "
                + (longer ? shown.diagonal().loses() : shown.diagonal().gains()) + " wheels by the same. It locks a "
                + "roll moment of " + moment(Math.abs(shown.lockedMoment())) + " between the axles.");
        cross.setText(String.format(context.view().locale(), "Cross weight (left front + right rear, over the total): "
                        + "%.2f %% at rest, %.2f %% with the link changed (%+.2f percentage points).",
                100 * shown.staticLoads().crossWeight(), 100 * shown.loads().crossWeight(),
                100 * (shown.loads().crossWeight() - shown.staticLoads().crossWeight())));
        wheels.fireTableDataChanged();
    }

    /** @return a roll moment in N·m or lbf·ft (NIST SP 811 factors, as the rest of the program) */
    private String moment(double newtonMetres) {
        if (context.view().units() == UnitSystem.US) {
            return String.format(context.view().locale(), "%.1f lbf·ft",
                    newtonMetres / (Constants.NEWTONS_PER_POUND_FORCE * Constants.METRES_PER_FOOT));
        }
        return String.format(context.view().locale(), "%.1f N·m", newtonMetres);
    }

    WorkStrip work() {
        return work;
    }

    String wordsText() {
        return words.getText();
    }

    String crossText() {
        return cross.getText();
    }

    PreloadResult shown() {
        return shown;
    }

    /** The four corners: load at rest, change per length, load with the change. */
    private final class Wheels extends TextTableModel {
        private static final String[] NAMES = {"left front", "right front", "left rear", "right rear"};
        private static final java.util.List<ToDoubleFunction<CornerLoads>> CORNERS = java.util.List.of(
                CornerLoads::leftFront, CornerLoads::rightFront, CornerLoads::leftRear, CornerLoads::rightRear);

        Wheels() {
            super(COLUMNS);
        }

        @Override
        public int getRowCount() {
            return shown == null ? 0 : 4;
        }

        @Override
        public Object getValueAt(int row, int column) {
            ToDoubleFunction<CornerLoads> corner = CORNERS.get(row);
            return switch (column) {
                case 0 -> NAMES[row];
                case 1 -> format.text(corner.applyAsDouble(shown.staticLoads()), Quantity.FORCE);
                case 2 -> signed(format.text(corner.applyAsDouble(shown.changePerLength()), Quantity.LINEAR_RATE));
                default -> format.text(corner.applyAsDouble(shown.loads()), Quantity.FORCE);
            };
        }

        private String signed(String text) {
            return text.startsWith("-") ? text : "+" + text;
        }
    }
}
