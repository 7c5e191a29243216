package barwright.ui.panel;

import barwright.model.AxlePosition;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.FieldCatalogue;
import barwright.ui.field.ViewSettings;

/** One axle: track and roll centre, unsprung parts, springs and tyre rate, and the tyre's grip data. */
final class AxlePage extends EditorPage {
    private final AxlePosition axle;

    AxlePage(OpenDocument document, ViewSettings view, AxlePosition axle) {
        super(document, view);
        this.axle = axle;
        rebuild();
    }

    @Override
    protected String shape() {
        return "axle";
    }

    @Override
    protected void build(Form form) {
        String key = axle.key();
        form.group("Track and roll centre");
        fields(form, key, FieldCatalogue.AXLE_GEOMETRY);
        form.group("Unsprung parts");
        fields(form, key, FieldCatalogue.AXLE_UNSPRUNG);
        form.group("Springs and tyre rate");
        fields(form, key, FieldCatalogue.AXLE_SPRINGS);
        form.group("Tyre grip (from the tyre's test data)");
        fields(form, key + ".tyre", FieldCatalogue.TYRE);
    }
}
