package barwright.ui.panel;

import barwright.io.Problem;
import barwright.ui.document.DocumentEvent;
import barwright.io.KeyPath;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.FieldSpec;
import barwright.ui.field.NumberText;
import barwright.ui.field.Precision;
import barwright.ui.field.ViewSettings;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.IntNode;
import com.fasterxml.jackson.databind.node.LongNode;
import com.fasterxml.jackson.databind.node.TextNode;

import barwright.ui.field.Steps;

import javax.swing.AbstractAction;
import javax.swing.JLabel;
import javax.swing.KeyStroke;
import javax.swing.JTextField;
import javax.swing.SwingConstants;
import javax.swing.event.DocumentListener;
import java.awt.event.FocusAdapter;
import java.awt.event.FocusEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Consumer;
import javax.swing.SwingUtilities;

/**
 * A text field bound to one number of the open document by its key path, in the display unit of the chosen
 * system and the user's locale. A value typed key by key is applied when it is complete: on Enter, when the
 * focus leaves, or after a pause of {@link #TYPING_PAUSE_MS} (so typing 2000 never shows a 200 mm bar as the
 * car); a paste, an arrow-key or wheel step, or text set by the program is applied at once. Text that is not
 * a number is handed to the core as it stands, so the core's message (key, value, allowed range) marks it.
 */
public final class NumberField extends JTextField {
    private final OpenDocument document;
    private final ViewSettings view;
    private final KeyPath path;
    private final FieldSpec spec;
    private final JLabel unitLabel = new JLabel();
    private final WrappingText problemLabel = new WrappingText("");
    private final Consumer<DocumentEvent> documentListener = this::documentChanged;
    private final Runnable viewListener = this::reload;
    private boolean reloading;
    private boolean editPending;
    private Object typingSession = new Object();
    /** A pause this long after the last key ends the typing of a value (ms): a slow typist's gap between keys. */
    public static final int TYPING_PAUSE_MS = 700;
    /** How many fields hold typed text not yet applied, for the window tests (event thread only). */
    private static int pendingFields;
    private final javax.swing.Timer typingPause = new javax.swing.Timer(TYPING_PAUSE_MS, event -> applyTyped());
    private boolean fromKeyboard;
    private boolean typedPending;

    public NumberField(OpenDocument document, ViewSettings view, KeyPath path, FieldSpec spec) {
        super(8);
        this.document = document;
        this.view = view;
        this.path = path;
        this.spec = spec;
        setName(path.toString());
        setHorizontalAlignment(SwingConstants.RIGHT);
        getAccessibleContext().setAccessibleName(spec.label());
        problemLabel.setName(path + ".problem");
        unitLabel.setName(path + ".unit");
        problemLabel.setVisible(false);
        getDocument().addDocumentListener(onChange(this::textChanged));
        typingPause.setRepeats(false);
        // key listeners hear a key before its binding changes the text: the change that follows is typed
        addKeyListener(new java.awt.event.KeyAdapter() {
            @Override
            public void keyTyped(java.awt.event.KeyEvent event) {
                keyboardChange();
            }

            @Override
            public void keyPressed(java.awt.event.KeyEvent event) {
                int code = event.getKeyCode();
                if (code == KeyEvent.VK_BACK_SPACE || code == KeyEvent.VK_DELETE) {
                    keyboardChange();
                }
                if (code == KeyEvent.VK_ENTER) {
                    applyTyped();
                }
            }
        });
        addFocusListener(new FocusAdapter() {
            @Override
            public void focusGained(FocusEvent event) {
                typingSession = new Object();
            }

            @Override
            public void focusLost(FocusEvent event) {
                applyTyped();
                document.closeEditStep();
                typingSession = new Object();
                if (document.problemAt(path).isEmpty()) {
                    reload();
                }
            }
        });
        document.addListener(documentListener);
        view.addListener(viewListener);
        stepWith(KeyEvent.VK_UP, 0, 1);
        stepWith(KeyEvent.VK_DOWN, 0, -1);
        stepWith(KeyEvent.VK_UP, InputEvent.SHIFT_DOWN_MASK, 10);
        stepWith(KeyEvent.VK_DOWN, InputEvent.SHIFT_DOWN_MASK, -10);
        // the wheel steps only the field being edited, so that scrolling the page never changes a value
        addMouseWheelListener(event -> {
            if (isFocusOwner() && event.getWheelRotation() != 0) {
                step(-event.getWheelRotation() * (event.isShiftDown() ? 10 : 1));
                event.consume();
            } else {
                getParent().dispatchEvent(SwingUtilities.convertMouseEvent(this, event, getParent()));
            }
        });
        reload();
    }

    private void stepWith(int key, int modifiers, int steps) {
        String name = "step" + steps;
        getInputMap(WHEN_FOCUSED).put(KeyStroke.getKeyStroke(key, modifiers), name);
        getActionMap().put(name, new AbstractAction() {
            @Override
            public void actionPerformed(java.awt.event.ActionEvent event) {
                step(steps);
            }
        });
    }

