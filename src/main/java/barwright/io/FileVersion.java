package barwright.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * The vehicle file's versions (docs/file-format.md, "Version history"), in one place: which version this program
 * writes, which it reads, the version a key first appeared in, and the upgrade of an older file's tree.
 *
 * <p>Version 2 only adds keys; a version-1 file means exactly what it meant, and upgrading it changes nothing but
 * its {@code version}.
 */
public final class FileVersion {
    /** The oldest version this program reads. */
    public static final int OLDEST = 1;
    /** The version this program writes; the newest it reads. */
    public static final int CURRENT = 2;
    /** The first version with suspension linkages ({@code linkage}, {@code rideHeightChangeMm}, {@code staticCamberDeg}). */
    public static final int LINKAGES = 2;

    private FileVersion() {
    }

    /** @return the version a (validated) tree declares */
    static int of(JsonNode tree) {
        return tree.path("version").asInt(CURRENT);
    }

    /**
     * @param tree a validated tree of any version this program reads
     * @return a copy in the current version, with the same meaning
     */
    static ObjectNode upgrade(JsonNode tree) {
        ObjectNode copy = ((ObjectNode) tree).deepCopy();
        // version 1 -> 2: keys were only added; nothing in a version-1 file changes its meaning
        copy.put("version", CURRENT);
        return copy;
    }

    /**
     * Records a problem where a key that needs a newer version appears in an older file.
     *
     * @return true where the key may be read
     */
    static boolean allows(int version, int since, JsonNode parent, String parentPath, String key, NodeReader reader) {
        if (NodeReader.isAbsent(parent, key) || version >= since) {
            return true;
        }
        reader.problem(NodeReader.child(parentPath, key), "is a key of file version " + since + " and later; this file "
                + "says version " + version + ". Set \"version\" to " + since + " (nothing else changes meaning).");
        return false;
    }
}
