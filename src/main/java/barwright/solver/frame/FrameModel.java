package barwright.solver.frame;

import java.util.List;

/**
 * A 3-D frame: nodes joined by beam elements and held by supports. Number the nodes along the frame's
 * chains (as a mesher of a bar does): the equations are factored in node order, so a chain numbered from
 * one end to the other factors in time proportional to its length.
 *
 * @param nodes    node positions in global axes (m)
 * @param elements the beam elements
 * @param supports springs and rigid constraints; enough of them to stop every rigid-body motion
 */
public record FrameModel(List<Vector3> nodes, List<BeamElement> elements, List<Support> supports) {
    /** Elements shorter than this fraction of the frame's size are refused as degenerate. */
    private static final double SHORTEST_ELEMENT_FRACTION = 1e-9;

    public FrameModel {
        nodes = List.copyOf(nodes);
        elements = List.copyOf(elements);
        supports = List.copyOf(supports);
        if (nodes.size() < 2) {
            throw new IllegalArgumentException("a frame needs at least two nodes, had " + nodes.size());
        }
        if (elements.isEmpty()) {
            throw new IllegalArgumentException("a frame needs at least one element");
        }
        double size = extent(nodes);
        for (int index = 0; index < elements.size(); index++) {
            BeamElement element = elements.get(index);
            checkNode("element " + index, element.startNode(), nodes.size());
            checkNode("element " + index, element.endNode(), nodes.size());
            double length = nodes.get(element.endNode()).minus(nodes.get(element.startNode())).length();
            if (!(length > SHORTEST_ELEMENT_FRACTION * size)) {
                throw new IllegalArgumentException("element " + index + " has length " + length
                        + " m: its two nodes coincide");
            }
        }
        for (Support support : supports) {
            checkNode("a support", support.node(), nodes.size());
        }
    }

    /** @return the number of equations before supports remove any: six per node */
    public int freedomCount() {
        return 6 * nodes.size();
    }

    /** @return the length of element {@code index} (m) */
    public double elementLength(int index) {
        BeamElement element = elements.get(index);
        return nodes.get(element.endNode()).minus(nodes.get(element.startNode())).length();
    }

    private static void checkNode(String owner, int node, int nodeCount) {
        if (node >= nodeCount) {
            throw new IllegalArgumentException(owner + " refers to node " + node + " but the frame has "
                    + nodeCount + " nodes (0 to " + (nodeCount - 1) + ")");
        }
    }

    private static double extent(List<Vector3> nodes) {
        double largest = 0;
        Vector3 first = nodes.get(0);
        for (Vector3 node : nodes) {
            largest = Math.max(largest, node.minus(first).length());
        }
        return largest;
    }
}
