package barwright.ui.task;

import barwright.model.TurnDirection;

import java.util.ArrayList;
import java.util.List;

/**
 * The steady turn a person is looking at with the lateral-acceleration slider: its direction and how far
 * toward the grip limit (a fraction, so the slider keeps its place when an edit moves the limit).
 */
public final class CorneringProbe {
    private final List<Runnable> listeners = new ArrayList<>();
    private TurnDirection turn = TurnDirection.LEFT;
    private double fractionOfLimit = 0.8;

    public TurnDirection turn() {
        return turn;
    }

    /** @return 0 for driving straight, 1 at the grip limit */
    public double fractionOfLimit() {
        return fractionOfLimit;
    }

    public void setTurn(TurnDirection newTurn) {
        if (newTurn != turn) {
            turn = newTurn;
            fire();
        }
    }

    public void setFractionOfLimit(double fraction) {
        double clamped = Math.max(0, Math.min(1, fraction));
        if (clamped != fractionOfLimit) {
            fractionOfLimit = clamped;
            fire();
        }
    }

    public void addListener(Runnable listener) {
        listeners.add(listener);
    }

    private void fire() {
        List.copyOf(listeners).forEach(Runnable::run);
    }
}
