package barwright.ui.linkage;

import barwright.io.FileWriteException;
import barwright.io.KeyPath;
import barwright.io.LinkageKeys;
import barwright.io.LinkageKeys.PointKey;
import barwright.io.Problem;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.FrontViewPoint;
import barwright.model.TurnDirection;
import barwright.physics.linkage.FrontViewFigure.Pickup;
import barwright.ui.action.WindowContext;
import barwright.ui.chart.DrawingExport;
import barwright.ui.panel.PagePanel;
import barwright.ui.panel.Palette;
import barwright.ui.panel.WrappingText;
import barwright.ui.sizing.WhileShown;
import barwright.ui.task.BackgroundWork;
import barwright.ui.task.CorneringProbe;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.IntNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSlider;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.JToggleButton;
import javax.swing.table.DefaultTableCellRenderer;
import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Component;
import java.awt.FlowLayout;
import java.awt.Font;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The linkage page: one axle's measured points in a table (display units, editable) above its front-view drawing,
 * which follows the lateral-acceleration slider (the body rolls by the analysis's roll, the links move, the roll
 * centre migrates). A point can be dragged on the drawing: a live preview while dragging, one undoable edit on
 * release. The solves run off the event thread. Event thread.
 */
public final class LinkagePage extends JPanel {
    private static final String DRAWING = "drawing";
    private static final String NONE = "none";

    private final WindowContext context;
    private final CorneringProbe probe;
    private final PointTableModel points;
    private final JTable table;
    private final JScrollPane tableScroll;
    private final JScrollPane scroller;
    private final DrawingAndPoints split;
    private final FrontViewDrawing drawing;
    private final JTextArea noLinkage = new JTextArea();
    private final JPanel cards = new JPanel(new CardLayout());
    private final WrappingText message = new WrappingText(" ");
    private final JToggleButton front = new JToggleButton("Front axle", true);
    private final JToggleButton rear = new JToggleButton("Rear axle");
    private final JSlider slider = new JSlider(0, 100);
    private final JComboBox<String> turn = new JComboBox<>(new String[] {"Left turn", "Right turn"});
    private final BackgroundWork<LinkageScene.Request, LinkageScene> worker;
    private final WhileShown solveWhileShown;
    private long revision;
    /** What the drawing's last solve says (a preview refused, a linkage run out of travel), or null. */
    private String sceneNote;
    /** Why the last drag was not kept, or null; cleared by the next drag or edit. */
    private String releaseNote;

    public LinkagePage(WindowContext context, CorneringProbe probe) {
        super(new BorderLayout(6, 6));
        setName("linkage.page");
        this.context = context;
        this.probe = probe;
        points = new PointTableModel(context.document(), context.view());
        table = new JTable(points);
        table.setName("linkage.points");
        table.setDefaultRenderer(Object.class, new ProblemRenderer());
        table.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);
        table.getTableHeader().setReorderingAllowed(false);
        drawing = new FrontViewDrawing(context.view(), this::pointName);
        drawing.setDragListener(new Dragging());
        noLinkage.setName("linkage.none");
        noLinkage.setEditable(false);
        noLinkage.setLineWrap(true);
        noLinkage.setWrapStyleWord(true);
        noLinkage.setOpaque(false);
        neverScrollTo(noLinkage);
        noLinkage.setBorder(BorderFactory.createEmptyBorder(16, 16, 16, 16));
        // the key under the drawing where the drawing has no room for it: below the fold, with the words under it
        JPanel drawingAndKey = new JPanel(new BorderLayout());
        drawingAndKey.add(drawing, BorderLayout.CENTER);
        drawingAndKey.add(drawing.keyBelow(), BorderLayout.SOUTH);
        cards.add(drawingAndKey, DRAWING);
        cards.add(new JScrollPane(noLinkage), NONE);
        message.setName("linkage.message");
        neverScrollTo(message);

