package barwright.physics;

import barwright.model.AxlePosition;
import barwright.physics.linkage.AxleKinematics;
import barwright.physics.linkage.LinkageLimitException;
import barwright.physics.linkage.RollState;
import barwright.physics.linkage.RollSweep;
import barwright.solver.MonotoneCubic;

import java.util.List;

/**
 * One linkage axle's geometry against body roll, followed once per analysis (model.md 11, "In the analysis"):
 * the load-transfer height and the two wheels' cambers to the road at each roll of a table, between the rolls a
 * shape-preserving cubic ({@link MonotoneCubic}). The table runs from -phi_end to phi_end, the negative half
 * being the mirror image (the right side is the left one mirrored, so the height is the same either way and
 * the right wheel at -phi has the left wheel's camber at phi); that puts rest inside the table, where the
 * height's slope is zero by symmetry. Past the end (where the linkage locks, or {@link #MAX_ROLL}) everything is
 * held at its value there. Immutable and thread-safe. Angles in rad, lengths in m.
 */
public final class AxleRollGeometry {
    /**
     * The table follows the roll to this (rad): 12 deg, well past the roll at the grip limit of a car the model
     * suits (a roll gradient of 15 deg/g is already warned of as past any suspension's travel).
     */
    static final double MAX_ROLL = Math.toRadians(12);
    /**
     * About this far apart (rad): 1 deg. Against the exact kinematics of the sample linkages the interpolated
     * height is within 0.05 mm and the cambers within 0.002 deg half-way between the states (tested).
     */
    static final double STEP = Math.toRadians(1);

    private final AxlePosition position;
    private final AxleKinematics kinematics;
    private final RollSweep sweep;
    private final MonotoneCubic height;
    private final MonotoneCubic rightCamber;

    private AxleRollGeometry(AxlePosition position, AxleKinematics kinematics, RollSweep sweep) {
        this.position = position;
        this.kinematics = kinematics;
        this.sweep = sweep;
        List<RollState> states = sweep.states();
        int n = states.size() - 1;
        if (n == 0) {
            // the linkage cannot roll at all from rest: hold everything at rest
            RollState rest = states.get(0);
            double[] x = {-STEP, 0, STEP};
            this.height = new MonotoneCubic(x, new double[] {rest.loadTransferHeight(), rest.loadTransferHeight(),
                    rest.loadTransferHeight()});
            this.rightCamber = new MonotoneCubic(x, new double[] {rest.leftCamber(), rest.rightCamber(),
                    rest.rightCamber()});
            return;
        }
        double[] rolls = new double[2 * n + 1];
        double[] heights = new double[2 * n + 1];
        double[] cambers = new double[2 * n + 1];
        for (int k = 0; k <= n; k++) {
            RollState state = states.get(k);
            rolls[n + k] = state.roll();
            rolls[n - k] = -state.roll();
            heights[n + k] = state.loadTransferHeight();
            heights[n - k] = state.loadTransferHeight();
            cambers[n + k] = state.rightCamber();
            cambers[n - k] = state.leftCamber();
        }
        this.height = new MonotoneCubic(rolls, heights);
        this.rightCamber = new MonotoneCubic(rolls, cambers);
    }

    /**
     * @param follow how far to follow the roll (rad), at most {@link #MAX_ROLL}
     * @return the axle's table, followed that far or to where the linkage stops
     * @throws ImpossibleVehicleException naming the axle's linkage where a state cannot be put together
     */
    static AxleRollGeometry of(AxlePosition position, AxleKinematics kinematics, double follow) {
        try {
            return new AxleRollGeometry(position, kinematics,
                    kinematics.rollSweep(Math.min(MAX_ROLL, Math.max(follow, STEP)), STEP));
        } catch (LinkageLimitException beyond) {
            throw new ImpossibleVehicleException(position.key() + ".linkage: " + beyond.getMessage());
        }
    }

    public AxlePosition position() {
        return position;
    }

    public AxleKinematics kinematics() {
        return kinematics;
    }

    /** @return the height that sets the geometric load transfer at a body roll, either sign (m) */
    public double loadTransferHeight(double roll) {
        return height.value(roll);
    }

    /**
     * @param roll the body's roll, positive leaning out of the turn (towards the outside wheel)
     * @return the outside wheel's camber to the road (rad), SAE J670
     */
    public double outsideCamber(double roll) {
        return rightCamber.value(roll);
    }

    /**
     * @param roll the body's roll, positive leaning out of the turn
     * @return the inside wheel's camber to the road (rad), SAE J670
     */
    public double insideCamber(double roll) {
        return rightCamber.value(-roll);
    }

    /** @return the largest roll the table reaches (rad); past it the geometry is held */
    public double endRoll() {
        return sweep.lastRoll();
    }

    /** @return why the table ends before the roll it was to follow, in words, or null where it reaches it */
    public String stopReason() {
        return sweep.stopReason();
    }

    /** @return true where the linkage itself stops the roll at {@link #endRoll()} (it locks or flips) */
    public boolean linkageStops() {
        return sweep.linkageStops();
    }

    /**
     * @param roll a body roll, positive leaning out of the turn; held at {@link #endRoll()} past the end
     * @return the linkage's exact state there (not the table's), for the report
     */
    public RollState exactState(double roll) {
        double held = Math.copySign(Math.min(Math.abs(roll), endRoll()), roll);
        try {
            return kinematics.roll(held);
        } catch (LinkageLimitException atTheEnd) {
            // a hair past the last state the sweep reached: that state is the answer
            return sweep.states().get(sweep.states().size() - 1);
        }
    }
}
