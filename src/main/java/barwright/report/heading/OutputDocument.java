package barwright.report.heading;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * The head every JSON document the program prints for scripts starts with (file-format.md, "Output
 * documents"): {@code format}, the document's kind, and {@code version}, its layout's version.
 */
public final class OutputDocument {
    private OutputDocument() {
    }

    /**
     * @param format  the document's kind, e.g. {@code barwright.report}
     * @param version its layout's version
     * @return a new document holding the two keys, in that order, for the rest to be added
     */
    public static ObjectNode start(String format, int version) {
        ObjectNode document = JsonNodeFactory.instance.objectNode();
        document.put("format", format);
        document.put("version", version);
        return document;
    }
}
