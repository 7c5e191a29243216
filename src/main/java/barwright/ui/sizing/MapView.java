package barwright.ui.sizing;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.map.BarOption;
import barwright.ui.panel.FigureFormat;
import barwright.ui.panel.WrappingText;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.SwingConstants;
import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.awt.event.FocusAdapter;
import java.awt.event.FocusEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The arm-hole map of the car as it stands: every front hole (rows) against every rear hole (columns), each
 * cell with its front share, roll gradient, limit and balance and any inside wheel lifting before the limit,
 * tinted so it reads at a glance, the car's setting framed. Worked out again off the event thread after every
 * accepted edit. A chosen cell's holes can be put in the car (one undo step). Event thread.
 */
final class MapView extends JPanel {
    private final SizingContext context;
    private final FigureFormat format;
    private final Exports exports;
    private final JPanel grid = new JPanel(new GridBagLayout());
    private final QuantityField reference;
    private final WrappingText legend = new WrappingText(" ");
    private final MapKey key = new MapKey();
    private final JScrollPane scroll;
    private final JButton useHoles = new JButton("Use the chosen holes");
    private final WorkStrip work = new WorkStrip("map");
    private final List<MapCellView> cells = new ArrayList<>();
    private final JComboBox<String> centre = new JComboBox<>(new String[]{"the car's setting now",
        "the static front weight + 5 points", "a front share of"});
    private AdjustmentMap shown;
    private MapCellView chosen;

