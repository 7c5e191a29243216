package barwright.solver.frame;

/**
 * The stress resultants at both ends of one element (local axes; see {@link SectionForces}). With loads at
 * the nodes only, N, V and T are constant along the element and the bending moments vary linearly between
 * the two ends, so the ends hold the extremes.
 *
 * @param element index of the element
 * @param start   resultants at the start node's section
 * @param end     resultants at the end node's section
 */
public record ElementEndForces(int element, SectionForces start, SectionForces end) {
}
