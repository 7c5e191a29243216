package barwright.ui.dynamics;

import javax.swing.Timer;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;

/**
 * The clock of a response played back: a time that runs from the start to the end of a run at real speed or
 * slower, pauses, and can be set by hand. Each tick tells the listeners the new time. Event thread.
 */
final class Playback {
    /** Between frames (ms): about 30 a second, smooth enough to watch a body roll. */
    static final int FRAME_MS = 33;
    private final Timer timer;
    private final List<DoubleConsumer> listeners = new ArrayList<>();
    private final List<Runnable> stateListeners = new ArrayList<>();
    private double time;
    private double end = 1;
    private double speed = 1;
    private long lastTick;

    Playback() {
        timer = new Timer(FRAME_MS, event -> tick());
        timer.setCoalesce(true);
    }

    void addListener(DoubleConsumer listener) {
        listeners.add(listener);
    }

    /** @param listener told when playing starts or stops */
    void addStateListener(Runnable listener) {
        stateListeners.add(listener);
    }

    /** A new run: the clock goes back to its start, paused. */
    void load(double runEnd) {
        pause();
        end = runEnd;
        set(0);
    }

    void play() {
        if (time >= end) {
            set(0);
        }
        lastTick = System.nanoTime();
        timer.start();
        stateListeners.forEach(Runnable::run);
    }

    void pause() {
        if (timer.isRunning()) {
            timer.stop();
            stateListeners.forEach(Runnable::run);
        }
    }

    boolean isPlaying() {
        return timer.isRunning();
    }

    /** @param factor 1 for real time, 0.25 for a quarter of it... */
    void speed(double factor) {
        speed = factor;
    }

    double speed() {
        return speed;
    }

    /** Puts the clock at a time (s), held between the start and the end. */
    void set(double newTime) {
        time = Math.max(0, Math.min(end, newTime));
        listeners.forEach(listener -> listener.accept(time));
    }

    double time() {
        return time;
    }

    double end() {
        return end;
    }

    /** Advances by the wall-clock time since the last frame, scaled; stops at the end. */
    private void tick() {
        long now = System.nanoTime();
        double step = (now - lastTick) * 1e-9 * speed;
        lastTick = now;
        set(time + step);
        if (time >= end) {
            pause();
        }
    }
}
