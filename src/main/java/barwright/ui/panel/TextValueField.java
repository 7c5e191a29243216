package barwright.ui.panel;

import barwright.ui.document.DocumentEvent;
import barwright.io.KeyPath;
import barwright.ui.document.OpenDocument;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.TextNode;

import javax.swing.JTextField;
import java.awt.event.FocusAdapter;
import java.awt.event.FocusEvent;
import java.util.function.Consumer;

/** A text field bound to a text of the open document (the car's name, its notes, a material's name). */
final class TextValueField extends JTextField {
    private final OpenDocument document;
    private final KeyPath path;
    private final Consumer<DocumentEvent> listener = this::documentChanged;
    private boolean reloading;
    private Object typingSession = new Object();

    TextValueField(OpenDocument document, KeyPath path, String help) {
        super(16);
        this.document = document;
        this.path = path;
        setName(path.toString());
        setToolTipText(Tooltips.wrap(help, 300));
        getDocument().addDocumentListener(NumberField.onChange(this::typed));
        addFocusListener(new FocusAdapter() {
            @Override
            public void focusLost(FocusEvent event) {
                document.closeEditStep();
                typingSession = new Object();
            }
        });
        document.addListener(listener);
        reload();
    }

    private void typed() {
        if (!reloading) {
            document.edit(path, TextNode.valueOf(getText()), typingSession, this);
        }
    }

    private void documentChanged(DocumentEvent event) {
        if (event.source() != this) {
            reload();
        }
        boolean refused = document.problemAt(path).isPresent();
        putClientProperty("JComponent.outline", refused ? "error" : null);
    }

    private void reload() {
        JsonNode node = document.value(path);
        String text = node == null || node.isNull() ? "" : node.asText();
        if (!text.equals(getText())) {
            reloading = true;
            try {
                setText(text);
                if (!hasFocus()) {
                    setCaretPosition(0); // show the start of a long name, not its end
                }
            } finally {
                reloading = false;
            }
        }
    }

    void detach() {
        document.removeListener(listener);
    }
}
