package barwright.ui.dynamics;

import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;
import javax.swing.JSpinner;
import javax.swing.SpinnerNumberModel;
import java.awt.FlowLayout;
import java.util.function.DoubleConsumer;

/**
 * A number set by a slider or a spinner, kept in step: the arrow keys move either, the mouse wheel over either
 * steps it, and each change is told once. Event thread.
 */
final class SliderSpinner extends JPanel {
    private final JSlider slider;
    private final JSpinner spinner;
    private final double step;
    private boolean syncing;

    /**
     * @param label    the words before it, with the unit
     * @param min      least value
     * @param max      greatest value
     * @param step     one step of the arrow keys or the wheel
     * @param value    the value to start from
     * @param onChange told each new value
     */
    SliderSpinner(String name, String label, double min, double max, double step, double value,
                  DoubleConsumer onChange) {
        super(new FlowLayout(FlowLayout.LEADING, 4, 0));
        this.step = step;
        setAlignmentX(LEFT_ALIGNMENT);
        slider = new JSlider((int) Math.round(min / step), (int) Math.round(max / step),
                (int) Math.round(value / step));
        slider.setName(name + ".slider");
        slider.setPreferredSize(new java.awt.Dimension(160, slider.getPreferredSize().height));
        spinner = new JSpinner(new SpinnerNumberModel(value, min, max, step));
        spinner.setName(name + ".spinner");
        ((JSpinner.NumberEditor) spinner.getEditor()).getFormat().setMinimumFractionDigits(2);
        JLabel words = new JLabel(label);
        words.setLabelFor(spinner);
        slider.addChangeListener(event -> {
            if (!syncing) {
                syncing = true;
                spinner.setValue(slider.getValue() * step);
                syncing = false;
                onChange.accept(value());
            }
        });
        spinner.addChangeListener(event -> {
            if (!syncing) {
                syncing = true;
                slider.setValue((int) Math.round(((Number) spinner.getValue()).doubleValue() / step));
                syncing = false;
                onChange.accept(value());
            }
        });
        // the wheel steps the number (up is more), as the arrow keys do
        slider.addMouseWheelListener(event -> slider.setValue(slider.getValue() - event.getWheelRotation()));
        spinner.addMouseWheelListener(event -> slider.setValue(slider.getValue() - event.getWheelRotation()));
        add(words);
        add(slider);
        add(spinner);
    }

    /** @return the value as shown */
    double value() {
        return ((Number) spinner.getValue()).doubleValue();
    }

    /** Sets the value as a person would (the change is told). */
    void set(double value) {
        spinner.setValue(Math.max(slider.getMinimum() * step, Math.min(slider.getMaximum() * step, value)));
    }

    JSlider slider() {
        return slider;
    }
}
