package barwright.ui.workshop;

import barwright.units.DisplayUnit;

import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import java.util.Locale;
import java.util.function.Supplier;

/**
 * One reading typed on a workshop page, in the unit the view shows (kg or lb, mm or in). The page works its
 * result out again at every change: the sums are closed forms of microseconds, so the event thread is not
 * held up.
 */
final class ReadingField extends JTextField {
    private final String what;
    private final Supplier<DisplayUnit> unit;
    /** The unit the text is in now: after a unit switch the typed value is converted, not reinterpreted. */
    private DisplayUnit typedIn;

    /**
     * @param what how a message names the reading, e.g. "the left front scale"
     * @param unit the unit the reading is typed in (follows the view's units)
     */
    ReadingField(String name, String what, Supplier<DisplayUnit> unit, Runnable changed) {
        super(8);
        setName(name);
        this.what = what;
        this.unit = unit;
        this.typedIn = unit.get();
        setHorizontalAlignment(RIGHT);
        getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent event) {
                changed.run();
            }

            @Override
            public void removeUpdate(DocumentEvent event) {
                changed.run();
            }

            @Override
            public void changedUpdate(DocumentEvent event) {
                changed.run();
            }
        });
    }

    boolean isBlank() {
        return getText().isBlank();
    }

    /** @return the reading in SI units */
    double si() throws ReadingException {
        return typedIn.toSi(plain());
    }

    /** @return the number as typed, for readings with no unit (a share, a count) */
    double plain() throws ReadingException {
        String text = getText().strip().replace(',', '.');
        if (text.isEmpty()) {
            throw new ReadingException("Type " + what + ".");
        }
        try {
            double value = Double.parseDouble(text);
            if (Double.isFinite(value)) {
                return value;
            }
        } catch (NumberFormatException notANumber) {
            // said below
        }
        throw new ReadingException(String.format(Locale.ROOT, "%s: \"%s\" is not a number.",
                Character.toUpperCase(what.charAt(0)) + what.substring(1), getText().strip()));
    }

    /** Shows an SI value in the view's unit. */
    void showSi(double si, int decimals) {
        typedIn = unit.get();
        setText(String.format(Locale.ROOT, "%." + decimals + "f", typedIn.fromSi(si)));
    }

    /** After the SI/US switch: the reading typed stays the same quantity, shown in the new unit. */
    void unitsChanged(int decimals) {
        DisplayUnit now = unit.get();
        if (now.equals(typedIn)) {
            return;
        }
        try {
            double si = typedIn.toSi(plain());
            typedIn = now;
            setText(String.format(Locale.ROOT, "%." + decimals + "f", now.fromSi(si)));
        } catch (ReadingException blankOrNotANumber) {
            typedIn = now; // nothing to convert
        }
    }

    /** A reading that cannot be used, in words that name it. */
    static final class ReadingException extends Exception {
        private static final long serialVersionUID = 1L;

        ReadingException(String message) {
            super(message);
        }
    }
}
