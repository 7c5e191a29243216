package barwright.solver.frame;

/**
 * A straight two-node Euler-Bernoulli beam element between two nodes of a frame.
 *
 * @param startNode   index of the node at the element's start (local x' points from it to the end node)
 * @param endNode     index of the node at the element's end
 * @param section     section and material
 * @param orientation a direction (dimensionless) lying in the element's local x'-z' plane, not parallel to
 *                    the element; null to let the frame choose (see the package description)
 */
public record BeamElement(int startNode, int endNode, SectionProperties section, Vector3 orientation) {
    public BeamElement {
        if (startNode < 0 || endNode < 0) {
            throw new IllegalArgumentException("node indices must be zero or more, were " + startNode + ", " + endNode);
        }
        if (startNode == endNode) {
            throw new IllegalArgumentException("an element needs two different nodes, both were " + startNode);
        }
        if (section == null) {
            throw new IllegalArgumentException("an element needs a section");
        }
    }

    /** An element whose local axes the frame chooses. */
    public static BeamElement between(int startNode, int endNode, SectionProperties section) {
        return new BeamElement(startNode, endNode, section, null);
    }
}