        tableScroll = new JScrollPane(table);
        split = new DrawingAndPoints(cards, tableScroll);
        add(controls(), BorderLayout.NORTH);
        // the drawing takes the room the view gives; only below its least height does the page scroll
        PagePanel body = new PagePanel(new BorderLayout(4, 4)) {
            /**
             * No wider than the drawing asks: the words below wrap at the width given, and on their unwrapped lines
             * they made the page wider than a small screen's tab, cutting the drawing on the right.
             */
            @Override
            public java.awt.Dimension getPreferredScrollableViewportSize() {
                java.awt.Dimension wanted = getPreferredSize();
                return new java.awt.Dimension(Math.min(wanted.width, Math.max(getMinimumSize().width,
                        drawing.getPreferredSize().width)), wanted.height);
            }

            /** As tall as the view unless that would squeeze the drawing under its least height. */
            @Override
            public boolean getScrollableTracksViewportHeight() {
                return getParent() instanceof javax.swing.JViewport viewport
                        && viewport.getHeight() >= getMinimumSize().height;
            }
        };
        body.add(split, BorderLayout.CENTER);
        body.add(footer(), BorderLayout.SOUTH);
        scroller = new JScrollPane(body, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        scroller.setBorder(BorderFactory.createEmptyBorder());
        add(scroller, BorderLayout.CENTER);
        // where the page must scroll (a short view), the drawing still fits whole in it: the words scroll under it
        scroller.getViewport().addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent event) {
                // the drawing is at the top of the page: its key, the table (where narrow) and the words follow below
                drawing.fitHeight(scroller.getViewport().getHeight() - 8);
            }
        });
        setBorder(BorderFactory.createEmptyBorder(4, 4, 4, 4));
        // the page never asks for more room than a chart does, so the key figures keep their place beside it
        fitTable();
        points.addTableModelListener(event -> fitTable());

        worker = BackgroundWork.newestOnly(LinkageScene::solve, this::arrived,
                failure -> message.setText("The drawing could not be made: " + failure));
        // solved again only while on screen (a slider move or an edit elsewhere costs a hidden page nothing);
        // the newest car and slider are solved when the page is shown
        solveWhileShown = new WhileShown(this, () -> submit(null));
        context.document().addListener(event -> {
            releaseNote = null;
            if (event.kind() == barwright.ui.document.DocumentEvent.Kind.REPLACED) {
                toTop();
            }
            points.reload();
            refresh();
        });
        context.results().addListener(this::refresh);
        context.view().addListener(points::reload);
        probe.addListener(() -> {
            slider.setValue((int) Math.round(probe.fractionOfLimit() * 100));
            turn.setSelectedIndex(probe.turn() == TurnDirection.LEFT ? 0 : 1);
            refresh();
        });
        points.setAxle(AxlePosition.FRONT);
        refresh();
    }

    private JPanel controls() {
        ButtonGroup axles = new ButtonGroup();
        axles.add(front);
        axles.add(rear);
        front.setName("linkage.front");
        rear.setName("linkage.rear");
        front.setToolTipText("The front axle's linkage");
        rear.setToolTipText("The rear axle's linkage");
        front.addActionListener(event -> showAxle(AxlePosition.FRONT));
        rear.addActionListener(event -> showAxle(AxlePosition.REAR));
        turn.setName("linkage.turn");
        turn.setToolTipText("Which way the car turns (the same as on the car picture)");
        turn.setSelectedIndex(probe.turn() == TurnDirection.LEFT ? 0 : 1);
        turn.addActionListener(event -> probe.setTurn(turn.getSelectedIndex() == 0 ? TurnDirection.LEFT
                : TurnDirection.RIGHT));
        slider.setName("linkage.slider");
        slider.setValue((int) Math.round(probe.fractionOfLimit() * 100));
        slider.setToolTipText("Lateral acceleration, from driving straight (left end) to the grip limit (right end); "
                + "the same slider as on the car picture");
        slider.getAccessibleContext().setAccessibleName("Lateral acceleration, share of the grip limit");
        slider.addChangeListener(event -> probe.setFractionOfLimit(slider.getValue() / 100.0));
        JLabel label = new JLabel("Lateral acceleration:");
        label.setLabelFor(slider);
        JPanel axleRow = new JPanel(new FlowLayout(FlowLayout.LEADING, 6, 0));
        axleRow.add(front);
        axleRow.add(rear);
        // the slider on a row of its own with the turn, so that a narrow window or a large text never pushes it
        // out of sight (a row asks for all it holds side by side: three buttons and a choice were too wide at 28 pt)
        JPanel sliderRow = new JPanel(new BorderLayout(6, 0));
        sliderRow.add(label, BorderLayout.WEST);
        sliderRow.add(slider, BorderLayout.CENTER);
        sliderRow.add(turn, BorderLayout.EAST);
        // at a large text the three no longer fit a small screen's tab side by side: the slider goes under
        sliderRow.addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent event) {
                int side = label.getPreferredSize().width + turn.getPreferredSize().width + 6 * line(label) + 12;
                Object wanted = sliderRow.getWidth() >= side ? BorderLayout.CENTER : BorderLayout.SOUTH;
                if (!wanted.equals(((BorderLayout) sliderRow.getLayout()).getConstraints(slider))) {
                    sliderRow.remove(slider);
                    sliderRow.add(slider, wanted);
                    sliderRow.revalidate();
                }
            }
        });
        JPanel controls = new JPanel(new BorderLayout(6, 2));
        controls.add(axleRow, BorderLayout.NORTH);
        controls.add(sliderRow, BorderLayout.CENTER);
        return controls;
    }

    private JPanel footer() {
        JButton png = new JButton("Export PNG\u2026");
        png.setName("linkage.export.png");
        png.setToolTipText("Write this drawing to a PNG file, in the units shown");
        png.addActionListener(event -> export("png"));
        JButton svg = new JButton("Export SVG\u2026");
        svg.setName("linkage.export.svg");
        svg.setToolTipText("Write this drawing to an SVG file, in the units shown");
        svg.addActionListener(event -> export("svg"));
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.TRAILING, 6, 0));
        buttons.add(png);
        buttons.add(svg);
        JPanel footer = new JPanel(new BorderLayout(6, 2));
        // the buttons under the message, not beside it: beside, they made the page too wide for a small screen
        footer.add(message, BorderLayout.NORTH);
        footer.add(buttons, BorderLayout.CENTER);
        WrappingText caution = new WrappingText("Moving a pickup point changes how the car behaves at speed: check "
                + "clearances, bump steer and the maker's data, and have a qualified mechanic check the car.");
        caution.setForeground(Palette.muted());
        neverScrollTo(caution);
        footer.add(caution, BorderLayout.SOUTH);
        return footer;
    }

    private static int line(Component component) {
        return component.getFontMetrics(component.getFont()).getHeight();
    }

    /** A text set by the program must not scroll the page to its caret. */
    private static void neverScrollTo(javax.swing.JTextArea text) {
        if (text.getCaret() instanceof javax.swing.text.DefaultCaret caret) {
            caret.setUpdatePolicy(javax.swing.text.DefaultCaret.NEVER_UPDATE);
        }
    }

    /** The table as tall as its rows (at least one), and some 12 lines of text wide (420 px at the least). */
    private void fitTable() {
        int line = table.getFontMetrics(table.getFont()).getHeight();
        table.setPreferredScrollableViewportSize(new java.awt.Dimension(Math.max(420, 12 * line),
                table.getRowHeight() * Math.max(1, points.getRowCount()) + 2));
        if (split != null) {
            split.setHasPoints(points.getRowCount() > 0); // an axle without a linkage has no points
        }
        table.revalidate();
    }

    /**
     * As wide as the drawing asks (or the page's least width): the slider's row and the words below, at their
     * own widths, made the page wider than a small screen's tab, cutting the drawing on the right.
     */
    @Override
    public java.awt.Dimension getPreferredSize() {
        java.awt.Dimension wanted = super.getPreferredSize();
        java.awt.Insets insets = getInsets();
        return new java.awt.Dimension(Math.min(wanted.width, Math.max(getMinimumSize().width,
                drawing.getPreferredSize().width + insets.left + insets.right + 8)), wanted.height);
    }

    /** Shows an axle's linkage. */
    public void showAxle(AxlePosition axle) {
        (axle == AxlePosition.FRONT ? front : rear).setSelected(true);
        points.setAxle(axle);
        toTop();
        refresh();
    }

    /** Shows the top of the page: the drawing, once its layout is done. */
    private void toTop() {
        javax.swing.SwingUtilities.invokeLater(() -> scroller.getViewport().setViewPosition(new java.awt.Point(0, 0)));
    }

    /** @return the axle shown */
    public AxlePosition axle() {
        return points.axle();
    }

    /** Asks for the drawing of the car as last accepted, at the slider's roll. */
    private void refresh() {
        solveWhileShown.request();
        showProblems();
    }

    private void submit(JsonNode candidate) {
        var document = context.document().lastValid();
        var shown = context.results().shown();
        worker.submit(new LinkageScene.Request(++revision, points.axle(), candidate, document,
                shown == null ? null : shown.result(), probe.turn(), probe.fractionOfLimit()));
    }

    private void arrived(LinkageScene scene) {
        CardLayout layout = (CardLayout) cards.getLayout();
        if (!scene.hasLinkage()) {
            noLinkage.setText(noLinkageWords(scene));
            layout.show(cards, NONE);
        } else {
            layout.show(cards, DRAWING);
        }
        drawing.show(scene);
        sceneNote = scene.note();
        showProblems();
    }

    /** @return what the page says for an axle without a linkage */
    private String noLinkageWords(LinkageScene scene) {
        String axle = scene.axle() == AxlePosition.FRONT ? "front" : "rear";
        UnitSystem units = context.view().units();
        String height = String.format(context.view().locale(), "%." + (units == UnitSystem.US ? 2 : 0) + "f %s",
                Quantity.LENGTH.unit(units).fromSi(scene.typedRollCentreHeight()), Quantity.LENGTH.unit(units).symbol());
        return "The " + axle + " axle has no linkage: the analysis uses its typed roll-centre height, " + height
                + " (the " + (scene.axle() == AxlePosition.FRONT ? "Front" : "Rear") + " axle page), which stays put as "
                + "the body rolls, and camber change is left out.\n\n"
                + "To have the roll centre and the cambers worked out from the pickup points, add a \"linkage\" object "
                + "to the " + axle + " axle in the vehicle file: its type (\"double-wishbone\", \"strut\", "
                + "\"live-axle-panhard\", \"live-axle-watts\", \"trailing-arm\" or \"semi-trailing-arm\") and the "
                + "points of the car's left side measured from the front, in mm. The keys, their ranges and an example "
                + "are in docs/file-format.md, \"Suspension linkages\". Open the file again and the linkage shows here.";
    }

    private void showProblems() {
        List<String> lines = new ArrayList<>();
        String prefix = points.axle().key() + ".";
        for (Problem problem : context.document().problems()) {
            if (problem.path().startsWith(prefix + LinkageKeys.linkage()) || problem.path().equals(points.axle().key())) {
                lines.add(problem.toString());
            }
        }
        if (sceneNote != null) {
            lines.add(sceneNote);
        }
        if (releaseNote != null) {
            lines.add(releaseNote);
        }
        boolean bad = !lines.isEmpty();
        message.setForeground(bad ? Palette.problem() : Palette.muted());
        message.setText(bad ? String.join("\n", lines)
                : "Type a point in the table, or drag a circle on the drawing. Edit > Undo takes a change back.");
        table.repaint();
    }

    private String pointName(Pickup pickup) {
        List<PointKey> keys = points.points();
        String name = pickup.index() < keys.size() ? keys.get(pickup.index()).label() : "Point";
        return name + (pickup.left() ? " (left side)" : " (right side, the mirror of the left)");
    }

    /** A drag: the file's values where it started, and the moved values as a candidate tree. */
    private final class Dragging implements FrontViewDrawing.DragListener {
        @Override
        public void dragged(Pickup pickup, FrontViewPoint pressed, FrontViewPoint now) {
            releaseNote = null;
            ObjectNode candidate = moved(pickup, pressed, now);
            if (candidate != null) {
                submit(candidate);
            }
        }

        @Override
        public void released(Pickup pickup, FrontViewPoint pressed, FrontViewPoint now) {
            ObjectNode candidate = moved(pickup, pressed, now);
            if (candidate == null || candidate.equals(context.document().tree())) {
                refresh();
                return;
            }
            try {
                VehicleLoader.fromTree(candidate);
            } catch (VehicleFileException refused) {
                releaseNote = "Not moved: " + refused.problems().get(0) + ".";
                submit(null);
                showProblems();
                return;
            }
            PointKey key = points.points().get(pickup.index());
            KeyPath base = KeyPath.of(points.axle().key()).child(LinkageKeys.linkage()).child(key.key());
            JsonNode movedValue = base.get(candidate).deepCopy();
            context.document().editAll(tree -> base.set(tree, movedValue), drawing);
            context.document().closeEditStep();
        }
    }

    /**
     * @return the document's tree with the point moved by the mouse's travel, turned into the body's axes as
     *         measured (the right side's points are the left's mirror image), rounded to 1 mm (0.01 in); null
     *         where the pickup names no point of the file
     */
    ObjectNode moved(Pickup pickup, FrontViewPoint pressed, FrontViewPoint now) {
        List<PointKey> keys = points.points();
        if (pickup.index() >= keys.size()) {
            return null;
        }
        PointKey key = keys.get(pickup.index());
        double roll = drawing.scene() == null ? 0 : drawing.scene().roll();
        double dy = now.y() - pressed.y();
        double dz = now.z() - pressed.z();
        double bodyY = Math.cos(roll) * dy + Math.sin(roll) * dz;
        double bodyZ = -Math.sin(roll) * dy + Math.cos(roll) * dz;
        if (!pickup.left()) {
            bodyY = -bodyY;
        }
        ObjectNode tree = context.document().tree().deepCopy();
        if (key.dimensions() == 1) {
            KeyPath path = LinkageKeys.path(points.axle().key(), key, 0);
            return shift(tree, path, bodyZ) ? tree : null;
        }
        boolean y = shift(tree, LinkageKeys.path(points.axle().key(), key, key.yIndex()), bodyY);
        boolean z = shift(tree, LinkageKeys.path(points.axle().key(), key, key.zIndex()), bodyZ);
        return y && z ? tree : null;
    }

    /** Moves the number at a path by a distance (m), rounded to the display unit's drag step. */
    private boolean shift(ObjectNode tree, KeyPath path, double by) {
        JsonNode old = context.document().value(path);
        if (old == null || !old.isNumber()) {
            return false;
        }
        double millimetres = old.doubleValue() + by * 1e3;
        double rounded;
        if (context.view().units() == UnitSystem.US) {
            rounded = Math.round(millimetres / 0.254) * 0.254; // 0.01 in
            rounded = Math.round(rounded * 1e4) / 1e4;
        } else {
            rounded = Math.round(millimetres);
        }
        path.set(tree, rounded == Math.rint(rounded) ? IntNode.valueOf((int) rounded) : DoubleNode.valueOf(rounded));
        return true;
    }

    private void export(String type) {
        Path target = context.dialogs().chooseFileToSave(points.axle().key() + "-linkage." + type, type);
        if (target == null) {
            return;
        }
        String name = target.getFileName().toString();
        if (!name.toLowerCase(Locale.ROOT).endsWith("." + type)) {
            target = target.resolveSibling(name + "." + type);
        }
        try {
            exportTo(target);
        } catch (FileWriteException failed) {
            context.dialogs().showError("Drawing not exported", "The drawing could not be written: "
                    + failed.getMessage() + ".");
        }
    }

    /** Writes the drawing as shown to a PNG or SVG file (by its ending), at the charts' export size. */
    public void exportTo(Path target) throws FileWriteException {
        Font font = drawing.getFont() != null ? drawing.getFont() : new Font(Font.SANS_SERIF, Font.PLAIN, 13);
        // at the export size the screen's text would be small: never under 18 pt
        Font exported = font.deriveFont(Math.max(18f, font.getSize2D()));
        DrawingExport.write(g -> drawing.paintExport(g, exported), target);
    }

    /** @return the drawing (for the window tests and the screenshot tool) */
    FrontViewDrawing drawing() {
        return drawing;
    }

    /** @return the table of points */
    JTable table() {
        return table;
    }

    /** @return the message line under the drawing */
    WrappingText message() {
        return message;
    }

    /** @return the text shown for an axle without a linkage */
    JTextArea noLinkageText() {
        return noLinkage;
    }

    /** @return the number of the newest drawing request (the speed harness waits for its scene) */
    long revision() {
        return revision;
    }

    /** @return true while solves are waiting or running */
    boolean isIdle() {
        return worker.isIdle();
    }

    /** @return the words for a linkage type, as the trade says them */
    static String typeWords(String type) {
        return switch (type) {
            case "double-wishbone" -> "double wishbones";
            case "strut" -> "struts with lower arms";
            case "live-axle-panhard" -> "live axle with a Panhard rod";
            case "live-axle-watts" -> "live axle with a Watt's linkage";
            case "trailing-arm" -> "trailing arms";
            case "semi-trailing-arm" -> "semi-trailing arms";
            default -> type;
        };
    }

    /** Marks a cell whose value the core refuses, with the core's message as its tooltip. */
    private final class ProblemRenderer extends DefaultTableCellRenderer {
        @Override
        public Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                                                       int row, int column) {
            Component cell = super.getTableCellRendererComponent(t, value, selected, focus, row, column);
            KeyPath path = points.path(row, column);
            setHorizontalAlignment(column == 0 ? LEADING : TRAILING);
            var problem = path == null ? java.util.Optional.<Problem>empty() : context.document().problemAt(path);
            if (problem.isPresent()) {
                cell.setForeground(Palette.problem());
                setToolTipText(problem.get().toString());
            } else {
                cell.setForeground(selected ? t.getSelectionForeground() : t.getForeground());
                setToolTipText(path == null ? null : path.toString());
            }
            return cell;
        }
    }
}
