package barwright.ui.sizing;

import barwright.model.Vehicle;
import barwright.sizing.ExactSolution;
import barwright.sizing.SizingRequest;
import barwright.sizing.SizingResult;

/**
 * A finished search, with the car it was run on.
 *
 * @param vehicle    the car searched
 * @param settings   the form's settings it was run with
 * @param request    the search as the core ran it
 * @param result     the ranked candidates and the counts
 * @param exactSolid the exact solid diameter for the target, or null where both bars were sized
 * @param exactWall  the exact wall of the tube diameter asked for, or null where none was asked for
 */
record SearchOutcome(Vehicle vehicle, SearchSettings settings, SizingRequest request, SizingResult result, ExactSolution exactSolid,
                     ExactSolution exactWall) {
}
