package barwright.physics.fatigue;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.DynamicsInputs;
import barwright.model.LapLog;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleResult;
import barwright.physics.dynamics.RollState;
import barwright.physics.dynamics.TransientAnalysis;

import java.util.List;

/**
 * A bar's stress history from a logged lap replayed through the roll in motion (docs/model.md 13 and 14). At each
 * recorded instant the body end at the axle has rolled phi; the tyres take phi_tyre = (T t - D a_y t) / K_tyre of
 * it, where T is the axle's load transfer at that instant, D its unsprung and geometric transfer per a_y and
 * K_tyre the tyres' roll stiffness (model.md 3: what reaches the ground through the springs, bar and dampers
 * is carried by the tyres). The suspension's roll phi - phi_tyre times the track is the differential wheel travel,
 * and the bar model in use turns it into the largest von Mises stress, signed with the travel. Held at a steady
 * a_y this is the quasi-static stress of {@link BarStressHistory} (phi_tyre = K phi / K_tyre, so the suspension
 * keeps K / K_susp of phi). Once an inside wheel lifts the model caps that axle's transfer, so the tyres' share
 * stops growing and the whole further roll goes into the bar: an upper bound.
 */
public final class ReplayedStress {
    /**
     * The replay starts at rest; a lap in a season starts where the one before ended. So the log's first a_y is
     * held this long before the lap (s) and the settling is dropped: damped roll modes of 1 to 3 Hz have died
     * away to well under 0.1 % by then (damping ratio 0.2 or more).
     */
    public static final double SETTLE_SECONDS = 5;

    private ReplayedStress() {
    }

    /**
     * One lap's stress at the bar of each axle.
     *
     * @param front       signed stress at each sample of the lap (Pa), or null for no front bar
     * @param rear        the rear's, or null
     * @param lapSeconds  the log's duration (s)
     */
    public record LapStress(double[] front, double[] rear, double lapSeconds) {
        /** @return the axle's history, or null where it has no bar */
        public double[] of(AxlePosition position) {
            return position == AxlePosition.FRONT ? front : rear;
        }
    }

    /**
     * Replays the log (with the settling hold before it) and turns each axle's state into its bar's stress.
     *
     * @throws barwright.physics.ImpossibleVehicleException where the file has no roll inertia
     */
    public static LapStress of(AnalysisResult analysis, DynamicsInputs inputs, LapLog log) {
        LapLog settled = settled(log);
        List<RollState> states = TransientAnalysis.log(analysis, inputs, settled, Double.POSITIVE_INFINITY)
                .run().states();
        int first = 0;
        while (first < states.size() && states.get(first).time() < log.start()) {
            first++;
        }
        return fromStates(analysis, states.subList(first, states.size()), log.end() - log.start());
    }

    /**
     * @param lap        the replayed states of one lap, in time order
     * @param lapSeconds the lap's duration (s)
     * @return each axle's bar stress at each state
     */
    public static LapStress fromStates(AnalysisResult analysis, List<RollState> lap, double lapSeconds) {
        return new LapStress(history(analysis, lap, AxlePosition.FRONT), history(analysis, lap, AxlePosition.REAR),
                lapSeconds);
    }

    /** @return the log with its first a_y and a_x held {@link #SETTLE_SECONDS} before its start */
    static LapLog settled(LapLog log) {
        double interval = Math.max(log.shortestInterval(), 0.02);
        int extra = (int) Math.ceil(SETTLE_SECONDS / interval);
        int count = log.times().length;
        double[] times = new double[extra + count];
        double[] lateral = new double[extra + count];
        double[] longitudinal = new double[extra + count];
        double[] speeds = log.speeds() == null ? null : new double[extra + count];
        for (int i = 0; i < extra; i++) {
            times[i] = log.start() - (extra - i) * interval;
            lateral[i] = log.lateral()[0];
            longitudinal[i] = log.longitudinal()[0];
            if (speeds != null) {
                speeds[i] = log.speeds()[0];
            }
        }
        System.arraycopy(log.times(), 0, times, extra, count);
        System.arraycopy(log.lateral(), 0, lateral, extra, count);
        System.arraycopy(log.longitudinal(), 0, longitudinal, extra, count);
        if (speeds != null) {
            System.arraycopy(log.speeds(), 0, speeds, extra, count);
        }
        return new LapLog(times, lateral, longitudinal, speeds);
    }

    /** @return the axle's bar stress at each state (Pa), or null where the axle has no bar */
    static double[] history(AnalysisResult analysis, List<RollState> states, AxlePosition position) {
        AntiRollBar bar = analysis.vehicle().axle(position).bar();
        if (bar == null) {
            return null;
        }
        AxleResult axle = analysis.axle(position);
        double track = analysis.vehicle().axle(position).track();
        double tyreStiffness = axle.stiffness().tyreRollStiffness();
        double directPerAcceleration = axle.loadTransfer().unsprung() + axle.loadTransfer().geometric();
        double stressPerTravel = BarStressHistory.stressPerTravel(analysis.vehicle(), bar, axle.bar());
        boolean front = position == AxlePosition.FRONT;
        double[] stress = new double[states.size()];
        for (int i = 0; i < stress.length; i++) {
            RollState state = states.get(i);
            double roll = front ? state.frontRoll() : state.rearRoll();
            double transfer = front ? state.frontTransfer() : state.rearTransfer();
            double tyreRoll = Double.isInfinite(tyreStiffness) ? 0
                    : (transfer - directPerAcceleration * state.lateral()) * track / tyreStiffness;
            stress[i] = stressPerTravel * track * (roll - tyreRoll);
        }
        return stress;
    }
}
