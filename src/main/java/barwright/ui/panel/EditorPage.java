package barwright.ui.panel;

import barwright.ui.document.DocumentEvent;
import barwright.io.KeyPath;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.FieldSpec;
import barwright.ui.field.ViewSettings;

import java.awt.BorderLayout;
import java.util.List;
import java.util.Objects;

/**
 * One page of the vehicle editor. Its form is built from the document's shape (solid or tube, a bar or
 * none, how many holes...) and built again only when that shape changes; values update in place.
 */
abstract class EditorPage extends PagePanel {
    protected final OpenDocument document;
    protected final ViewSettings view;
    private Form form;
    private String builtFor;

    EditorPage(OpenDocument document, ViewSettings view) {
        super(new BorderLayout());
        this.document = document;
        this.view = view;
        document.addListener(this::documentChanged);
        view.addListener(() -> documentChanged(null));
    }

    /** @return a text that changes exactly when the form must be built again */
    protected abstract String shape();

    /** Fills a new form for the document as it is. */
    protected abstract void build(Form form);

    /** Builds the form the first time; called by the subclass constructor when it is ready. */
    protected final void rebuild() {
        if (form != null) {
            form.detach();
            remove(form);
        }
        form = new Form();
        builtFor = shape();
        build(form);
        form.end();
        add(form, BorderLayout.CENTER);
        revalidate();
        repaint();
    }

    private void documentChanged(DocumentEvent event) {
        if (!Objects.equals(shape(), builtFor)) {
            rebuild();
        }
    }

    /** Adds number fields for specs under a path. */
    protected void fields(Form target, String parent, List<FieldSpec> specs) {
        for (FieldSpec spec : specs) {
            target.field(new NumberField(document, view, KeyPath.of(parent).child(spec.key()), spec));
        }
    }

    protected boolean isObject(String path) {
        var node = document.value(KeyPath.of(path));
        return node != null && node.isObject();
    }

    protected boolean has(String path) {
        var node = document.value(KeyPath.of(path));
        return node != null && !node.isNull();
    }
}