    /** Moves the shown value by whole steps of its quantity (Steps); an empty or refused text is left alone. */
    void step(int steps) {
        OptionalDouble number = NumberText.parse(getText(), view.locale());
        if (number.isEmpty()) {
            return;
        }
        double moved = Steps.move(number.getAsDouble(), Steps.of(spec.quantity(), view.units()), steps);
        setText(NumberText.format(moved, Precision.field(spec.quantity(), view.units()), view.locale()));
    }

    /** @return a listener that runs the action on any change of a text document */
    static DocumentListener onChange(Runnable action) {
        return new DocumentListener() {
            @Override
            public void insertUpdate(javax.swing.event.DocumentEvent event) {
                action.run();
            }

            @Override
            public void removeUpdate(javax.swing.event.DocumentEvent event) {
                action.run();
            }

            @Override
            public void changedUpdate(javax.swing.event.DocumentEvent event) {
                action.run();
            }
        };
    }

    public KeyPath path() {
        return path;
    }

    public FieldSpec spec() {
        return spec;
    }

    /** @return the unit shown beside the field */
    public JLabel unitLabel() {
        return unitLabel;
    }

    /** @return the line under the field that shows the core's message while the value is refused */
    public WrappingText problemLabel() {
        return problemLabel;
    }

    /** Stops listening to the document and the view settings (the field is being thrown away). */
    public void detach() {
        if (typedPending) {
            typingPause.stop();
            typedPending = false;
            pendingFields--;
        }
        document.removeListener(documentListener);
        view.removeListener(viewListener);
    }

    /**
     * A change of the text becomes one edit at the end of the current event, so that a paste or a
     * replacement (which Swing reports as a removal and an insertion) is one edit, not two.
     */
    private void textChanged() {
        if (reloading) {
            return;
        }
        if (fromKeyboard) {
            if (!typedPending) {
                typedPending = true;
                pendingFields++;
            }
            typingPause.restart();
            return;
        }
        if (editPending) {
            return;
        }
        editPending = true;
        SwingUtilities.invokeLater(() -> {
            editPending = false;
            typed();
        });
    }

    /**
     * Marks the text changes of the key being handled as typed (a key over a selection changes the text
     * twice: a removal and an insertion); the mark ends with the key's event.
     */
    private void keyboardChange() {
        fromKeyboard = true;
        SwingUtilities.invokeLater(() -> fromKeyboard = false);
    }

    /** Applies text typed key by key, if any is waiting (Enter, focus leaving, or the pause). */
    private void applyTyped() {
        typingPause.stop();
        if (typedPending) {
            typedPending = false;
            pendingFields--;
            typed();
        }
    }

    /** @return whether any field holds typed text not yet applied (for the window tests; event thread only) */
    public static boolean anyTypingPending() {
        return pendingFields > 0;
    }

    private void typed() {
        String text = getText();
        JsonNode value;
        OptionalDouble number = NumberText.parse(text, view.locale());
        if (text.isBlank()) {
            value = null; // the core says whether the key may be left out
        } else if (number.isPresent()) {
            value = fileNumber(spec.toFile(number.getAsDouble(), view.units()));
        } else {
            value = TextNode.valueOf(text.strip());
        }
        document.edit(path, value, typingSession, this);
    }

    /** A whole number is written as the file reader reads one (an int), so that typing back a value undoes dirt. */
    private static JsonNode fileNumber(double value) {
        if (value == Math.rint(value) && Math.abs(value) <= Integer.MAX_VALUE) {
            return IntNode.valueOf((int) value);
        }
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? LongNode.valueOf((long) value)
                : DoubleNode.valueOf(value);
    }

    private void documentChanged(DocumentEvent event) {
        if (event.source() != this) {
            reload();
        } else {
            showProblem();
        }
    }

    /** Shows the document's value in the display unit, unless the person is typing this very value. */
    void reload() {
        unitLabel.setText(spec.unitSymbol(view.units()));
        JsonNode node = document.value(path);
        String text;
        if (node == null || node.isNull()) {
            text = "";
        } else if (node.isNumber()) {
            text = NumberText.format(spec.toDisplay(node.doubleValue(), view.units()),
                    Precision.field(spec.quantity(), view.units()), view.locale());
        } else {
            text = node.isTextual() ? node.textValue() : node.toString();
        }
        if (!text.equals(getText())) {
            reloading = true;
            try {
                setText(text);
            } finally {
                reloading = false;
            }
        }
        showProblem();
    }

    private void showProblem() {
        Optional<Problem> problem = document.problemAt(path);
        putClientProperty("JComponent.outline", problem.isPresent() ? "error" : null);
        problemLabel.setForeground(Palette.problem());
        problemLabel.setText(problem.map(Problem::toString).orElse(""));
        problemLabel.setVisible(problem.isPresent());
        setToolTipText(Tooltips.field(spec.label(), spec.unitSymbol(view.units()), spec.help(), path.toString(),
                problem.map(Problem::toString).orElse(null)));
    }
}
