package barwright.ui.panel;

import barwright.report.work.KeyFigure;

import javax.swing.JButton;
import javax.swing.SwingConstants;
import java.awt.Font;
import java.util.function.Consumer;

/** A result figure that opens the working behind it when clicked or pressed with the keyboard. */
final class FigureButton extends JButton {
    private final KeyFigure figure;

    FigureButton(String name, KeyFigure figure, Consumer<KeyFigure> showWork) {
        this.figure = figure;
        setName(name);
        putClientProperty("JButton.buttonType", "borderless");
        setHorizontalAlignment(SwingConstants.RIGHT);
        setMargin(new java.awt.Insets(1, 4, 1, 4));
        setToolTipText(figure == null ? null : "Show how this figure is worked out");
        if (figure != null) {
            addActionListener(event -> showWork.accept(figure));
        } else {
            setFocusable(false);
        }
    }

    /** Sets the figure's text; out-of-date figures are greyed and slanted. */
    void show(String text, boolean stale) {
        if (!text.equals(getText())) {
            setText(text);
        }
        int style = stale ? Font.ITALIC : Font.PLAIN;
        if (getFont().getStyle() != style) {
            setFont(getFont().deriveFont(style));
        }
        setForeground(stale ? Palette.muted() : javax.swing.UIManager.getColor("Label.foreground"));
    }

    KeyFigure figure() {
        return figure;
    }
}
