package barwright.ui.sizing;

import barwright.model.AxlePosition;
import barwright.sizing.BarFigures;
import barwright.sizing.SetupFigures;
import barwright.sizing.map.MapCell;
import barwright.ui.chart.ChartStyle;
import barwright.ui.panel.FigureFormat;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.BoxLayout;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.UIManager;
import javax.swing.border.Border;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;

/**
 * One cell of the arm-hole map: the front share in large type, the roll gradient, the limit and balance, and in
 * red which inside wheel lifts before the limit; tinted by the front share, framed heavily where it is the
 * car's setting. Event thread.
 */
final class MapCellView extends JPanel {
    private final MapCell cell;
    private final JLabel share = new JLabel();
    private final JLabel tag = new JLabel();
    private final JLabel roll = new JLabel();
    private final JLabel limit = new JLabel();
    private final JLabel lift = new JLabel();
    private boolean selected;

    MapCellView(MapCell cell, int row, int column) {
        super(null);
        // lines at their own heights (a grid of equal rows gave each the large first line's height)
        setLayout(new BoxLayout(this, BoxLayout.Y_AXIS));
        this.cell = cell;
        setName("map.cell." + row + "." + column);
        share.setName(getName() + ".share");
        share.setFont(share.getFont().deriveFont(Font.BOLD, share.getFont().getSize2D() * 1.25f));
        tag.setName(getName() + ".tag");
        tag.setFont(tag.getFont().deriveFont(Font.BOLD));
        JPanel top = new JPanel(new java.awt.BorderLayout(6, 0));
        top.setOpaque(false);
        top.add(share, java.awt.BorderLayout.WEST);
        top.add(tag, java.awt.BorderLayout.EAST);
        for (JComponent line : new JComponent[]{top, roll, limit, lift}) {
            line.setAlignmentX(LEFT_ALIGNMENT);
            add(line);
        }
        setFocusable(true);
    }

    /** Writes the figures in the units chosen and tints the cell around the reference share. */
    void show(FigureFormat format, double referenceShare) {
        SetupFigures figures = cell.figures();
        Color text = UIManager.getColor("Label.foreground");
        for (JLabel label : new JLabel[]{share, tag, roll, limit}) {
            label.setForeground(text);
        }
        lift.setForeground(MapColours.lift());
        if (figures == null) {
            setBackground(MapColours.mix(MapColours.background(), Color.GRAY, 0.3));
            share.setText("no stable roll");
            roll.setText("");
            limit.setText("");
            lift.setText("");
            lift.setVisible(false);
            setToolTipText(cell.problem());
        } else {
            setBackground(MapColours.tint(figures.frontLoadTransferShare() - referenceShare));
            share.setText(format.text(figures.frontLoadTransferShare(), Quantity.SHARE) + " front");
            tag.setText(cell.current() ? "now" : "");
            tag.setToolTipText(cell.current() ? "The car's setting now" : null);
            roll.setText("roll " + format.text(figures.rollGradient(), Quantity.ROLL_GRADIENT));
            limit.setText("limit " + format.text(figures.limit(), Quantity.ACCELERATION) + ", "
                    + figures.balance().key());
            lift.setText(liftWords(format, figures));
            lift.setVisible(!lift.getText().isBlank()); // no empty line where no wheel lifts
            setToolTipText(details(format, figures));
        }
        frame();
    }

    private static String liftWords(FigureFormat format, SetupFigures figures) {
        List<String> parts = new ArrayList<>();
        for (AxlePosition axle : AxlePosition.values()) {
            if (figures.liftsBeforeLimit(axle)) {
                parts.add("inside " + axle.key() + " lifts at " + format.lift(figures.insideLift(axle)));
            }
        }
        return parts.isEmpty() ? " " : String.join("; ", parts);
    }

    private String details(FigureFormat format, SetupFigures figures) {
        StringBuilder html = new StringBuilder("<html><b>").append(cell.front().bar() == null ? "no front bar"
                : "front hole " + (cell.front().hole() + 1)).append(", ")
                .append(cell.rear().bar() == null ? "no rear bar" : "rear hole " + (cell.rear().hole() + 1))
                .append(cell.current() ? " (the car's setting)" : "").append("</b><br>");
        html.append("front share of load transfer ").append(format.text(figures.frontLoadTransferShare(),
                Quantity.SHARE)).append("<br>roll gradient ").append(format.text(figures.rollGradient(),
                Quantity.ROLL_GRADIENT)).append("<br>limit ").append(format.text(figures.limit(),
                Quantity.ACCELERATION)).append(", ").append(figures.balance().key());
        for (AxlePosition axle : AxlePosition.values()) {
            html.append("<br>inside ").append(axle.key()).append(" wheel lifts: ")
                    .append(format.lift(figures.insideLift(axle)))
                    .append(figures.liftsBeforeLimit(axle) ? " (before the limit)" : "");
            BarFigures bar = figures.bar(axle);
            if (bar != null) {
                html.append("<br>").append(axle.key()).append(" bar safety factor ").append(format.factor(
                        bar.safetyFactor()));
            }
        }
        return html.append("<br>Click to choose these holes.</html>").toString();
    }

    void setSelected(boolean chosen) {
        selected = chosen;
        frame();
    }

    private void frame() {
        Color line = ChartStyle.text();
        Border outer = cell.current() ? BorderFactory.createLineBorder(line, 3)
                : BorderFactory.createLineBorder(MapColours.mix(MapColours.background(), line, 0.35), 1);
        Border mark = selected ? BorderFactory.createLineBorder(focus(), 3)
                : cell.figures() != null && (cell.figures().frontLiftsBeforeLimit() || cell.figures().rearLiftsBeforeLimit())
                ? BorderFactory.createCompoundBorder(BorderFactory.createEmptyBorder(1, 1, 1, 1),
                BorderFactory.createDashedBorder(MapColours.lift(), 1.5f, 4, 3, false))
                : BorderFactory.createEmptyBorder(3, 3, 3, 3);
        int pad = cell.current() ? 1 : 3;
        setBorder(BorderFactory.createCompoundBorder(outer, BorderFactory.createCompoundBorder(mark,
                BorderFactory.createEmptyBorder(pad, pad + 2, pad, pad))));
    }

    private static Color focus() {
        Color colour = UIManager.getColor("Component.focusColor");
        return colour != null ? colour : new Color(0x2675BF);
    }

    MapCell cell() {
        return cell;
    }

    boolean isSelected() {
        return selected;
    }

    /** @return the cell's first line, e.g. "46.7 % front now" for the car's setting */
    String shareText() {
        return tag.getText().isEmpty() ? share.getText() : share.getText() + " " + tag.getText();
    }
}