    MapView(SizingContext context, Exports exports) {
        super(new BorderLayout());
        setName("map.view");
        this.context = context;
        this.exports = exports;
        this.format = new FigureFormat(context.view());
        reference = new QuantityField("map.reference", "Tint centred on a front share of", Quantity.SHARE,
                context.view(), 0.01, 0.99, 0.5, false);
        reference.setToolTipText("Cells above this front share are tinted in the front axle's colour (towards "
                + "understeer), below it in the rear axle's (towards oversteer)");
        reference.addActionListener(event -> referenceChanged());
        reference.addFocusListener(new FocusAdapter() {
            @Override
            public void focusLost(FocusEvent event) {
                referenceChanged();
            }
        });
        centre.setName("map.centre");
        centre.setToolTipText("The static front weight + 5 points is a rule of thumb for a slight understeer (from "
                + "memory of Milliken & Milliken, Race Car Vehicle Dynamics)");
        centre.addActionListener(event -> referenceChanged());
        useHoles.setName("map.useHoles");
        useHoles.setToolTipText("Moves both bars' links to the chosen cell's holes; Edit > Undo takes it back");
        useHoles.addActionListener(event -> useChosen());
        JButton csv = new JButton("Map as CSV…");
        csv.setName("map.csv");
        csv.setToolTipText("Saves every front hole against every rear hole as a table for a spreadsheet");
        csv.addActionListener(event -> exports.mapCsv(message -> work.say(message, false)));
        JButton sheet = new JButton("Setup sheet as PDF…");
        sheet.setName("map.sheet");
        sheet.setToolTipText("Writes the setup sheet of the car as it stands, with this map, to take to the track");
        sheet.addActionListener(event -> exports.setupSheet(message -> work.say(message, false)));
        exports.useReference(this::sheetReference);
        reference.setVisible(false);
        reference.unitLabel().setVisible(false);

        JPanel top = new JPanel(new WrappingFlow(6, 2)); // one line at 1024 px with the largest text
        JLabel tintLabel = new JLabel("Tint centred on");
        tintLabel.setToolTipText("Each cell is tinted by how far its front share of load transfer lies from this");
        top.add(tintLabel);
        top.add(centre);
        top.add(reference);
        top.add(reference.unitLabel());
        JPanel buttons = new JPanel(new WrappingFlow(6, 2)); // one row where the width allows
        buttons.add(useHoles);
        buttons.add(csv);
        buttons.add(sheet);
        legend.setName("map.legend");
        // new words show from their start: setting them moves no scroll pane to their end
        ((javax.swing.text.DefaultCaret) legend.getCaret()).setUpdatePolicy(javax.swing.text.DefaultCaret.NEVER_UPDATE);
        legend.setBorder(BorderFactory.createEmptyBorder(2, 8, 2, 8));
        key.setBorder(BorderFactory.createEmptyBorder(0, 4, 0, 4));
        JPanel north = new JPanel(new BorderLayout());
        north.add(top, BorderLayout.NORTH);
        north.add(key, BorderLayout.CENTER);
        JScrollPane explanation = SearchView.capped(legend, this, 22); // scrolls: the map keeps its room
        north.add(explanation, BorderLayout.SOUTH);
        key.explains(explanation);
        addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent event) {
                key.fitTo(getHeight());
            }
        });
        JPanel under = new JPanel(new BorderLayout());
        under.add(buttons, BorderLayout.CENTER);
        under.add(work, BorderLayout.SOUTH);
        grid.setName("map.grid");
        grid.setBorder(BorderFactory.createEmptyBorder(2, 4, 2, 4));
        JPanel holder = new JPanel(new BorderLayout());
        holder.add(grid, BorderLayout.NORTH);
        scroll = new JScrollPane(holder);
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        scroll.getHorizontalScrollBar().setUnitIncrement(16);
        scroll.setName("map.scroll");
        add(north, BorderLayout.NORTH);
        add(scroll, BorderLayout.CENTER);
        add(under, BorderLayout.SOUTH);
        WhileShown updates = new WhileShown(this, this::carChanged);
        context.document().addListener(event -> {
            refreshUseHoles(); // at once: a map for an older car never moves the links of this one
            updates.request();
        });
        context.view().addListener(this::redraw);
        updates.request();
    }

    /** Works the map out again for the car as it stands. */
    private void carChanged() {
        Vehicle vehicle;
        try {
            vehicle = context.currentCar().vehicle();
        } catch (IllegalStateException refused) {
            work.say("The map is for the car before the last change: " + refused.getMessage() + ".", true);
            return;
        }
        work.run("Working out the map", "hole pairs", "The map could not be worked out",
                progress -> AdjustmentMap.of(vehicle, List.of(new AdjustmentMap.LabelledBar("current",
                        vehicle.front().bar())), List.of(new AdjustmentMap.LabelledBar("current", vehicle.rear().bar())),
                        progress), this::show);
    }

    private void referenceChanged() {
        reference.setVisible(centre.getSelectedIndex() == 2);
        reference.unitLabel().setVisible(reference.isVisible());
        try {
            referenceShare();
            work.say(" ", false);
        } catch (IllegalArgumentException refused) {
            work.say(refused.getMessage(), true);
            return;
        }
        redraw();
    }

    /**
     * @return the front share the tint is centred on: the current cell's, the rule of thumb's, or the one typed
     * @throws IllegalArgumentException where the one typed is not a share
     */
    double referenceShare() {
        if (centre.getSelectedIndex() == 2) {
            return reference.value();
        }
        if (shown == null) {
            return Double.NaN;
        }
        if (centre.getSelectedIndex() == 0) {
            for (var cell : shown.cells()) {
                if (cell.current() && cell.figures() != null) {
                    return cell.figures().frontLoadTransferShare();
                }
            }
        }
        return Exports.ruleOfThumb(shown.vehicle());
    }

    /** @return the reference in words for the legend */
    private String referenceWords(double share) {
        return format.text(share, Quantity.SHARE) + switch (centre.getSelectedIndex()) {
            case 0 -> ", the car's setting now";
            case 1 -> ", the static front weight + 5 points";
            default -> "";
        };
    }

    /**
     * @return the reference the setup sheet's map is tinted around: a share typed here (a target), else the rule of
     *     thumb that the sheet's legend names
     */
    private double sheetReference() {
        try {
            if (centre.getSelectedIndex() == 2) {
                return reference.value();
            }
        } catch (IllegalArgumentException unreadable) {
            // the sheet falls back on the rule of thumb
        }
        return Exports.ruleOfThumb(context.currentCar().vehicle());
    }

    private void show(AdjustmentMap map) {
        int[] kept = chosen == null ? null : new int[]{chosen.cell().front().hole(), chosen.cell().rear().hole()};
        shown = map;
        chosen = null;
        cells.clear();
        grid.removeAll();
        JLabel corner = header("<html>rows: <b>front</b><br>columns: <b>rear</b></html>");
        corner.setToolTipText("Each row is a front arm hole, each column a rear one; each cell the car with that pair");
        grid.add(corner, at(0, 0));
        for (int c = 0; c < map.columns().size(); c++) {
            grid.add(optionHeader(AxlePosition.REAR, map.columns().get(c)), at(c + 1, 0));
        }
        for (int r = 0; r < map.rows().size(); r++) {
            grid.add(optionHeader(AxlePosition.FRONT, map.rows().get(r)), at(0, r + 1));
            for (int c = 0; c < map.columns().size(); c++) {
                MapCellView cell = new MapCellView(map.cell(r, c), r, c);
                cell.addMouseListener(new MouseAdapter() {
                    @Override
                    public void mousePressed(MouseEvent event) {
                        choose(cell);
                    }
                });
                cells.add(cell);
                GridBagConstraints at = at(c + 1, r + 1);
                at.fill = GridBagConstraints.BOTH;
                grid.add(cell, at);
                if (kept != null && kept[0] == cell.cell().front().hole() && kept[1] == cell.cell().rear().hole()) {
                    chosen = cell;
                    cell.setSelected(true);
                }
            }
        }
        redraw();
        grid.revalidate();
        grid.repaint();
    }

    private void redraw() {
        if (shown == null) {
            return;
        }
        double centreShare;
        try {
            centreShare = referenceShare();
        } catch (IllegalArgumentException unreadable) {
            centreShare = Exports.ruleOfThumb(shown.vehicle());
        }
        int widest = 0;
        for (MapCellView cell : cells) {
            cell.show(format, centreShare);
            cell.setPreferredSize(null);
            widest = Math.max(widest, cell.getPreferredSize().width);
        }
        for (MapCellView cell : cells) { // one width for every column, so the grid reads as a table
            cell.setPreferredSize(new Dimension(widest, cell.getPreferredSize().height));
        }
        for (Component header : grid.getComponents()) {
            if (header instanceof JLabel label && label.getClientProperty(BarOption.class) instanceof Object[] key) {
                label.setText(optionWords((AxlePosition) key[0], (BarOption) key[1]));
            }
        }
        key.show(format.text(centreShare, Quantity.SHARE));
        legend.setText("Tint: the front axle's colour where the front share of load transfer is above "
                + referenceWords(centreShare) + ", towards understeer; the rear axle's where it is below, towards "
                + "oversteer; fuller the further it lies (full at 5 points). Red dashes and red text: an inside wheel "
                + "lifts before the limit. Heavy frame and \"now\": the car's setting. Holes count from 1, the first "
                + "arm length in the file. Click a cell to choose its holes.");
        refreshUseHoles();
    }

    private void refreshUseHoles() {
        useHoles.setEnabled(chosen != null && !chosen.cell().current() && forCarAsItStands());
    }

    /** @return true where the map shown was worked out for the open car as it stands */
    private boolean forCarAsItStands() {
        return shown != null && context.document().isValid()
                && context.document().lastValid().vehicle().equals(shown.vehicle());
    }

    /**
     * @return a row's (front) header on two or three short lines, a column's (rear) on two: "rear hole 2 (in use)"
     *     over its arm length, so that the headers take little of the map's room at a large text size
     */
    private String optionWords(AxlePosition axle, BarOption option) {
        if (option.bar() == null) {
            return "<html><b>no " + axle.key() + " bar</b></html>";
        }
        String arm = Double.isNaN(option.armLength()) ? "" : "<br>arm " + format.text(option.armLength(), Quantity.LENGTH);
        String inUse = option.current() ? (axle == AxlePosition.FRONT ? "<br>(in use)" : " (in use)") : "";
        return axle == AxlePosition.FRONT
                ? "<html><b>" + axle.key() + " hole " + (option.hole() + 1) + "</b>" + arm + inUse + "</html>"
                : "<html><b>" + axle.key() + " hole " + (option.hole() + 1) + "</b>" + inUse + arm + "</html>";
    }

    private JLabel optionHeader(AxlePosition axle, BarOption option) {
        JLabel label = header(optionWords(axle, option));
        label.putClientProperty(BarOption.class, new Object[]{axle, option});
        return label;
    }

    private JLabel header(String text) {
        JLabel label = new JLabel(text, SwingConstants.CENTER);
        label.setBorder(BorderFactory.createEmptyBorder(1, 4, 1, 4));
        return label;
    }

    private void choose(MapCellView cell) {
        if (chosen != null) {
            chosen.setSelected(false);
        }
        chosen = cell;
        cell.setSelected(true);
        refreshUseHoles();
        cell.requestFocusInWindow();
    }

    private void useChosen() {
        if (chosen == null || chosen.cell().current()) {
            return;
        }
        if (!forCarAsItStands()) {
            useHoles.setEnabled(false);
            work.say("This map is for the car before the last change: wait for it to be worked out again.", true);
            return;
        }
        Map<AxlePosition, Integer> holes = new EnumMap<>(AxlePosition.class);
        if (chosen.cell().front().bar() != null) {
            holes.put(AxlePosition.FRONT, chosen.cell().front().hole());
        }
        if (chosen.cell().rear().bar() != null) {
            holes.put(AxlePosition.REAR, chosen.cell().rear().hole());
        }
        BarEdits.putHoles(context.document(), holes, this);
        work.say("Links moved to front hole " + (chosen.cell().front().hole() + 1) + ", rear hole "
                + (chosen.cell().rear().hole() + 1) + ". Edit > Undo (Ctrl+Z) in the main window takes it back.", false);
    }

    private static GridBagConstraints at(int x, int y) {
        GridBagConstraints at = new GridBagConstraints();
        at.gridx = x;
        at.gridy = y;
        at.weightx = x == 0 ? 0 : 1;
        at.fill = GridBagConstraints.BOTH;
        at.insets = new Insets(2, 2, 2, 2);
        return at;
    }

    List<MapCellView> cells() {
        return List.copyOf(cells);
    }

    AdjustmentMap shown() {
        return shown;
    }

    WorkStrip work() {
        return work;
    }
}
