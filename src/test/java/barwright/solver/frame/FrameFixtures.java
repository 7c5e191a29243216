package barwright.solver.frame;

import java.util.ArrayList;
import java.util.List;

/** Small frames for the tests: straight members cut into elements, with invented but steel-like values. */
final class FrameFixtures {
    /**
     * A steel-like round bar, 25 mm solid: E = 205 GPa, G = 80 GPa (typical handbook values for steel, from memory:
     * docs/validation.md, "Formulas named beside tests").
     */
    static final SectionProperties ROUND_BAR = SectionProperties.round(205e9, 80e9,
            Math.PI * 0.025 * 0.025 / 4, Math.PI * Math.pow(0.025, 4) / 64, Math.PI * Math.pow(0.025, 4) / 32);

    private FrameFixtures() {
    }

    /** @return n + 1 equally spaced nodes from {@code start} to {@code end} */
    static List<Vector3> line(Vector3 start, Vector3 end, int elements) {
        List<Vector3> nodes = new ArrayList<>();
        for (int i = 0; i <= elements; i++) {
            nodes.add(start.plus(end.minus(start).times((double) i / elements)));
        }
        return nodes;
    }

    /** @return elements joining consecutive nodes 0-1, 1-2, ... */
    static List<BeamElement> chain(int nodeCount, SectionProperties section, Vector3 orientation) {
        List<BeamElement> elements = new ArrayList<>();
        for (int i = 0; i + 1 < nodeCount; i++) {
            elements.add(new BeamElement(i, i + 1, section, orientation));
        }
        return elements;
    }

    /** @return a tolerance of {@code relative} times the magnitude of {@code expected} */
    static double relative(double expected, double relative) {
        return Math.abs(expected) * relative;
    }
}
